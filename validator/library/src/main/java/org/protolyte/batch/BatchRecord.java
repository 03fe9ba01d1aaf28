package org.protolyte.batch;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

import org.protolyte.document.Formulation;
import org.protolyte.document.SourceDocument;
import org.protolyte.units.Quantity;

/**
 * A batch record as read: the master it follows (already read), the batch size, the additions as recorded and the
 * measurements, every part keeping its JSON pointer. Fractions are 0–1; temperatures kelvin.
 *
 * @param batchSize litres of batch (a finalVolume master) or kilograms of water (a waterMass master)
 */
public record BatchRecord(SourceDocument document, String id, String batch, Formulation master,
                          Optional<String> masterRevision, double batchSize, String batchSizePointer,
                          List<Addition> additions, List<Measurement> measurements) {

    public BatchRecord {
        additions = List.copyOf(additions);
        measurements = List.copyOf(measurements);
    }

    /**
     * A measurement of the finished batch, which the master's specification applies to: taken at or after the last
     * addition, at full volume. Earlier readings (the pH before adjustment) are in-process and judged by prediction.
     */
    public boolean ofFinishedBatch(Measurement m) {
        int last = additions.stream().mapToInt(Addition::step).max().orElse(0);
        return m.step() >= last && m.atVolume() == 1;
    }

    /** How a recorded amount relates to the pure substance. */
    public enum Weighed { AS_IS, PURE, ANHYDROUS }

    /**
     * One addition: the form used, the amount (a mass, or a volume of a stock of {@code stockMolarity} mol/L), and the
     * certificate values: {@code assay} as a fraction, on the dried substance unless {@code assayAsIs}, and
     * {@code water} (water content or loss on drying, a fraction) where recorded.
     */
    public record Addition(int step, String substance, Quantity amount, OptionalDouble stockMolarity,
                           Optional<String> lot, OptionalDouble assay, boolean assayAsIs, OptionalDouble water,
                           Weighed weighed, String pointer) {
    }

    /** A measurement: pH at a temperature, or osmolality (mOsm/kg), at a step, at a fraction of the batch volume. */
    public record Measurement(int step, Kind kind, double value, OptionalDouble kelvin, double atVolume,
                              String pointer) {
        public enum Kind { PH, OSMOLALITY }
    }
}
