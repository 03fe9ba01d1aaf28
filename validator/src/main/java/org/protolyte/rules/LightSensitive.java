package org.protolyte.rules;

import java.util.ArrayList;
import java.util.List;

import org.protolyte.analysis.FormulationAnalysis;
import org.protolyte.recipe.Ingredient;

/** Components the library marks as light-sensitive or photoreactive. */
public final class LightSensitive implements CheckKind {

    @Override
    public String id() {
        return "light-sensitive";
    }

    @Override
    public String summary() {
        return "light-sensitive or photoreactive components are named, so the medium is kept dark";
    }

    @Override
    public List<Finding> check(FormulationAnalysis a, Rule rule) {
        List<Finding> out = new ArrayList<>();
        for (Ingredient ing : a.recipe().ingredients()) {
            ing.substance().handling().lightSensitivity().ifPresent(l -> out.add(rule.finding(
                    a.recipe().formulation(), ing.line().pointer() + "/substance",
                    ing.substance().name() + ": " + l.text() + " (" + l.source() + ")")));
        }
        return out;
    }
}
