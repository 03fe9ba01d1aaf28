package org.protolyte.rules;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.protolyte.batch.BatchAnalysis;

/**
 * Each addition within its tolerance of the master's amount for this batch size, in moles after the certificate
 * corrections (assay, water): the master line's own tolerance, else {@code tolerance} (percent, default 2).
 */
public final class BatchAmountTolerance implements BatchCheckKind {

    @Override
    public String id() {
        return "batch-amount-tolerance";
    }

    @Override
    public String summary() {
        return "each addition is within its tolerance of the master, after assay and water corrections";
    }

    @Override
    public List<Finding> check(BatchAnalysis b, Rule rule) {
        double fallback = rule.number("tolerance", 2) / 100;
        List<Finding> out = new ArrayList<>();
        for (BatchAnalysis.AdditionCheck c : b.additions()) {
            if (c.match() != BatchAnalysis.Match.SAME && c.match() != BatchAnalysis.Match.OTHER_FORM
                    || c.addition().isEmpty()) {
                continue;
            }
            double tolerance = c.tolerance().orElse(fallback);
            double d = c.deviation();
            if (Math.abs(d) > tolerance) {
                var a = c.addition().get();
                out.add(rule.finding(b.record().document(), a.pointer() + "/amount", String.format(Locale.ROOT,
                        "%s at step %d: %s recorded is %.4g mmol after the certificate corrections, %+.1f %% against "
                                + "the %.4g mmol the master gives for this batch (tolerance ±%s %%)",
                        c.used().orElseThrow().name(), a.step(), a.amount(), c.actualMoles() * 1000, 100 * d,
                        c.expectedMoles() * 1000, plain(100 * tolerance))));
            }
        }
        return out;
    }

    private static String plain(double x) {
        return java.math.BigDecimal.valueOf(x).round(new java.math.MathContext(3)).stripTrailingZeros().toPlainString();
    }
}
