package org.protolyte.rules;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.protolyte.batch.BatchAnalysis;

/**
 * A measurement of one kind agrees with the engine's prediction for the batch as recorded: pH within
 * {@code maxDifference} (default 0.1), a titrant volume or an osmolality within {@code maxDifference} per cent
 * (defaults 10 and 3); beyond {@code errorBeyond}, where stated, the finding is an error. One class for the three
 * kinds, which differ only in what they compare.
 */
public abstract class BatchMeasurementAgrees implements BatchCheckKind {

    /**
     * mmol/L of strong acid or base that traces in the materials and CO2 taken up during a reading may carry, and the
     * buffer capacity (mmol/kg per pH) below which a reading is not compared at all: common practice.
     */
    static final double TRACE_LOAD = 0.2;
    static final double UNBUFFERED_BELOW = 1.0;

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

    /**
     * A pH reading where the predicted β is below {@code unbufferedBelow} of a {@code batch-ph-agrees} rule: traces
     * and CO2 set it, so it is not compared with the prediction (nor used to judge a mistake, {@link BatchDiagnosis}).
     */
    static boolean unbuffered(BatchAnalysis.Observation o, Rule phRule) {
        return o.kind() == BatchAnalysis.Observation.Kind.PH
                && o.bufferCapacity() < phRule.number("unbufferedBelow", UNBUFFERED_BELOW);
    }

    /** The pH difference allowed: {@code limit}, or more where a trace of acid or base moves the pH by load/β. */
    static double pHLimit(BatchAnalysis.Observation o, double limit, Rule phRule) {
        return Double.isFinite(o.bufferCapacity())
                ? Math.max(limit, phRule.number("traceLoad", TRACE_LOAD) / o.bufferCapacity()) : limit;
    }

    /**
     * A rule may state {@code errorBeyond} (same unit as {@code maxDifference}): a difference beyond it is an error
     * whatever the rule's severity, since neither the model nor the instrument is that far off.
     */
    private boolean beyond(BatchAnalysis.Observation o, double d, Rule rule) {
        double e = rule.number("errorBeyond", Double.POSITIVE_INFINITY);
        return kind == BatchAnalysis.Observation.Kind.PH ? Math.abs(d) > e : Math.abs(d) > e / 100 * Math.abs(o.predicted());
    }

    private String unit(double limit) {
        return kind == BatchAnalysis.Observation.Kind.PH ? String.format(Locale.ROOT, "%.2f", limit)
                : String.format(Locale.ROOT, "%.0f %%", limit);
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
        List<Finding> out = new ArrayList<>();
        for (BatchAnalysis.Observation o : b.observations()) {
            if (o.kind() != kind || Double.isNaN(o.predicted())) {
                continue;
            }
            double d = o.measured() - o.predicted();
            if (unbuffered(o, rule)) {
                if (Math.abs(d) > rule.number("maxDifference", defaultLimit)) {
                    out.add(new Finding(rule.id(), Severity.NOTE, String.format(Locale.ROOT,
                            "%s: measured %s, the additions as recorded give %s (%+.2f), not compared: the "
                                    + "solution is unbuffered there (β %.2g mmol/kg per pH, below %.2g), so traces "
                                    + "of acid or base in the materials and dissolved CO2 set the reading, not the "
                                    + "recorded additions", o.label(), BatchText.value(o.kind(), o.measured()),
                            BatchText.value(o.kind(), o.predicted()), d, o.bufferCapacity(),
                            rule.number("unbufferedBelow", UNBUFFERED_BELOW)),
                            java.util.Optional.of(o.pointer()), b.record().document().locate(o.pointer()),
                            java.util.Optional.of(rule)));
                }
                continue;
            }
            double limit = kind == BatchAnalysis.Observation.Kind.PH
                    ? pHLimit(o, rule.number("maxDifference", defaultLimit), rule)
                    : rule.number("maxDifference", defaultLimit);
            boolean off = kind == BatchAnalysis.Observation.Kind.PH ? Math.abs(d) > limit
                    : Math.abs(d) > limit / 100 * Math.abs(o.predicted());
            if (off) {
                Finding f = rule.finding(b.record().document(), o.pointer(), String.format(Locale.ROOT,
                        "%s: measured %s, the additions as recorded give %s (%s; limit %s)%s", o.label(),
                        BatchText.value(o.kind(), o.measured()), BatchText.value(o.kind(), o.predicted()),
                        kind == BatchAnalysis.Observation.Kind.PH ? String.format(Locale.ROOT, "%+.2f", d)
                                : String.format(Locale.ROOT, "%+.0f %%", 100 * d / o.predicted()),
                        kind == BatchAnalysis.Observation.Kind.PH ? String.format(Locale.ROOT, "%.2f", limit)
                                : String.format(Locale.ROOT, "%.0f %%", limit), beyond(o, d, rule)
                                ? String.format(Locale.ROOT, "; beyond %s, more than the model and the instrument "
                                + "can explain", unit(rule.number("errorBeyond", 0))) : ""));
                out.add(beyond(o, d, rule)
                        ? new Finding(f.rule(), Severity.ERROR, f.message(), f.pointer(), f.location(), f.definition())
                        : f);
            }
        }
        return out;
    }
}
