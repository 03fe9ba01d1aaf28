package org.protolyte.rules;

import java.util.List;

import org.protolyte.analysis.FormulationAnalysis;
import org.protolyte.document.Formulation;

/** A pH target states the temperature at which it holds (USP &lt;791&gt;, Ph. Eur. 2.2.3); else 25 °C is assumed. */
public final class PhTargetTemperatureStated implements CheckKind {

    @Override
    public String id() {
        return "ph-target-temperature-stated";
    }

    @Override
    public String summary() {
        return "the pH target states the temperature at which it holds";
    }

    @Override
    public List<Finding> check(FormulationAnalysis a, Rule rule) {
        Formulation f = a.recipe().formulation();
        return f.pHTarget().filter(t -> !t.temperatureStated())
                .map(t -> List.of(rule.finding(f, t.pointer(), "the pH target states no temperature; 25 °C is assumed")))
                .orElse(List.of());
    }
}
