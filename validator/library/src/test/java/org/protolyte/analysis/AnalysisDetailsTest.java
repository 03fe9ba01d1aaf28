package org.protolyte.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;
import org.protolyte.Protolyte;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.report.DocumentReport;
import org.protolyte.substance.LibraryLoader;

/**
 * Figures of the analysis that a wrong sign, factor or order would change: the order of the buffers, which pairs of
 * conditions get a drift line, the CO2 state a q.s. is aimed at, the working solution's conditions, the stock volume
 * a reason quotes, the titratable acidity of a recipe made up to volume. Expected values are definitions, conservation
 * or published values named beside them.
 */
class AnalysisDetailsTest {

    private static final SchemaCatalog SCHEMAS = new SchemaCatalog();
    private static final Protolyte PROTOLYTE = new Protolyte(SCHEMAS, LibraryLoader.shipped(SCHEMAS));

    private static FormulationAnalysis analyse(String basis, String body) {
        String json = "{\"document\": \"formulation\", \"formatVersion\": 1, \"id\": \"TST-DET\", \"revision\": \"A\","
                + " \"basis\": " + basis + ", " + body + "}";
        DocumentReport r = PROTOLYTE.check("t.json", json.getBytes(StandardCharsets.UTF_8));
        return r.analysis().orElseThrow(() -> new AssertionError(r.findings().toString()));
    }

    private static FormulationAnalysis analyse(String body) {
        return analyse("{\"finalVolume\": \"1 L\"}", body);
    }

    private static final String PHOSPHATE = "{\"substance\": \"disodium hydrogen phosphate anhydrous\", \"amount\": "
            + "\"16 mmol/L\"}, {\"substance\": \"potassium dihydrogen phosphate\", \"amount\": \"4 mmol/L\"}";

    /**
     * Largest β first, whatever the library's order: 1 mmol/L acetate (pKa 4.76) at pH 7.6 buffers some 10⁻⁶ mol/L
     * per pH against phosphate's 2.303·C·α(1−α) ≈ 7 mmol/L per pH (derived); a plain buffer with no complex has its
     * thermodynamic pKa, not an apparent one.
     */
    @Test
    void buffersComeLargestFirstAndAPlainPKaIsNotApparent() {
        ConditionResult c = analyse("\"components\": [{\"substance\": \"sodium acetate anhydrous\", \"amount\": "
                + "\"1 mmol/L\"}, " + PHOSPHATE + "], \"conditions\": [{\"name\": \"bench\", \"temperature\": \"25 Cel\"}]")
                .conditions().get(0);
        List<BufferContribution> b = c.buffers();
        assertEquals(List.of("phosphate", "acetate"), b.stream().map(BufferContribution::system).toList());
        assertFalse(b.get(0).apparent(), b::toString);
        assertFalse(b.get(1).apparent(), b::toString);
    }

    /**
     * Drift lines: every pair holding a reference condition, here the first (which is also the first at the target's
     * temperature). A second condition at that temperature is not a reference: 4 conditions give 3 lines, not 5.
     */
    @Test
    void onlyTheFirstConditionAtTheTargetsTemperatureIsAReference() {
        FormulationAnalysis a = analyse("\"components\": [" + PHOSPHATE + "],"
                + " \"targets\": {\"pH\": {\"value\": 7.4, \"tolerance\": 0.5, \"temperature\": \"25 Cel\"}},"
                + " \"conditions\": [{\"name\": \"a\", \"temperature\": \"25 Cel\"}, {\"name\": \"b\", \"temperature\":"
                + " \"4 Cel\"}, {\"name\": \"c\", \"temperature\": \"25 Cel\"}, {\"name\": \"d\", \"temperature\": \"37 Cel\"}]");
        assertEquals(List.of("a→b", "a→c", "a→d"), a.drifts().stream().map(d -> d.from() + "→" + d.to()).toList());
    }

    /**
     * The cause of a drift is the system with the largest share times |dpKa/dT|: a Tris buffer (dpKa/dT −0.028 per K,
     * Goldberg, Kishore and Lennen 2002, from memory) with a little phosphate (−0.001 per K) drifts with Tris.
     */
    @Test
    void theMainBufferWithTheSteepestPKaIsTheCauseBeforeAMinorOne() {
        Drift d = analyse("\"components\": [{\"substance\": \"Tris\", \"amount\": \"25 mmol/L\"},"
                + " {\"substance\": \"Tris hydrochloride\", \"amount\": \"25 mmol/L\"},"
                + " {\"substance\": \"potassium dihydrogen phosphate\", \"amount\": \"2 mmol/L\"}],"
                + " \"conditions\": [{\"name\": \"bench\", \"temperature\": \"25 Cel\"}, {\"name\": \"warm\","
                + " \"temperature\": \"37 Cel\"}]").drifts().get(0);
        assertEquals("Tris", d.system().orElseThrow(), d::toString);
        assertEquals(-0.028, d.dpKadT(), 0.003);
    }

    /** A drift read backwards: from and to swapped, the change negated, the cause the same. */
    @Test
    void aReversedDriftSwapsItsEndsAndNegatesTheChange() {
        Drift d = new Drift("prep", "use", 20, 37, -0.2, Optional.of("Tris"), -0.028, 0.9, Optional.empty());
        assertEquals(new Drift("use", "prep", 37, 20, 0.2, Optional.of("Tris"), -0.028, 0.9, Optional.empty()),
                d.reversed());
    }

    /**
     * Without adjustTo.pH, the q.s. must meet the target at its own condition in its CO2 state: Tris (pKa 7.7 at 37 °C)
     * under 5 % CO2 at 37 °C takes up carbonic acid, so the dose that gives 7.4 closed gives less under CO2 (common
     * practice: CO2 acidifies a medium). The target's condition, second in the document, is at the target's midpoint.
     */
    @Test
    void theQsMeetsTheTargetInTheCo2StateOfItsCondition() {
        FormulationAnalysis a = analyse("\"components\": [{\"substance\": \"Tris\", \"amount\": \"50 mmol/L\"},"
                + " {\"substance\": \"hydrochloric acid\", \"stock\": {\"concentration\": \"1 mol/L\"},"
                + " \"adjustTo\": {\"temperature\": \"20 Cel\"}}],"
                + " \"targets\": {\"pH\": {\"value\": 7.4, \"tolerance\": 0.05, \"temperature\": \"37 Cel\"}},"
                + " \"conditions\": [{\"name\": \"preparation\", \"temperature\": \"20 Cel\"},"
                + " {\"name\": \"incubator\", \"temperature\": \"37 Cel\", \"co2\": \"5 %\"},"
                + " {\"name\": \"closed\", \"temperature\": \"37 Cel\"}]");
        assertEquals(7.4, a.conditions().get(1).state().orElseThrow().pH(), 0.005);
        assertTrue(a.conditions().get(2).state().orElseThrow().pH() > 7.45,
                () -> "closed, without the CO2, the same dose must leave the pH higher: " + a.conditions().get(2));
    }

    /**
     * No CO2 level puts an acetate buffer (pH 4.8) at a target of 7.4: the search between 1 Pa and 50 kPa finds none,
     * and none is shown (CO2 only lowers the pH).
     */
    @Test
    void noCo2ForATargetTheMediumCannotReach() {
        ConditionResult c = analyse("\"components\": [{\"substance\": \"acetic acid\", \"amount\": \"10 mmol/L\"},"
                + " {\"substance\": \"sodium acetate anhydrous\", \"amount\": \"10 mmol/L\"}],"
                + " \"targets\": {\"pH\": {\"value\": 7.4, \"tolerance\": 0.2, \"temperature\": \"37 Cel\"}},"
                + " \"conditions\": [{\"name\": \"use\", \"temperature\": \"37 Cel\", \"co2\": \"5 %\"}]")
                .conditions().get(0);
        assertTrue(c.determinate());
        assertTrue(c.co2ForTarget().isEmpty(), c::toString);
    }

    /**
     * A concentrate with two conditions: its working solution is solved at both, each with its uncertainty.
     */
    @Test
    void aConcentratesWorkingSolutionHasEveryCondition() {
        FormulationAnalysis a = analyse("\"components\": [" + PHOSPHATE + "], \"dilution\": {\"factor\": 10},"
                + " \"conditions\": [{\"name\": \"bench\", \"temperature\": \"25 Cel\"}, {\"name\": \"cold\","
                + " \"temperature\": \"4 Cel\"}]");
        List<ConditionResult> w = a.working().orElseThrow().conditions();
        assertEquals(List.of("bench", "cold"), w.stream().map(c -> c.condition().name()).toList());
        assertTrue(w.stream().allMatch(c -> c.uncertainty().isPresent()), w::toString);
    }

    /**
     * The reason a q.s. cannot be made quotes the stock it would take: 100 mmol/L Tris to pH 7 needs about 92 mmol of
     * HCl (the protonated fraction 1/(1 + 10^(7 − 8.07)) at 25 °C, Henderson–Hasselbalch with pKa 8.07, Goldberg et
     * al. 2002, from memory), 9.2 L of a 0.01 mol/L stock; activity moves it by a few per cent.
     */
    @Test
    void anOverflowingQsQuotesTheStockVolumeItNeeds() {
        TitrantResult t = analyse("\"components\": [{\"substance\": \"Tris\", \"amount\": \"100 mmol/L\"},"
                + " {\"substance\": \"hydrochloric acid\", \"stock\": {\"concentration\": \"0.01 mol/L\"},"
                + " \"adjustTo\": {\"pH\": 7.0, \"temperature\": \"25 Cel\"}}]").titrants().get(0);
        String why = t.unreachable().orElseThrow().reason();
        Matcher m = Pattern.compile("needs ([0-9.]+) mL of the").matcher(why);
        assertTrue(m.find(), why);
        double expected = 100 / (1 + Math.pow(10, 7 - 8.07)) / 0.01;
        assertEquals(expected, Double.parseDouble(m.group(1)), 0.06 * expected, why);
    }

    /**
     * The titratable acidity of a recipe made up to 1 L, weighed in as sodium hydroxide (the mmol per litre at 37 °C
     * times the litres the batch fills there), brings it to pH 7.4 at 37 °C (self-consistency; acetate near its end
     * point is steep, so a per cent in the amount shows as tenths of a pH unit).
     */
    @Test
    void theTitratableAcidityOfARecipeMadeUpToVolumeGivesPH74() {
        String acid = "{\"substance\": \"acetic acid\", \"amount\": \"3.6 mmol/L\"},"
                + " {\"substance\": \"sodium acetate anhydrous\", \"amount\": \"6.4 mmol/L\"}";
        String body = "\"conditions\": [{\"name\": \"body\", \"temperature\": \"37 Cel\"}]";
        FormulationAnalysis a = analyse("\"components\": [" + acid + "], " + body);
        double mmol = a.titratableAcidity().orElseThrow().mmolPerLitre() * a.conditions().get(0).volumeLitres();
        ConditionResult c = analyse("\"components\": [" + acid + ", {\"substance\": \"sodium hydroxide\", \"amount\": \""
                + String.format(Locale.ROOT, "%.9f", mmol) + " mmol/L\"}], " + body).conditions().get(0);
        assertEquals(7.4, c.state().orElseThrow().pH(), 0.03);
    }

    /**
     * The sensitivities are taken at the target's temperature and CO2 state, not at the first condition: closed at
     * 25 °C sodium hydrogen carbonate is amphiprotic, its pH ½(pKa1 + pKa2) whatever its amount (derived), so +1 %
     * moves it by almost nothing; open to 5 % CO2 at 37 °C (the first condition) it would move by log10(1.01).
     */
    @Test
    void sensitivitiesAreTakenAtTheTargetsOwnCondition() {
        List<Sensitivity> s = analyse("\"components\": [{\"substance\": \"sodium hydrogen carbonate\", \"amount\":"
                + " \"24 mmol/L\"}], \"targets\": {\"pH\": {\"value\": 8.3, \"tolerance\": 0.5, \"temperature\": \"25 Cel\"}},"
                + " \"conditions\": [{\"name\": \"incubator\", \"temperature\": \"37 Cel\", \"co2\": \"5 %\"},"
                + " {\"name\": \"bench\", \"temperature\": \"25 Cel\"}]").targetSensitivities();
        assertEquals(1, s.size(), s::toString);
        assertTrue(Math.abs(s.get(0).dpHPerPercent()) < 0.001, s::toString);
    }

    /**
     * The pH before any titrant is taken where the meter reads it, at part volume: 50 mmol of Tris base in half the
     * litre is a 100 mmol/L solution, whose pH ½(pKw + pKa + log C) is ½·log10 2 = 0.15 above that of 50 mmol/L
     * (derived); it is the pH the analysis gives a 100 mmol/L Tris solution.
     */
    @Test
    void theStartingPHOfAnAdjustmentAtPartVolumeIsReadThere() {
        TitrantResult t = analyse("\"components\": [{\"substance\": \"Tris\", \"amount\": \"50 mmol/L\"},"
                + " {\"substance\": \"hydrochloric acid\", \"stock\": {\"concentration\": \"1 mol/L\"},"
                + " \"adjustTo\": {\"pH\": 8.0, \"temperature\": \"25 Cel\", \"atVolume\": 0.5}}],"
                + " \"conditions\": [{\"name\": \"bench\", \"temperature\": \"25 Cel\"}]").titrants().get(0);
        String at25 = "\"conditions\": [{\"name\": \"bench\", \"temperature\": \"25 Cel\"}]";
        double twice = analyse("\"components\": [{\"substance\": \"Tris\", \"amount\": \"100 mmol/L\"}], " + at25)
                .conditions().get(0).state().orElseThrow().pH();
        double once = analyse("\"components\": [{\"substance\": \"Tris\", \"amount\": \"50 mmol/L\"}], " + at25)
                .conditions().get(0).state().orElseThrow().pH();
        assertEquals(0.15, twice - once, 0.02);
        assertEquals(twice, t.startPH(), 0.01);
    }
}
