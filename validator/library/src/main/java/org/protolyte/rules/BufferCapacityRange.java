package org.protolyte.rules;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.protolyte.analysis.ConditionResult;
import org.protolyte.analysis.FormulationAnalysis;

/** Buffer capacity (mmol/L per pH) at least {@code min} and, where given, at most {@code max}. */
public final class BufferCapacityRange implements CheckKind {

    @Override
    public String id() {
        return "buffer-capacity-range";
    }

    @Override
    public String summary() {
        return "buffer capacity lies between the pack's minimum and maximum";
    }

    @Override
    public List<Finding> check(FormulationAnalysis a, Rule rule) {
        double min = rule.number("min", 0);
        double max = rule.number("max", Double.POSITIVE_INFINITY);
        List<Finding> out = new ArrayList<>();
        for (ConditionResult c : Conditions.judged(a, rule)) {
            double beta = c.bufferCapacityPerLitre() * 1000;
            String main = c.mainBuffer().map(b -> String.format(Locale.ROOT, ", %.0f %% of it from %s",
                    b.share() * 100, b.system())).orElse("");
            if (beta < min) {
                out.add(rule.finding(a.recipe().formulation(), Conditions.pointer(c), String.format(Locale.ROOT,
                        "buffer capacity at %s (%.0f °C) is %.3g mmol/L per pH%s; minimum %.3g", c.condition().name(),
                        Conditions.celsius(c), beta, main, min)));
            } else if (beta > max) {
                out.add(rule.finding(a.recipe().formulation(), Conditions.pointer(c), String.format(Locale.ROOT,
                        "buffer capacity at %s (%.0f °C) is %.3g mmol/L per pH%s; maximum %.3g", c.condition().name(),
                        Conditions.celsius(c), beta, main, max)));
            }
        }
        return out;
    }
}
