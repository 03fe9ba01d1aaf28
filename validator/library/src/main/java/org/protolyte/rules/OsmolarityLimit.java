package org.protolyte.rules;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.protolyte.analysis.ConditionResult;
import org.protolyte.analysis.FormulationAnalysis;

/**
 * Osmolarity (mOsm per litre of solution) at most {@code max} in what reaches the vein: every admixture the document
 * declares (the product as mixed into its receiving fluid), or, where it declares none, the product itself at its
 * judged conditions.
 */
public final class OsmolarityLimit implements CheckKind {

    @Override
    public String id() {
        return "osmolarity-limit";
    }

    @Override
    public String summary() {
        return "the osmolarity of the product and of each admixture stays within the pack's limit";
    }

    @Override
    public List<Finding> check(FormulationAnalysis a, Rule rule) {
        double max = rule.number("max", Double.POSITIVE_INFINITY);
        List<Finding> out = new ArrayList<>();
        if (a.admixtures().isEmpty()) {
            for (ConditionResult c : Conditions.judged(a, rule)) {
                over(a, rule, c, "at " + c.condition().name(), Conditions.pointer(c), max, out);
            }
        }
        for (FormulationAnalysis.Admixed m : a.admixtures()) {
            if (m.result().determinate()) {
                over(a, rule, m.result(), "mixed " + m.result().condition().name(), m.admixture().pointer(), max, out);
            }
        }
        return out;
    }

    private static void over(FormulationAnalysis a, Rule rule, ConditionResult c, String where, String pointer,
                             double max, List<Finding> out) {
        double mOsm = c.osmolarity() * 1000;
        if (mOsm > max) {
            out.add(rule.finding(a.recipe().formulation(), pointer, String.format(Locale.ROOT,
                    "osmolarity %s (%.0f °C) is %.0f mOsm/L; limit %.0f mOsm/L", where, Conditions.celsius(c), mOsm,
                    max)));
        }
    }
}
