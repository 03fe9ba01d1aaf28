package org.protolyte.rules;

import java.util.ArrayList;
import java.util.List;

import org.protolyte.analysis.FormulationAnalysis;
import org.protolyte.analysis.TitrantResult;

/** A q.s. titrant can bring the recipe to its goal pH: a base cannot lower it, a weak titrant runs out. */
public final class TitrantReachesGoal implements CheckKind {

    @Override
    public String id() {
        return "titrant-reaches-goal";
    }

    @Override
    public String summary() {
        return "the q.s. titrant can reach the pH it adjusts to";
    }

    @Override
    public List<Finding> check(FormulationAnalysis a, Rule rule) {
        List<Finding> out = new ArrayList<>();
        boolean anyDosed = a.titrants().stream().anyMatch(t -> t.used() && t.unreachable().isEmpty());
        for (TitrantResult t : a.titrants()) {
            if (t.unreachable().isPresent() && !anyDosed) {
                out.add(rule.finding(a.recipe().formulation(), t.ingredient().line().pointer() + "/adjustTo",
                        t.unreachable().get().reason()));
            }
        }
        return out;
    }
}
