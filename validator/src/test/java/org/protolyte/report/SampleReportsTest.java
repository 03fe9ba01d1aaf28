package org.protolyte.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.protolyte.Protolyte;
import org.protolyte.document.JsonReader;
import org.protolyte.document.Problem;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.substance.LibraryLoader;

/** Every shipped sample checks, prints a readable report, and its JSON report validates against the report schema. */
class SampleReportsTest {

    private static final SchemaCatalog SCHEMAS = new SchemaCatalog();
    private static final Protolyte PROTOLYTE = new Protolyte(SCHEMAS, LibraryLoader.shipped(SCHEMAS));

    static Stream<Path> samples() throws IOException {
        Path dir = Path.of(System.getProperty("protolyte.projectRoot", ".."), "sample-formulations");
        List<Path> files;
        try (Stream<Path> s = Files.list(dir)) {
            files = s.filter(p -> p.toString().endsWith(".json")).sorted().toList();
        }
        assertTrue(files.size() >= 5, "at least five samples");
        return files.stream();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("samples")
    void sampleIsAValidDocumentWithAJsonReportThatMatchesTheSchema(Path sample) {
        RunReport run = PROTOLYTE.check(List.of(sample));
        DocumentReport r = run.reports().get(0);
        assertNotEquals(Status.INVALID, r.status(), () -> "sample is invalid: " + r.findings());
        assertNotEquals(Status.FAULT, r.status(), () -> "internal fault: " + r.diagnostics());
        String json = new JsonRenderer().render(run);
        List<Problem> problems = SCHEMAS.validate(new JsonReader().read("report", json.getBytes()),
                "report.schema.json");
        assertEquals(List.of(), problems);
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("samples")
    void sampleTextReportNamesTheDocumentAndItsConditions(Path sample) {
        RunReport run = PROTOLYTE.check(List.of(sample));
        String text = new TextRenderer().render(run);
        DocumentReport r = run.reports().get(0);
        assertTrue(text.contains(r.id().orElseThrow()));
        r.analysis().orElseThrow().conditions().forEach(c -> assertTrue(text.contains(c.condition().name())));
        assertTrue(text.contains("decision aid"));
    }
}
