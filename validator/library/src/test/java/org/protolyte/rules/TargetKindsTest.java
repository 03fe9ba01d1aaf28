package org.protolyte.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.protolyte.rules.Analyses.analyse;
import static org.protolyte.rules.Analyses.component;
import static org.protolyte.rules.Analyses.condition;
import static org.protolyte.rules.Analyses.conditions;
import static org.protolyte.rules.Analyses.formulation;
import static org.protolyte.rules.Analyses.run;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.protolyte.analysis.Drift;
import org.protolyte.analysis.FormulationAnalysis;
import org.protolyte.analysis.Robustness;

/**
 * The kinds that judge a figure against the document's pH target or between its conditions, on hand-built figures:
 * temperature-drift, titratable-acidity-limit, load-capacity, pka-near-target and batch-risk. A value at a limit is
 * within it, the smallest step beyond is not, and the message names the place and the number.
 */
class TargetKindsTest {

    /** preparation 20 °C, use 25 °C, storage 5 °C; target 7.0–8.0 at 25 °C; saline, so every condition solves. */
    private static final FormulationAnalysis THREE = analyse(formulation(", \"conditions\": ["
            + "{\"name\": \"preparation\", \"temperature\": \"20 Cel\"}, {\"name\": \"use\", \"temperature\": \"25 Cel\"},"
            + " {\"name\": \"storage\", \"temperature\": \"5 Cel\"}], \"targets\": {\"pH\": {\"min\": 7.0, \"max\": 8.0, "
            + "\"temperature\": \"25 Cel\"}}", component("sodium chloride", "10 mmol/L")));

    private static List<String> where(List<Finding> f) {
        return f.stream().map(x -> x.pointer().orElseThrow()).toList();
    }

    // ---- temperature-drift ----

    private static Drift drift(String from, String to, double change) {
        double[] celsius = {from.equals("preparation") ? 20 : from.equals("use") ? 25 : 5,
                to.equals("preparation") ? 20 : to.equals("use") ? 25 : 5};
        return new Drift(from, to, celsius[0], celsius[1], change, Optional.of("Tris"), -0.028, 0.9,
                Optional.empty());
    }

    private static List<Finding> drifts(String parameters, Drift... d) {
        return run(new TemperatureDrift(), Analyses.drifts(THREE, d), parameters);
    }

    @Test
    void aDriftAtTheLimitIsWithinAndJustBeyondIsNotInEitherDirection() {
        assertEquals(List.of(), drifts("{\"maxChange\": 0.25}", drift("preparation", "use", 0.25)));
        assertEquals(List.of(), drifts("{\"maxChange\": 0.25}", drift("preparation", "use", -0.25)));
        assertEquals(List.of("/conditions/1"), where(drifts("{\"maxChange\": 0.25}", drift("preparation", "use",
                0.2501))));
        assertEquals(List.of("/conditions/1"), where(drifts("{\"maxChange\": 0.25}", drift("preparation", "use",
                -0.2501))));
        // default 0.1
        assertEquals(List.of(), drifts("{}", drift("preparation", "storage", 0.1)));
        assertEquals(List.of("/conditions/2"), where(drifts("{}", drift("preparation", "storage", 0.1001))));
    }

    @Test
    void theDriftMessageNamesBothConditionsTheLimitAndTheCause() {
        assertEquals(List.of("pH moves +0.50 from preparation (20 °C) to storage (5 °C), limit ±0.10; mostly Tris, "
                + "dpKa/dT -0.0280 per K, 90 % of the buffering"), drifts("{}", drift("preparation", "storage", 0.5))
                .stream().map(Finding::message).toList());
        Drift water = new Drift("preparation", "use", 20, 25, -0.3, Optional.empty(), 0, 0, Optional.empty());
        assertEquals("pH moves -0.30 from preparation (20 °C) to use (25 °C); water's own ionisation",
                drifts("{\"maxChange\": 0}", water).get(0).message());
    }

    @Test
    void aDriftListedTowardsTheReferenceIsReadFromIt() {
        // the analysis lists use → preparation; read from preparation the change has the other sign
        List<Finding> f = drifts("{}", drift("use", "preparation", 0.4));
        assertEquals(List.of("/conditions/1"), where(f));
        assertTrue(f.get(0).message().startsWith("pH moves -0.40 from preparation (20 °C) to use (25 °C)"),
                f.get(0).message());
    }

    @Test
    void onlyDriftsFromTheReferenceAndToTheNamedConditionAreJudged() {
        Drift useToStorage = drift("use", "storage", 0.5);
        Drift prepToUse = drift("preparation", "use", 0.5);
        Drift prepToStorage = drift("preparation", "storage", 0.5);
        assertEquals(List.of("/conditions/1", "/conditions/2"), where(drifts("{}", prepToUse, prepToStorage,
                useToStorage)));
        assertEquals(List.of("/conditions/2"), where(drifts("{\"to\": \"storage\"}", prepToUse, prepToStorage,
                useToStorage)));
        assertEquals(List.of("/conditions/0", "/conditions/2"), where(drifts("{\"from\": \"use\"}", prepToUse,
                prepToStorage, useToStorage)));
        assertEquals(List.of("/conditions/0"), where(drifts("{\"from\": \"use\", \"to\": \"preparation\"}", prepToUse,
                prepToStorage, useToStorage)));
    }

    @Test
    void withoutPreparationTheFirstConditionIsTheReference() {
        FormulationAnalysis two = analyse(formulation(", \"conditions\": [{\"name\": \"cold\", \"temperature\": "
                + "\"5 Cel\"}, {\"name\": \"warm\", \"temperature\": \"37 Cel\"}]", component("sodium chloride",
                "10 mmol/L")));
        Drift d = new Drift("warm", "cold", 37, 5, 0.5, Optional.empty(), 0, 0, Optional.empty());
        List<Finding> f = run(new TemperatureDrift(), Analyses.drifts(two, d), "{}");
        assertEquals(List.of("/conditions/1"), where(f));
        assertTrue(f.get(0).message().startsWith("pH moves -0.50 from cold (5 °C) to warm (37 °C)"), f.get(0).message());
    }

    @Test
    void aDriftWithAChangeOfCo2IsLeftToTheCo2Rules() {
        Drift co2 = new Drift("preparation", "use", 20, 25, 0.8, Optional.of("carbonate"), -0.01, 0.9,
                Optional.of("use is open to 5 % CO2"));
        assertEquals(List.of(), drifts("{}", co2));
    }

    // ---- titratable-acidity-limit ----

    private static List<Finding> acidity(double perLitre, OptionalDouble perDose, String parameters) {
        return run(new TitratableAcidityLimit(), Analyses.titratableAcidity(THREE, perLitre, perDose), parameters);
    }

    @Test
    void titratableAcidityAtTheLimitIsWithinAndJustAboveIsNotEitherWay() {
        String p = "{\"maxPerLitre\": 30}";
        assertEquals(List.of(), acidity(30, OptionalDouble.empty(), p));
        assertEquals(List.of(), acidity(-30, OptionalDouble.empty(), p));
        List<Finding> acid = acidity(30.1, OptionalDouble.empty(), p);
        assertEquals(List.of(""), where(acid));
        assertEquals("titratable acidity (base needed) to pH 7.4 at 37 °C is 30.1 mmol/L; limit 30.0",
                acid.get(0).message());
        assertEquals("titratable alkalinity (acid needed) to pH 7.4 at 37 °C is 30.1 mmol/L; limit 30.0",
                acidity(-30.1, OptionalDouble.empty(), p).get(0).message());
    }

    @Test
    void theDoseIsJudgedOnItsOwnWhereTheDocumentGivesOne() {
        String p = "{\"maxPerLitre\": 100, \"maxPerDose\": 2}";
        assertEquals(List.of(), acidity(40, OptionalDouble.of(2), p));
        assertEquals(List.of(), acidity(-40, OptionalDouble.of(-2), p));
        List<Finding> f = acidity(-40, OptionalDouble.of(-2.01), p);
        assertEquals(List.of("/dose"), where(f));
        assertEquals("titratable alkalinity (acid needed) to pH 7.4 at 37 °C is 2.01 mmol per dose; limit 2.00",
                f.get(0).message());
        assertEquals(List.of("", "/dose"), where(acidity(101, OptionalDouble.of(3), p)));
    }

    @Test
    void withoutLimitsOrAFigureTitratableAcidityNeverFires() {
        assertEquals(List.of(), acidity(1e6, OptionalDouble.of(1e6), "{}"));
        FormulationAnalysis none = new FormulationAnalysis(THREE.recipe(), THREE.solution(), THREE.conditions(),
                THREE.titrants(), THREE.caveats(), THREE.assumptions(), THREE.targetSensitivities(), THREE.drifts(),
                Optional.empty(), THREE.robustness(), THREE.working());
        assertEquals(List.of(), run(new TitratableAcidityLimit(), none, "{\"maxPerLitre\": 0, \"maxPerDose\": 0}"));
    }

    // ---- load-capacity ----

    /** THREE with no loads computed anywhere, then the given ones at one condition. */
    private static List<Finding> loads(FormulationAnalysis a, String condition, double acid, double base,
                                       String parameters) {
        FormulationAnalysis none = conditions(a, c -> Analyses.loads(c, OptionalDouble.empty(), OptionalDouble.empty()));
        return run(new LoadCapacity(), condition(none, condition, c -> Analyses.loads(c, OptionalDouble.of(acid),
                OptionalDouble.of(base))), parameters);
    }

    @Test
    void aLoadAtTheMinimumIsEnoughAndJustBelowIsNot() {
        String p = "{\"minAcid\": 5, \"minBase\": 2}";
        assertEquals(List.of(), loads(THREE, "use", 5, 2, p));
        List<Finding> acid = loads(THREE, "use", 4.99, 2, p);
        assertEquals(List.of("/conditions/1"), where(acid));
        assertEquals("at use (25 °C) 4.99 mmol/L of strong acid takes the pH below the target; minimum 5.00",
                acid.get(0).message());
        List<Finding> base = loads(THREE, "use", 5, 1.99, p);
        assertEquals("at use (25 °C) 1.99 mmol/L of strong base takes the pH above the target; minimum 2.00",
                base.get(0).message());
        assertEquals(2, loads(THREE, "use", 0, 0, p).size());
        // defaults 0: a load is never below them
        assertEquals(List.of(), loads(THREE, "use", 0, 0, "{}"));
    }

    @Test
    void loadsAreJudgedOnlyAtTheTargetsTemperatureAndOnlyWhereComputed() {
        String p = "{\"minAcid\": 5}";
        assertEquals(List.of(), loads(THREE, "storage", 0, 0, p));
        assertEquals(List.of(), loads(THREE, "preparation", 0, 0, p));
        assertEquals(List.of(), run(new LoadCapacity(), condition(THREE, "use", c -> Analyses.loads(c,
                OptionalDouble.empty(), OptionalDouble.of(0))), p), "no acid side: the target has no lower limit");
        assertEquals(List.of(), run(new LoadCapacity(), condition(conditions(THREE, c -> Analyses.loads(c,
                OptionalDouble.of(0), OptionalDouble.of(0))), "use", Analyses::indeterminate), p));
    }

    // ---- pka-near-target ----

    private static List<Finding> pKa(FormulationAnalysis a, String parameters,
                                     org.protolyte.analysis.BufferContribution... buffers) {
        return run(new PkaNearTarget(), conditions(a, c -> Analyses.buffers(c, buffers)), parameters);
    }

    @Test
    void aPKaOneUnitFromTheTargetIsNearAndJustBeyondIsNot() {
        // target 7.0–8.0: its midpoint 7.5; "within about one unit of its pKa" (Van Slyke 1922)
        assertEquals(List.of(), pKa(THREE, "{}", Analyses.buffer("MES", 6.5, 1, false)));
        assertEquals(List.of(), pKa(THREE, "{}", Analyses.buffer("bicine", 8.5, 1, false)));
        List<Finding> f = pKa(THREE, "{}", Analyses.buffer("MES", 6.49, 1, false));
        assertEquals(List.of("/targets/pH"), where(f));
        assertEquals("the main buffering system, MES (100 % of β), has pKa 6.49 at 25 °C, 1.01 from the target pH "
                + "7.50 (limit 1.00)", f.get(0).message());
        assertEquals(1, pKa(THREE, "{\"maxDistance\": 0.5}", Analyses.buffer("bicine", 8.01, 1, false)).size());
        assertEquals(List.of(), pKa(THREE, "{\"maxDistance\": 0.5}", Analyses.buffer("bicine", 8.0, 1, false)));
    }

    @Test
    void thePKaJudgedIsThatOfTheSystemCarryingMostOfTheBuffering() {
        // MES far from the target carries 30 %, HEPES near it 70 %: the main buffer is near
        assertEquals(List.of(), pKa(THREE, "{}", Analyses.buffer("MES", 5.0, 0.3, false),
                Analyses.buffer("HEPES", 7.5, 0.7, false)));
        List<Finding> f = pKa(THREE, "{}", Analyses.buffer("MES", 5.0, 0.7, false), Analyses.buffer("HEPES", 7.5, 0.3,
                false));
        assertTrue(f.get(0).message().startsWith("the main buffering system, MES (70 % of β)"), f.get(0).message());
    }

    @Test
    void anApparentPKaIsSaidToBeOne() {
        var borate = new org.protolyte.analysis.BufferContribution("borate", 0.01, 1, 5.0, 0.01, false, true);
        assertTrue(pKa(THREE, "{}", borate).get(0).message().contains("has an apparent (complexes included) pKa 5.00"));
    }

    @Test
    void anOpenSystemOrNoTargetOrNoBufferIsNotJudged() {
        assertEquals(List.of(), pKa(THREE, "{}", Analyses.buffer("carbonate", 6.1, 1, true)));
        assertEquals(List.of(), pKa(THREE, "{}"));
        FormulationAnalysis noTarget = analyse(Analyses.saline(""));
        assertEquals(List.of(), pKa(noTarget, "{}", Analyses.buffer("MES", 1, 1, false)));
        assertEquals(List.of(), run(new PkaNearTarget(), condition(conditions(THREE, c -> Analyses.buffers(c,
                Analyses.buffer("MES", 1, 1, false))), "use", Analyses::indeterminate), "{}"));
    }

    @Test
    void thePKaIsReadAtTheTargetsTemperature() {
        // only the condition at 25 °C, the target's, is read: a far pKa at 5 °C does not count
        FormulationAnalysis a = condition(conditions(THREE, c -> Analyses.buffers(c, Analyses.buffer("MES", 1, 1,
                false))), "use", c -> Analyses.buffers(c, Analyses.buffer("HEPES", 7.5, 1, false)));
        assertEquals(List.of(), run(new PkaNearTarget(), a, "{}"));
    }

    // ---- batch-risk ----

    private static final Robustness.Interval PH = new Robustness.Interval(7.42, 0.05, 7.33, 7.52);

    private static FormulationAnalysis risk(int samples, int solved, Optional<String> why, double... outside) {
        List<Robustness.ConditionRobustness> c = new java.util.ArrayList<>();
        String[] names = {"use", "storage"};
        for (int i = 0; i < outside.length; i++) {
            c.add(new Robustness.ConditionRobustness(names[i], PH, PH, PH, Double.isNaN(outside[i])
                    ? OptionalDouble.empty() : OptionalDouble.of(outside[i]), PH, 7.3, 7.5, Map.of()));
        }
        return THREE.withRobustness(new Robustness.Result(new Robustness.Settings(samples, 42, 0.01, 0.01), solved, c,
                Map.of(), why));
    }

    @Test
    void aRiskAtTheLimitIsAcceptedAndJustAboveIsNot() {
        assertEquals(List.of(), run(new BatchRisk(), risk(1000, 1000, Optional.empty(), 0.05), "{}"));
        List<Finding> f = run(new BatchRisk(), risk(1000, 1000, Optional.empty(), 0.051), "{}");
        assertEquals(List.of("/targets/pH"), where(f));
        assertEquals("5.1 % of simulated batches (1000, seed 42) leave the pH target at use; limit 5.0 %; batch pH "
                + "7.420 [7.330–7.520]", f.get(0).message());
        assertEquals(List.of(), run(new BatchRisk(), risk(1000, 1000, Optional.empty(), 0.01), "{\"maxProbability\": "
                + "0.01}"));
        assertEquals(1, run(new BatchRisk(), risk(1000, 1000, Optional.empty(), 0.011), "{\"maxProbability\": 0.01}")
                .size());
    }

    @Test
    void eachConditionOverTheLimitIsAFindingAndOneWithoutAProbabilityIsNot() {
        List<Finding> f = run(new BatchRisk(), risk(1000, 1000, Optional.empty(), 0.2, Double.NaN), "{}");
        assertEquals(1, f.size());
        assertEquals(2, run(new BatchRisk(), risk(1000, 1000, Optional.empty(), 0.2, 0.3), "{}").size());
    }

    @Test
    void unsolvedBatchesAreCountedAndTheirReasonGiven() {
        String m = run(new BatchRisk(), risk(1000, 990, Optional.of("no convergence"), 0.2), "{}").get(0).message();
        assertTrue(m.endsWith("; 10 of them could not be solved and count as outside (no convergence)"), m);
        String noReason = run(new BatchRisk(), risk(1000, 990, Optional.empty(), 0.2), "{}").get(0).message();
        assertTrue(noReason.endsWith("(no reason given)"), noReason);
    }

    @Test
    void withoutTheStudyBatchRiskSaysNothing() {
        assertEquals(List.of(), run(new BatchRisk(), THREE, "{\"maxProbability\": 0}"));
    }
}
