package org.protolyte.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.Locale;

import org.junit.jupiter.api.Test;
import org.protolyte.Protolyte;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.report.DocumentReport;
import org.protolyte.substance.LibraryLoader;

/** Temperature drift, part-volume adjustment, loads and titratable acidity. */
class RealConditionsTest {

    private static final SchemaCatalog SCHEMAS = new SchemaCatalog();
    private static final Protolyte PROTOLYTE = new Protolyte(SCHEMAS, LibraryLoader.shipped(SCHEMAS));

    private static FormulationAnalysis analyse(String body) {
        String json = "{\"document\": \"formulation\", \"formatVersion\": 1, \"id\": \"TST-REAL\", \"revision\": \"A\","
                + " \"basis\": {\"finalVolume\": \"1 L\"}, " + body + "}";
        DocumentReport r = PROTOLYTE.check("t.json", json.getBytes(StandardCharsets.UTF_8));
        return r.analysis().orElseThrow(() -> new AssertionError(r.findings().toString()));
    }

    private static double pH(FormulationAnalysis a, String condition) {
        return a.conditions().stream().filter(c -> c.condition().name().equals(condition)).findFirst().orElseThrow()
                .state().orElseThrow().pH();
    }

    private static final String TRIS = "\"components\": [{\"substance\": \"Tris\", \"amount\": \"50 mmol/L\"},"
            + " {\"substance\": \"Tris hydrochloride\", \"amount\": \"50 mmol/L\"}]";

    /**
     * Tris: dpH/dT ≈ −0.028 per K near 25 °C, the check value from ΔH° in Goldberg et al. 2002 (47.45 kJ/mol,
     * from memory; 47.53 ± 0.13 kJ/mol read in J. Solution Chem. 16 (1987) gives −0.0279 by van 't Hoff). From 25 to
     * 37 °C an equimolar Tris buffer drifts by about −0.34.
     */
    @Test
    void trisDriftsByItsTemperatureCoefficientAndIsNamedAsTheCause() {
        FormulationAnalysis a = analyse(TRIS + ", \"conditions\": [{\"name\": \"preparation\", \"temperature\": \"25 Cel\"},"
                + " {\"name\": \"use\", \"temperature\": \"37 Cel\"}]");
        Drift d = a.drifts().get(0);
        assertEquals(-0.028 * 12, d.change(), 0.03);
        assertEquals("Tris", d.system().orElseThrow());
        assertEquals(-0.028, d.dpKadT(), 0.002);
    }

    /**
     * The cause of a drift is the system with the largest share of β times |dpKa/dT|, not the largest share alone.
     * Tris beside phosphate at pH 7.6: dpKa/dT is −ΔH°/(R ln10 T²), ΔH° 47.5 kJ/mol for Tris and 3.6 kJ/mol for
     * phosphate's second step (Goldberg, Kishore and Lennen 2002, Table 1, from memory), −0.027 and −0.002 per K at
     * 31 °C. Phosphate (20 mmol/L, mostly HPO4²⁻) holds more of β than Tris (13 mmol/L, a quarter of it base), yet Tris
     * moves the pH: 0.4 × 0.027 against 0.6 × 0.002.
     */
    @Test
    void theDriftIsBlamedOnTheSystemWhoseShareTimesDpKaDtIsLargest() {
        FormulationAnalysis a = analyse("\"components\": [{\"substance\": \"Tris\", \"amount\": \"3 mmol/L\"},"
                + " {\"substance\": \"Tris hydrochloride\", \"amount\": \"10 mmol/L\"},"
                + " {\"substance\": \"disodium hydrogen phosphate anhydrous\", \"amount\": \"16 mmol/L\"},"
                + " {\"substance\": \"potassium dihydrogen phosphate\", \"amount\": \"4 mmol/L\"}],"
                + " \"conditions\": [{\"name\": \"preparation\", \"temperature\": \"25 Cel\"},"
                + " {\"name\": \"use\", \"temperature\": \"37 Cel\"}]");
        ConditionResult prep = a.conditions().get(0);
        double tris = share(prep, "Tris");
        double phosphate = share(prep, "phosphate");
        assertTrue(phosphate > tris, () -> "phosphate must hold more of β for the case to mean anything: " + prep.buffers());
        assertEquals(7.6, prep.state().orElseThrow().pH(), 0.15);
        Drift d = a.drifts().get(0);
        assertEquals("Tris", d.system().orElseThrow(), d::toString);
        assertEquals(-0.027, d.dpKadT(), 0.002);
        assertEquals(tris, d.share(), 1e-12);
    }

    private static double share(ConditionResult c, String system) {
        return c.buffers().stream().filter(b -> b.system().equals(system)).findFirst().orElseThrow().share();
    }

    /**
     * Titratable acidity of 10 mmol/L acetate buffer at pH ≈ 5 (acid 3.6, salt 6.4 mmol/L): to reach pH 7.4 nearly all
     * the acetic acid must be neutralised, 3.6 mmol/L of base (Henderson–Hasselbalch, derived; the acid left at 7.4
     * is 0.2 % of the total).
     */
    @Test
    void titratableAcidityIsTheBaseThatNeutralisesTheWeakAcid() {
        FormulationAnalysis a = analyse("\"components\": [{\"substance\": \"acetic acid\", \"amount\": \"3.6 mmol/L\"},"
                + " {\"substance\": \"sodium acetate anhydrous\", \"amount\": \"6.4 mmol/L\"}],"
                + " \"dose\": {\"volume\": \"2 mL\"}");
        TitratableAcidity t = a.titratableAcidity().orElseThrow();
        assertEquals(3.6, t.mmolPerLitre(), 0.15);
        assertEquals(t.mmolPerLitre() * 0.002, t.mmolPerDose().getAsDouble(), 1e-9);
    }

    /**
     * A target holds at its own temperature: a phosphate saline in the cold room is not "already outside" a target set
     * for 25 °C. Loads are judged where the target is, so the 4 °C condition carries none and the 25 °C one has room on
     * both sides (phosphate's pKa2 rises by about 0.05 from 25 to 4 °C, ΔH° 3.6 kJ/mol, from memory of Goldberg et al.
     * 2002: enough to leave a ±0.03 target set with sodium hydroxide at 25 °C).
     */
    @Test
    void loadsAreJudgedAtTheTargetsTemperatureOnly() {
        FormulationAnalysis a = analyse("\"components\": [{\"substance\": \"potassium dihydrogen phosphate\", \"amount\": "
                + "\"10 mmol/L\"}, {\"substance\": \"sodium chloride\", \"amount\": \"137 mmol/L\"},"
                + " {\"substance\": \"sodium hydroxide\", \"stock\": {\"concentration\": \"1 mol/L\"},"
                + " \"adjustTo\": {\"temperature\": \"25 Cel\"}}],"
                + " \"targets\": {\"pH\": {\"value\": 7.4, \"tolerance\": 0.03, \"temperature\": \"25 Cel\"}},"
                + " \"conditions\": [{\"name\": \"use\", \"temperature\": \"25 Cel\"},"
                + " {\"name\": \"storage\", \"temperature\": \"4 Cel\"}]");
        var use = a.conditions().get(0);
        var storage = a.conditions().get(1);
        assertTrue(use.loads().isPresent(), "no loads at the target's temperature");
        assertTrue(use.loads().get().acidToLeaveTarget().getAsDouble() > 0, use.loads()::toString);
        assertTrue(use.loads().get().baseToLeaveTarget().getAsDouble() > 0, use.loads()::toString);
        assertTrue(storage.state().orElseThrow().pH() > 7.43, () -> "storage pH " + storage.state());
        assertTrue(storage.loads().isEmpty(), () -> "judged at 4 °C against a 25 °C target: " + storage.loads());
    }

    /** For a small step, the acid load to leave the target is about β·ΔpH (the definition of β, derived). */
    @Test
    void acidLoadMatchesBufferCapacityTimesTheDistanceToTheTargetEdge() {
        FormulationAnalysis a = analyse("\"components\": [{\"substance\": \"potassium dihydrogen phosphate\", \"amount\": "
                + "\"50 mmol/L\"}, {\"substance\": \"disodium hydrogen phosphate anhydrous\", \"amount\": \"50 mmol/L\"}],"
                + " \"targets\": {\"pH\": {\"min\": 6.78, \"max\": 6.86, \"temperature\": \"25 Cel\"}}");
        var c = a.conditions().get(0);
        double distance = c.state().orElseThrow().pH() - 6.78;
        double expected = c.bufferCapacityPerLitre() * 1000 * distance;
        assertTrue(distance > 0 && distance < 0.05, "pH " + c.state().orElseThrow().pH());
        assertEquals(expected, c.loads().orElseThrow().acidToLeaveTarget().getAsDouble(), 0.1 * expected);
    }

    private static final String PHOSPHATE_SALINE = "{\"substance\": \"potassium dihydrogen phosphate\", \"amount\": "
            + "\"40 mmol/L\"}, {\"substance\": \"disodium hydrogen phosphate anhydrous\", \"amount\": \"10 mmol/L\"},"
            + " {\"substance\": \"sodium chloride\", \"amount\": \"150 mmol/L\"}";

    /** At part volume the ionic strength is higher, so a phosphate buffer reads lower than after making up. */
    @Test
    void aStatedPHAtPartVolumeIsReadThereAndMovesOnMakingUp() {
        FormulationAnalysis a = analyse("\"components\": [" + PHOSPHATE_SALINE + ", {\"substance\": \"sodium hydroxide\","
                + " \"stock\": {\"concentration\": \"1 mol/L\"}, \"adjustTo\": {\"pH\": 7.0, \"temperature\": \"20 Cel\","
                + " \"atVolume\": 0.8}}], \"conditions\": [{\"name\": \"preparation\", \"temperature\": \"20 Cel\"}]");
        TitrantResult t = a.titrants().get(0);
        assertEquals(0.8, t.atVolume());
        double madeUp = t.pHAfterMakingUp().getAsDouble();
        assertEquals(madeUp, pH(a, "preparation"), 1e-9);
        assertTrue(madeUp > 7.0 && madeUp < 7.05, "phosphate, charges −2/−1: dilution raises the pH a little: " + madeUp);
    }

    /** Adjusting at part volume for a target after making up: the setpoint differs from the target, the result meets it. */
    @Test
    void theSetpointAtPartVolumeGivesTheTargetAfterMakingUp() {
        FormulationAnalysis a = analyse("\"components\": [" + PHOSPHATE_SALINE + ", {\"substance\": \"sodium hydroxide\","
                + " \"stock\": {\"concentration\": \"1 mol/L\"}, \"adjustTo\": {\"temperature\": \"20 Cel\","
                + " \"atVolume\": 0.8}}], \"targets\": {\"pH\": {\"value\": 7.0, \"tolerance\": 0.05, \"temperature\": "
                + "\"20 Cel\"}}, \"conditions\": [{\"name\": \"preparation\", \"temperature\": \"20 Cel\"}]");
        TitrantResult t = a.titrants().get(0);
        assertEquals(7.0, pH(a, "preparation"), 1e-6);
        assertTrue(t.setpointPH().getAsDouble() < 7.0, "reads lower at part volume: " + t.setpointPH());
    }

    /** The setpoint the finding proposes, written back as adjustTo.pH, does meet the target (self-consistency). */
    @Test
    void theProposedSetpointMeetsTheTarget() {
        String body = "\"components\": [{\"substance\": \"Tris\", \"amount\": \"25 mmol/L\"}, {\"substance\": \"hydrochloric "
                + "acid\", \"stock\": {\"concentration\": \"1 mol/L\"}, \"adjustTo\": {\"pH\": %s, \"temperature\": "
                + "\"30 Cel\"}}], \"targets\": {\"pH\": {\"value\": 7.5, \"tolerance\": 0.1, \"temperature\": \"4 Cel\"}},"
                + " \"conditions\": [{\"name\": \"preparation\", \"temperature\": \"30 Cel\"}, {\"name\": \"use\","
                + " \"temperature\": \"4 Cel\"}]";
        FormulationAnalysis first = analyse(String.format(Locale.ROOT, body, "7.5"));
        double proposed = first.titrants().get(0).setpointForTarget().getAsDouble();
        FormulationAnalysis second = analyse(String.format(Locale.ROOT, body, String.valueOf(proposed)));
        assertEquals(7.5, pH(second, "use"), 0.01);
    }

    /** A drift line for every pair made 1,000 conditions a 33 MB report: only pairs with a reference condition. */
    @Test
    void driftLinesGrowLinearlyWithTheConditions() {
        StringBuilder c = new StringBuilder("\"conditions\": [{\"name\": \"c0\", \"temperature\": \"20 Cel\"}");
        for (int i = 1; i < 40; i++) {
            c.append(", {\"name\": \"c").append(i).append("\", \"temperature\": \"").append(4 + i).append(" Cel\"}");
        }
        c.append("], \"targets\": {\"pH\": {\"value\": 8.0, \"tolerance\": 0.5, \"temperature\": \"30 Cel\"}}");
        FormulationAnalysis a = analyse(TRIS + ", " + c);
        // from c0 to the 39 others, and from c26 (30 °C, the target's) to the 38 conditions that are neither
        assertEquals(39 + 38, a.drifts().size());
        assertTrue(a.drifts().stream().anyMatch(d -> d.from().equals("c26") && d.to().equals("c39")));
        assertTrue(a.drifts().stream().anyMatch(d -> d.from().equals("c1") && d.to().equals("c26")));
        assertTrue(a.drifts().stream().noneMatch(d -> d.from().equals("c1") && d.to().equals("c2")));
    }

    @Test
    void storageToUseIsADriftOfItsOwn() {
        // cold storage warmed for use: the drift a user looks for, although neither condition is the first
        FormulationAnalysis a = analyse(TRIS + ", \"conditions\": [{\"name\": \"preparation\", \"temperature\": \"22 Cel\"}, "
                + "{\"name\": \"storage\", \"temperature\": \"5 Cel\"}, {\"name\": \"use\", \"temperature\": \"37 Cel\"}]");
        assertTrue(a.drifts().stream().anyMatch(d -> d.from().equals("storage") && d.to().equals("use")));
    }
}
