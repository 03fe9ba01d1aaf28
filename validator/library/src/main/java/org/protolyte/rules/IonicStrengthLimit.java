package org.protolyte.rules;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.protolyte.analysis.ConditionResult;
import org.protolyte.analysis.FormulationAnalysis;

/** Ionic strength (mol/kg) at most {@code max}. */
public final class IonicStrengthLimit implements CheckKind {

    @Override
    public String id() {
        return "ionic-strength-limit";
    }

    @Override
    public String summary() {
        return "ionic strength is within the pack's limit";
    }

    @Override
    public List<Finding> check(FormulationAnalysis a, Rule rule) {
        double max = rule.number("max", Double.POSITIVE_INFINITY);
        List<Finding> out = new ArrayList<>();
        for (ConditionResult c : Conditions.judged(a, rule)) {
            double i = c.state().orElseThrow().ionicStrength();
            if (i > max) {
                out.add(rule.finding(a.recipe().formulation(), Conditions.pointer(c), String.format(Locale.ROOT,
                        "ionic strength at %s is %.3g mol/kg; limit %.3g", c.condition().name(), i, max)));
            }
        }
        return out;
    }
}
