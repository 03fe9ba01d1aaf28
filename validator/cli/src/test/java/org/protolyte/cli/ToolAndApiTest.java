package org.protolyte.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.spi.ToolProvider;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.protolyte.api.Format;
import org.protolyte.api.Result;
import org.protolyte.api.Source;
import org.protolyte.api.Validator;

/**
 * The two in-process integrations against the command line: the {@link ToolProvider} gives its exit codes and output,
 * and the library API renders each sample's report with the command line's bytes, time stamp apart.
 */
class ToolAndApiTest {

    private static final Path ROOT = Path.of(System.getProperty("protolyte.projectRoot", "../..")).normalize();

    static List<Path> samples() throws Exception {
        List<Path> out = new ArrayList<>();
        try (Stream<Path> s = Files.walk(ROOT.resolve("sample-formulations"))) {
            s.filter(p -> p.toString().endsWith(".json") && !p.toString().contains("site-library")
                    && !p.getFileName().toString().startsWith("master-")).sorted().forEach(out::add);
        }
        return out;
    }

    private static String[] run(ToolProvider tool, String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = tool.run(new PrintWriter(out), new PrintWriter(err), args);
        return new String[] {String.valueOf(code), out.toString(), err.toString()};
    }

    @Test
    void theToolProviderRunsTheCommandLineInProcess() {
        ToolProvider tool = ToolProvider.findFirst("protolyte").orElseThrow(() ->
                new AssertionError("no ToolProvider named protolyte on the class path"));
        Path samples = ROOT.resolve("sample-formulations");
        String[] pass = run(tool, "check", samples.resolve("cell-culture-hepes-basal-medium.json").toString());
        assertEquals("0", pass[0], pass[2]);
        assertTrue(pass[1].contains("PASS"), pass[1]);
        String[] fail = run(tool, "check", samples.resolve("parenteral-citrate-buffer-off-target.json").toString());
        assertEquals("1", fail[0], fail[2]);
        String[] usage = run(tool, "check", "--format", "nonsense", "x.json");
        assertEquals("2", usage[0]);
        assertTrue(usage[2].contains("protolyte:"), usage[2]);
        MainCommandLineTest.Result direct = MainCommandLineTest.run("check",
                samples.resolve("parenteral-citrate-buffer-off-target.json").toString());
        assertEquals(direct.out(), fail[1], "the same report as the command line");
    }

    /** The JSON report's only line that differs between two runs. */
    private static String timeless(String report) {
        return report.replaceAll("\"generatedAt\" : \"[^\"]*\"", "\"generatedAt\" : \"…\"")
                .replaceAll("(?s)<time class=\"generated\"[^>]*>.*?</time>", "<time/>")
                .replaceAll("<meta name=\"generated\"[^>]*>", "<meta/>");
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("samples")
    void theApiRendersTheCommandLinesReport(Path sample) throws Exception {
        Validator validator = Validator.builder().plots(true).build();
        Result r = validator.check(Source.of(sample));
        for (Format f : Format.values()) {
            // a validator with plots gives the plots' points in JSON too, as --curves does
            MainCommandLineTest.Result cli = f == Format.JSON
                    ? MainCommandLineTest.run("check", "--format", "json", "--curves", sample.toString())
                    : MainCommandLineTest.run("check", "--format", f.name().toLowerCase(java.util.Locale.ROOT),
                            sample.toString());
            assertEquals(r.exitCode(), cli.exitCode(), f + ": " + cli.err());
            assertEquals(timeless(cli.out()), timeless(r.render(f)), f + " report of " + sample);
        }
    }

    /** A folder through the API gives the command line's report of that folder, every format, time stamp apart. */
    @Test
    void theApiChecksAFolderAsTheCommandLineDoes() throws Exception {
        Path folder = ROOT.resolve("sample-formulations");
        org.protolyte.api.Run run = Validator.builder().plots(true).build().check(List.of(folder), List.of("site-library/"));
        assertTrue(run.results().size() > 15, "every sample: " + run.results().size());
        assertTrue(run.skipped().stream().anyMatch(s -> s.reason().contains("site-library/")), run.skipped()::toString);
        for (Format f : Format.values()) {
            List<String> args = new ArrayList<>(List.of("check", "--format", f.name().toLowerCase(java.util.Locale.ROOT),
                    "--exclude", "site-library/"));
            if (f == Format.JSON) {
                args.add("--curves");
            }
            args.add(folder.toString());
            MainCommandLineTest.Result cli = MainCommandLineTest.run(args.toArray(String[]::new));
            assertEquals(run.exitCode(), cli.exitCode(), f + ": " + cli.err());
            assertEquals(timeless(cli.out()), timeless(run.render(f)), f + " report of the folder");
        }
    }
}
