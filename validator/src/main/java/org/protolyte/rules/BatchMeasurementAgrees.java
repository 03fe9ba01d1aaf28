package org.protolyte.rules;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.protolyte.batch.BatchAnalysis;

/**
 * A measurement of one kind agrees with the engine's prediction for the batch as recorded: pH within
 * {@code maxDifference} (default 0.1), a titrant volume or an osmolality within {@code maxDifference} per cent
 * (defaults 10 and 3). One class for the three kinds, which differ only in what they compare.
 */
public abstract class BatchMeasurementAgrees implements BatchCheckKind {

    private final String id;
    private final BatchAnalysis.Observation.Kind kind;
    private final double defaultLimit;

    BatchMeasurementAgrees(String id, BatchAnalysis.Observation.Kind kind, double defaultLimit) {
        this.id = id;
        this.kind = kind;
        this.defaultLimit = defaultLimit;
    }

    /** pH readings, in pH units. */
    public static final class Ph extends BatchMeasurementAgrees {
        public Ph() {
            super("batch-ph-agrees", BatchAnalysis.Observation.Kind.PH, 0.1);
        }
    }

    /** The titrant volume against the q.s. the recorded weighings need, per cent. */
    public static final class Titrant extends BatchMeasurementAgrees {
        public Titrant() {
            super("batch-titrant-agrees", BatchAnalysis.Observation.Kind.TITRANT, 10);
        }
    }

    /** Osmolality, per cent. */
    public static final class Osmolality extends BatchMeasurementAgrees {
        public Osmolality() {
            super("batch-osmolality-agrees", BatchAnalysis.Observation.Kind.OSMOLALITY, 3);
        }
    }

    @Override
    public String id() {
        return id;
    }

    @Override
    public String summary() {
        return switch (kind) {
            case PH -> "each pH reading agrees with the pH the recorded additions give";
            case TITRANT -> "the titrant used agrees with the q.s. the recorded weighings need";
            case OSMOLALITY -> "each osmolality reading agrees with the one the recorded additions give";
        };
    }

    @Override
    public List<Finding> check(BatchAnalysis b, Rule rule) {
        double limit = rule.number("maxDifference", defaultLimit);
        List<Finding> out = new ArrayList<>();
        for (BatchAnalysis.Observation o : b.observations()) {
            if (o.kind() != kind || Double.isNaN(o.predicted())) {
                continue;
            }
            double d = o.measured() - o.predicted();
            boolean off = kind == BatchAnalysis.Observation.Kind.PH ? Math.abs(d) > limit
                    : Math.abs(d) > limit / 100 * Math.abs(o.predicted());
            if (off) {
                out.add(rule.finding(b.record().document(), o.pointer(), String.format(Locale.ROOT,
                        "%s: measured %s, the additions as recorded give %s (%s; limit %s)", o.label(),
                        BatchText.value(o.kind(), o.measured()), BatchText.value(o.kind(), o.predicted()),
                        kind == BatchAnalysis.Observation.Kind.PH ? String.format(Locale.ROOT, "%+.2f", d)
                                : String.format(Locale.ROOT, "%+.0f %%", 100 * d / o.predicted()),
                        kind == BatchAnalysis.Observation.Kind.PH ? String.format(Locale.ROOT, "%.2f", limit)
                                : String.format(Locale.ROOT, "%.0f %%", limit))));
            }
        }
        return out;
    }
}
