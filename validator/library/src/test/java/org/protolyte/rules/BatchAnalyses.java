package org.protolyte.rules;

import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Optional;

import org.protolyte.batch.BatchAnalysis;
import org.protolyte.batch.BatchRecord;
import org.protolyte.batch.BatchRecordReader;
import org.protolyte.document.JsonReader;
import org.protolyte.recipe.RecipeResolver;

/**
 * Hand-built batch analyses for testing one batch check kind on its own: a batch record is read (so its pointers and
 * places in the text are real) and its master resolved, and what a check judges (the observations with their
 * predictions, the candidates, the pH readings with their specification) is then set by the test, not computed, so a
 * test states the numbers on either side of a limit and no chemistry stands between them and the check.
 */
final class BatchAnalyses {

    /**
     * A 1 L acetate buffer at 20 °C made as a 2 L batch: /additions/0 and /additions/1 the two weighings, and
     * /measurements/0 a pH at step 2 (4.80 at 20 °C), /measurements/1 an osmolality at step 2 (30 mOsm/kg).
     */
    static final String RECORD = "{\"document\": \"batch-record\", \"formatVersion\": 1, \"id\": \"TST-BR\","
            + " \"batch\": \"T1\", \"master\": {\"formulation\": {\"document\": \"formulation\", \"formatVersion\": 1,"
            + " \"id\": \"TST-ACE\", \"revision\": \"A\", \"basis\": {\"finalVolume\": \"1 L\"}, \"components\": ["
            + "{\"substance\": \"sodium acetate anhydrous\", \"amount\": \"0.82 g\"},"
            + " {\"substance\": \"acetic acid\", \"amount\": \"0.60 g\"}],"
            + " \"conditions\": [{\"name\": \"storage\", \"temperature\": \"20 Cel\"}]}}, \"batchSize\": \"2 L\","
            + " \"additions\": [{\"step\": 1, \"substance\": \"sodium acetate anhydrous\", \"amount\": \"1.64 g\"},"
            + " {\"step\": 2, \"substance\": \"acetic acid\", \"amount\": \"1.20 g\"}],"
            + " \"measurements\": [{\"step\": 2, \"quantity\": \"pH\", \"value\": 4.80, \"temperature\": \"20 Cel\"},"
            + " {\"step\": 2, \"quantity\": \"osmolality\", \"value\": 30}]}";

    private BatchAnalyses() {
    }

    /** The record above as read, with nothing compared yet: no additions checked, no observations, no candidates. */
    static BatchAnalysis batch() {
        var doc = new JsonReader().read("record.json", RECORD.getBytes(StandardCharsets.UTF_8));
        BatchRecord r = new BatchRecordReader(Analyses.SCHEMAS).read(doc, Optional.empty(), Optional.empty());
        return new BatchAnalysis(r, new RecipeResolver(Analyses.LIBRARY).resolve(r.master()),
                r.batchSize() / r.master().basis().amount(), List.of(), List.of(), List.of(), List.of(),
                Optional.empty(), List.of());
    }

    static BatchAnalysis observations(BatchAnalysis b, BatchAnalysis.Observation... observations) {
        return new BatchAnalysis(b.record(), b.master(), b.scale(), b.additions(), List.of(observations),
                b.candidates(), b.specifiedPh(), b.asMade(), b.caveats());
    }

    /** The candidates, "as recorded" first (as the analyzer gives them), each with one prediction per observation. */
    static BatchAnalysis candidates(BatchAnalysis b, BatchAnalysis.Candidate... candidates) {
        return new BatchAnalysis(b.record(), b.master(), b.scale(), b.additions(), b.observations(),
                List.of(candidates), b.specifiedPh(), b.asMade(), b.caveats());
    }

    static BatchAnalysis specifiedPh(BatchAnalysis b, BatchAnalysis.SpecifiedPh... readings) {
        return new BatchAnalysis(b.record(), b.master(), b.scale(), b.additions(), b.observations(), b.candidates(),
                List.of(readings), b.asMade(), b.caveats());
    }

    // --- one observation, one candidate, one reading against its target ---------------------------------------

    /** The pH reading /measurements/0 and its prediction, at a predicted buffer capacity β (mmol/kg per pH). */
    static BatchAnalysis.Observation pH(double measured, double predicted, double beta) {
        return new BatchAnalysis.Observation(BatchAnalysis.Observation.Kind.PH, "pH at step 2 (20.0 °C)", measured,
                predicted, "/measurements/0", Optional.empty(), beta);
    }

    /** The osmolality reading /measurements/1 (mOsm/kg) and its prediction. */
    static BatchAnalysis.Observation osmolality(double measured, double predicted) {
        return new BatchAnalysis.Observation(BatchAnalysis.Observation.Kind.OSMOLALITY, "osmolality at step 2",
                measured, predicted, "/measurements/1", Optional.empty());
    }

    /** A usual mistake whose predictions are all computed. */
    static BatchAnalysis.Candidate candidate(String cause, double... predicted) {
        return new BatchAnalysis.Candidate(cause, predicted, List.of(), Optional.empty());
    }

    /** The pH reading /measurements/0 against a target of min–max at its own temperature, 20 °C. */
    static BatchAnalysis.SpecifiedPh target(double measured, double min, double max) {
        return new BatchAnalysis.SpecifiedPh("pH at step 2 (20.0 °C)", measured, min, max, 293.15, 0, "/measurements/0",
                Optional.empty());
    }

    /** The same reading whose target could not be moved to its temperature. */
    static BatchAnalysis.SpecifiedPh unjudged(double measured, double min, double max) {
        return new BatchAnalysis.SpecifiedPh("pH at step 2 (20.0 °C)", measured, min, max, 293.15, Double.NaN,
                "/measurements/0", Optional.of("set unjudged by the test"));
    }

    /** A batch check kind by its id, with the given parameters (JSON object text). */
    static List<Finding> run(String kind, BatchAnalysis b, String parameters) {
        return ((BatchCheckKind) CheckKinds.load().all().get(kind)).check(b, Analyses.rule(kind, parameters));
    }
}
