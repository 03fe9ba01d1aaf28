package org.protolyte.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.protolyte.analysis.Analyzer;
import org.protolyte.batch.BatchAnalysis;
import org.protolyte.batch.BatchAnalysis.Candidate;
import org.protolyte.batch.BatchAnalysis.Further;
import org.protolyte.batch.BatchAnalysis.Observation;
import org.protolyte.batch.BatchAnalyzer;
import org.protolyte.batch.BatchRecordReader;
import org.protolyte.chemistry.Davies;
import org.protolyte.chemistry.Equilibrium;
import org.protolyte.document.JsonReader;

/**
 * batch-diagnosis on hand-set observations and candidates: a real record (so pointers resolve) whose measurements,
 * predictions and usual mistakes the test states, so each case sits just inside or outside a limit.
 */
class BatchDiagnosisTest {

    private static final BatchAnalysis RECORD = record();

    private static BatchAnalysis record() {
        String path = "/rule-examples/batch-diagnosis/quiet.json";
        try (InputStream in = BatchDiagnosisTest.class.getResourceAsStream(path)) {
            var doc = new JsonReader().read("batch.json", in.readAllBytes());
            var r = new BatchRecordReader(Analyses.SCHEMAS).read(doc, Optional.empty(), Optional.empty());
            return new BatchAnalyzer(Analyses.LIBRARY, new Analyzer(new Equilibrium(Davies.INSTANCE))).analyze(r);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The record with these observations; the first candidate is the batch as recorded, the others mistakes. */
    private static BatchAnalysis with(List<Observation> obs, Candidate... candidates) {
        BatchAnalysis b = RECORD;
        return new BatchAnalysis(b.record(), b.master(), b.scale(), b.additions(), obs, List.of(candidates),
                b.specifiedPh(), b.asMade(), b.caveats());
    }

    private static Observation pH(String pointer, double measured, double predicted, double beta) {
        return new Observation(Observation.Kind.PH, "pH at step 1", measured, predicted, pointer, Optional.empty(),
                beta);
    }

    private static Observation osmolality(double measured, double predicted) {
        return new Observation(Observation.Kind.OSMOLALITY, "osmolality", measured, predicted, "/measurements/2",
                Optional.empty());
    }

    private static Candidate candidate(String cause, double... predicted) {
        return new Candidate(cause, predicted, List.of(), Optional.empty());
    }

    private static final Candidate RECORDED = candidate("as recorded", 7.08, 283);

    private static List<Finding> diagnose(BatchAnalysis b, String parameters, Rule... selection) {
        Rule rule = Analyses.rule("batch-diagnosis", parameters);
        return new BatchDiagnosis().check(b, rule, List.of(selection));
    }

    @Test
    void anUnbufferedReadingThatIsOnlyANoteCallsForNoDiagnosis() {
        // β 0.4 mmol/kg per pH, below the default 1 of batch-ph-agrees: that rule reports the 1.18 difference as a note
        BatchAnalysis b = with(List.of(pH("/measurements/0", 5.90, 7.08, 0.4), osmolality(283, 283)), RECORDED,
                candidate("sodium chloride left out", 7.10, 20));
        assertEquals(List.of(), diagnose(b, "{}"));
        Rule agrees = Analyses.rule("batch-ph-agrees", "{}");
        assertEquals(Severity.NOTE, new BatchMeasurementAgrees.Ph().check(b, agrees).get(0).severity());
    }

    @Test
    void aReadingJustAboveTheUnbufferedThresholdIsDiagnosed() {
        // at β = 1.0 the reading is compared, with the limit widened to 0.2 / β = 0.2 (trace load, common practice)
        Candidate fits = candidate("sodium chloride left out", 6.90, 283);
        BatchAnalysis off = with(List.of(pH("/measurements/0", 6.85, 7.08, 1.0), osmolality(283, 283)), RECORDED, fits);
        List<Finding> f = diagnose(off, "{}");
        assertEquals(1, f.size());
        assertEquals("/measurements/0", f.get(0).pointer().orElseThrow());
        assertTrue(f.get(0).message().contains("consistent with, best fit first: 1. sodium chloride left out"),
                f.get(0).message());
        // 0.15 from the prediction: beyond the rule's own 0.1 but within what a trace load moves at β 1.0
        BatchAnalysis within = with(List.of(pH("/measurements/0", 6.93, 7.08, 1.0), osmolality(283, 283)), RECORDED,
                fits);
        assertEquals(List.of(), diagnose(within, "{}"));
    }

    @Test
    void theThresholdIsThatOfTheSelectedPhRule() {
        BatchAnalysis b = with(List.of(pH("/measurements/0", 5.90, 7.08, 0.4), osmolality(283, 283)), RECORDED,
                candidate("sodium chloride left out", 5.95, 283));
        Rule site = Analyses.rule("batch-ph-agrees", "{\"unbufferedBelow\": 0.3, \"traceLoad\": 0.01}");
        List<Finding> f = diagnose(b, "{}", site);
        assertEquals(1, f.size(), "at β 0.4, above the site's 0.3, the reading is compared");
        assertTrue(f.get(0).message().contains("consistent with, best fit first: 1. sodium chloride left out"),
                f.get(0).message());
        Rule disabled = new Rule(site.id(), site.check(), site.parameters(), site.severity(), false, site.summary(),
                site.explanation(), site.remedy(), site.safety(), site.references(), site.pack());
        assertEquals(List.of(), diagnose(b, "{}", disabled), "a disabled rule sets nothing: the default 1 applies");
    }

    @Test
    void anUnbufferedReadingDoesNotRuleOutTheMistakeTheOtherMeasurementsShow() {
        // the osmolality is 10 % low; the candidate gives it and, like the record, about 7 for the unbuffered saline
        BatchAnalysis b = with(List.of(pH("/measurements/0", 5.90, 7.08, 0.4), osmolality(255, 283)), RECORDED,
                candidate("sodium chloride at a tenth of its amount", 7.09, 256));
        List<Finding> f = diagnose(b, "{}");
        assertEquals(1, f.size());
        assertEquals("/measurements/2", f.get(0).pointer().orElseThrow(), "the finding sits at the reading that misses");
        assertTrue(f.get(0).message().contains("; consistent with sodium chloride at a tenth of its amount (gives "
                + "7.09 and 256 mOsm/kg)"), f.get(0).message());
    }

    @Test
    void aFurtherMeasurementIsNamedOnlyWhereItsPredictionsDifferByMoreThanItsLimit() {
        List<Observation> one = List.of(osmolality(255, 283));
        Candidate a = new Candidate("a", new double[] {256}, List.of(new Further(Observation.Kind.PH, "pH at the end",
                OptionalDouble.of(7.00))), Optional.empty());
        Candidate b = new Candidate("b", new double[] {254}, List.of(new Further(Observation.Kind.PH, "pH at the end",
                OptionalDouble.of(7.25))), Optional.empty());
        Candidate near = new Candidate("b", new double[] {254}, List.of(new Further(Observation.Kind.PH,
                "pH at the end", OptionalDouble.of(7.09))), Optional.empty());
        Candidate recorded = candidate("as recorded", 283);
        String apart = diagnose(with(one, recorded, a, b), "{}").get(0).message();
        assertTrue(apart.endsWith("consistent with each of (one observation cannot rank them): a (gives 256 mOsm/kg); "
                + "b (gives 254 mOsm/kg); the pH at the end would tell them apart (7.00, 7.25, in the order above)"),
                apart);
        // 0.09 apart, within the 0.1 a pH reading is good for
        String not = diagnose(with(one, recorded, a, near), "{}").get(0).message();
        assertTrue(not.endsWith("; no further measurement in reach tells them apart"), not);
    }

    @Test
    void aMissAtTheDiagnosisLimitIsNoneAndACandidateAtItFits() {
        // pH 0.125 from the prediction, limit 0.125: no miss; 0.135: a miss, and a candidate 0.125 off still fits
        String p = "{\"pH\": 0.125}";
        Candidate near = candidate("sodium chloride left out", 7.125, 283);
        assertEquals(List.of(), diagnose(with(List.of(pH("/measurements/1", 7.25, 7.125, 50), osmolality(283, 283)),
                candidate("as recorded", 7.125, 283), near), p));
        List<Finding> f = diagnose(with(List.of(pH("/measurements/1", 7.25, 7.0, 50), osmolality(283, 283)),
                candidate("as recorded", 7.0, 283), near), p);
        assertTrue(f.get(0).message().contains("best fit first: 1. sodium chloride left out"), f.get(0).message());
        List<Finding> none = diagnose(with(List.of(pH("/measurements/1", 7.25, 7.0, 50), osmolality(283, 283)),
                candidate("as recorded", 7.0, 283), candidate("far", 7.124, 283)), p);
        assertTrue(none.get(0).message().contains("; none of the usual mistakes"), none.get(0).message());
    }

    @Test
    void candidatesAreRankedBySquaredDifferenceOverTheLimit() {
        // a: pH 0.09 below (z 0.9), osmolality 0.1 % above (z 0.03): 0.81; b: pH 0.05 above (z 0.5), osmolality 2 %
        // above (z 0.67): 0.69, so b fits best although a is listed first and is the closer in pH
        List<Observation> obs = List.of(pH("/measurements/1", 7.10, 7.5, 50), osmolality(283, 250));
        Candidate a = candidate("a", 7.01, 283 * 1.001);
        Candidate b = candidate("b", 7.15, 283 * 1.02);
        String m = diagnose(with(obs, candidate("as recorded", 7.5, 250), a, b), "{}").get(0).message();
        assertTrue(m.contains("; consistent with, best fit first: 1. b (gives 7.15 and 289 mOsm/kg); 2. a (gives 7.01 "
                + "and 283 mOsm/kg)"), m);
        assertTrue(m.startsWith("measured pH at step 1 7.10 and osmolality 283 mOsm/kg; the additions as recorded give "
                + "7.50 and 250 mOsm/kg; "), m);
    }

    @Test
    void aMistakeThatCouldNotBePredictedIsNamedAsNotJudged() {
        List<Observation> obs = List.of(osmolality(255, 283));
        Candidate fits = candidate("sodium chloride at a tenth", 256);
        Candidate lost = new Candidate("no titrant", new double[] {Double.NaN}, List.of(), Optional.of("no solution"));
        Candidate lost2 = new Candidate("twice the titrant", new double[] {Double.NaN}, List.of(),
                Optional.of("no convergence"));
        String m = diagnose(with(obs, candidate("as recorded", 283), fits, lost, lost2), "{}").get(0).message();
        assertTrue(m.endsWith("; consistent with sodium chloride at a tenth (gives 256 mOsm/kg); 2 of the usual "
                + "mistakes could not be predicted and are not judged: no titrant (no solution); twice the titrant"), m);
        String all = diagnose(with(obs, candidate("as recorded", 283), fits), "{}").get(0).message();
        assertTrue(!all.contains("could not be predicted"), all);
    }

    @Test
    void aTitrantVolumeMissesBeyondItsPerCentOfThePrediction() {
        // 5.0 mL against 4.0 is 25 % off: at a limit of 25 % no miss, beyond the default 10 % a miss; a candidate
        // fits within 10 % of the measured 5.0 mL
        Observation t5 = new Observation(Observation.Kind.TITRANT, "sodium hydroxide", 5.0, 4.0, "/additions/3/amount",
                Optional.empty());
        assertEquals(List.of(), diagnose(with(List.of(t5), candidate("as recorded", 4.0), candidate("x", 5.0)),
                "{\"titrant\": 25}"));
        String m = diagnose(with(List.of(t5), candidate("as recorded", 4.0), candidate("stock at 4/5 strength", 5.45),
                candidate("far", 5.6)), "{}").get(0).message();
        assertTrue(m.endsWith("; consistent with stock at 4/5 strength (gives 5.45 mL)"), m);
        assertEquals(List.of(), diagnose(with(List.of(t5), candidate("as recorded", 4.0), candidate("x", 5.0)),
                "{\"titrant\": 30}"));
    }

    @Test
    void judgedAloneTheDefaultsOfBatchPhAgreesApply() {
        BatchAnalysis b = with(List.of(pH("/measurements/0", 5.90, 7.08, 0.4), osmolality(255, 283)), RECORDED,
                candidate("sodium chloride at a tenth of its amount", 7.09, 256));
        Rule rule = Analyses.rule("batch-diagnosis", "{}");
        assertEquals(new BatchDiagnosis().check(b, rule, List.of()), new BatchDiagnosis().check(b, rule));
        assertEquals(1, new BatchDiagnosis().check(b, rule).size());
    }

    private static Candidate further(String cause, double osmolality, double... pH) {
        List<Further> f = new java.util.ArrayList<>();
        for (int i = 0; i < pH.length; i++) {
            f.add(new Further(Observation.Kind.PH, "pH " + (i + 1), OptionalDouble.of(pH[i])));
        }
        return new Candidate(cause, new double[] {osmolality}, f, Optional.empty());
    }

    @Test
    void ofFurtherMeasurementsThatTellApartEquallyWellTheFirstIsNamed() {
        List<Observation> one = List.of(osmolality(255, 283));
        String m = diagnose(with(one, candidate("as recorded", 283), further("a", 256, 7.0, 7.5),
                further("b", 254, 7.5, 7.0)), "{}").get(0).message();
        assertTrue(m.endsWith("; the pH 1 would tell them apart (7.00, 7.50, in the order above)"), m);
    }

    @Test
    void aSpreadOfExactlyTheLimitDoesNotTellThemApart() {
        // 7.00 and 7.25 with a pH limit of 0.25: a reading cannot tell values one limit apart
        List<Observation> one = List.of(osmolality(255, 283));
        String m = diagnose(with(one, candidate("as recorded", 283), further("a", 256, 7.0), further("b", 254, 7.25)),
                "{\"pH\": 0.25}").get(0).message();
        assertTrue(m.endsWith("; no further measurement in reach tells them apart"), m);
        String wider = diagnose(with(one, candidate("as recorded", 283), further("a", 256, 7.0), further("b", 254,
                7.26)), "{\"pH\": 0.25}").get(0).message();
        assertTrue(wider.endsWith("; the pH 1 would tell them apart (7.00, 7.26, in the order above)"), wider);
    }
}
