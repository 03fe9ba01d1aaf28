package org.protolyte.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.protolyte.Protolyte;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.report.DocumentReport;
import org.protolyte.report.Status;
import org.protolyte.substance.LibraryLoader;

/** Each built-in check with a document that triggers it and one that does not. */
class BuiltInChecksTest {

    private static final SchemaCatalog SCHEMAS = new SchemaCatalog();
    private static final Protolyte PROTOLYTE = new Protolyte(SCHEMAS, LibraryLoader.shipped(SCHEMAS));

    private static DocumentReport check(String extra, String target) {
        String json = "{\"document\": \"formulation\", \"formatVersion\": 1, \"id\": \"TST-RULE\"" + extra + ","
                + " \"basis\": {\"waterMass\": \"1 kg\"}, \"components\": ["
                + "{\"substance\": \"potassium dihydrogen phosphate\", \"amount\": \"25 mmol/kg\"},"
                + "{\"substance\": \"disodium hydrogen phosphate anhydrous\", \"amount\": \"25 mmol/kg\"}],"
                + " \"targets\": {\"pH\": " + target + "}}";
        return PROTOLYTE.check("t.json", json.getBytes(StandardCharsets.UTF_8));
    }

    private static List<String> rules(DocumentReport r) {
        return r.findings().stream().map(Finding::rule).toList();
    }

    // The equimolal phosphate standard is pH 6.865 at 25 °C (Buck et al. 2002); targets either side of it.
    @Test
    void phOutsideTheTargetIsAnError() {
        DocumentReport r = check(", \"revision\": \"A\"", "{\"value\": 7.2, \"tolerance\": 0.1, \"temperature\": \"25 Cel\"}");
        assertEquals(Status.FAIL, r.status());
        assertEquals(List.of("ph-within-target"), rules(r));
    }

    @Test
    void phInsideTheTargetPasses() {
        DocumentReport r = check(", \"revision\": \"A\"", "{\"min\": 6.8, \"max\": 6.95, \"temperature\": \"25 Cel\"}");
        assertEquals(Status.PASS, r.status());
        assertEquals(List.of(), rules(r));
    }

    @Test
    void targetWithoutTemperatureIsAWarningAndAssumes25Celsius() {
        DocumentReport r = check(", \"revision\": \"A\"", "{\"value\": 6.9, \"tolerance\": 0.1}");
        assertEquals(Status.PASS, r.status());
        assertEquals(List.of("ph-target-temperature-stated"), rules(r));
        // 25 °C = 298.15 K by the definition of the Celsius scale (derived)
        assertEquals(298.15, r.analysis().orElseThrow().conditions().get(0).condition().kelvin(), 1e-9);
    }

    @Test
    void missingRevisionIsANote() {
        DocumentReport r = check("", "{\"value\": 6.9, \"tolerance\": 0.1, \"temperature\": \"25 Cel\"}");
        assertEquals(Status.PASS, r.status());
        assertTrue(r.findings().stream().anyMatch(f -> f.rule().equals("revision-stated")
                && f.severity() == Severity.NOTE));
    }
}
