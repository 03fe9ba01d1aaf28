package org.protolyte.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.protolyte.Protolyte;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.report.DocumentReport;
import org.protolyte.substance.LibraryLoader;

/**
 * The lines of the uncertainty budget: named by system and step, in the units they are published in, the CO2
 * system's constants where a condition opens it, and no β uncertainty where no constant moves β.
 */
class UncertaintyBudgetTest {

    private static final SchemaCatalog SCHEMAS = new SchemaCatalog();
    private static final Protolyte PROTOLYTE = new Protolyte(SCHEMAS, LibraryLoader.shipped(SCHEMAS));

    private static ConditionResult analyse(String components, String condition) {
        String json = "{\"document\": \"formulation\", \"formatVersion\": 1, \"id\": \"TST-UB\", \"revision\": \"A\","
                + " \"basis\": {\"finalVolume\": \"1 L\"}, \"components\": [" + components + "],"
                + " \"conditions\": [" + condition + "]}";
        DocumentReport r = PROTOLYTE.check("t.json", json.getBytes(StandardCharsets.UTF_8));
        return r.analysis().orElseThrow(() -> new AssertionError(r.findings().toString())).conditions().get(0);
    }

    private static Uncertainty.Contribution line(Uncertainty u, String constant) {
        return u.contributions().stream().filter(c -> c.constant().equals(constant)).findFirst()
                .orElseThrow(() -> new AssertionError(constant + " not in " + u.contributions()));
    }

    /**
     * Tris (one step, so "Tris pKa") at 37 °C: pKa 8.071 ± 0.009 and ΔH° 47.53 ± 0.13 kJ/mol (J. Solution Chem. 16
     * (1987), the library's source). In a buffer the pH moves with the pKa, so ±0.009; ΔH° moves the pKa at 37 °C by
     * u/(R ln10)·(1/T − 1/298.15) (van 't Hoff), 130 J/mol giving −0.00088, lowering the pH.
     */
    @Test
    void aOneStepSystemsLinesAreItsPKaAndItsDeltaHInKilojoules() {
        Uncertainty u = analyse("{\"substance\": \"Tris\", \"amount\": \"25 mmol/L\"},"
                + " {\"substance\": \"Tris hydrochloride\", \"amount\": \"25 mmol/L\"}",
                "{\"name\": \"use\", \"temperature\": \"37 Cel\"}").uncertainty().orElseThrow();
        Uncertainty.Contribution pKa = line(u, "Tris pKa");
        assertEquals(0.009, pKa.standardUncertainty(), 1e-12);
        assertEquals(0.009, Math.abs(pKa.pHChange()), 0.001);
        Uncertainty.Contribution dH = line(u, "Tris ΔH°");
        assertEquals(0.13, dH.standardUncertainty(), 1e-12);
        double vantHoff = 130 / (8.314462618 * Math.log(10)) * (1 / 310.15 - 1 / 298.15);
        assertEquals(vantHoff, dH.pHChange(), 0.1 * Math.abs(vantHoff));
    }

    /** A phosphate buffer under 5 % CO2 takes up carbonic acid: carbonate's constants enter the budget. */
    @Test
    void aCo2ConditionBringsTheCarbonateConstants() {
        Uncertainty u = analyse("{\"substance\": \"disodium hydrogen phosphate anhydrous\", \"amount\": \"16 mmol/L\"},"
                + " {\"substance\": \"potassium dihydrogen phosphate\", \"amount\": \"4 mmol/L\"}",
                "{\"name\": \"use\", \"temperature\": \"37 Cel\", \"co2\": \"5 %\"}").uncertainty().orElseThrow();
        List<String> names = u.contributions().stream().map(Uncertainty.Contribution::constant).toList();
        assertTrue(names.contains("carbonate pKa1"), names::toString);
        assertTrue(names.contains("phosphate pKa2"), names::toString);
    }

    /**
     * 1 mmol/L hydrochloric acid: no acid–base system, so only pKw and the activity model are uncertain; pKw moves [OH⁻] of some
     * 10⁻¹¹ mol/L: β (2.303·[H⁺], 2.3 mmol/L per pH) does not move at all at the reported precision (derived).
     */
    @Test
    void noConstantThatMovesBetaGivesNoBetaUncertainty() {
        ConditionResult c = analyse("{\"substance\": \"hydrochloric acid\", \"amount\": \"1 mmol/L\"}",
                "{\"name\": \"use\", \"temperature\": \"37 Cel\"}");
        Uncertainty u = c.uncertainty().orElseThrow();
        assertEquals(java.util.Set.of("pKw", "activity model (log10 γ per z²)"),
                u.contributions().stream().map(Uncertainty.Contribution::constant).collect(java.util.stream.Collectors.toSet()));
        assertEquals(2.3e-3, c.bufferCapacityPerLitre(), 0.1e-3);
        assertEquals(0, u.bufferCapacityPerLitre(), 1e-9);
    }

    /**
     * A condition that is indeterminate (HEPES, without Pitzer parameters, in 3 mol/L sodium chloride: beyond the
     * Davies equation it keeps) has no uncertainty, and is not told that its uncertainty is missing: its pH is not
     * shown at all.
     */
    @Test
    void anIndeterminateConditionHasNoUncertaintyAndNoNoteOfIt() {
        ConditionResult c = analyse("{\"substance\": \"sodium chloride\", \"amount\": \"3 mol/L\"},"
                + " {\"substance\": \"HEPES\", \"amount\": \"20 mmol/L\"},"
                + " {\"substance\": \"HEPES sodium salt\", \"amount\": \"20 mmol/L\"}",
                "{\"name\": \"use\", \"temperature\": \"25 Cel\"}");
        assertTrue(!c.determinate() && c.uncertainty().isEmpty(), c::toString);
        assertTrue(c.caveats().stream().noneMatch(x -> x.code().equals("uncertainty-not-computed")), c::toString);
    }
}
