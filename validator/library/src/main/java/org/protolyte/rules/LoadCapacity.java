package org.protolyte.rules;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.protolyte.analysis.ConditionResult;
import org.protolyte.analysis.FormulationAnalysis;

/**
 * The recipe takes at least {@code minAcid} (and {@code minBase}) mmol/L of strong acid (base) before its pH
 * leaves the target: for a medium, the lactic acid that cells produce between feeds. Judged at the condition at the
 * target's temperature, the only one where the target says what the pH must be.
 */
public final class LoadCapacity implements CheckKind {

    @Override
    public String id() {
        return "load-capacity";
    }

    @Override
    public String summary() {
        return "the recipe takes the pack's minimum acid or base load before leaving its pH target";
    }

    @Override
    public List<Finding> check(FormulationAnalysis a, Rule rule) {
        List<Finding> out = new ArrayList<>();
        for (ConditionResult c : Conditions.atTarget(a).stream().toList()) {
            if (c.loads().isEmpty()) {
                continue;
            }
            var l = c.loads().get();
            double minAcid = rule.number("minAcid", 0);
            double minBase = rule.number("minBase", 0);
            if (l.acidToLeaveTarget().isPresent() && l.acidToLeaveTarget().getAsDouble() < minAcid) {
                out.add(rule.finding(a.recipe().formulation(), Conditions.pointer(c), String.format(Locale.ROOT,
                        "at %s (%.0f °C) %.3g mmol/L of strong acid takes the pH below the target; minimum %.3g",
                        c.condition().name(), Conditions.celsius(c), l.acidToLeaveTarget().getAsDouble(), minAcid)));
            }
            if (l.baseToLeaveTarget().isPresent() && l.baseToLeaveTarget().getAsDouble() < minBase) {
                out.add(rule.finding(a.recipe().formulation(), Conditions.pointer(c), String.format(Locale.ROOT,
                        "at %s (%.0f °C) %.3g mmol/L of strong base takes the pH above the target; minimum %.3g",
                        c.condition().name(), Conditions.celsius(c), l.baseToLeaveTarget().getAsDouble(), minBase)));
            }
        }
        return out;
    }
}
