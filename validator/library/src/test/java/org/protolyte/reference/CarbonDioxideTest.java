package org.protolyte.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;

import org.junit.jupiter.api.Test;
import org.protolyte.Protolyte;
import org.protolyte.analysis.ConditionResult;
import org.protolyte.chemistry.CarbonDioxide;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.report.DocumentReport;
import org.protolyte.substance.LibraryLoader;

/** Solutions open to a CO2 atmosphere: Henry's law and the carbonic acid steps. */
class CarbonDioxideTest {

    private static final SchemaCatalog SCHEMAS = new SchemaCatalog();
    private static final Protolyte PROTOLYTE = new Protolyte(SCHEMAS, LibraryLoader.shipped(SCHEMAS));

    private static ConditionResult condition(String components, String condition) {
        String json = "{\"document\": \"formulation\", \"formatVersion\": 1, \"id\": \"TST-CO2\", \"revision\": \"A\","
                + " \"basis\": {\"finalVolume\": \"1 L\"}, \"components\": [" + components + "],"
                + " \"conditions\": [" + condition + "]}";
        DocumentReport r = PROTOLYTE.check("t.json", json.getBytes(StandardCharsets.UTF_8));
        return r.analysis().orElseThrow(() -> new AssertionError(r.findings().toString())).conditions().get(0);
    }

    /**
     * Plasma: 24 mmol/L bicarbonate at a CO2 partial pressure of 5.3 kPa and 37 °C has pH about 7.40 (common
     * practice, from the apparent plasma constants pK' 6.1 and CO2 solubility 0.23 mmol/L/kPa). From thermodynamic
     * constants in a plain salt solution of similar ionic strength the pH comes out a little higher: Davies
     * γ(HCO3-) ≈ 0.75 at I = 0.15 raises pH by about 0.1 relative to concentrations, partly offset by the plasma
     * pK' being an apparent constant. Hence ±0.08 rather than a tuned constant.
     */
    @Test
    void bicarbonateAtPhysiologicalCarbonDioxideGivesPlasmaPH() {
        ConditionResult c = condition("{\"substance\": \"sodium hydrogen carbonate\", \"amount\": \"24 mmol/L\"},"
                        + "{\"substance\": \"sodium chloride\", \"amount\": \"116 mmol/L\"}",
                "{\"name\": \"use\", \"temperature\": \"37 Cel\", \"co2\": \"5.3 kPa\"}");
        assertEquals(7.40, c.state().orElseThrow().pH(), 0.08);
    }

    /** Pure water in equilibrium with air is near pH 5.6 (common practice: "clean rain"), at 25 °C. */
    @Test
    void waterInAirIsSlightlyAcid() {
        ConditionResult c = condition("{\"substance\": \"sodium chloride\", \"amount\": \"0.1 mmol/L\"}",
                "{\"name\": \"use\", \"temperature\": \"25 Cel\", \"co2\": \"air\"}");
        assertEquals(5.6, c.state().orElseThrow().pH(), 0.05);
    }

    /** A 5 % CO2 atmosphere is 5.07 kPa at standard pressure; at 37 °C CO2(aq) is then about 1.2 mmol/kg. */
    @Test
    void fivePercentAtmosphereSetsDissolvedCarbonDioxide() {
        ConditionResult c = condition("{\"substance\": \"sodium hydrogen carbonate\", \"amount\": \"26 mmol/L\"}",
                "{\"name\": \"incubator\", \"temperature\": \"37 Cel\", \"co2\": \"5 %\"}");
        double co2 = c.state().orElseThrow().species().stream().filter(s -> s.species().name().equals("CO2(aq)"))
                .findFirst().orElseThrow().molality();
        assertEquals(CarbonDioxide.dissolvedMolality(310.15, 0.05 * 101325), co2, 1e-12);
        // plasma solubility 0.23 mmol/L/kPa (common practice) × 5.07 kPa = 1.17 mmol/L
        assertEquals(1.17e-3, co2, 0.15e-3);
    }

    /** Open to CO2, bicarbonate buffers far more than closed: β_open includes ln10·m(HCO3-) (derived). */
    @Test
    void openCarbonateBuffersMoreThanClosed() {
        String comps = "{\"substance\": \"sodium hydrogen carbonate\", \"amount\": \"24 mmol/L\"}";
        ConditionResult open = condition(comps, "{\"name\": \"use\", \"temperature\": \"37 Cel\", \"co2\": \"5 %\"}");
        ConditionResult closed = condition(comps, "{\"name\": \"use\", \"temperature\": \"37 Cel\"}");
        assertTrue(open.bufferCapacityPerLitre() > 3 * closed.bufferCapacityPerLitre());
        assertEquals(Math.log(10) * 0.024, open.bufferCapacityPerLitre(), 0.1 * Math.log(10) * 0.024);
    }
}
