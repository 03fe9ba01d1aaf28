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
        Path dir = Path.of(System.getProperty("protolyte.projectRoot", "../.."), "sample-formulations");
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

    /**
     * The basal medium's condition lines name the systems that carry 95 % of β (carbonate, HEPES, and phosphate where
     * it counts), two forms each, and count the rest; --species all lists every system, the amino acids too.
     */
    @org.junit.jupiter.api.Test
    void theTextReportShowsTheMainSystemsUnlessAllAreAskedFor() {
        RunReport run = PROTOLYTE.check(List.of(Path.of(System.getProperty("protolyte.projectRoot", "../.."),
                "sample-formulations", "cell-culture-complete-basal-medium.json")));
        String main = new TextRenderer().render(run);
        String all = new TextRenderer(true).render(run);
        String preparation = forms(main, "preparation");
        assertTrue(preparation.contains("carbonate: HCO3- 85 %, CO2(aq) 14 %"), preparation);
        assertTrue(preparation.matches(".*; \\+\\d+ systems \\(--species all\\);.*"), preparation);
        assertTrue(!preparation.contains("lysine"), preparation);
        String everything = forms(all, "preparation");
        assertTrue(everything.contains("lysine: H2Lys+ 99 %") && !everything.contains("--species all"), everything);
    }

    /** The forms under a condition's row of the first condition table: the indented lines that follow it, joined. */
    private static String forms(String text, String condition) {
        List<String> lines = text.lines().toList();
        int row = lines.indexOf(lines.stream().filter(l -> l.startsWith("  " + condition + " ")).findFirst().orElseThrow());
        StringBuilder b = new StringBuilder();
        for (int i = row + 1; i < lines.size() && lines.get(i).startsWith("      "); i++) {
            b.append(' ').append(lines.get(i).strip());
        }
        return b.toString().strip();
    }

    /** Every line of the text report of every sample fits a terminal 100 columns wide, apart from long names. */
    @org.junit.jupiter.api.Test
    void everySamplesTextReportFitsOneHundredColumns() throws java.io.IOException {
        Path samples = Path.of(System.getProperty("protolyte.projectRoot", "../.."), "sample-formulations");
        List<Path> files = new java.util.ArrayList<>();
        try (var s = java.nio.file.Files.walk(samples)) {
            s.filter(p -> p.toString().endsWith(".json") && !p.toString().contains("site-library")).sorted()
                    .forEach(files::add);
        }
        String text = new TextRenderer(true, java.util.Optional.of(org.protolyte.units.Quantity.parse("250 L")))
                .render(PROTOLYTE.check(files));
        assertTrue(text.lines().count() > 400, "all samples reported");
        // apart from long names: a line past the width holds one word after its indent (or a document's "== ")
        text.lines().forEach(l -> assertTrue(l.codePointCount(0, l.length()) <= TextRenderer.WIDTH
                        || !l.strip().replaceFirst("^== ", "").contains(" "),
                () -> l.codePointCount(0, l.length()) + " columns: " + l));
    }

    /** Drift from the first condition (where it is made) to each other one in text; every pair stays in JSON. */
    @org.junit.jupiter.api.Test
    void theTextReportGivesTheDriftFromTheFirstCondition() {
        RunReport run = PROTOLYTE.check(List.of(Path.of(System.getProperty("protolyte.projectRoot", "../.."),
                "sample-formulations", "ophthalmic-borate-mannitol-drops.json")));
        String text = new TextRenderer().render(run);
        assertTrue(text.contains("drift preparation → storage") && text.contains("drift preparation → use"), text);
        assertTrue(!text.contains("drift storage → use"), text);
        assertTrue(new JsonRenderer().render(run).contains("\"from\" : \"storage\""));
    }
}
