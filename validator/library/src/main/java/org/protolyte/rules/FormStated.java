package org.protolyte.rules;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.protolyte.analysis.FormulationAnalysis;
import org.protolyte.recipe.Ingredient;
import org.protolyte.substance.Substance;
import org.protolyte.substance.SubstanceLibrary;

/**
 * A component written by a name that does not state its form (a bare formula such as "Na2HPO4") while
 * the library holds other forms of the same material (hydrates): the molar mass, and so the amount,
 * depends on which one is weighed.
 */
public final class FormStated implements CheckKind {

    @Override
    public String id() {
        return "form-stated";
    }

    @Override
    public String summary() {
        return "each component names the specific form (hydrate, salt) that is weighed";
    }

    @Override
    public List<Finding> check(FormulationAnalysis a, Rule rule) {
        SubstanceLibrary library = a.recipe().library();
        List<Finding> out = new ArrayList<>();
        for (Ingredient ing : a.recipe().ingredients()) {
            Substance s = ing.substance();
            String written = SubstanceLibrary.normalise(ing.line().substance());
            if (written.equals(SubstanceLibrary.normalise(s.name())) || statesForm(written)) {
                continue;
            }
            List<String> others = library.substances().stream()
                    .filter(o -> !o.name().equals(s.name()) && o.composition().equals(s.composition()))
                    .map(Substance::name).toList();
            if (!others.isEmpty()) {
                out.add(rule.finding(a.recipe().formulation(), ing.line().pointer() + "/substance", String.format(
                        Locale.ROOT, "'%s' was read as %s (%.2f g/mol); the library also holds %s", ing.line().substance(),
                        s.name(), s.molarMass().orElse(Double.NaN), String.join(", ", others))));
            }
        }
        return out;
    }

    /** Words or formula parts that say which hydrate is meant. */
    private static boolean statesForm(String normalised) {
        return normalised.contains("hydrate") || normalised.contains("anhydrous") || normalised.contains("h2o");
    }
}
