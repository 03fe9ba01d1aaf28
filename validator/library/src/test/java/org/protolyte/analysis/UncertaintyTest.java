package org.protolyte.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;

import org.junit.jupiter.api.Test;
import org.protolyte.Protolyte;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.substance.LibraryLoader;

/** The pH's uncertainty from the constants, by linear propagation. */
class UncertaintyTest {

    private static final SchemaCatalog SCHEMAS = new SchemaCatalog();
    private static final Protolyte PROTOLYTE = new Protolyte(SCHEMAS, LibraryLoader.shipped(SCHEMAS));

    private static ConditionResult condition(String components, String target, String name) {
        String json = "{\"document\": \"formulation\", \"formatVersion\": 1, \"id\": \"TST-U\", \"revision\": \"A\","
                + " \"basis\": {\"waterMass\": \"1 kg\"}, \"components\": [" + components + "]" + target + ","
                + " \"conditions\": [{\"name\": \"preparation\", \"temperature\": \"20 Cel\"},"
                + " {\"name\": \"use\", \"temperature\": \"25 Cel\"}]}";
        return PROTOLYTE.check("t.json", json.getBytes(StandardCharsets.UTF_8)).analysis().orElseThrow().conditions()
                .stream().filter(c -> c.condition().name().equals(name)).findFirst().orElseThrow();
    }

    /**
     * Equimolal phosphate: by Henderson–Hasselbalch ∂pH/∂pKa2 = 1 (derived), so pKa2's uncertainty (0.002 in the
     * library) passes to the pH one for one and dominates the constants; pKa1 and pKa3, far away, hardly count. (At
     * I = 0.1 mol/kg the activity model's share is larger still.)
     */
    @Test
    void aBufferPassesOnTheUncertaintyOfItsPKa() {
        ConditionResult c = condition("{\"substance\": \"potassium dihydrogen phosphate\", \"amount\": \"25 mmol/kg\"},"
                + "{\"substance\": \"disodium hydrogen phosphate anhydrous\", \"amount\": \"25 mmol/kg\"}", "", "use");
        Uncertainty u = c.uncertainty().orElseThrow();
        Uncertainty.Contribution main = u.contributions().stream().filter(x -> !x.constant().startsWith("activity"))
                .findFirst().orElseThrow();
        assertEquals("phosphate pKa2", main.constant(), "the largest of the constants");
        assertEquals(main.standardUncertainty(), main.pHChange(), 0.05 * main.standardUncertainty());
        assertEquals(Math.sqrt(u.contributions().stream().mapToDouble(x -> x.pHChange() * x.pHChange()).sum()), u.pH(),
                1e-12);
        // at the pKa β = 2.303·C·α(1 − α) is at its maximum, so a small move of the pKa leaves it all but unchanged
        assertTrue(u.bufferCapacityPerLitre() < 1e-3 * c.bufferCapacityPerLitre(), () -> "u(β) " + u);
    }

    /** Dosed to a pH at a condition, the meter sets that pH whatever the constants: no uncertainty is left there. */
    @Test
    void theMeterRemovesTheConstantsUncertaintyAtTheAdjustedCondition() {
        ConditionResult c = condition("{\"substance\": \"L-histidine\", \"amount\": \"20 mmol/kg\"},"
                        + "{\"substance\": \"hydrochloric acid\", \"stock\": {\"concentration\": \"1 mol/L\"},"
                        + " \"adjustTo\": {\"temperature\": \"25 Cel\"}}",
                ", \"targets\": {\"pH\": {\"value\": 6.0, \"tolerance\": 0.2, \"temperature\": \"25 Cel\"}}", "use");
        assertTrue(c.uncertainty().orElseThrow().pH() < 1e-6, "u = " + c.uncertainty().orElseThrow().pH());
    }

    /**
     * At the condition the titrant is dosed for, every constant's change of the pH is zero in exact arithmetic; the
     * solver leaves rounding there (the Tris sample's use condition showed 1.5e-15, and its order among the
     * contributions changed between runs of the JVM). It is reported as none, so that two runs agree.
     */
    @Test
    void atTheAdjustedConditionEveryContributionIsExactlyNone() throws java.io.IOException {
        java.nio.file.Path sample = java.nio.file.Path.of(System.getProperty("protolyte.projectRoot", "../.."),
                "sample-formulations", "laboratory-tris-buffer-37c.json");
        ConditionResult c = PROTOLYTE.check(sample).analysis().orElseThrow().conditions().stream()
                .filter(x -> x.condition().name().equals("use")).findFirst().orElseThrow();
        Uncertainty u = c.uncertainty().orElseThrow();
        assertTrue(u.contributions().size() > 1, u.contributions().toString());
        u.contributions().forEach(x -> assertEquals(0.0, x.pHChange(), x.toString()));
        assertEquals(0.0, u.pH());
    }
}
