package org.protolyte.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.protolyte.Protolyte;
import org.protolyte.document.Digests;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.substance.LibraryLoader;

/** A report records what it was computed from, and two runs on the same inputs differ only in their timestamp. */
class ReproducibleReportTest {

    private static List<Path> samples() throws IOException {
        try (Stream<Path> s = Files.list(Path.of(System.getProperty("protolyte.projectRoot", "../.."), "sample-formulations"))) {
            return s.filter(p -> p.toString().endsWith(".json")).sorted().toList();
        }
    }

    private static String run() throws IOException {
        SchemaCatalog schemas = new SchemaCatalog();
        return new JsonRenderer().render(new Protolyte(schemas, LibraryLoader.shipped(schemas)).check(samples()));
    }

    private static String withoutTimestamp(String json) {
        return json.replaceAll("\"generatedAt\" : \"[^\"]*\"", "\"generatedAt\" : \"…\"");
    }

    @Test
    void twoRunsOnTheSameInputsGiveTheSameReportApartFromItsTimestamp() throws Exception {
        String first = run();
        Thread.sleep(5);
        String second = run();
        assertTrue(first.contains("\"generatedAt\""));
        assertEquals(withoutTimestamp(first), withoutTimestamp(second));
    }

    @Test
    void theReportRecordsTheHashOfEachInputsBytes() throws IOException {
        String json = run();
        for (Path p : samples()) {
            assertTrue(json.contains(Digests.sha256(Files.readAllBytes(p))), p.toString());
        }
    }

    @Test
    void theReportRecordsTheLibraryAndRulePacksItUsed() throws IOException {
        String json = run();
        assertTrue(json.contains("\"substanceLibrary\""));
        assertTrue(json.contains("\"source\" : \"rules/general.json\""));
        assertTrue(json.matches("(?s).*\"rulePacks\" : \\[ \\{.*\"sha256\" : \"[0-9a-f]{64}\".*"));
    }

    /** Provenance lists the library files in the order they were given, whatever a hash map would do. */
    @Test
    void theLibraryFilesAreListedInTheOrderGiven() {
        java.util.Map<String, String> files = new java.util.LinkedHashMap<>();
        for (String f : List.of("shipped library", "site/z.json", "site/a.json", "m.json", "b.json", "y.json",
                "c.json", "x.json")) {
            files.put(f, "0".repeat(64));
        }
        RunSummary summary = new RunSummary("test", java.time.Instant.EPOCH, files);
        assertEquals(List.copyOf(files.keySet()), List.copyOf(summary.libraryFiles().keySet()));
    }
}
