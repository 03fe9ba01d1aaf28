package org.protolyte.rules;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.protolyte.analysis.ConditionResult;
import org.protolyte.analysis.FormulationAnalysis;

/** The pH moves no more than {@code maxChange} when the solution equilibrates with room air. */
public final class AirExposureDrift implements CheckKind {

    @Override
    public String id() {
        return "air-exposure-drift";
    }

    @Override
    public String summary() {
        return "the pH holds when the solution equilibrates with room air";
    }

    @Override
    public List<Finding> check(FormulationAnalysis a, Rule rule) {
        double max = rule.number("maxChange", 0.3);
        List<Finding> out = new ArrayList<>();
        for (ConditionResult c : Conditions.judged(a, rule)) {
            if (c.pHInAir().isEmpty()) {
                continue;
            }
            double pH = c.state().orElseThrow().pH();
            double change = c.pHInAir().getAsDouble() - pH;
            if (Math.abs(change) > max) {
                out.add(rule.finding(a.recipe().formulation(), Conditions.pointer(c), String.format(Locale.ROOT,
                        "in room air the pH at %s (%.0f °C) moves from %.2f to %.2f (%+.2f%s)",
                        c.condition().name(), Conditions.celsius(c), pH, c.pHInAir().getAsDouble(), change,
                        Conditions.limit(";", max))));
            }
        }
        return out;
    }
}
