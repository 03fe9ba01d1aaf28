package org.protolyte.rules;

import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.protolyte.analysis.BufferContribution;
import org.protolyte.analysis.ConditionResult;
import org.protolyte.analysis.FormulationAnalysis;
import org.protolyte.document.Formulation;

/**
 * The system that carries the buffering has a pKa, at the target's temperature, within {@code maxDistance}
 * of the target pH: a weak acid buffers well only within about one unit of its pKa, where β is at least a
 * third of its maximum (Van Slyke's β = ln10·C·Ka[H]/(Ka+[H])²).
 */
public final class PkaNearTarget implements CheckKind {

    @Override
    public String id() {
        return "pka-near-target";
    }

    @Override
    public String summary() {
        return "the main buffering system's pKa at the target temperature is near the target pH";
    }

    @Override
    public List<Finding> check(FormulationAnalysis a, Rule rule) {
        Formulation f = a.recipe().formulation();
        Optional<ConditionResult> at = Conditions.atTarget(a);
        if (at.isEmpty() || at.get().mainBuffer().isEmpty() || !Double.isFinite(f.pHTarget().orElseThrow().midpoint())) {
            return List.of();
        }
        double target = f.pHTarget().orElseThrow().midpoint();
        double max = rule.number("maxDistance", 1.0);
        BufferContribution b = at.get().mainBuffer().get();
        if (b.open()) {
            return List.of();   // an open system (bicarbonate under CO2) buffers on above its pKa
        }
        double distance = Math.abs(b.nearestPKa() - target);
        if (distance <= max) {
            return List.of();
        }
        return List.of(rule.finding(f, f.pHTarget().get().pointer(), String.format(Locale.ROOT,
                "the main buffering system, %s (%.0f %% of β), has %spKa %.2f at %.0f °C, %.2f from the target pH %.2f "
                        + "(limit %.2f)", b.system(), b.share() * 100,
                b.apparent() ? "an apparent (complexes included) " : "", b.nearestPKa(), Conditions.celsius(at.get()),
                distance, target, max)));
    }
}
