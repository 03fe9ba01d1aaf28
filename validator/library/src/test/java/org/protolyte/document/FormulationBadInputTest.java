package org.protolyte.document;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.protolyte.Protolyte;
import org.protolyte.TestDocs;
import org.protolyte.report.DocumentReport;
import org.protolyte.report.Status;
import org.protolyte.rules.Finding;
import org.protolyte.substance.LibraryLoader;

class FormulationBadInputTest {

    private static SchemaCatalog schemas;
    private static Protolyte protolyte;

    @BeforeAll
    static void load() {
        schemas = new SchemaCatalog();
        protolyte = new Protolyte(schemas, LibraryLoader.shipped(schemas));
    }

    private static List<Problem> problems(String json) {
        SourceDocument doc = new JsonReader().read("t.json", TestDocs.bytes(json));
        DocumentException e = assertThrows(DocumentException.class, () -> new FormulationReader(schemas).read(doc));
        return e.problems();
    }

    private static Problem problemAt(List<Problem> problems, String pointer) {
        return problems.stream().filter(p -> p.pointer().equals(pointer)).findFirst()
                .orElseThrow(() -> new AssertionError("no problem at " + pointer + " in " + problems));
    }

    private static Problem problemAt(String json, String pointer) {
        return problemAt(problems(json), pointer);
    }

    private static String oneComponent(String component) {
        return TestDocs.formulation(component, "");
    }

    @Test
    void misspelledTolerancePropertySuggestsTheRightNameWithPointerAndLine() {
        String json = "{\n"
                + "\"document\": \"formulation\",\n"
                + "\"formatVersion\": 1,\n"
                + "\"id\": \"TST-101\",\n"
                + "\"basis\": {\"finalVolume\": \"1 L\"},\n"
                + "\"components\": [" + TestDocs.ACETATE + "],\n"
                + "\"targets\": {\"pH\": {\"value\": 4.7,\n"
                + "  \"tolerence\": 0.3}}\n"
                + "}";
        Problem p = problemAt(json, "/targets/pH/tolerence");
        assertTrue(p.message().contains("'tolerence'"), p.message());
        assertTrue(p.message().contains("did you mean 'tolerance'"), p.message());
        assertEquals(9, p.location().orElseThrow().line());
    }

    @Test
    void missingRequiredPropertyIsNamed() {
        String json = "{\"document\": \"formulation\", \"formatVersion\": 1, \"id\": \"TST-102\",\n"
                + "\"components\": [" + TestDocs.ACETATE + "]}";
        Problem p = problemAt(json, "");
        assertTrue(p.message().contains("'basis'") && p.message().contains("missing"), p.message());
    }

    @Test
    void aControlCharacterInASubstanceNameIsRefusedNotDropped() {
        // JSON text "\u0000": the NUL reaches the name; matching would fold it away and find tromethamine
        Problem p = problemAt(oneComponent("{\"substance\": \"trometh\\u0000amine\", \"amount\": \"6 g\"}"),
                "/components/0/substance");
        assertTrue(p.message().contains("control character") && p.message().contains("U+0000"), p.message());
    }

    @Test
    void zeroAmountIsRefusedWithItsPointer() {
        Problem p = problemAt(oneComponent("{\"substance\": \"sodium chloride\", \"amount\": \"0 g\"}"),
                "/components/0/amount");
        assertTrue(p.message().contains("greater than zero"), p.message());
    }

    @Test
    void negativeAmountIsRefusedWithItsPointer() {
        String json = TestDocs.formulation(TestDocs.ACETATE
                + ",\n{\"substance\": \"sodium chloride\", \"amount\": {\"value\": -2.5, \"unit\": \"mg\"}}", "");
        Problem p = problemAt(json, "/components/2/amount");
        assertTrue(p.message().contains("greater than zero"), p.message());
        assertTrue(p.location().isPresent());
    }

    @Test
    void barePercentAmountIsRefusedPointingToWeightPerVolume() {
        Problem p = problemAt(oneComponent("{\"substance\": \"sodium chloride\", \"amount\": \"0.9 %\"}"),
                "/components/0/amount");
        assertTrue(p.message().contains("'% w/v'"), p.message());
    }

    @Test
    void unknownUnitListsTheAcceptedUnits() {
        Problem p = problemAt(oneComponent("{\"substance\": \"sodium chloride\", \"amount\": \"9 grams\"}"),
                "/components/0/amount");
        assertTrue(p.message().contains("unknown unit 'grams'"), p.message());
        assertTrue(p.message().contains("accepted:"), p.message());
        for (String unit : List.of("'g'", "'mg'", "'mmol/L'", "'% w/v'")) {
            assertTrue(p.message().contains(unit), () -> unit + " not listed in: " + p.message());
        }
    }

    @Test
    void perLitreAmountUnderWaterMassBasisIsRefused() {
        String json = TestDocs.formulation("{\"waterMass\": \"1 kg\"}",
                "{\"substance\": \"sodium chloride\", \"amount\": \"150 mmol/L\"}", "");
        DocumentReport r = protolyte.check("t.json", TestDocs.bytes(json));
        assertEquals(Status.INVALID, r.status());
        Finding f = r.findings().stream().filter(x -> x.pointer().equals(Optional.of("/components/0/amount")))
                .findFirst().orElseThrow(() -> new AssertionError(r.findings().toString()));
        assertEquals(Protolyte.INVALID_DOCUMENT, f.rule());
        assertTrue(f.message().contains("per litre") && f.message().contains("water mass"), f.message());
    }

    @Test
    void anAdmixtureWithAZeroVolumeOrAnUnknownFluidIsRefusedAtItsPlace() {
        String nacl = "{\"substance\": \"sodium chloride\", \"amount\": \"9 g\"}";
        Problem p = problemAt(TestDocs.formulation(nacl, ", \"admixture\": [{\"into\": \"normal saline\", "
                + "\"ratio\": \"0 + 9\"}]"), "/admixture/0/ratio");
        assertTrue(p.message().contains("above zero"), p.message());
        problemAt(TestDocs.formulation(nacl, ", \"admixture\": [{\"into\": \"normal saline\", \"ratio\": \"1:9\"}]"),
                "/admixture/0/ratio");
        DocumentReport r = protolyte.check("t.json", TestDocs.bytes(TestDocs.formulation(nacl,
                ", \"admixture\": [{\"into\": \"normal saline\", \"ratio\": \"1 + 9\"}, {\"into\": \"seawater\", "
                + "\"ratio\": \"1 + 1\"}]")));
        assertEquals(Status.INVALID, r.status());
        Finding f = r.findings().stream().filter(x -> x.pointer().equals(Optional.of("/admixture/1/into")))
                .findFirst().orElseThrow(() -> new AssertionError(r.findings().toString()));
        assertTrue(f.message().contains("'seawater' is not a receiving fluid") && f.message().contains("plasma model"),
                f.message());
    }

    @Test
    void componentWithBothAmountAndAdjustToIsRefused() {
        Problem p = problemAt(oneComponent("{\"substance\": \"sodium hydroxide\", \"amount\": \"5 mmol/L\",\n"
                + " \"adjustTo\": {\"pH\": 7.0, \"temperature\": \"25 Cel\"}}"), "/components/0");
        assertTrue(p.message().contains("both amount and adjustTo"), p.message());
    }

    @Test
    void duplicateConditionNamesAreRefused() {
        String json = TestDocs.formulation(TestDocs.ACETATE, ",\n\"conditions\": [\n"
                + "{\"name\": \"storage\", \"temperature\": \"5 Cel\"},\n"
                + "{\"name\": \"storage\", \"temperature\": \"25 Cel\"}\n]");
        Problem p = problemAt(json, "/conditions/1/name");
        assertTrue(p.message().contains("'storage'") && p.message().contains("twice"), p.message());
    }

    @Test
    void everyProblemOfADocumentIsReportedTogether() {
        String json = TestDocs.formulation(
                "{\"substance\": \"sodium chloride\", \"amount\": \"0 g\"},\n"
                        + "{\"substance\": \"potassium chloride\", \"amount\": \"1 grams\"}", "");
        List<Problem> all = problems(json);
        problemAt(all, "/components/0/amount");
        problemAt(all, "/components/1/amount");
    }
}
