package org.protolyte.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;

import org.junit.jupiter.api.Test;
import org.protolyte.Protolyte;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.report.DocumentReport;
import org.protolyte.report.Status;
import org.protolyte.substance.LibraryLoader;

/** q.s. titration: the computed amount meets its goal, the setpoint is where the meter must read, limits are named. */
class TitrationTest {

    private static final SchemaCatalog SCHEMAS = new SchemaCatalog();
    private static final Protolyte PROTOLYTE = new Protolyte(SCHEMAS, LibraryLoader.shipped(SCHEMAS));

    private static DocumentReport check(String components, String target, String conditions) {
        String json = "{\"document\": \"formulation\", \"formatVersion\": 1, \"id\": \"TST-QS\","
                + " \"basis\": {\"finalVolume\": \"1 L\"}, \"components\": [" + components + "]"
                + (target.isEmpty() ? "" : ", \"targets\": {\"pH\": " + target + "}")
                + ", \"conditions\": [" + conditions + "]}";
        return PROTOLYTE.check("test", json.getBytes(StandardCharsets.UTF_8));
    }

    private static double pH(DocumentReport r, String condition) {
        return r.analysis().orElseThrow().conditions().stream().filter(c -> c.condition().name().equals(condition))
                .findFirst().orElseThrow().state().orElseThrow().pH();
    }

    private static final String TRIS = "{\"substance\": \"Tris\", \"amount\": \"50 mmol/L\"}";
    private static final String HCL = "{\"substance\": \"hydrochloric acid\", \"stock\": {\"concentration\": \"1 mol/L\"},"
            + " \"adjustTo\": {\"temperature\": \"22 Cel\"}}";
    private static final String ROOM_AND_BODY = "{\"name\": \"preparation\", \"temperature\": \"22 Cel\"},"
            + " {\"name\": \"use\", \"temperature\": \"37 Cel\"}";

    @Test
    void quantumSatisAmountMeetsTheTargetAtItsTemperature() {
        DocumentReport r = check(TRIS + "," + HCL, "{\"value\": 7.8, \"tolerance\": 0.1, \"temperature\": \"37 Cel\"}",
                ROOM_AND_BODY);
        assertEquals(Status.PASS, r.status());
        assertEquals(7.8, pH(r, "use"), 1e-6);
        TitrantResult t = r.analysis().orElseThrow().titrants().get(0);
        assertTrue(t.moles() > 0 && t.moles() < 0.05, "HCl must be less than the Tris it titrates: " + t.moles());
        assertEquals(t.moles() * 1000, t.stockMillilitres().getAsDouble(), 1e-9);
    }

    /** The setpoint is the pH the meter reads at the adjustment temperature: for Tris, higher when warmer use follows. */
    @Test
    void setpointIsThePHAtTheAdjustmentTemperature() {
        DocumentReport r = check(TRIS + "," + HCL, "{\"value\": 7.8, \"tolerance\": 0.1, \"temperature\": \"37 Cel\"}",
                ROOM_AND_BODY);
        TitrantResult t = r.analysis().orElseThrow().titrants().get(0);
        assertEquals(pH(r, "preparation"), t.setpointPH().getAsDouble(), 1e-6);
        // Tris dpKa/dT ≈ −0.028 K⁻¹ (Goldberg et al. 2002, from memory): 15 K colder reads about 0.4 higher
        assertEquals(0.42, t.setpointPH().getAsDouble() - 7.8, 0.05);
    }

    @Test
    void explicitAdjustmentPHWinsOverTheTarget() {
        String hcl = HCL.replace("\"adjustTo\": {", "\"adjustTo\": {\"pH\": 8.1, ");
        DocumentReport r = check(TRIS + "," + hcl, "{\"value\": 7.8, \"tolerance\": 0.1, \"temperature\": \"37 Cel\"}",
                ROOM_AND_BODY);
        assertEquals(8.1, pH(r, "preparation"), 1e-6);
        assertEquals(Status.FAIL, r.status(), "8.1 at 22 °C is about 7.7 at 37 °C, outside 7.8 ± 0.1");
    }

    @Test
    void aBaseCannotLowerThePH() {
        String naoh = HCL.replace("hydrochloric acid", "sodium hydroxide");
        DocumentReport r = check(TRIS + "," + naoh, "{\"value\": 7.8, \"tolerance\": 0.1, \"temperature\": \"37 Cel\"}",
                ROOM_AND_BODY);
        assertEquals(Status.FAIL, r.status());
        assertTrue(r.findings().stream().anyMatch(f -> f.rule().equals("titrant-reaches-goal")
                && f.message().contains("can only raise") && f.pointer().orElseThrow().equals("/components/1/adjustTo")));
    }

    @Test
    void aWeakAcidTitrantThatRunsOutSaysWhatItCanReach() {
        String acetic = "{\"substance\": \"acetic acid\", \"stock\": {\"concentration\": \"1 mol/L\"},"
                + " \"adjustTo\": {\"pH\": 3.0, \"temperature\": \"25 Cel\"}}";
        DocumentReport r = check(TRIS + "," + acetic, "", "{\"name\": \"use\", \"temperature\": \"25 Cel\"}");
        assertEquals(Status.FAIL, r.status());
        TitrantResult t = r.analysis().orElseThrow().titrants().get(0);
        assertTrue(t.unreachable().isPresent());
        assertTrue(t.unreachable().get().reachablePH() > 3.0);
    }

    @Test
    void withAnAcidAndABaseOnlyTheNeededOneIsUsed() {
        String naoh = HCL.replace("hydrochloric acid", "sodium hydroxide");
        DocumentReport r = check(TRIS + "," + HCL + "," + naoh,
                "{\"value\": 7.8, \"tolerance\": 0.1, \"temperature\": \"37 Cel\"}", ROOM_AND_BODY);
        assertEquals(Status.PASS, r.status());
        var titrants = r.analysis().orElseThrow().titrants();
        assertTrue(titrants.get(0).moles() > 0);
        assertEquals(0, titrants.get(1).moles());
        assertFalse(titrants.get(1).used());
    }

    @Test
    void twoAcidsCarryingAdjustToMakeTheDocumentInvalid() {
        String acetic = HCL.replace("hydrochloric acid", "acetic acid");
        DocumentReport r = check(TRIS + "," + HCL + "," + acetic,
                "{\"value\": 7.8, \"tolerance\": 0.1, \"temperature\": \"37 Cel\"}", ROOM_AND_BODY);
        assertEquals(Status.INVALID, r.status());
        assertTrue(r.findings().get(0).message().contains("two acids"));
        // the analysis names the second acid; the reader's layer places it at that component's adjustTo
        assertEquals(java.util.Optional.of("/components/2/adjustTo"), r.findings().get(0).pointer());
    }

    @Test
    void adjustToWithoutAPHNeedsATarget() {
        DocumentReport r = check(TRIS + "," + HCL, "", ROOM_AND_BODY);
        assertEquals(Status.INVALID, r.status());
        assertTrue(r.findings().get(0).message().contains("no pH target"));
        assertEquals(java.util.Optional.of("/components/1/adjustTo"), r.findings().get(0).pointer());
    }

    @Test
    void aTargetTemperatureWithoutAConditionAddsAnImplicitOne() {
        DocumentReport r = check(TRIS + "," + HCL, "{\"value\": 7.8, \"tolerance\": 0.1, \"temperature\": \"30 Cel\"}",
                ROOM_AND_BODY);
        var target = r.analysis().orElseThrow().conditions().stream()
                .filter(c -> c.condition().name().equals("target")).findFirst().orElseThrow();
        assertTrue(target.condition().implicit());
        assertEquals(7.8, target.state().orElseThrow().pH(), 1e-6);
    }

    /**
     * The q.s. a user weighs, pinned to a published composition. NaH2PO4 + NaOH is Na2HPO4 (stoichiometry), so the
     * sodium hydroxide that brings KH2PO4 + NaH2PO4 to a primary standard's pH must be the standard's Na2HPO4:
     * KH2PO4 0.008695 + Na2HPO4 0.03043 mol/kg reads 7.413 at 25 °C, and KH2PO4 0.025 + Na2HPO4 0.025 mol/kg reads
     * 6.865 (Buck et al., Pure Appl. Chem. 74 (2002) 2169; Bates et al., J. Res. NBS 65A (1961)). The tolerance is
     * the engine's ±0.02 pH agreement with the standards (PrimaryStandardsTest) times β of the buffer at that pH.
     */
    @org.junit.jupiter.params.ParameterizedTest(name = "KH2PO4 {0} + NaH2PO4 {1} mol/kg to pH {2}")
    @org.junit.jupiter.params.provider.CsvSource({"0.008695, 0.03043, 7.413", "0.025, 0.025, 6.865"})
    void sodiumHydroxideQuantumSatisIsTheStandardsHydrogenPhosphate(double kh2po4, double nah2po4, double pH) {
        String json = "{\"document\": \"formulation\", \"formatVersion\": 1, \"id\": \"TST-QS-STD\","
                + " \"basis\": {\"waterMass\": \"1 kg\"}, \"components\": ["
                + "{\"substance\": \"potassium dihydrogen phosphate\", \"amount\": {\"value\": " + kh2po4
                + ", \"unit\": \"mol/kg\"}},"
                + "{\"substance\": \"sodium dihydrogen phosphate anhydrous\", \"amount\": {\"value\": " + nah2po4
                + ", \"unit\": \"mol/kg\"}},"
                + "{\"substance\": \"sodium hydroxide\", \"adjustTo\": {\"pH\": " + pH
                + ", \"temperature\": \"25 Cel\"}}],"
                + " \"conditions\": [{\"name\": \"use\", \"temperature\": \"25 Cel\"}]}";
        DocumentReport r = PROTOLYTE.check("test", json.getBytes(StandardCharsets.UTF_8));
        assertEquals(Status.PASS, r.status(), () -> r.findings() + " " + r.diagnostics());
        var use = r.analysis().orElseThrow().conditions().get(0);
        double beta = use.bufferCapacityPerLitre();   // ≈ per kg of water at 0.04 mol/kg
        TitrantResult t = r.analysis().orElseThrow().titrants().get(0);
        assertEquals(nah2po4, t.moles(), 0.02 * beta, "mol of NaOH per kg of water");
    }
}
