package org.protolyte.rules;

import java.util.Locale;

import org.protolyte.batch.BatchAnalysis;

/** How batch values read in findings: pH 6.62, 4.1 mL, 292 mOsm/kg. */
final class BatchText {
    private BatchText() {
    }

    static String value(BatchAnalysis.Observation.Kind kind, double x) {
        if (Double.isNaN(x)) {
            return "no prediction";
        }
        return switch (kind) {
            case PH -> String.format(Locale.ROOT, "pH %.2f", x);
            case TITRANT -> String.format(Locale.ROOT, "%.3g mL", x);
            case OSMOLALITY -> String.format(Locale.ROOT, "%.0f mOsm/kg", x);
        };
    }

    static String bare(BatchAnalysis.Observation.Kind kind, double x) {
        if (Double.isNaN(x)) {
            return "—";
        }
        return switch (kind) {
            case PH -> String.format(Locale.ROOT, "%.2f", x);
            case TITRANT -> String.format(Locale.ROOT, "%.3g mL", x);
            case OSMOLALITY -> String.format(Locale.ROOT, "%.0f mOsm/kg", x);
        };
    }
}
