package org.protolyte.maven;

import java.io.File;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

import org.apache.maven.plugin.AbstractMojo;
import org.apache.maven.plugin.MojoExecutionException;
import org.apache.maven.plugin.MojoFailureException;
import org.apache.maven.plugins.annotations.LifecyclePhase;
import org.apache.maven.plugins.annotations.Mojo;
import org.apache.maven.plugins.annotations.Parameter;
import org.protolyte.api.ConfigurationException;
import org.protolyte.api.Diagnostic;
import org.protolyte.api.Finding;
import org.protolyte.api.Format;
import org.protolyte.api.Result;
import org.protolyte.api.Run;
import org.protolyte.api.Severity;
import org.protolyte.api.Status;
import org.protolyte.api.Validator;

/**
 * Checks the project's formulation documents and batch records as {@code protolyte check} does, writes the reports,
 * and fails the build unless every document passes: a failing, invalid or indeterminate document, or an internal
 * fault, fails it. A configuration that cannot be used (a missing pack file, a bad glob, a folder without documents)
 * stops the build with every problem named.
 */
@Mojo(name = "check", defaultPhase = LifecyclePhase.VERIFY, threadSafe = true)
public final class CheckMojo extends AbstractMojo {

    /**
     * Formulation documents or batch records (JSON), and folders: a folder means every {@code *.json} below it, in
     * order of relative path, less what its {@code .protolyte-ignore} or {@code excludes} leaves out.
     */
    @Parameter(property = "protolyte.files", defaultValue = "${project.basedir}/recipes")
    private List<File> files;

    /**
     * Globs of files found in a folder to leave out, matched against the path below that folder, as lines of the
     * folder's {@code .protolyte-ignore} (e.g. {@code drafts/}, {@code old-*.json}).
     */
    @Parameter(property = "protolyte.excludes")
    private List<String> excludes;

    /** Site substance libraries that extend the shipped one. */
    @Parameter(property = "protolyte.substances")
    private List<File> substances;

    /**
     * Rule packs, as the command line's {@code --rules}: a shipped pack's name ({@code parenteral}) or a pack file
     * (relative to the project's folder) replaces the packs chosen by each document's intended use; {@code +name} or
     * {@code +file} adds to that choice instead.
     */
    @Parameter(property = "protolyte.rules")
    private List<String> rules;

    /**
     * A folder of plugin jars, as the command line's {@code --plugins}: a site's check kinds and substance libraries.
     * It holds jars only; the reports name each with its SHA-256.
     */
    @Parameter(property = "protolyte.plugins")
    private File plugins;

    /** The waiver file QA holds: accepted findings, per document revision. */
    @Parameter(property = "protolyte.waivers")
    private File waivers;

    /** The lowest finding severity that fails a document: {@code error}, {@code warning} or {@code note}. */
    @Parameter(property = "protolyte.failOn", defaultValue = "error")
    private String failOn;

    /**
     * The reports to write, each a {@code format} ({@code text}, {@code json}, {@code sarif} or {@code html}) and a
     * {@code file}, written atomically with the bytes {@code protolyte check --format FORMAT -o FILE} writes. As a
     * property, {@code format:file} items separated by commas. Default: the text report in
     * <code>${project.build.directory}/protolyte/report.txt</code>. An HTML report also puts the plots' points into the
     * run's JSON reports.
     */
    @Parameter(property = "protolyte.reports")
    private List<Report> reports;

    /** Skips the check (and says so). */
    @Parameter(property = "protolyte.skip", defaultValue = "false")
    private boolean skip;

    @Parameter(defaultValue = "${project.basedir}", readonly = true, required = true)
    private File basedir;

    @Parameter(defaultValue = "${project.build.directory}", readonly = true, required = true)
    private File buildDirectory;

    @Override
    public void execute() throws MojoExecutionException, MojoFailureException {
        if (skip) {
            getLog().info("Protolyte check skipped (protolyte.skip)");
            return;
        }
        List<String> problems = new ArrayList<>();
        if (list(files).isEmpty()) {
            problems.add("files: names no document or folder to check");
        }
        list(files).stream().filter(f -> !f.exists()).forEach(f -> problems.add("files: " + f + " does not exist"));
        Map<Path, Format> targets = targets(problems);
        Validator validator;
        Run run;
        try {
            Validator.Builder builder = Validator.builder().failOn(severity(problems))
                    .plots(targets.containsValue(Format.HTML));
            for (File s : list(substances)) {
                builder.substanceLibrary(s.toPath());
            }
            if (waivers != null) {
                builder.waivers(waivers.toPath());
            }
            if (plugins != null) {
                builder.plugins(plugins.toPath());
            }
            builder.rules(basedir.toPath(), list(rules));
            validator = builder.build();
        } catch (ConfigurationException e) {
            problems.addAll(e.problems());
            throw configuration(problems);
        }
        if (!problems.isEmpty()) {
            throw configuration(problems);
        }
        try {
            run = validator.check(list(files).stream().map(File::toPath).toList(), list(excludes));
        } catch (ConfigurationException e) {
            throw configuration(e.problems());
        }
        if (run.results().isEmpty()) {
            throw configuration(List.of("files: every file found was left out (" + run.skipped().size()
                    + " skipped), so nothing was checked"));
        }
        for (Map.Entry<Path, Format> t : targets.entrySet()) {
            try {
                AtomicFile.write(t.getKey(), out -> run.render(t.getValue(), out));
            } catch (IOException e) {
                throw new MojoExecutionException("cannot write the report " + t.getKey() + ": " + e.getMessage(), e);
            }
            getLog().info("Protolyte " + t.getValue().name().toLowerCase(Locale.ROOT) + " report: " + t.getKey());
        }
        List<String> summary = summary(run);
        if (run.exitCode() != 0) {
            summary.forEach(getLog()::error);
            throw new MojoFailureException("Protolyte check did not pass (exit code " + run.exitCode() + "):"
                    + System.lineSeparator()
                    + String.join(System.lineSeparator(), summary));
        }
        summary.forEach(getLog()::info);
    }

    /** Every report file, resolved against the project's folder, with its format; unknown formats are problems. */
    private Map<Path, Format> targets(List<String> problems) {
        List<Report> wanted = reports == null || reports.isEmpty()
                ? List.of(new Report("text", new File(buildDirectory, "protolyte/report.txt"))) : reports;
        Map<Path, Format> out = new java.util.LinkedHashMap<>();
        for (Report r : wanted) {
            Optional<Format> format = r.parsedFormat();
            if (format.isEmpty()) {
                problems.add("reports: format '" + r.format() + "' is not one of text, json, sarif, html");
            } else if (r.file() == null || r.file().getPath().isBlank()) {
                problems.add("reports: the " + r.format() + " report names no file");
            } else {
                Path file = basedir.toPath().resolve(r.file().toPath()).normalize();
                if (out.put(file, format.get()) != null) {
                    problems.add("reports: " + file + " is named twice");
                }
            }
        }
        return out;
    }

    private Severity severity(List<String> problems) {
        String s = failOn == null ? "" : failOn.strip().toUpperCase(Locale.ROOT);
        for (Severity known : Severity.values()) {
            if (known.name().equals(s)) {
                return known;
            }
        }
        problems.add("failOn: '" + failOn + "' is not one of error, warning, note");
        return Severity.ERROR;
    }

    private static MojoExecutionException configuration(List<String> problems) {
        return new MojoExecutionException("Protolyte cannot check with this configuration:" + System.lineSeparator()
                + "  " + String.join(System.lineSeparator() + "  ", problems));
    }

    /** The counts line of the text report, then one line per document that does not pass. */
    List<String> summary(Run run) {
        Map<Status, Long> n = run.counts();
        long documents = n.values().stream().mapToLong(Long::longValue).sum();
        List<String> out = new ArrayList<>();
        out.add(String.format(Locale.ROOT, "%d document(s): %d pass, %d fail, %d invalid, %d indeterminate", documents,
                n.get(Status.PASS), n.get(Status.FAIL), n.get(Status.INVALID), n.get(Status.INDETERMINATE))
                + (n.get(Status.FAULT) > 0 ? ", " + n.get(Status.FAULT) + " internal fault(s)" : ""));
        for (Result r : run.results()) {
            if (r.status() != Status.PASS) {
                out.add(r.status() + " " + shown(r.source()) + ": " + firstReason(r));
            }
        }
        return out;
    }

    /** A source below the project's folder, relative to it. */
    private String shown(String source) {
        Path p = Path.of(source);
        Path base = basedir.toPath().toAbsolutePath().normalize();
        return p.isAbsolute() && p.normalize().startsWith(base) ? base.relativize(p.normalize()).toString() : source;
    }

    /** The weightiest finding not waived, else the engine's first word on an indeterminate condition. */
    private static String firstReason(Result r) {
        Optional<Finding> f = r.findings().stream().filter(x -> !x.waived())
                .min(Comparator.comparing(Finding::severity, Comparator.reverseOrder()));
        if (f.isPresent()) {
            return f.get().severity().name().toLowerCase(Locale.ROOT) + " " + f.get().rule()
                    + f.get().pointer().map(p -> " " + p).orElse("") + ": " + f.get().message();
        }
        return r.diagnostics().stream().filter(Diagnostic::indeterminate).findFirst()
                .map(d -> "indeterminate " + d.code() + d.condition().map(c -> " (" + c + ")").orElse("") + ": "
                        + d.message())
                .orElse("no finding given");
    }

    private static <T> List<T> list(List<T> maybe) {
        return maybe == null ? List.of() : maybe;
    }
}
