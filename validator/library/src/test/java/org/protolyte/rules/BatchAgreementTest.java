package org.protolyte.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.protolyte.analysis.Analyzer;
import org.protolyte.batch.BatchAnalysis;
import org.protolyte.batch.BatchAnalysis.Observation;
import org.protolyte.batch.BatchAnalysis.SpecifiedPh;
import org.protolyte.batch.BatchAnalyzer;
import org.protolyte.batch.BatchRecordReader;
import org.protolyte.chemistry.Davies;
import org.protolyte.chemistry.Equilibrium;
import org.protolyte.document.JsonReader;

/**
 * batch-ph-agrees, batch-titrant-agrees, batch-osmolality-agrees and batch-out-of-specification on hand-set
 * measurements, predictions and specifications of a real record (measurements: 0 pH before adjustment, 1 pH after,
 * 2 osmolality 283 mOsm/kg of the finished batch). Limits chosen so that the edge is exact in binary.
 */
class BatchAgreementTest {

    private static final BatchAnalysis RECORD = record();

    private static BatchAnalysis record() {
        String path = "/rule-examples/batch-diagnosis/quiet.json";
        try (InputStream in = BatchAgreementTest.class.getResourceAsStream(path)) {
            var doc = new JsonReader().read("batch.json", in.readAllBytes());
            var r = new BatchRecordReader(Analyses.SCHEMAS).read(doc, Optional.empty(), Optional.empty());
            return new BatchAnalyzer(Analyses.LIBRARY, new Analyzer(new Equilibrium(Davies.INSTANCE))).analyze(r);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static BatchAnalysis observed(Observation... obs) {
        BatchAnalysis b = RECORD;
        return new BatchAnalysis(b.record(), b.master(), b.scale(), b.additions(), List.of(obs), b.candidates(),
                b.specifiedPh(), b.asMade(), b.caveats());
    }

    private static BatchAnalysis specified(SpecifiedPh... p) {
        BatchAnalysis b = RECORD;
        return new BatchAnalysis(b.record(), b.master(), b.scale(), b.additions(), b.observations(), b.candidates(),
                List.of(p), b.asMade(), b.caveats());
    }

    private static Observation pH(double measured, double predicted, double beta) {
        return new Observation(Observation.Kind.PH, "pH after adjustment", measured, predicted, "/measurements/1",
                Optional.empty(), beta);
    }

    private static Observation titrant(double measured, double predicted) {
        return new Observation(Observation.Kind.TITRANT, "sodium hydroxide at step 5", measured, predicted,
                "/additions/3/amount", Optional.empty());
    }

    private static Observation osmolality(double measured, double predicted) {
        return new Observation(Observation.Kind.OSMOLALITY, "osmolality at step 6", measured, predicted,
                "/measurements/2", Optional.empty());
    }

    private static List<Finding> agree(BatchMeasurementAgrees kind, BatchAnalysis b, String parameters) {
        return kind.check(b, Analyses.rule(kind.id(), parameters));
    }

    private static List<String> messages(List<Finding> f) {
        return f.stream().map(Finding::message).toList();
    }

    // ---- batch-ph-agrees ----

    @Test
    void aPHDifferenceAtTheLimitAgreesAndJustBeyondDoesNot() {
        var k = new BatchMeasurementAgrees.Ph();
        String p = "{\"maxDifference\": 0.125}";
        assertEquals(List.of(), agree(k, observed(pH(7.25, 7.125, 50)), p));
        assertEquals(List.of(), agree(k, observed(pH(7.0, 7.125, 50)), p));
        assertEquals(1, agree(k, observed(pH(7.26, 7.125, 50)), p).size());
        List<Finding> f = agree(k, observed(pH(7.375, 7.125, 50)), p);
        assertEquals(List.of("/measurements/1"), f.stream().map(x -> x.pointer().orElseThrow()).toList());
        assertEquals(List.of("pH after adjustment: measured pH 7.38, the additions as recorded give pH 7.13 (+0.25; "
                + "limit 0.13)"), messages(f));
        assertEquals(Severity.WARNING, f.get(0).severity());
        assertEquals(1, agree(k, observed(pH(6.99, 7.125, 50)), p).size());
        // default 0.1
        assertEquals(1, agree(k, observed(pH(7.25, 7.125, 50)), "{}").size());
    }

    @Test
    void aTraceLoadOverAWeakBufferWidensTheLimit() {
        // 0.2 mmol/kg of acid or base over β 1.25 mmol/kg per pH moves the pH by 0.16 (common practice)
        var k = new BatchMeasurementAgrees.Ph();
        assertEquals(List.of(), agree(k, observed(pH(7.25, 7.125, 1.25)), "{}"));
        assertTrue(messages(agree(k, observed(pH(7.375, 7.125, 1.25)), "{}")).get(0).endsWith("; limit 0.16)"));
        assertEquals(List.of(), agree(k, observed(pH(7.25, 7.0, 1.25)), "{\"traceLoad\": 0.4}"));
        assertEquals(1, agree(k, observed(pH(7.25, 7.0, 1.25)), "{}").size());
        // over a strong buffer the rule's own limit stands
        assertEquals(1, agree(k, observed(pH(7.25, 7.125, 4)), "{}").size());
    }

    @Test
    void anUnbufferedReadingIsANoteAndOnlyBeyondTheRulesOwnLimit() {
        var k = new BatchMeasurementAgrees.Ph();
        List<Finding> f = agree(k, observed(pH(5.9, 7.08, 0.4)), "{}");
        assertEquals(Severity.NOTE, f.get(0).severity());
        assertEquals("pH after adjustment: measured pH 5.90, the additions as recorded give pH 7.08 (-1.18), not "
                + "compared: the solution is unbuffered there (β 0.40 mmol/kg per pH, below 1.0), so traces of acid or "
                + "base in the materials and dissolved CO2 set the reading, not the recorded additions",
                f.get(0).message());
        assertEquals("/measurements/1", f.get(0).pointer().orElseThrow());
        assertEquals(List.of(), agree(k, observed(pH(7.25, 7.125, 0.4)), "{\"maxDifference\": 0.125}"));
        assertEquals(1, agree(k, observed(pH(7.26, 7.125, 0.4)), "{\"maxDifference\": 0.125}").size());
        // at β 0.4 and a threshold of 0.3 the reading is compared, as a warning
        assertEquals(Severity.WARNING, agree(k, observed(pH(5.9, 7.08, 0.4)), "{\"unbufferedBelow\": 0.3}").get(0)
                .severity());
    }

    @Test
    void beyondErrorBeyondTheFindingIsAnErrorWhateverTheRulesSeverity() {
        var k = new BatchMeasurementAgrees.Ph();
        String p = "{\"errorBeyond\": 0.5}";
        Finding at = agree(k, observed(pH(7.625, 7.125, 50)), p).get(0);
        assertEquals(Severity.WARNING, at.severity());
        assertTrue(!at.message().contains("beyond"), at.message());
        for (double measured : new double[] {7.63, 6.62}) {
            Finding over = agree(k, observed(pH(measured, 7.125, 50)), p).get(0);
            assertEquals(Severity.ERROR, over.severity());
            assertTrue(over.message().endsWith("; beyond 0.50, more than the model and the instrument can explain"),
                    over.message());
        }
        Rule error = new Rule("e", k.id(), Analyses.rule(k.id(), p).parameters(), Severity.ERROR, true, "s", "e",
                Optional.empty(), Optional.empty(), List.of(), "p");
        assertEquals(Severity.ERROR, k.check(observed(pH(7.63, 7.125, 50)), error).get(0).severity());
    }

    @Test
    void aReadingWithoutAPredictionOrOfAnotherKindIsNotJudgedHere() {
        var k = new BatchMeasurementAgrees.Ph();
        assertEquals(List.of(), agree(k, observed(pH(9, Double.NaN, 50), osmolality(400, 280), titrant(90, 50)),
                "{}"));
    }

    // ---- batch-titrant-agrees and batch-osmolality-agrees ----

    @Test
    void aTitrantVolumeAtItsPercentLimitAgreesAndJustBeyondDoesNot() {
        var k = new BatchMeasurementAgrees.Titrant();
        String p = "{\"maxDifference\": 25}";
        assertEquals(List.of(), agree(k, observed(titrant(100, 80)), p));
        assertEquals(List.of(), agree(k, observed(titrant(60, 80)), p));
        assertEquals(List.of("sodium hydroxide at step 5: measured 101 mL, the additions as recorded give 80.0 mL "
                + "(+26 %; limit 25 %)"), messages(agree(k, observed(titrant(101, 80)), p)));
        assertEquals(1, agree(k, observed(titrant(59, 80)), p).size());
        // default 10 %
        assertEquals(1, agree(k, observed(titrant(100, 80)), "{}").size());
        assertEquals(List.of(), agree(k, observed(titrant(84, 80), pH(9, 7, 50)), "{}"));
    }

    @Test
    void aTitrantBeyondErrorBeyondPerCentIsAnError() {
        var k = new BatchMeasurementAgrees.Titrant();
        String p = "{\"errorBeyond\": 50}";
        assertEquals(Severity.WARNING, agree(k, observed(titrant(120, 80)), p).get(0).severity());
        Finding over = agree(k, observed(titrant(121, 80)), p).get(0);
        assertEquals(Severity.ERROR, over.severity());
        assertTrue(over.message().endsWith("(+51 %; limit 10 %); beyond 50 %, more than the model and the instrument "
                + "can explain"), over.message());
        assertEquals(Severity.ERROR, agree(k, observed(titrant(39, 80)), p).get(0).severity());
    }

    @Test
    void anOsmolalityAtItsPercentLimitAgreesAndJustBeyondDoesNot() {
        var k = new BatchMeasurementAgrees.Osmolality();
        String p = "{\"maxDifference\": 25}";
        assertEquals(List.of(), agree(k, observed(osmolality(500, 400)), p));
        assertEquals(List.of("osmolality at step 6: measured 501 mOsm/kg, the additions as recorded give 400 mOsm/kg "
                + "(+25 %; limit 25 %)"), messages(agree(k, observed(osmolality(501, 400)), p)));
        assertEquals(1, agree(k, observed(osmolality(299, 400)), p).size());
    }

    @Test
    void eachKindSaysWhatItCompares() {
        assertTrue(new BatchMeasurementAgrees.Ph().summary().contains("pH reading"));
        assertTrue(new BatchMeasurementAgrees.Titrant().summary().contains("titrant"));
        assertTrue(new BatchMeasurementAgrees.Osmolality().summary().contains("osmolality"));
    }

    // ---- batch-out-of-specification ----

    private static SpecifiedPh reading(double measured, double min, double max, double shift) {
        return new SpecifiedPh("pH at step 5", measured, min, max, 293.15, shift, "/measurements/1", Optional.empty());
    }

    private static List<Finding> spec(BatchAnalysis b, String parameters, Rule... selection) {
        return new BatchOutOfSpecification().check(b, Analyses.rule("batch-out-of-specification", parameters),
                List.of(selection));
    }

    private static final String ACTION = "; the batch as measured does not meet its specification: the reviewer must "
            + "open an out-of-specification investigation per local procedure before any decision on the batch (this "
            + "finding is a decision aid, not a release decision)";

    @Test
    void aPHAtTheEdgeOfTheTargetMeetsItAndJustBeyondDoesNot() {
        assertEquals(List.of(), spec(specified(reading(7.3, 7.1, 7.3, 0), reading(7.1, 7.1, 7.3, 0)), "{}"));
        List<Finding> f = spec(specified(reading(7.31, 7.1, 7.3, 0)), "{}");
        assertEquals(List.of("/measurements/1"), f.stream().map(x -> x.pointer().orElseThrow()).toList());
        assertEquals("pH at step 5: measured pH 7.31, outside 7.10–7.30 (the master's pH target 7.10–7.30 at 20.0 °C)"
                + ACTION, f.get(0).message());
        assertEquals(1, spec(specified(reading(7.09, 7.1, 7.3, 0)), "{}").size());
    }

    @Test
    void aTargetMovedToTheReadingsTemperatureSaysByHowMuch() {
        // target 7.10–7.30 at 20 °C, moved by −0.05 to the reading's temperature: 7.05–7.25
        String m = spec(specified(reading(7.28, 7.05, 7.25, -0.05)), "{}").get(0).message();
        assertTrue(m.startsWith("pH at step 5: measured pH 7.28, outside 7.05–7.25 (the master's pH target 7.10–7.30 "
                + "at 20.0 °C, moved by -0.050 to this temperature by the drift predicted for the batch)"), m);
        assertEquals(List.of(), spec(specified(reading(7.25, 7.05, 7.25, -0.05)), "{}"));
    }

    @Test
    void anOpenEndedTargetAndAnUnjudgedReading() {
        assertTrue(spec(specified(reading(7.5, Double.NEGATIVE_INFINITY, 7.3, 0)), "{}").get(0).message()
                .contains("outside ≤ 7.30"));
        assertTrue(spec(specified(reading(7.0, 7.1, Double.POSITIVE_INFINITY, 0)), "{}").get(0).message()
                .contains("outside ≥ 7.10"));
        SpecifiedPh unjudged = new SpecifiedPh("pH at step 5", 9, 7.1, 7.3, 310.15, 0, "/measurements/1",
                Optional.of("the drift to 37 °C cannot be predicted"));
        assertEquals(List.of(), spec(specified(unjudged), "{}"));
    }

    @Test
    void theOsmolalityOfTheFinishedBatchIsHeldToTheRulesOwnRange() {
        // the record measured 283 mOsm/kg at step 6, after the last addition
        assertEquals(List.of(), spec(specified(), "{\"osmolality\": {\"min\": 283, \"max\": 283}}"));
        List<Finding> high = spec(specified(), "{\"osmolality\": {\"min\": 270, \"max\": 282}}");
        assertEquals(List.of("/measurements/2"), high.stream().map(x -> x.pointer().orElseThrow()).toList());
        assertEquals("osmolality at step 6: measured 283 mOsm/kg, outside the specification 270–282 mOsm/kg" + ACTION,
                high.get(0).message());
        assertTrue(spec(specified(), "{\"osmolality\": {\"min\": 284}}").get(0).message()
                .contains("outside the specification ≥ 284 mOsm/kg"));
        assertTrue(spec(specified(), "{\"osmolality\": {\"max\": 280}}").get(0).message()
                .contains("outside the specification 0–280 mOsm/kg"));
    }

    @Test
    void withoutItsOwnRangeTheLastEnabledOsmolalityRuleOfTheSelectionIsTheSpecification() {
        Rule wide = Analyses.rule("osmolality-range", "{\"min\": 260, \"max\": 340}");
        Rule narrow = Analyses.rule("osmolality-range", "{\"min\": 290, \"max\": 310}");
        Rule off = new Rule(narrow.id(), narrow.check(), narrow.parameters(), narrow.severity(), false,
                narrow.summary(), narrow.explanation(), narrow.remedy(), narrow.safety(), narrow.references(),
                narrow.pack());
        Rule other = Analyses.rule("ph-within-limits", "{\"min\": 290, \"max\": 310}");
        assertEquals(List.of(), spec(specified(), "{}"), "no range at all: nothing to hold it to");
        assertEquals(List.of(), spec(specified(), "{}", narrow, wide));
        assertTrue(spec(specified(), "{}", wide, narrow).get(0).message().contains("290–310 mOsm/kg"));
        assertEquals(List.of(), spec(specified(), "{}", wide, off));
        assertEquals(List.of(), spec(specified(), "{}", other));
        assertEquals(List.of(), spec(specified(), "{\"osmolality\": {\"min\": 260, \"max\": 340}}", narrow),
                "the rule's own range comes first");
        assertEquals(List.of(), new BatchOutOfSpecification().check(specified(), Analyses.rule(
                "batch-out-of-specification", "{}")), "judged alone, with no selection");
        assertEquals(1, new BatchOutOfSpecification().check(specified(), Analyses.rule("batch-out-of-specification",
                "{\"osmolality\": {\"max\": 280}}")).size(), "judged alone, its own range still holds");
    }

    // ---- batch-amount-tolerance ----

    /** The record's sodium chloride line (step 1), with the moles and match set; {@code lineTolerance} its own. */
    private static BatchAnalysis amounts(BatchAnalysis.Match match, double expected, double actual,
                                         Optional<Double> lineTolerance) {
        BatchAnalysis.AdditionCheck c = RECORD.additions().stream().filter(x -> x.addition().isPresent()
                && x.addition().get().step() == 1).findFirst().orElseThrow();
        BatchAnalysis.AdditionCheck set = new BatchAnalysis.AdditionCheck(match, c.line(), c.addition(), c.expected(),
                c.used(), expected, actual, lineTolerance);
        BatchAnalysis b = RECORD;
        return new BatchAnalysis(b.record(), b.master(), b.scale(), List.of(set), b.observations(), b.candidates(),
                b.specifiedPh(), b.asMade(), b.caveats());
    }

    private static List<Finding> tolerance(BatchAnalysis b, String parameters) {
        return new BatchAmountTolerance().check(b, Analyses.rule("batch-amount-tolerance", parameters));
    }

    @Test
    void anAmountAtItsToleranceIsWithinAndJustBeyondIsNot() {
        String p = "{\"tolerance\": 25}";
        assertEquals(List.of(), tolerance(amounts(BatchAnalysis.Match.SAME, 0.5, 0.625, Optional.empty()), p));
        assertEquals(List.of(), tolerance(amounts(BatchAnalysis.Match.SAME, 0.5, 0.375, Optional.empty()), p));
        List<Finding> f = tolerance(amounts(BatchAnalysis.Match.SAME, 0.5, 0.626, Optional.empty()), p);
        assertEquals(List.of("/additions/0/amount"), f.stream().map(x -> x.pointer().orElseThrow()).toList());
        assertEquals("sodium chloride at step 1: 70.1 g recorded is 626.0 mmol after the certificate corrections, "
                + "+25.2 % against the 500.0 mmol the master gives for this batch (tolerance ±25 %)", f.get(0).message());
        assertEquals(1, tolerance(amounts(BatchAnalysis.Match.OTHER_FORM, 0.5, 0.374, Optional.empty()), p).size());
        // default 2 %
        assertEquals(1, tolerance(amounts(BatchAnalysis.Match.SAME, 0.5, 0.52, Optional.empty()), "{}").size());
    }

    @Test
    void theMasterLinesOwnToleranceComesFirst() {
        List<Finding> f = tolerance(amounts(BatchAnalysis.Match.SAME, 0.5, 0.51, Optional.of(0.01)), "{\"tolerance\": 25}");
        assertTrue(f.get(0).message().endsWith("(tolerance ±1 %)"), f.get(0).message());
    }

    @Test
    void onlyAnAdditionOfTheMastersLineIsHeldToItsAmount() {
        for (BatchAnalysis.Match m : List.of(BatchAnalysis.Match.EXTRA, BatchAnalysis.Match.MISSING,
                BatchAnalysis.Match.TITRANT)) {
            assertEquals(List.of(), tolerance(amounts(m, 0.5, 5, Optional.empty()), "{}"), m.toString());
        }
    }

    // ---- batch-additions-match ----

    private static List<Finding> additions(BatchAnalysis.AdditionCheck... c) {
        BatchAnalysis b = RECORD;
        return new BatchAdditionsMatch().check(new BatchAnalysis(b.record(), b.master(), b.scale(), List.of(c),
                b.observations(), b.candidates(), b.specifiedPh(), b.asMade(), b.caveats()),
                Analyses.rule("batch-additions-match", "{}"));
    }

    private static BatchAnalysis.AdditionCheck step(int step, BatchAnalysis.Match match, boolean added, double expected,
                                                    double actual) {
        BatchAnalysis.AdditionCheck c = RECORD.additions().stream().filter(x -> x.addition().isPresent()
                && x.addition().get().step() == step).findFirst().orElseThrow();
        return new BatchAnalysis.AdditionCheck(match, c.line(), added ? c.addition() : Optional.empty(), c.expected(),
                c.used(), expected, actual, c.tolerance());
    }

    @Test
    void eachKindOfMismatchIsNamedAtItsPlace() {
        assertEquals(List.of(), additions(step(1, BatchAnalysis.Match.SAME, true, 1, 2)));
        assertEquals(List.of("sodium chloride (master line 3) has no addition in the record"),
                messages(additions(step(1, BatchAnalysis.Match.MISSING, false, 1, 0))));
        List<Finding> extra = additions(step(1, BatchAnalysis.Match.EXTRA, true, 0, 1));
        assertEquals("/additions/0/substance", extra.get(0).pointer().orElseThrow());
        assertEquals("sodium chloride at step 1 is not in master EX-BATCH-DIAGNOSIS-MASTER", extra.get(0).message());
        assertEquals(List.of("the master's q.s. titrant sodium hydroxide has no recorded addition"),
                messages(additions(step(5, BatchAnalysis.Match.TITRANT, false, 0, 0))));
        assertEquals(List.of(), additions(step(5, BatchAnalysis.Match.TITRANT, true, 0, 0)));
    }

    @Test
    void anotherFormSaysWhetherTheAmountWasRecalculated() {
        assertEquals(List.of("step 1 used sodium chloride where the master names sodium chloride; the amount was "
                + "recalculated to the same moles"), messages(additions(step(1, BatchAnalysis.Match.OTHER_FORM, true,
                0.5, 0.5024))));
        assertEquals(List.of("step 1 used sodium chloride where the master names sodium chloride; that is -0.6 % of "
                + "the moles the master gives"), messages(additions(step(1, BatchAnalysis.Match.OTHER_FORM, true, 0.5,
                0.497))));
    }
}
