package org.protolyte.rules;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.protolyte.batch.BatchAnalysis;
import org.protolyte.batch.BatchRecord;
import org.protolyte.chemistry.Thermo;

import tools.jackson.databind.JsonNode;

/**
 * Every measured value of the finished batch that has a specification is within it, whatever the prediction says:
 * each pH reading against the master's pH target (moved to the reading's temperature by the drift the engine predicts
 * for the batch, see {@link BatchAnalysis.SpecifiedPh}), each osmolality against {@code osmolality.min}–{@code max},
 * or, without them, the range of the osmolality rule the record's packs select. Readings before the last addition
 * are in-process, not results of the batch, and are judged against prediction only.
 */
public final class BatchOutOfSpecification implements BatchCheckKind {

    private static final String ACTION = "the batch as measured does not meet its specification: the reviewer must "
            + "open an out-of-specification investigation per local procedure before any decision on the batch "
            + "(this finding is a decision aid, not a release decision)";

    @Override
    public String id() {
        return "batch-out-of-specification";
    }

    @Override
    public String summary() {
        return "every measured value of the finished batch lies within the master's specification";
    }

    @Override
    public List<Finding> check(BatchAnalysis b, Rule rule) {
        return check(b, rule, List.of());
    }

    @Override
    public List<Finding> check(BatchAnalysis b, Rule rule, List<Rule> selection) {
        List<Finding> out = new ArrayList<>();
        for (BatchAnalysis.SpecifiedPh p : b.specifiedPh()) {
            if (p.unjudged().isPresent() || p.measured() >= p.min() - 1e-9 && p.measured() <= p.max() + 1e-9) {
                continue;
            }
            String at = String.format(Locale.ROOT, "%.1f °C", p.targetKelvin() - Thermo.KELVIN_OFFSET);
            String spec = p.shift() == 0 ? "the master's pH target " + range(p.min(), p.max(), "%.2f") + " at " + at
                    : String.format(Locale.ROOT, "the master's pH target %s at %s, moved by %+.3f to this temperature "
                    + "by the drift predicted for the batch", range(p.min() - p.shift(), p.max() - p.shift(), "%.2f"),
                    at, p.shift());
            out.add(rule.finding(b.record().document(), p.pointer(), String.format(Locale.ROOT,
                    "%s: measured pH %.2f, outside %s (%s); %s", p.label(), p.measured(),
                    range(p.min(), p.max(), "%.2f"), spec, ACTION)));
        }
        Optional<double[]> osmolality = osmolality(rule, selection);
        if (osmolality.isPresent()) {
            double min = osmolality.get()[0];
            double max = osmolality.get()[1];
            for (BatchRecord.Measurement m : b.record().measurements()) {
                if (m.kind() == BatchRecord.Measurement.Kind.OSMOLALITY && b.record().ofFinishedBatch(m)
                        && (m.value() < min || m.value() > max)) {
                    out.add(rule.finding(b.record().document(), m.pointer(), String.format(Locale.ROOT,
                            "osmolality at step %d: measured %.0f mOsm/kg, outside the specification %s mOsm/kg; %s",
                            m.step(), m.value(), range(min, max, "%.0f"), ACTION)));
                }
            }
        }
        return out;
    }

    /** The rule's own range, else that of the last enabled osmolality rule of the selection (the most specific pack). */
    private static Optional<double[]> osmolality(Rule rule, List<Rule> selection) {
        JsonNode own = rule.parameters().get("osmolality");
        if (own != null && own.isObject()) {
            return Optional.of(new double[] {own.path("min").asDouble(0),
                    own.has("max") ? own.get("max").asDouble() : Double.POSITIVE_INFINITY});
        }
        Optional<Rule> pack = Optional.empty();
        for (Rule r : selection) {
            if (r.enabled() && r.check().equals("osmolality-range")) {
                pack = Optional.of(r);
            }
        }
        return pack.map(r -> new double[] {r.number("min", 0), r.number("max", Double.POSITIVE_INFINITY)});
    }

    private static String range(double min, double max, String format) {
        if (Double.isInfinite(min)) {
            return "≤ " + String.format(Locale.ROOT, format, max);
        }
        if (Double.isInfinite(max)) {
            return "≥ " + String.format(Locale.ROOT, format, min);
        }
        return String.format(Locale.ROOT, format, min) + "–" + String.format(Locale.ROOT, format, max);
    }
}
