package org.protolyte.rules;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.protolyte.analysis.FormulationAnalysis;
import org.protolyte.analysis.TitratableAcidity;

/**
 * The strong base or acid needed to bring the product to pH 7.4 at 37 °C stays within {@code maxPerLitre}
 * (mmol/L) and, where the document gives a dose, {@code maxPerDose} (mmol): what the body must neutralise.
 */
public final class TitratableAcidityLimit implements CheckKind {

    @Override
    public String id() {
        return "titratable-acidity-limit";
    }

    @Override
    public String summary() {
        return "the titratable acidity or alkalinity to pH 7.4 is within the pack's limit";
    }

    @Override
    public List<Finding> check(FormulationAnalysis a, Rule rule) {
        if (a.titratableAcidity().isEmpty()) {
            return List.of();
        }
        TitratableAcidity t = a.titratableAcidity().get();
        String kind = t.mmolPerLitre() >= 0 ? "acidity (base needed)" : "alkalinity (acid needed)";
        List<Finding> out = new ArrayList<>();
        double perLitre = Math.abs(t.mmolPerLitre());
        double maxPerLitre = rule.number("maxPerLitre", Double.POSITIVE_INFINITY);
        if (perLitre > maxPerLitre) {
            out.add(rule.finding(a.recipe().formulation(), "", String.format(Locale.ROOT,
                    "titratable %s to pH 7.4 at 37 °C is %.3g mmol/L; limit %.3g", kind, perLitre, maxPerLitre)));
        }
        double maxPerDose = rule.number("maxPerDose", Double.POSITIVE_INFINITY);
        if (t.mmolPerDose().isPresent() && Math.abs(t.mmolPerDose().getAsDouble()) > maxPerDose) {
            out.add(rule.finding(a.recipe().formulation(), "/dose", String.format(Locale.ROOT,
                    "titratable %s to pH 7.4 at 37 °C is %.3g mmol per dose; limit %.3g", kind,
                    Math.abs(t.mmolPerDose().getAsDouble()), maxPerDose)));
        }
        return out;
    }
}
