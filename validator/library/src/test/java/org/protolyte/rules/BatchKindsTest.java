package org.protolyte.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.protolyte.rules.BatchAnalyses.batch;
import static org.protolyte.rules.BatchAnalyses.candidate;
import static org.protolyte.rules.BatchAnalyses.candidates;
import static org.protolyte.rules.BatchAnalyses.observations;
import static org.protolyte.rules.BatchAnalyses.osmolality;
import static org.protolyte.rules.BatchAnalyses.pH;
import static org.protolyte.rules.BatchAnalyses.run;
import static org.protolyte.rules.BatchAnalyses.specifiedPh;
import static org.protolyte.rules.BatchAnalyses.target;
import static org.protolyte.rules.BatchAnalyses.unjudged;

import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.protolyte.batch.BatchAnalysis;

/**
 * The batch check kinds on hand-built batch analyses: each figure a check judges is set on either side of its limit,
 * and the finding (or its absence) follows from the kind's definition alone.
 */
class BatchKindsTest {

    private static final BatchAnalysis BATCH = batch();

    private static List<Finding> agrees(String kind, BatchAnalysis.Observation o, String parameters) {
        return run(kind, observations(BATCH, o), parameters);
    }

    /**
     * A pH reading is held to 0.1 of its prediction; a trace load of 0.2 mmol/kg moves a buffer of β = 1 mmol/kg per
     * pH by 0.2, so the limit widens to that; below β = 1 the reading is not compared, and a note says why.
     */
    @Test
    void aPhReadingAgreesWithinItsLimitWidenedByTraces() {
        List<Finding> off = agrees("batch-ph-agrees", pH(4.90, 4.71, 11.5), "{}");
        assertEquals(1, off.size(), off::toString);
        assertEquals(Optional.of("/measurements/0"), off.get(0).pointer());
        assertEquals(Severity.WARNING, off.get(0).severity());
        assertTrue(off.get(0).message().contains("measured pH 4.90, the additions as recorded give pH 4.71 (+0.19; "
                + "limit 0.10)"), off.get(0)::message);
        assertTrue(off.get(0).location().isPresent(), "the place in the record");
        assertEquals(List.of(), agrees("batch-ph-agrees", pH(4.78, 4.71, 11.5), "{}"));
        assertEquals(List.of(), agrees("batch-ph-agrees", pH(4.90, 4.71, 1.0), "{}"));
        List<Finding> unbuffered = agrees("batch-ph-agrees", pH(4.90, 4.71, 0.5), "{}");
        assertEquals(Severity.NOTE, unbuffered.get(0).severity());
        assertTrue(unbuffered.get(0).message().contains("not compared: the solution is unbuffered"),
                unbuffered.get(0)::message);
        List<Finding> far = agrees("batch-ph-agrees", pH(4.90, 4.71, 11.5), "{\"errorBeyond\": 0.15}");
        assertEquals(Severity.ERROR, far.get(0).severity());
        assertTrue(far.get(0).message().contains("beyond 0.15"), far.get(0)::message);
        assertEquals(List.of(), agrees("batch-ph-agrees", pH(4.90, Double.NaN, 11.5), "{}"), "no prediction, no judgment");
    }

    /** An osmolality is held to 3 % of its prediction: 30 against 28 is 7 % off, against 29.5 under 2 %. */
    @Test
    void anOsmolalityAgreesWithinItsPerCent() {
        List<Finding> off = agrees("batch-osmolality-agrees", osmolality(30, 28), "{}");
        assertEquals(1, off.size(), off::toString);
        assertEquals(Optional.of("/measurements/1"), off.get(0).pointer());
        assertTrue(off.get(0).message().contains("(+7 %; limit 3 %)"), off.get(0)::message);
        assertEquals(List.of(), agrees("batch-osmolality-agrees", osmolality(30, 29.5), "{}"));
        assertEquals(List.of(), agrees("batch-ph-agrees", osmolality(30, 28), "{}"), "each kind judges its own");
    }

    @Test
    void aReadingOutsideItsTargetIsOutOfSpecification() {
        List<Finding> oos = run("batch-out-of-specification", specifiedPh(BATCH, target(7.58, 7.30, 7.50)), "{}");
        assertEquals(1, oos.size(), oos::toString);
        assertEquals(Optional.of("/measurements/0"), oos.get(0).pointer());
        assertTrue(oos.get(0).message().contains("measured pH 7.58, outside 7.30–7.50")
                && oos.get(0).message().contains("out-of-specification investigation"), oos.get(0)::message);
        assertEquals(List.of(), run("batch-out-of-specification", specifiedPh(BATCH, target(7.50, 7.30, 7.50)), "{}"));
        assertEquals(List.of(), run("batch-out-of-specification", specifiedPh(BATCH, target(7.30, 7.30, 7.50)), "{}"));
        // a target that could not be moved is not judged here: the report makes the record indeterminate
        assertEquals(List.of(), run("batch-out-of-specification", specifiedPh(BATCH, unjudged(7.58, 7.30, 7.50)), "{}"));
    }

    /** The record's osmolality of 30 mOsm/kg, taken after the last addition, against the rule's own range. */
    @Test
    void anOsmolalityOutsideTheRulesRangeIsOutOfSpecification() {
        List<Finding> oos = run("batch-out-of-specification", BATCH, "{\"osmolality\": {\"min\": 280, \"max\": 320}}");
        assertEquals(1, oos.size(), oos::toString);
        assertEquals(Optional.of("/measurements/1"), oos.get(0).pointer());
        assertTrue(oos.get(0).message().contains("measured 30 mOsm/kg, outside the specification 280–320 mOsm/kg"),
                oos.get(0)::message);
        assertEquals(List.of(), run("batch-out-of-specification", BATCH, "{\"osmolality\": {\"min\": 25, \"max\": 35}}"));
    }

    /** One observation: the mistakes within 0.1 pH of it are listed, the others not. */
    @Test
    void theDiagnosisNamesTheMistakesThatFitTheReading() {
        BatchAnalysis b = candidates(observations(BATCH, pH(5.40, 4.71, 11.5)), candidate("as recorded", 4.71),
                candidate("acetic acid weighed a tenth of what was recorded (step 2)", 5.45),
                candidate("sodium acetate anhydrous left out (step 1)", 2.9));
        List<Finding> d = run("batch-diagnosis", b, "{}");
        assertEquals(1, d.size(), d::toString);
        assertEquals(Optional.of("/measurements/0"), d.get(0).pointer());
        String m = d.get(0).message();
        assertTrue(m.startsWith("measured pH at step 2 (20.0 °C) 5.40; the additions as recorded give 4.71"), m);
        assertTrue(m.contains("consistent with acetic acid weighed a tenth of what was recorded (step 2) (gives 5.45)"),
                m);
        assertFalse(m.contains("left out"), m);
        assertEquals(List.of(), run("batch-diagnosis", candidates(observations(BATCH, pH(4.75, 4.71, 11.5)),
                candidate("as recorded", 4.71), candidate("acetic acid left out (step 2)", 4.75)), "{}"),
                "nothing to explain");
    }

    /**
     * Two observations rank the fits by Σ(difference/limit)²: B (0.5² + 0.11²) before A (0.5² + 0.56²); none fitting
     * sends the reviewer to the meter and the materials.
     */
    @Test
    void twoObservationsRankTheFitsAndNoFitSaysSo() {
        BatchAnalysis obs = observations(BATCH, pH(5.40, 4.71, 11.5), osmolality(30, 28));
        List<Finding> ranked = run("batch-diagnosis", candidates(obs, candidate("as recorded", 4.71, 28),
                candidate("A", 5.45, 29.5), candidate("B", 5.35, 30.1)), "{}");
        String m = ranked.get(0).message();
        assertTrue(m.contains("best fit first: 1. B (gives 5.35 and 30 mOsm/kg); 2. A (gives 5.45 and 30 mOsm/kg)"), m);
        List<Finding> none = run("batch-diagnosis", candidates(obs, candidate("as recorded", 4.71, 28),
                candidate("A", 6.5, 30)), "{}");
        assertTrue(none.get(0).message().contains("none of the usual mistakes"), none.get(0)::message);
    }
}
