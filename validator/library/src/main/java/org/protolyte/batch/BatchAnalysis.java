package org.protolyte.batch;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

import org.protolyte.analysis.FormulationAnalysis;
import org.protolyte.chemistry.Caveat;
import org.protolyte.document.Formulation;
import org.protolyte.recipe.Recipe;
import org.protolyte.substance.Substance;

/**
 * What a batch record says once compared with its master and with chemistry: each addition against the master line
 * it belongs to, each measurement against the engine's prediction for the batch as recorded, and the usual mistakes
 * with the predictions each would give. The rules judge it; nothing here is a verdict.
 *
 * @param scale     batch per master basis (20 for a 20 L batch of a 1 L master)
 * @param specifiedPh each pH reading of the finished batch with the master's pH target at the reading's temperature
 * @param asMade    the analysis of the whole batch as recorded, at the master's conditions
 * @param caveats   what the engine could not do for the report beside the measurements (the batch as made)
 */
public record BatchAnalysis(BatchRecord record, Recipe master, double scale, List<AdditionCheck> additions,
                            List<Observation> observations, List<Candidate> candidates,
                            List<SpecifiedPh> specifiedPh, Optional<FormulationAnalysis> asMade,
                            List<Caveat> caveats) {

    public BatchAnalysis {
        additions = List.copyOf(additions);
        observations = List.copyOf(observations);
        candidates = List.copyOf(candidates);
        specifiedPh = List.copyOf(specifiedPh);
        caveats = List.copyOf(caveats);
    }

    /** How an addition relates to the master. */
    public enum Match { SAME, OTHER_FORM, MISSING, EXTRA, TITRANT }

    /**
     * One master line with what was added for it (or an addition the master does not have): the substance used, and
     * the moles expected for this batch size and found after the certificate corrections. {@code tolerance} is the
     * master line's own weighing tolerance, where it states one.
     */
    public record AdditionCheck(Match match, Optional<Formulation.Line> line, Optional<BatchRecord.Addition> addition,
                                Optional<Substance> expected, Optional<Substance> used, double expectedMoles,
                                double actualMoles, Optional<Double> tolerance) {
        /** (actual − expected)/expected; NaN where either side is absent. */
        public double deviation() {
            return expectedMoles > 0 && actualMoles >= 0 ? actualMoles / expectedMoles - 1 : Double.NaN;
        }
    }

    /**
     * A measured value and the engine's prediction for the batch as recorded: a pH at a step and temperature, an
     * osmolality (mOsm/kg), or the volume of titrant (mL) against the q.s. the recorded weighings need to reach the
     * pH the meter showed after it. {@code predicted} is NaN where the engine cannot stand behind a number, and
     * {@code unpredicted} then says why. {@code bufferCapacity}, for a pH: the predicted β of the batch at that step,
     * mmol per kg of water per pH (NaN where not known), which says how far traces and dissolved CO2 can move the
     * reading.
     */
    public record Observation(Kind kind, String label, double measured, double predicted, String pointer,
                              Optional<String> unpredicted, double bufferCapacity) {

        public Observation(Kind kind, String label, double measured, double predicted, String pointer,
                           Optional<String> unpredicted) {
            this(kind, label, measured, predicted, pointer, unpredicted, Double.NaN);
        }

        public enum Kind {
            PH, OSMOLALITY, TITRANT;

            /** A value as a reader sees it: 6.62, 292 mOsm/kg, 4.1 mL; a dash where there is none. */
            public String text(double x) {
                if (Double.isNaN(x)) {
                    return "—";
                }
                return switch (this) {
                    case PH -> String.format(java.util.Locale.ROOT, "%.2f", x);
                    case TITRANT -> String.format(java.util.Locale.ROOT, "%.3g mL", x);
                    case OSMOLALITY -> String.format(java.util.Locale.ROOT, "%.0f mOsm/kg", x);
                };
            }
        }
    }

    /**
     * A usual mistake and what the batch would have given under it, one prediction per observation (same order), and
     * per further measurement that would tell candidates apart ({@code further}: its label and predicted value);
     * {@code unpredicted}: why some of its predictions could not be made (NaN in {@code predicted}).
     */
    public record Candidate(String cause, double[] predicted, List<Further> further, Optional<String> unpredicted) {
        public Candidate {
            predicted = predicted.clone();
            further = List.copyOf(further);
        }
    }

    /**
     * A pH reading of the finished batch and the master's pH target, {@code min}–{@code max} at the reading's
     * temperature: the target as written where the temperatures agree, else moved by {@code shift}, the change of pH
     * the engine predicts for the batch as recorded between the target's temperature and the reading's. Where that
     * change cannot be predicted the range is not known and {@code unjudged} says why.
     */
    public record SpecifiedPh(String label, double measured, double min, double max, double targetKelvin, double shift,
                              String pointer, Optional<String> unjudged) {
    }

    /** A measurement not in the record, predicted: "osmolality" at the end, "pH before adjustment" and so on. */
    public record Further(Observation.Kind kind, String label, OptionalDouble predicted) {
    }
}
