package org.protolyte.rules;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;

import org.protolyte.analysis.FormulationAnalysis;
import org.protolyte.recipe.Ingredient;
import org.protolyte.substance.Handling;

/** The hazard classifications the library holds for a recipe's components, as safety notes at their lines. */
public final class HazardNotes implements CheckKind {

    @Override
    public String id() {
        return "hazard-notes";
    }

    @Override
    public String summary() {
        return "components with a hazard classification carry a safety note";
    }

    @Override
    public List<Finding> check(FormulationAnalysis a, Rule rule) {
        List<Finding> out = new ArrayList<>();
        for (Ingredient ing : a.recipe().ingredients()) {
            List<Handling.Hazard> hazards = ing.substance().handling().hazards();
            if (hazards.isEmpty()) {
                continue;
            }
            String classes = hazards.stream().map(h -> h.classification() + " (" + h.statement() + "; "
                    + h.appliesTo() + ")").collect(Collectors.joining("; "));
            String role = ing.line().isTitrant() ? " used as titrant" : "";
            out.add(rule.finding(a.recipe().formulation(), ing.line().pointer() + "/substance",
                    ing.substance().name() + role + ": " + classes + ". " + ing.substance().notes()));
        }
        return out;
    }
}
