package org.protolyte.rules;

import java.util.List;
import java.util.Optional;

import org.protolyte.analysis.ConditionResult;
import org.protolyte.analysis.FormulationAnalysis;
import org.protolyte.chemistry.Thermo;
import org.protolyte.document.Formulation;

/** Which condition a rule judges: the one its parameters name, else "use", else every determinate one. */
final class Conditions {
    private Conditions() {
    }

    static List<ConditionResult> judged(FormulationAnalysis a, Rule rule) {
        Optional<String> named = rule.text("condition");
        List<ConditionResult> determinate = a.conditions().stream().filter(ConditionResult::determinate).toList();
        if (named.isPresent()) {
            return determinate.stream().filter(c -> c.condition().name().equals(named.get())).toList();
        }
        List<ConditionResult> use = determinate.stream().filter(c -> c.condition().name().equals("use")).toList();
        return use.isEmpty() ? determinate : use;
    }

    /** The determinate condition at the pH target's temperature. */
    static Optional<ConditionResult> atTarget(FormulationAnalysis a) {
        Optional<Formulation.PhTarget> target = a.recipe().formulation().pHTarget();
        if (target.isEmpty()) {
            return Optional.empty();
        }
        return a.conditions().stream().filter(c -> Formulation.sameTemperature(c.condition().kelvin(), target.get().kelvin()))
                .filter(ConditionResult::determinate).findFirst();
    }

    static String pointer(ConditionResult c) {
        return c.condition().pointer();
    }

    static double celsius(ConditionResult c) {
        return c.condition().kelvin() - Thermo.KELVIN_OFFSET;
    }

    /**
     * "; limit ±0.30" (after {@code separator}) for a limit on a change; nothing for a zero limit, which a pack sets to
     * report every change (a note), so that no message reads "limit ±0.00".
     */
    static String limit(String separator, double max) {
        return max > 0 ? String.format(java.util.Locale.ROOT, "%s limit ±%.2f", separator, max) : "";
    }
}
