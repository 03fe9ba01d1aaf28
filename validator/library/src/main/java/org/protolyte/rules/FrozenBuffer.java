package org.protolyte.rules;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.protolyte.analysis.ConditionResult;
import org.protolyte.analysis.FormulationAnalysis;
import org.protolyte.recipe.Ingredient;

/**
 * A condition below the solution's freezing point, with a buffer that is known to shift its pH when ice forms: the
 * pack names the acid–base system and the counterion (sodium phosphate). The engine reports no pH for a frozen
 * condition; this rule says why that matters. It is the one kind that judges a condition the engine could not solve.
 */
public final class FrozenBuffer implements CheckKind {

    @Override
    public String id() {
        return "frozen-buffer";
    }

    @Override
    public String summary() {
        return "a buffer that shifts its pH on freezing is not stored below its freezing point";
    }

    @Override
    public List<Finding> check(FormulationAnalysis a, Rule rule) {
        String system = rule.text("system").orElseThrow();
        String counterion = rule.text("counterion").orElseThrow();
        Ingredient carrier = null;
        boolean ion = false;
        for (Ingredient ing : a.recipe().ingredients()) {
            var c = ing.substance().composition();
            if (carrier == null && c.systems().stream().anyMatch(p -> p.system().equals(system))) {
                carrier = ing;
            }
            ion |= c.ions().containsKey(counterion);
        }
        List<Finding> out = new ArrayList<>();
        if (carrier == null || !ion) {
            return out;
        }
        for (ConditionResult c : a.conditions()) {
            c.caveats().stream().filter(x -> x.code().equals("below-freezing-point")).findFirst().ifPresent(x ->
                    out.add(rule.finding(a.recipe().formulation(), Conditions.pointer(c), String.format(Locale.ROOT,
                            "%s: %s. As ice forms, the %s salt of %s crystallises out and the unfrozen liquid's pH "
                                    + "shifts", c.condition().name(), x.message(), counterion, system))));
        }
        return out;
    }
}
