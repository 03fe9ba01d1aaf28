package org.protolyte.rules;

import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.protolyte.analysis.FormulationAnalysis;
import org.protolyte.recipe.Ingredient;
import org.protolyte.recipe.Solution;
import org.protolyte.substance.LookupException;
import org.protolyte.substance.Substance;
import org.protolyte.units.Dimension;
import org.protolyte.units.Quantity;

/**
 * The concentration of one substance, or the total of one acid–base system, at most {@code max}
 * (mmol/L or g/L style units), per litre of solution at the make-up temperature.
 */
public final class ConcentrationLimit implements CheckKind {

    @Override
    public String id() {
        return "concentration-limit";
    }

    @Override
    public String summary() {
        return "a component's concentration is within the pack's limit";
    }

    @Override
    public List<Finding> check(FormulationAnalysis a, Rule rule) {
        Quantity max = Quantity.parse(rule.text("max").orElseThrow());
        Solution s = a.solution();
        double litres = s.volumeLitres(a.recipe().makeUpKelvin());
        Optional<String> system = rule.text("system");
        Optional<Substance> substance = Optional.empty();
        if (system.isEmpty()) {
            try {
                substance = Optional.of(a.recipe().library().lookup(rule.text("substance").orElseThrow()));
            } catch (LookupException e) {
                // caught: the library does not hold the rule's substance, so no document can contain it: nothing to judge
                return List.of();
            }
        }
        double moles = 0;
        double grams = 0;
        Ingredient first = null;
        for (Ingredient ing : a.recipe().ingredients()) {
            Substance sub = ing.substance();
            double n = s.moles().getOrDefault(ing, 0.0);
            double count = system.isPresent()
                    ? sub.composition().systems().stream().filter(p -> p.system().equals(system.get()))
                    .mapToDouble(p -> p.count()).sum()
                    : sub.name().equals(substance.get().name()) ? 1 : 0;
            if (count > 0 && n > 0) {
                moles += n * count;
                grams += n * count * sub.molarMass().orElse(Double.NaN);
                first = first == null ? ing : first;
            }
        }
        if (first == null) {
            return List.of();
        }
        boolean perMole = max.dimension() == Dimension.AMOUNT_CONCENTRATION;
        double value = (perMole ? moles : grams) / litres;
        if (value <= max.base()) {
            return List.of();
        }
        String what = system.isPresent() ? "total " + system.get() : substance.orElseThrow().name();
        String shown = perMole ? String.format(Locale.ROOT, "%.3g mmol/L", value * 1000)
                : String.format(Locale.ROOT, "%.3g g/L", value);
        return List.of(rule.finding(a.recipe().formulation(), first.line().pointer(), String.format(Locale.ROOT,
                "%s is %s; limit %s", what, shown, max)));
    }
}
