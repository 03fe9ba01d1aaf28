package org.protolyte.rules;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

import org.protolyte.analysis.ConditionResult;
import org.protolyte.analysis.FormulationAnalysis;
import org.protolyte.chemistry.Component;
import org.protolyte.chemistry.SaltSolubility;
import org.protolyte.chemistry.SpeciesAmount;
import org.protolyte.recipe.Ingredient;
import org.protolyte.recipe.Solution;

/**
 * No salt of the library's solubility tables above its solubility at any condition, the common-ion effect counted
 * ({@link SaltSolubility}): a concentrate that is clear at room temperature can crystallise in the cold room. Free ion
 * molalities come from the equilibrium; where the pH is indeterminate (a concentrate beyond the activity model) and the
 * recipe weighs the salt itself, a strong ion counts at its total and the salt's anion at the amount weighed, the
 * technician's own reckoning. Outside a table's temperatures nothing is said.
 */
public final class SolubilityLimit implements CheckKind {

    @Override
    public String id() {
        return "solubility-limit";
    }

    @Override
    public String summary() {
        return "every tabulated salt stays below its solubility at every condition";
    }

    @Override
    public List<Finding> check(FormulationAnalysis a, Rule rule) {
        List<Finding> out = new ArrayList<>();
        for (SaltSolubility salt : a.recipe().library().solubilities()) {
            List<String> byCondition = new ArrayList<>();
            ConditionResult worst = null;
            double worstIndex = 0;
            for (ConditionResult c : a.conditions()) {
                Optional<Map<String, Double>> m = molalities(a, c, salt);
                OptionalDouble index = m.isEmpty() ? OptionalDouble.empty()
                        : salt.index(m.get(), c.condition().kelvin());
                if (index.isEmpty()) {
                    continue;
                }
                byCondition.add(String.format(Locale.ROOT, "%s (%.0f °C) %.2g×", c.condition().name(),
                        Conditions.celsius(c), Math.pow(10, index.getAsDouble())));
                if (index.getAsDouble() > worstIndex) {
                    worstIndex = index.getAsDouble();
                    worst = c;
                }
            }
            if (worst != null) {
                double s = salt.saturatedMolality(worst.condition().kelvin()).orElseThrow();
                double held = weighed(a.solution(), salt) / a.solution().waterKg();
                String holds = held > 0 ? String.format(Locale.ROOT, "the solution holds %.3g g per 100 g water as weighed, "
                        + "against a solubility of %.3g g in pure water there; with the common ions of the other "
                        + "components", held * salt.molarMass() / 10, s * salt.molarMass() / 10)
                        : String.format(Locale.ROOT, "its ions come from other components (solubility %.3g g per 100 g "
                        + "water there);", s * salt.molarMass() / 10);
                out.add(rule.finding(a.recipe().formulation(), Conditions.pointer(worst), String.format(Locale.ROOT,
                        "%s (%s) can crystallise at %s (%.0f °C): %s the ion product is %.2g times that of the saturated "
                                + "solution; by condition: %s", salt.name(), salt.formula(), worst.condition().name(),
                        Conditions.celsius(worst), holds, Math.pow(10, worstIndex), String.join("; ", byCondition))));
            }
        }
        return out;
    }

    /** Free molality of each of the salt's ions at a condition, by species name; empty where it cannot be said. */
    private static Optional<Map<String, Double>> molalities(FormulationAnalysis a, ConditionResult c,
                                                           SaltSolubility salt) {
        Map<String, Double> m = new HashMap<>();
        if (c.determinate()) {
            for (SpeciesAmount s : c.state().orElseThrow().species()) {
                if (salt.ions().containsKey(s.species().name())) {
                    m.put(s.species().name(), s.molality());
                }
            }
            return Optional.of(m);
        }
        Solution solution = a.solution();
        double weighed = weighed(solution, salt);
        if (weighed <= 0) {
            return Optional.empty();
        }
        for (String ion : salt.ions().keySet()) {
            Optional<Component> strong = a.recipe().library().ion(ion);
            m.put(ion, strong.isPresent() ? solution.totals().getOrDefault(strong.get(), 0.0)
                    : weighed / solution.waterKg());
        }
        return Optional.of(m);
    }

    /** Moles of the salt's own forms in the recipe, per basis. */
    private static double weighed(Solution solution, SaltSolubility salt) {
        double n = 0;
        for (Map.Entry<Ingredient, Double> e : solution.moles().entrySet()) {
            if (salt.forms().contains(e.getKey().substance().name())) {
                n += e.getValue();
            }
        }
        return n;
    }
}
