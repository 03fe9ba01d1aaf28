package org.protolyte.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.protolyte.rules.Analyses.analyse;
import static org.protolyte.rules.Analyses.component;
import static org.protolyte.rules.Analyses.condition;
import static org.protolyte.rules.Analyses.conditions;
import static org.protolyte.rules.Analyses.formulation;
import static org.protolyte.rules.Analyses.run;

import java.util.List;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.protolyte.analysis.FormulationAnalysis;

/**
 * The kinds that compare one figure of a condition with a pack's limits, each on a hand-built analysis whose figure
 * the test sets on either side of the limit: a value at the limit is within it, the smallest step beyond is not.
 */
class ConditionLimitsTest {

    /** Three conditions: preparation 20 °C, use 25 °C, storage 5 °C; saline, so every one is determinate. */
    private static final FormulationAnalysis THREE = analyse(formulation(", \"conditions\": ["
            + "{\"name\": \"preparation\", \"temperature\": \"20 Cel\"}, {\"name\": \"use\", \"temperature\": \"25 Cel\"},"
            + " {\"name\": \"storage\", \"temperature\": \"5 Cel\"}]", component("sodium chloride", "10 mmol/L")));

    private static FormulationAnalysis allPH(double pH) {
        return conditions(THREE, c -> Analyses.pH(c, pH));
    }

    private static List<String> where(List<Finding> f) {
        return f.stream().map(x -> x.pointer().orElseThrow()).toList();
    }

    private static final String USE = "/conditions/1";

    // ---- ph-within-limits ----

    @Test
    void phAtEitherLimitIsWithinAndJustBeyondIsNot() {
        CheckKind k = new PhWithinLimits();
        String p = "{\"min\": 6, \"max\": 8}";
        assertEquals(List.of(), run(k, allPH(6.0), p));
        assertEquals(List.of(), run(k, allPH(8.0), p));
        assertEquals(List.of(USE), where(run(k, allPH(8.001), p)));
        assertEquals(List.of(USE), where(run(k, allPH(5.999), p)));
    }

    @Test
    void phLimitsJudgeUseOnlyWhenItIsThereAndTheNamedConditionWhenOneIsNamed() {
        CheckKind k = new PhWithinLimits();
        FormulationAnalysis storageOff = condition(THREE, "storage", c -> Analyses.pH(c, 9));
        assertEquals(List.of(), run(k, storageOff, "{\"max\": 8}"));
        assertEquals(List.of("/conditions/2"), where(run(k, storageOff, "{\"max\": 8, \"condition\": \"storage\"}")));
        assertEquals(List.of(), run(k, storageOff, "{\"max\": 8, \"condition\": \"preparation\"}"));
    }

    @Test
    void withoutUseEveryDeterminateConditionIsJudged() {
        FormulationAnalysis a = conditions(analyse(formulation(", \"conditions\": [{\"name\": \"a\", \"temperature\": "
                + "\"20 Cel\"}, {\"name\": \"b\", \"temperature\": \"30 Cel\"}]", component("sodium chloride",
                "10 mmol/L"))), c -> Analyses.pH(c, 9));
        assertEquals(List.of("/conditions/0", "/conditions/1"), where(run(new PhWithinLimits(), a, "{\"max\": 8}")));
    }

    @Test
    void anIndeterminateConditionIsNotJudged() {
        FormulationAnalysis a = condition(condition(allPH(7), "use", c -> Analyses.pH(c, 9)), "use",
                Analyses::indeterminate);
        assertEquals(List.of(), run(new PhWithinLimits(), a, "{\"max\": 8}"));
        assertEquals(List.of(), run(new PhWithinLimits(), a, "{\"max\": 8, \"condition\": \"use\"}"));
    }

    @Test
    void phLimitMessageStatesTheValueItsUncertaintyAndTheLimits() {
        FormulationAnalysis a = condition(allPH(8.5), "use", c -> Analyses.uncertainty(c, 0.04));
        String m = run(new PhWithinLimits(), a, "{\"min\": 6, \"max\": 8}").get(0).message();
        assertEquals("pH at use (25 °C) is 8.50 ± 0.04, outside 6.0 to 8.0", m);
        assertEquals("pH at use (25 °C) is 8.50, outside 6.0 to 8.0", run(new PhWithinLimits(),
                conditions(allPH(8.5), Analyses::withoutUncertainty), "{\"min\": 6, \"max\": 8}").get(0).message());
    }

    // ---- osmolality-range ----

    @Test
    void osmolalityAtEitherLimitIsWithinAndJustBeyondIsNot() {
        CheckKind k = new OsmolalityRange();
        String p = "{\"min\": 280, \"max\": 300}";
        assertEquals(List.of(), run(k, conditions(THREE, c -> Analyses.osmolality(c, 0.280)), p));
        assertEquals(List.of(), run(k, conditions(THREE, c -> Analyses.osmolality(c, 0.300)), p));
        assertEquals(List.of(USE), where(run(k, conditions(THREE, c -> Analyses.osmolality(c, 0.3001)), p)));
        assertEquals(List.of(USE), where(run(k, conditions(THREE, c -> Analyses.osmolality(c, 0.2799)), p)));
    }

    @Test
    void osmolalityMessageShowsTheRangeWithOpenEnds() {
        CheckKind k = new OsmolalityRange();
        FormulationAnalysis high = conditions(THREE, c -> Analyses.osmolality(c, 0.350));
        String both = run(k, high, "{\"min\": 280, \"max\": 300}").get(0).message();
        assertTrue(both.startsWith("osmolality at use (25 °C) is 350 mOsm/kg ("), both);
        assertTrue(both.endsWith("; the range is 280–300 mOsm/kg"), both);
        assertTrue(run(k, high, "{\"max\": 300}").get(0).message().endsWith("the range is 0–300 mOsm/kg"));
        FormulationAnalysis low = conditions(THREE, c -> Analyses.osmolality(c, 0.250));
        assertTrue(run(k, low, "{\"min\": 280}").get(0).message().endsWith("the range is 280–∞ mOsm/kg"));
    }

    @Test
    void osmolalityWithoutLimitsNeverFires() {
        assertEquals(List.of(), run(new OsmolalityRange(), conditions(THREE, c -> Analyses.osmolality(c, 5)), "{}"));
    }

    // ---- ionic-strength-limit ----

    @Test
    void ionicStrengthAtTheLimitIsWithinAndJustAboveIsNot() {
        CheckKind k = new IonicStrengthLimit();
        assertEquals(List.of(), run(k, conditions(THREE, c -> Analyses.ionicStrength(c, 0.1)), "{\"max\": 0.1}"));
        List<Finding> f = run(k, conditions(THREE, c -> Analyses.ionicStrength(c, 0.1001)), "{\"max\": 0.1}");
        assertEquals(List.of(USE), where(f));
        assertEquals("ionic strength at use is 0.100 mol/kg; limit 0.100", f.get(0).message());
        assertEquals(List.of(), run(k, conditions(THREE, c -> Analyses.ionicStrength(c, 9)), "{}"));
    }

    // ---- buffer-capacity-range ----

    @Test
    void bufferCapacityAtEitherLimitIsWithinAndBeyondSaysWhichLimit() {
        CheckKind k = new BufferCapacityRange();
        String p = "{\"min\": 5, \"max\": 50}";
        assertEquals(List.of(), run(k, conditions(THREE, c -> Analyses.bufferCapacity(c, 0.005)), p));
        assertEquals(List.of(), run(k, conditions(THREE, c -> Analyses.bufferCapacity(c, 0.050)), p));
        List<Finding> low = run(k, conditions(THREE, c -> Analyses.bufferCapacity(c, 0.0049)), p);
        assertEquals(List.of(USE), where(low));
        assertEquals("buffer capacity at use (25 °C) is 4.90 mmol/L per pH; minimum 5.00", low.get(0).message());
        List<Finding> high = run(k, conditions(THREE, c -> Analyses.buffers(Analyses.bufferCapacity(c, 0.0501),
                Analyses.buffer("phosphate", 7.2, 0.25, false), Analyses.buffer("HEPES", 7.5, 0.75, false))), p);
        assertEquals("buffer capacity at use (25 °C) is 50.1 mmol/L per pH, 75 % of it from HEPES; maximum 50.0",
                high.get(0).message());
    }

    @Test
    void bufferCapacityWithoutLimitsNeverFires() {
        assertEquals(List.of(), run(new BufferCapacityRange(), conditions(THREE, c -> Analyses.bufferCapacity(c, 0)),
                "{}"));
    }

    // ---- air-exposure-drift ----

    private static FormulationAnalysis inAir(double pH, double air) {
        return conditions(THREE, c -> Analyses.pHInAir(Analyses.pH(c, pH), OptionalDouble.of(air)));
    }

    @Test
    void airDriftAtTheLimitIsWithinAndBeyondInEitherDirectionIsNot() {
        CheckKind k = new AirExposureDrift();
        assertEquals(List.of(), run(k, inAir(7.0, 7.25), "{\"maxChange\": 0.25}"));
        assertEquals(List.of(), run(k, inAir(7.0, 6.75), "{\"maxChange\": 0.25}"));
        assertEquals(List.of(USE), where(run(k, inAir(7.0, 7.26), "{\"maxChange\": 0.25}")));
        assertEquals(List.of(USE), where(run(k, inAir(7.0, 6.74), "{\"maxChange\": 0.25}")));
        // default 0.3
        assertEquals(List.of(), run(k, inAir(7.0, 7.3), "{}"));
        assertEquals(List.of(USE), where(run(k, inAir(7.0, 7.31), "{}")));
    }

    @Test
    void airDriftMessageIsSignedAndOmitsAZeroLimit() {
        CheckKind k = new AirExposureDrift();
        assertEquals("in room air the pH at use (25 °C) moves from 7.00 to 6.50 (-0.50; limit ±0.30)",
                run(k, inAir(7.0, 6.5), "{}").get(0).message());
        assertEquals("in room air the pH at use (25 °C) moves from 7.00 to 7.10 (+0.10)",
                run(k, inAir(7.0, 7.1), "{\"maxChange\": 0}").get(0).message());
    }

    @Test
    void airDriftNeedsAnAirPH() {
        FormulationAnalysis a = conditions(THREE, c -> Analyses.pHInAir(c, OptionalDouble.empty()));
        assertEquals(List.of(), run(new AirExposureDrift(), a, "{\"maxChange\": 0}"));
    }

    @Test
    void everyMessageOfTheseKindsNamesTheRule() {
        Finding f = run(new IonicStrengthLimit(), conditions(THREE, c -> Analyses.ionicStrength(c, 1)), "{\"max\": 0.1}")
                .get(0);
        assertEquals("r-ionic-strength-limit", f.rule());
        assertEquals(Severity.WARNING, f.severity());
        assertFalse(f.location().isEmpty(), "a finding at a condition has a line and column");
    }
}
