package org.protolyte.rules;

import java.util.List;

import org.protolyte.analysis.FormulationAnalysis;
import org.protolyte.recipe.Ingredient;

/** A recipe with bicarbonate or carbonate states the CO2 atmosphere of at least one condition. */
public final class BicarbonateNeedsCo2 implements CheckKind {

    @Override
    public String id() {
        return "bicarbonate-needs-co2";
    }

    @Override
    public String summary() {
        return "a bicarbonate-buffered recipe states the CO2 level it is used under";
    }

    @Override
    public List<Finding> check(FormulationAnalysis a, Rule rule) {
        var f = a.recipe().formulation();
        if (f.conditions().stream().anyMatch(c -> c.co2Pascal().isPresent())) {
            return List.of();
        }
        String carbonDioxide = a.recipe().library().carbonDioxide().map(s -> s.name()).orElse(null);
        for (Ingredient ing : a.recipe().ingredients()) {
            if (ing.substance().composition().systems().stream().anyMatch(p -> p.system().equals(carbonDioxide))) {
                return List.of(rule.finding(f, ing.line().pointer(), ing.substance().name() + " buffers with CO2, but no "
                        + "condition states a CO2 level: every pH here is for a closed vessel, free of CO2 as made"));
            }
        }
        return List.of();
    }
}
