package org.protolyte.rules;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.protolyte.analysis.ConditionResult;
import org.protolyte.analysis.FormulationAnalysis;
import org.protolyte.chemistry.Thermo;
import org.protolyte.document.Formulation;

/**
 * The calculated pH at the target's temperature lies within the document's pH target. USP &lt;791&gt; and
 * Ph. Eur. 2.2.3 state pH at a stated temperature, which is why the target's temperature is used.
 */
public final class PhWithinTarget implements CheckKind {

    @Override
    public String id() {
        return "ph-within-target";
    }

    @Override
    public String summary() {
        return "the calculated pH at the target temperature lies within the pH target";
    }

    @Override
    public List<Finding> check(FormulationAnalysis a) {
        Formulation f = a.recipe().formulation();
        List<Finding> out = new ArrayList<>();
        if (f.pHTarget().isEmpty()) {
            return out;
        }
        Formulation.PhTarget target = f.pHTarget().get();
        Optional<ConditionResult> at = a.conditions().stream()
                .filter(c -> Math.abs(c.condition().kelvin() - target.kelvin()) < 0.005)
                .filter(ConditionResult::determinate).findFirst();
        if (at.isEmpty()) {
            return out;
        }
        double pH = at.get().state().orElseThrow().pH();
        if (!target.contains(pH)) {
            double t = target.kelvin() - Thermo.KELVIN_OFFSET;
            String range = Double.isInfinite(target.min()) ? String.format(Locale.ROOT, "at most %.2f", target.max())
                    : Double.isInfinite(target.max()) ? String.format(Locale.ROOT, "at least %.2f", target.min())
                    : String.format(Locale.ROOT, "%.2f to %.2f", target.min(), target.max());
            out.add(new Finding(id(), Severity.ERROR, String.format(Locale.ROOT,
                    "calculated pH %.2f at %.0f °C is outside the target (%s at %.0f °C); change the buffer ratio "
                            + "or adjust the pH with a titrant (adjustTo)", pH, t, range, t),
                    Optional.of(target.pointer()), f.document().locate(target.pointer())));
        }
        if (!target.temperatureStated()) {
            out.add(new Finding("ph-target-temperature-stated", Severity.WARNING,
                    "the pH target states no temperature; 25 °C is assumed. USP <791> and Ph. Eur. 2.2.3 expect pH "
                            + "at a stated temperature, and a buffer's pH moves with temperature",
                    Optional.of(target.pointer()), f.document().locate(target.pointer())));
        }
        return out;
    }
}
