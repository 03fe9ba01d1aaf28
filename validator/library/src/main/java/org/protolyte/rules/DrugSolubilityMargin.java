package org.protolyte.rules;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.protolyte.analysis.DrugSolubility;
import org.protolyte.analysis.FormulationAnalysis;
import org.protolyte.recipe.Ingredient;

/**
 * Each drug substance stays below {@code maxFraction} (default 1) of its solubility at every condition, with room for
 * the uncertainty: log10(dissolved/solubility) + {@code coverage} (default 2) × its standard uncertainty must not pass
 * log10 maxFraction. The product's conditions and every admixture (the product in its receiving fluid) are judged
 * alike. One finding per drug, at its line, for the condition or admixture with the least room, naming each; a solid's
 * constant used outside the temperatures of its data is said so.
 */
public final class DrugSolubilityMargin implements CheckKind {

    @Override
    public String id() {
        return "drug-solubility-margin";
    }

    @Override
    public String summary() {
        return "each drug substance stays dissolved, with margin, at every condition";
    }

    @Override
    public List<Finding> check(FormulationAnalysis a, Rule rule) {
        double max = rule.number("maxFraction", 1.0);
        double k = rule.number("coverage", 2.0);
        double limit = Math.log10(max);
        List<Finding> out = new ArrayList<>();
        for (DrugSolubility d : a.drugs()) {
            DrugSolubility.AtCondition worst = null;
            List<String> all = new ArrayList<>();
            List<DrugSolubility.AtCondition> judged = new ArrayList<>(d.conditions());
            a.admixtures().forEach(m -> m.drugs().stream().filter(x -> x.drug().name().equals(d.drug().name()))
                    .forEach(x -> judged.addAll(x.conditions())));
            for (DrugSolubility.AtCondition x : judged) {
                double bound = x.log10Fraction() + k * x.uncertainty();
                all.add(String.format(Locale.ROOT, "%s %.0f %% (up to %.0f %%%s)", x.condition(), 100 * x.fraction(),
                        100 * Math.pow(10, bound), x.inRange() ? "" : ", extrapolated"));
                if (bound > limit && (worst == null || bound > worst.log10Fraction() + k * worst.uncertainty())) {
                    worst = x;
                }
            }
            if (worst == null) {
                continue;
            }
            String where = worst.log10Fraction() > limit ? "exceeds" : "may exceed, within its uncertainty,";
            out.add(rule.finding(a.recipe().formulation(), pointer(a, d), String.format(Locale.ROOT,
                    "%s %s %.0f %% of its solubility: %s (pH %.2f) %.3g mmol/L is dissolved, %.0f %% of the "
                    + "%.3g mmol/L that %s allows (log10 ± %.2f, coverage %.1f); by condition: %s", d.drug().name(),
                    where, 100 * max, (worst.condition().startsWith("into ") ? "mixed " : "at ") + worst.condition(),
                    worst.pH(), worst.dissolved() * 1000, 100 * worst.fraction(),
                    worst.solubility() * 1000, worst.limiting().name(), worst.uncertainty(), k,
                    String.join("; ", all))));
        }
        return out;
    }

    /** The first line that brings the drug's system, else the document. */
    private static String pointer(FormulationAnalysis a, DrugSolubility d) {
        for (Ingredient i : a.recipe().ingredients()) {
            if (i.substance().composition().systems().stream().anyMatch(p -> p.system().equals(d.drug().system()
                    .name()))) {
                return i.line().pointer();
            }
        }
        return "";
    }
}
