package org.protolyte.rules;

import org.protolyte.batch.BatchAnalysis;

/** How batch values read in findings: pH 6.62, 4.1 mL, 292 mOsm/kg. */
final class BatchText {
    private BatchText() {
    }

    static String value(BatchAnalysis.Observation.Kind kind, double x) {
        if (Double.isNaN(x)) {
            return "no prediction";
        }
        return (kind == BatchAnalysis.Observation.Kind.PH ? "pH " : "") + kind.text(x);
    }
}
