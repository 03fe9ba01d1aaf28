package org.protolyte.rules;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.protolyte.analysis.ConditionResult;
import org.protolyte.analysis.FormulationAnalysis;

/** pH within a product type's limits (for example what a route of administration tolerates), whatever the target. */
public final class PhWithinLimits implements CheckKind {

    @Override
    public String id() {
        return "ph-within-limits";
    }

    @Override
    public String summary() {
        return "the pH lies within the limits the pack sets for the product type";
    }

    @Override
    public List<Finding> check(FormulationAnalysis a, Rule rule) {
        double min = rule.number("min", Double.NEGATIVE_INFINITY);
        double max = rule.number("max", Double.POSITIVE_INFINITY);
        List<Finding> out = new ArrayList<>();
        for (ConditionResult c : Conditions.judged(a, rule)) {
            double pH = c.state().orElseThrow().pH();
            if (pH < min || pH > max) {
                String u = c.uncertainty().map(x -> String.format(Locale.ROOT, " ± %.2f", x.pH())).orElse("");
                out.add(rule.finding(a.recipe().formulation(), Conditions.pointer(c), String.format(Locale.ROOT,
                        "pH at %s (%.0f °C) is %.2f%s, outside %.1f to %.1f", c.condition().name(), Conditions.celsius(c),
                        pH, u, min, max)));
            }
        }
        return out;
    }
}
