package org.protolyte.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.protolyte.rules.Analyses.analyse;
import static org.protolyte.rules.Analyses.component;
import static org.protolyte.rules.Analyses.conditions;
import static org.protolyte.rules.Analyses.formulation;
import static org.protolyte.rules.Analyses.run;

import java.util.List;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.protolyte.analysis.ConditionResult;
import org.protolyte.analysis.FormulationAnalysis;

/** ph-within-target on hand-built figures: the target's edges, and the unbuffered case judged closed. */
class PhWithinTargetKindTest {

    private static FormulationAnalysis target(String target) {
        return analyse(formulation(", \"conditions\": [{\"name\": \"use\", \"temperature\": \"25 Cel\"}], \"targets\": "
                + "{\"pH\": " + target + "}", component("sodium chloride", "10 mmol/L")));
    }

    private static final FormulationAnalysis RANGE = target("{\"min\": 6.8, \"max\": 7.0, \"temperature\": \"25 Cel\"}");

    private static List<Finding> at(FormulationAnalysis a, java.util.function.UnaryOperator<ConditionResult> c) {
        return run(new PhWithinTarget(), conditions(a, x -> c.apply(Analyses.withoutUncertainty(
                Analyses.bufferCapacity(x, 0.01)))), "{}");
    }

    @Test
    void theTargetsEdgesAreWithinAndJustBeyondIsNot() {
        assertEquals(List.of(), at(RANGE, c -> Analyses.pH(c, 6.8)));
        assertEquals(List.of(), at(RANGE, c -> Analyses.pH(c, 7.0)));
        assertEquals(1, at(RANGE, c -> Analyses.pH(c, 7.001)).size());
        assertEquals(1, at(RANGE, c -> Analyses.pH(c, 6.799)).size());
    }

    @Test
    void theMessageStatesTheRangeTheMainBufferTheUncertaintyAndTheCo2() {
        String m = at(RANGE, c -> Analyses.co2ForTarget(Analyses.uncertainty(Analyses.buffers(Analyses.pH(c, 7.5),
                Analyses.buffer("HEPES", 7.5, 0.8, false), Analyses.buffer("phosphate", 7.2, 0.2, false)), 0.03),
                5066.25)).get(0).message();
        // 5066.25 Pa is 5 % of standard pressure, 101325 Pa (definition)
        assertTrue(m.startsWith("pH at 25 °C is 7.50 ± 0.03, target 6.80 to 7.00; HEPES carries 80 % of the "
                + "buffering; "), m);
        assertTrue(m.endsWith("; a CO2 level of 5.07 kPa (5.0 % at standard pressure) would give pH 6.90 with this "
                + "bicarbonate"), m);
    }

    @Test
    void anOpenEndedTargetSaysAtMostOrAtLeast() {
        FormulationAnalysis max = target("{\"max\": 7.0, \"temperature\": \"25 Cel\"}");
        assertTrue(at(max, c -> Analyses.pH(c, 7.5)).get(0).message().contains("target at most 7.00"));
        FormulationAnalysis min = target("{\"min\": 7.0, \"temperature\": \"25 Cel\"}");
        assertTrue(at(min, c -> Analyses.pH(c, 6.5)).get(0).message().contains("target at least 7.00"));
    }

    @Test
    void anUnbufferedClosedSolutionIsJudgedClosedWithItsRangeInAir() {
        java.util.function.UnaryOperator<ConditionResult> closed = c -> Analyses.pHInAir(Analyses.pH(c, 7.5),
                OptionalDouble.of(5.6));
        String m = run(new PhWithinTarget(), conditions(RANGE, c -> closed.apply(Analyses.bufferCapacity(c, 0.0009))),
                "{}").get(0).message();
        assertTrue(m.startsWith("pH at 25 °C is 7.50 closed and free of CO2, target 6.80 to 7.00; the solution is "
                + "unbuffered (β 0.90 mmol/L per pH, below 1.0)"), m);
        assertTrue(m.contains("between 7.50 closed and 5.60 in room air (also outside the target)"), m);
        // at the threshold itself the solution counts as buffered
        String buffered = run(new PhWithinTarget(), conditions(RANGE, c -> closed.apply(Analyses.bufferCapacity(c,
                0.001))), "{}").get(0).message();
        assertTrue(buffered.startsWith("pH at 25 °C is 7.50"), buffered);
        assertTrue(!buffered.contains("unbuffered"), buffered);
        // without an air pH there is no range to give
        String noAir = run(new PhWithinTarget(), conditions(RANGE, c -> Analyses.pHInAir(Analyses.bufferCapacity(
                Analyses.pH(c, 7.5), 0.0009), OptionalDouble.empty())), "{}").get(0).message();
        assertTrue(!noAir.contains("unbuffered"), noAir);
    }

    @Test
    void theMessageNamesTheLeverAndTheSetpointThatWouldMeetTheTarget() {
        FormulationAnalysis a = RANGE;
        org.protolyte.analysis.TitrantResult t = new org.protolyte.analysis.TitrantResult(
                a.recipe().ingredients().get(0), org.protolyte.analysis.TitrantResult.Role.BASE, 0.001, true,
                OptionalDouble.of(7.1), 293.15, 7.1, 298.15, java.util.Optional.empty()).withSetpointForTarget(6.85);
        FormulationAnalysis levers = new FormulationAnalysis(a.recipe(), a.solution(), a.conditions(), List.of(t),
                a.caveats(), a.assumptions(), List.of(new org.protolyte.analysis.Sensitivity("sodium chloride",
                "/components/0", -0.0125)), a.drifts(), a.titratableAcidity(), a.robustness(), a.working());
        String m = at(levers, c -> Analyses.pH(c, 7.5)).get(0).message();
        assertTrue(m.endsWith("; the pH moves most with sodium chloride (-0.013 per +1 %); adjusting to pH 6.85 at "
                + "20 °C instead of 7.10 would meet it"), m);
        FormulationAnalysis flat = new FormulationAnalysis(a.recipe(), a.solution(), a.conditions(), List.of(),
                a.caveats(), a.assumptions(), List.of(new org.protolyte.analysis.Sensitivity("sodium chloride",
                "/components/0", 0)), a.drifts(), a.titratableAcidity(), a.robustness(), a.working());
        String none = at(flat, c -> Analyses.pH(c, 7.5)).get(0).message();
        assertEquals("pH at 25 °C is 7.50, target 6.80 to 7.00", none);
        // a lever that rounds to zero at three decimals ("-0.000 per +1 %") is no lever to name; one that shows is
        for (double dpH : new double[] {-0.0004999, 0.0004999}) {
            FormulationAnalysis tiny = new FormulationAnalysis(a.recipe(), a.solution(), a.conditions(), List.of(),
                    a.caveats(), a.assumptions(), List.of(new org.protolyte.analysis.Sensitivity("sodium chloride",
                    "/components/0", dpH)), a.drifts(), a.titratableAcidity(), a.robustness(), a.working());
            assertEquals("pH at 25 °C is 7.50, target 6.80 to 7.00", at(tiny, c -> Analyses.pH(c, 7.5)).get(0).message());
        }
        FormulationAnalysis shows = new FormulationAnalysis(a.recipe(), a.solution(), a.conditions(), List.of(),
                a.caveats(), a.assumptions(), List.of(new org.protolyte.analysis.Sensitivity("sodium chloride",
                "/components/0", -0.0005)), a.drifts(), a.titratableAcidity(), a.robustness(), a.working());
        assertTrue(at(shows, c -> Analyses.pH(c, 7.5)).get(0).message().endsWith("(-0.001 per +1 %)"));
    }

    @Test
    void anIndeterminateConditionAtTheTargetIsNotJudged() {
        assertEquals(List.of(), at(RANGE, c -> Analyses.indeterminate(Analyses.pH(c, 9))));
    }
}
