package org.protolyte.api;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.Executor;

import org.protolyte.Protolyte;
import org.protolyte.document.DocumentException;
import org.protolyte.document.Problem;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.plugin.Plugins;
import org.protolyte.report.DocumentReport;
import org.protolyte.rules.CheckKinds;
import org.protolyte.rules.Checker;
import org.protolyte.rules.RuleBook;
import org.protolyte.rules.WaiverFile;
import org.protolyte.rules.Waivers;
import org.protolyte.substance.LibraryLoader;
import org.protolyte.substance.SubstanceLibrary;

/**
 * Checks formulation documents and batch records. Built once with {@link #builder()}, then immutable and safe to
 * share between threads: a service builds one and checks every request with it.
 *
 * <pre>{@code
 * Validator validator = Validator.builder().failOn(Severity.ERROR).build();
 * Result result = validator.check(Source.of(Path.of("buffer.json")));
 * if (result.status() != Status.PASS) {
 *     System.out.print(result.render(Format.TEXT));
 * }
 * }</pre>
 */
public final class Validator {

    private final Protolyte protolyte;
    private final SubstanceLibrary library;
    private final List<RuleSummary> rules;
    private final Clock clock;
    private final Executor executor;

    private Validator(Protolyte protolyte, SubstanceLibrary library, List<RuleSummary> rules, Clock clock,
                      Executor executor) {
        this.protolyte = protolyte;
        this.library = library;
        this.rules = List.copyOf(rules);
        this.clock = clock;
        this.executor = executor;
    }

    public static Builder builder() {
        return new Builder();
    }

    /** The tool's version, as the reports give it. */
    public static String version() {
        return Protolyte.version();
    }

    /** One rule of the packs this validator may apply. */
    public record RuleSummary(String id, String pack, Severity severity, String summary) {
    }

    /**
     * Every place a site's check kinds or substance libraries came from: each jar of {@link Builder#plugins}, and the
     * class path's or module path's providers, with the SHA-256 of each jar. Reports name the same.
     */
    public List<Plugin> plugins() {
        return protolyte.plugins().stream().map(o -> new Plugin(o.location(), o.sha256(), o.checkKinds(),
                o.substanceLibraries())).toList();
    }

    /** Every rule of the packs this validator holds, in pack order. */
    public List<RuleSummary> rules() {
        return rules;
    }

    /** Checks one document; never throws for what the document holds (an unusable one is {@link Status#INVALID}). */
    public Result check(Source source) {
        DocumentReport r = source.folder().isPresent()
                ? protolyte.check(source.name(), source.bytes(), source.folder().get())
                : protolyte.check(source.name(), source.bytes());
        return new Result(r, clock.instant(), Protolyte.version(), library.files(), protolyte.plugins());
    }

    /**
     * Checks files and folders as {@code protolyte check} does: a folder is every *.json below it in order of relative
     * path, less what its ignore file ({@value org.protolyte.Protolyte#IGNORE_FILE}) or an {@code excludes} glob leaves
     * out; companions found in a folder (libraries, packs, waivers) are passed over and listed. Runs on the
     * validator's executor.
     *
     * @throws ConfigurationException where a name or a pattern cannot be used (an empty name, a bad glob, a folder
     *                                without documents)
     */
    public Run check(List<Path> filesOrFolders, List<String> excludes) throws ConfigurationException {
        org.protolyte.Inputs.Found found;
        try {
            if (filesOrFolders.stream().anyMatch(p -> p.toString().equals(org.protolyte.Inputs.STANDARD_INPUT))) {
                throw new ConfigurationException(List.of("'-' (standard input) is the command line's; give a Source"));
            }
            found = org.protolyte.Inputs.expand(filesOrFolders, excludes, java.io.InputStream.nullInputStream());
        } catch (org.protolyte.Inputs.Unusable e) {
            throw new ConfigurationException(List.of(e.getMessage()));
        } catch (IOException e) {
            throw new ConfigurationException(List.of("cannot read the files named: " + e.getMessage()));
        }
        java.time.Instant at = clock.instant();
        org.protolyte.report.RunSummary summary = new org.protolyte.report.RunSummary(Protolyte.version(), at,
                library.files(), protolyte.plugins(), Optional.empty());
        found.excluded().forEach(summary::skip);
        List<Result> results = new ArrayList<>();
        protolyte.stream(found.inputs(), summary, r -> results.add(new Result(r, at, Protolyte.version(),
                library.files(), protolyte.plugins())), executor, 16);
        return new Run(results, summary.skipped(), summary);
    }

    /** Checks several documents on the validator's executor; the results in the order of the sources. */
    public List<Result> checkAll(List<Source> sources) {
        List<CompletableFuture<Result>> running = new ArrayList<>();
        for (Source s : sources) {
            running.add(CompletableFuture.supplyAsync(() -> check(s), executor));
        }
        return running.stream().map(CompletableFuture::join).toList();
    }

    /** Collects a validator's configuration; {@link #build} checks all of it at once. Not thread-safe. */
    public static final class Builder {

        private record Named(String name, Optional<byte[]> content, Optional<Path> file) {
        }

        private final List<Named> libraries = new ArrayList<>();
        private final List<Named> packs = new ArrayList<>();
        private final List<String> onlyPacks = new ArrayList<>();
        private final List<String> alsoPacks = new ArrayList<>();
        private final List<Map.Entry<String, Path>> choices = new ArrayList<>();
        private Optional<Named> waivers = Optional.empty();
        private Optional<Path> plugins = Optional.empty();
        private Severity failOn = Severity.ERROR;
        private Clock clock = Clock.systemUTC();
        private Executor executor = Runnable::run;
        private boolean plots;

        private Builder() {
        }

        /** A site's substance library, read when the validator is built, extending the shipped one. */
        public Builder substanceLibrary(Path file) {
            libraries.add(new Named(file.toString(), Optional.empty(), Optional.of(file)));
            return this;
        }

        /** A site's substance library from bytes, named as reports will name it. */
        public Builder substanceLibrary(String name, byte[] content) {
            libraries.add(new Named(name, Optional.of(content.clone()), Optional.empty()));
            return this;
        }

        /**
         * A folder of plugin jars: their check kinds ({@link org.protolyte.spi.CheckKind}) join the shipped ones, their
         * substance libraries ({@link org.protolyte.spi.SubstanceLibrarySource}) extend the shipped library. The folder
         * holds jars only, each providing something; anything else is a configuration problem. Kinds on the class path
         * or the module path are loaded without this.
         */
        public Builder plugins(Path folder) {
            this.plugins = Optional.of(folder);
            return this;
        }

        /** A rule pack added to the packs each document's intended use chooses. */
        public Builder rulePack(Path file) {
            packs.add(new Named(file.toString(), Optional.empty(), Optional.of(file)));
            return this;
        }

        /** A rule pack from bytes, added to the packs each document's intended use chooses. */
        public Builder rulePack(String name, byte[] content) {
            packs.add(new Named(name, Optional.of(content.clone()), Optional.empty()));
            return this;
        }

        /**
         * Only these packs judge every document (the command line's {@code --rules PACK}): shipped names, or packs added
         * here, by their name or by the name they were added under (the file's path).
         */
        public Builder onlyRulePacks(String... names) {
            onlyPacks.addAll(List.of(names));
            return this;
        }

        /**
         * These packs join the choice, the intended use's or {@link #onlyRulePacks}' (the command line's {@code --rules
         * +PACK}): named as for {@code onlyRulePacks}.
         */
        public Builder alsoRulePacks(String... names) {
            alsoPacks.addAll(List.of(names));
            return this;
        }

        /**
         * The command line's {@code --rules} values: a shipped pack's name, else a pack file (resolved against
         * {@code base}); plain, it replaces the intended use's choice, as {@link #onlyRulePacks}; after a {@code +}, it
         * joins it, as {@link #alsoRulePacks}. A file named twice is read once. The command line, the service and the
         * build plugin all take their rule choice through here.
         */
        public Builder rules(Path base, List<String> values) {
            Objects.requireNonNull(base);
            values.forEach(v -> choices.add(Map.entry(v == null ? "" : v.strip(), base)));
            return this;
        }

        /** The lowest severity that fails a document (default {@link Severity#ERROR}). */
        public Builder failOn(Severity severity) {
            this.failOn = Objects.requireNonNull(severity);
            return this;
        }

        /** The waiver file QA holds; approval and expiry are judged on the clock's date. */
        public Builder waivers(Path file) {
            this.waivers = Optional.of(new Named(file.toString(), Optional.empty(), Optional.of(file)));
            return this;
        }

        public Builder waivers(String name, byte[] content) {
            this.waivers = Optional.of(new Named(name, Optional.of(content.clone()), Optional.empty()));
            return this;
        }

        /** The clock of the reports' time stamps and of the waivers' date (default: the system clock, UTC). */
        public Builder clock(Clock clock) {
            this.clock = Objects.requireNonNull(clock);
            return this;
        }

        /** Where {@link Validator#checkAll} runs its checks (default: the calling thread). */
        public Builder executor(Executor executor) {
            this.executor = Objects.requireNonNull(executor);
            return this;
        }

        /**
         * Also trace the points behind the plots: HTML draws them, and JSON gives them as {@code --curves} does (a
         * hundred more solves per document).
         */
        public Builder plots(boolean plots) {
            this.plots = plots;
            return this;
        }

        /** The validator, or one exception that names every problem of the configuration. */
        public Validator build() throws ConfigurationException {
            SchemaCatalog schemas = new SchemaCatalog();
            List<String> problems = new ArrayList<>();
            LibraryLoader loader = new LibraryLoader(schemas).addShipped();
            Plugins found = null;
            CheckKinds kinds = null;
            try {
                found = Plugins.found(plugins);
                kinds = CheckKinds.load(found);
            } catch (Plugins.Unusable e) {
                problems.addAll(e.problems());
            }
            if (kinds == null) {
                throw new ConfigurationException(problems);   // no pack can be read without its kinds
            }
            for (Plugins.Library l : found.libraries()) {
                try {
                    loader.add(l.name(), l.content(), true);
                } catch (DocumentException e) {
                    describe("substance library " + l.name(), e, problems);
                }
            }
            for (Named l : libraries) {
                read(l, "substance library", problems).ifPresent(bytes -> {
                    try {
                        loader.add(l.name(), bytes, true);
                    } catch (DocumentException e) {
                        describe("substance library " + l.name(), e, problems);
                    }
                });
            }
            RuleBook book = RuleBook.shipped(schemas, kinds);
            List<String> added = new ArrayList<>();
            java.util.Map<String, String> addedAs = new java.util.HashMap<>();
            for (Named p : packs) {
                read(p, "rule pack", problems).ifPresent(bytes -> {
                    try {
                        String name = book.add(p.name(), bytes, false).name();
                        added.add(name);
                        addedAs.put(p.name(), name);
                    } catch (DocumentException e) {
                        describe("rule pack " + p.name(), e, problems);
                    }
                });
            }
            List<String> onlyNames = new ArrayList<>(onlyPacks);
            List<String> alsoNames = new ArrayList<>(alsoPacks);
            java.util.Set<String> unreadable = new java.util.HashSet<>();
            for (Map.Entry<String, Path> choice : choices) {
                boolean joins = choice.getKey().startsWith("+");
                String name = joins ? choice.getKey().substring(1) : choice.getKey();
                if (name.isEmpty()) {
                    problems.add("rules: '" + choice.getKey() + "' names no rule pack (a shipped name, a file, or "
                            + "either after '+')");
                    continue;
                }
                Path file = choice.getValue().resolve(name).normalize();
                String as = file.toString();
                if (book.pack(name).isPresent()) {
                    as = name;
                } else if (!addedAs.containsKey(as)) {
                    if (!Files.exists(file) && name.matches("[a-z0-9]+(-[a-z0-9]+)*")) {   // a pack's name
                        problems.add("unknown rule pack '" + name + "': not a shipped pack (" + String.join(", ",
                                book.packs().keySet()) + ") and no file " + file);
                        unreadable.add(as);
                    } else {
                        Optional<byte[]> bytes = read(new Named(as, Optional.empty(), Optional.of(file)), "rule pack",
                                problems);
                        try {
                            if (bytes.isPresent()) {
                                addedAs.put(as, book.add(as, bytes.get(), false).name());   // chosen, not joined
                            } else {
                                unreadable.add(as);
                            }
                        } catch (DocumentException e) {
                            describe("rule pack " + as, e, problems);
                            unreadable.add(as);
                        }
                    }
                }
                (joins ? alsoNames : onlyNames).add(as);
            }
            List<String> only = new ArrayList<>();
            List<String> also = new ArrayList<>();
            for (List<String> names : List.of(onlyNames, alsoNames)) {
                for (String name : names) {
                    String pack = addedAs.getOrDefault(name, name);
                    if (book.pack(pack).isEmpty()) {
                        // a file's own problem is named where it was read
                        if (!unreadable.contains(name) && !packs.stream().anyMatch(p -> p.name().equals(name))) {
                            problems.add("unknown rule pack '" + name + "': not shipped (" + String.join(", ",
                                    book.packs().keySet()) + ") and not added");
                        }
                    } else if (!(names == onlyNames ? only : also).contains(pack)) {
                        (names == onlyNames ? only : also).add(pack);
                    }
                }
            }
            Waivers held = Waivers.none(LocalDate.now(clock));
            if (waivers.isPresent()) {
                Named w = waivers.get();
                Optional<byte[]> bytes = read(w, "waiver file", problems);
                if (bytes.isPresent()) {
                    try {
                        held = new Waivers(WaiverFile.read(schemas, w.name(), bytes.get()), LocalDate.now(clock));
                    } catch (DocumentException e) {
                        describe("waiver file " + w.name(), e, problems);
                    }
                }
            }
            SubstanceLibrary library = null;
            Checker checker = null;
            if (problems.isEmpty()) {
                try {
                    library = loader.build();
                } catch (DocumentException e) {
                    describe("substance libraries", e, problems);
                }
                try {
                    List<String> joining = new ArrayList<>(only.isEmpty() ? added : List.of());
                    also.stream().filter(p -> !joining.contains(p)).forEach(joining::add);
                    checker = new Checker(book, only, joining);
                } catch (DocumentException e) {
                    describe("rule packs", e, problems);
                }
            }
            if (!problems.isEmpty()) {
                throw new ConfigurationException(problems);
            }
            Protolyte p = new Protolyte(schemas, library, checker, org.protolyte.rules.Severity.valueOf(failOn.name()),
                    held);
            List<RuleSummary> rules = new ArrayList<>();
            book.rules(new ArrayList<>(book.packs().keySet())).forEach(r -> rules.add(new RuleSummary(r.id(), r.pack(),
                    Severity.valueOf(r.severity().name()), r.summary())));
            return new Validator(plots ? p.withCurves() : p, library, rules, clock, executor);
        }

        private static Optional<byte[]> read(Named n, String what, List<String> problems) {
            if (n.content().isPresent()) {
                return n.content();
            }
            Path file = n.file().orElseThrow();
            try {
                if (!Files.isRegularFile(file)) {
                    problems.add(what + " " + file + ": " + (Files.isDirectory(file) ? "is a folder, not a file"
                            : "file not found"));
                    return Optional.empty();
                }
                try (var in = Files.newInputStream(file)) {
                    return Optional.of(Protolyte.readBounded(in));
                }
            } catch (IOException e) {
                problems.add(what + " " + file + ": cannot be read: " + e.getMessage());
                return Optional.empty();
            }
        }

        private static void describe(String what, DocumentException e, List<String> problems) {
            for (Problem p : e.problems()) {
                problems.add(what + ": " + p);
            }
        }
    }
}
