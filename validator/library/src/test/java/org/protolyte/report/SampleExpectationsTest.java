package org.protolyte.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.protolyte.Protolyte;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.substance.LibraryLoader;

/** Each sample gives exactly the status and findings that sample-formulations/README.md says it should. */
class SampleExpectationsTest {

    private static final Path SAMPLES = Path.of(System.getProperty("protolyte.projectRoot", "../.."), "sample-formulations");
    private static final Pattern ROW = Pattern.compile("^\\| `([^`]+\\.json)` \\| (\\w+) \\| ([^|]*) \\|");
    private static final Pattern FINDING = Pattern.compile("([a-z0-9-]+) \\((error|warning|note)\\)");

    record Expectation(String file, String status, Set<String> findings) {
        @Override
        public String toString() {
            return file;
        }
    }

    static List<Expectation> expectations() throws IOException {
        List<Expectation> out = new ArrayList<>();
        for (String line : Files.readAllLines(SAMPLES.resolve("README.md"))) {
            Matcher m = ROW.matcher(line);
            if (m.find()) {
                Set<String> findings = new TreeSet<>();
                Matcher f = FINDING.matcher(m.group(3));
                while (f.find()) {
                    findings.add(f.group(1) + " (" + f.group(2) + ")");
                }
                out.add(new Expectation(m.group(1), m.group(2), findings));
            }
        }
        return out;
    }

    @Test
    void everySampleHasAnEntryAndAtLeastTwoFailOnPurpose() throws IOException {
        List<String> listed = expectations().stream().map(Expectation::file).toList();
        try (Stream<Path> files = Files.walk(SAMPLES)) {
            files.filter(p -> p.toString().endsWith(".json") && !p.getFileName().toString().contains("substances"))
                    .map(p -> SAMPLES.relativize(p).toString().replace('\\', '/'))
                    .forEach(p -> assertTrue(listed.contains(p), p + " has no entry in sample-formulations/README.md"));
        }
        assertTrue(expectations().stream().filter(e -> e.status().equals("fail")).count() >= 2);
    }

    /** The sample checked with the shipped library and the samples' site library. */
    private static DocumentReport check(Expectation e) throws IOException {
        SchemaCatalog schemas = new SchemaCatalog();
        Path site = SAMPLES.resolve("site-library/site-substances.json");
        var library = new LibraryLoader(schemas).addShipped().add(site.toString(), Files.readAllBytes(site), true).build();
        return new Protolyte(schemas, library).check(SAMPLES.resolve(e.file()));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("expectations")
    void sampleGivesTheFindingsItsEntrySays(Expectation e) throws IOException {
        DocumentReport r = check(e);
        Set<String> actual = new TreeSet<>();
        r.findings().forEach(f -> actual.add(f.rule() + " (" + f.severity().code() + ")"));
        assertEquals(e.status(), r.status().code(), () -> e.file() + ": " + r.findings() + r.diagnostics());
        assertEquals(e.findings(), actual, e.file());
    }

    /**
     * Every condition of every sample that analyses has a pH, its working solution's too, unless it is below the
     * solution's freezing point: concentrates included (Pitzer's equations carry them).
     */
    @ParameterizedTest(name = "{0}")
    @MethodSource("expectations")
    void everyConditionAboveFreezingHasAPh(Expectation e) throws IOException {
        DocumentReport r = check(e);
        r.analysis().ifPresent(a -> {
            List<org.protolyte.analysis.ConditionResult> all = new ArrayList<>(a.conditions());
            a.working().ifPresent(w -> all.addAll(w.conditions()));
            for (var c : all) {
                assertTrue(c.determinate() || c.caveats().stream().anyMatch(x -> x.code().equals("below-freezing-point")),
                        () -> e.file() + " " + c.condition().name() + ": " + c.caveats());
            }
        });
    }
}
