package org.protolyte.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.protolyte.Protolyte;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.report.DocumentReport;
import org.protolyte.substance.LibraryLoader;

/** Every check kind is registered with a parameter schema; kinds that no shipped pack uses are tested here. */
class CheckKindsTest {

    private static final SchemaCatalog SCHEMAS = new SchemaCatalog();

    @Test
    void everyKindHasAParameterSchemaInTheJar() {
        for (CheckKind k : CheckKinds.load().all().values()) {
            assertNotNull(CheckKindsTest.class.getResource("/schemas/" + k.parameterSchema()), k.id());
            assertTrue(k.id().matches("[a-z0-9]+(-[a-z0-9]+)*"), k.id());
        }
    }

    @Test
    void theShippedKindsAreAllRegistered() {
        assertEquals(33, CheckKinds.load().all().size());
    }

    private static List<Finding> withPack(String rules, String components) {
        RuleBook book = RuleBook.shipped(SCHEMAS, CheckKinds.load());
        book.add("site.json", ("{\"document\": \"rule-pack\", \"formatVersion\": 1, \"name\": \"site\", \"version\": \"1\","
                + " \"rules\": [" + rules + "]}").getBytes(StandardCharsets.UTF_8), false);
        Protolyte p = new Protolyte(SCHEMAS, LibraryLoader.shipped(SCHEMAS), new Checker(book, List.of("site"), List.of()),
                Severity.ERROR);
        String json = "{\"document\": \"formulation\", \"formatVersion\": 1, \"id\": \"TST-KIND\", \"revision\": \"A\","
                + " \"basis\": {\"finalVolume\": \"1 L\"}, \"components\": [" + components + "],"
                + " \"conditions\": [{\"name\": \"use\", \"temperature\": \"25 Cel\"}]}";
        DocumentReport r = p.check("t.json", json.getBytes(StandardCharsets.UTF_8));
        return r.findings();
    }

    private static final String LIMIT = "{\"id\": \"site-ionic-strength\", \"check\": \"ionic-strength-limit\","
            + " \"parameters\": {\"max\": 0.1}, \"severity\": \"warning\", \"summary\": \"s\", \"explanation\": \"e\","
            + " \"references\": [\"common practice\"]}";

    /** 150 mmol/L NaCl has an ionic strength of about 0.15 mol/kg (I = ½Σ z²m; derived). */
    @Test
    void ionicStrengthAboveTheLimitIsAFinding() {
        List<Finding> f = withPack(LIMIT, "{\"substance\": \"sodium chloride\", \"amount\": \"150 mmol/L\"}");
        assertEquals(List.of("site-ionic-strength"), f.stream().map(Finding::rule).toList());
        assertTrue(f.get(0).message().contains("0.15"), f.get(0).message());
    }

    @Test
    void ionicStrengthWithinTheLimitIsQuiet() {
        assertEquals(List.of(), withPack(LIMIT, "{\"substance\": \"sodium chloride\", \"amount\": \"50 mmol/L\"}"));
    }
}
