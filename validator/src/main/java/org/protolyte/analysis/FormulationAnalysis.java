package org.protolyte.analysis;

import java.util.List;

import org.protolyte.chemistry.Caveat;
import org.protolyte.recipe.Recipe;
import org.protolyte.recipe.Solution;

/** Everything computed for one formulation: per condition, the q.s. titrants, and what was assumed. */
public record FormulationAnalysis(Recipe recipe, Solution solution, List<ConditionResult> conditions,
                                  List<TitrantResult> titrants, List<Caveat> caveats, List<String> assumptions) {

    public FormulationAnalysis {
        conditions = List.copyOf(conditions);
        titrants = List.copyOf(titrants);
        caveats = List.copyOf(caveats);
        assumptions = List.copyOf(assumptions);
    }
}
