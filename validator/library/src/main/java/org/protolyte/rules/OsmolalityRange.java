package org.protolyte.rules;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.protolyte.analysis.ConditionResult;
import org.protolyte.analysis.FormulationAnalysis;

/** Osmolality (mOsm/kg water) at least {@code min} and at most {@code max}. */
public final class OsmolalityRange implements CheckKind {

    @Override
    public String id() {
        return "osmolality-range";
    }

    @Override
    public String summary() {
        return "osmolality lies between the pack's minimum and maximum";
    }

    @Override
    public List<Finding> check(FormulationAnalysis a, Rule rule) {
        double min = rule.number("min", 0);
        double max = rule.number("max", Double.POSITIVE_INFINITY);
        List<Finding> out = new ArrayList<>();
        for (ConditionResult c : Conditions.judged(a, rule)) {
            double osmolality = c.state().orElseThrow().osmolality() * 1000;
            if (osmolality < min || osmolality > max) {
                out.add(rule.finding(a.recipe().formulation(), Conditions.pointer(c), String.format(Locale.ROOT,
                        "osmolality at %s (%.0f °C) is %.0f mOsm/kg (%.0f mOsm/L); the range is %s–%s mOsm/kg",
                        c.condition().name(), Conditions.celsius(c), osmolality, c.osmolarity() * 1000,
                        min == 0 ? "0" : String.format(Locale.ROOT, "%.0f", min),
                        Double.isInfinite(max) ? "∞" : String.format(Locale.ROOT, "%.0f", max))));
            }
        }
        return out;
    }
}
