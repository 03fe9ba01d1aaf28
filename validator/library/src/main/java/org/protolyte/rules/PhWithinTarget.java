package org.protolyte.rules;

import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.protolyte.analysis.ConditionResult;
import org.protolyte.analysis.FormulationAnalysis;
import org.protolyte.chemistry.Thermo;
import org.protolyte.document.Formulation;

/**
 * The calculated pH at the target's temperature lies within the document's pH target. USP &lt;791&gt; and
 * Ph. Eur. 2.2.3 state pH at a stated temperature, which is why the target's temperature is used. A closed solution
 * with almost no buffer capacity (below {@code unbufferedBelow}, default 1 mmol/L per pH, common practice) takes the
 * pH its dissolved CO2 gives it: its finding gives the range from closed to air-equilibrated and says that the target
 * was judged closed, as the document states it.
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
    public List<Finding> check(FormulationAnalysis a, Rule rule) {
        Formulation f = a.recipe().formulation();
        Optional<ConditionResult> at = Conditions.atTarget(a);
        if (at.isEmpty()) {
            return List.of();
        }
        Formulation.PhTarget target = f.pHTarget().orElseThrow();
        double pH = at.get().state().orElseThrow().pH();
        if (target.contains(pH)) {
            return List.of();
        }
        double t = target.kelvin() - Thermo.KELVIN_OFFSET;
        String range = Double.isInfinite(target.min()) ? String.format(Locale.ROOT, "at most %.2f", target.max())
                : Double.isInfinite(target.max()) ? String.format(Locale.ROOT, "at least %.2f", target.min())
                : String.format(Locale.ROOT, "%.2f to %.2f", target.min(), target.max());
        ConditionResult c = at.get();
        double beta = c.bufferCapacityPerLitre() * 1000;
        double unbuffered = rule.number("unbufferedBelow", 1.0);
        if (c.condition().co2Pascal().isEmpty() && beta < unbuffered && c.pHInAir().isPresent()) {
            double air = c.pHInAir().getAsDouble();
            return List.of(rule.finding(f, target.pointer(), String.format(Locale.ROOT,
                    "pH at %.0f °C is %.2f closed and free of CO2, target %s; the solution is unbuffered (β %.2g mmol/L "
                            + "per pH, below %.2g), so dissolved CO2 and traces set its pH: between %.2f closed and "
                            + "%.2f in room air (%s the target), depending on handling. The target is judged for the "
                            + "closed, CO2-free solution the condition '%s' states; if it is meant for the solution as "
                            + "made in air, give that condition \"co2\": \"air\"", t, pH, range, beta, unbuffered,
                    pH, air, target.contains(air) ? "within" : "also outside", c.condition().name())));
        }
        String main = at.get().mainBuffer().map(b -> String.format(Locale.ROOT, "; %s carries %.0f %% of the buffering",
                b.system(), b.share() * 100)).orElse("");
        // named only where it shows at the three decimals printed (no "-0.000 per +1 %")
        String lever = a.targetSensitivities().stream().findFirst().filter(x -> Math.abs(x.dpHPerPercent()) >= 0.0005)
                .map(x -> String.format(Locale.ROOT, "; the pH moves most with %s (%+.3f per +1 %%)", x.substance(),
                        x.dpHPerPercent())).orElse("");
        String setpoint = a.titrants().stream().filter(x -> x.setpointForTarget().isPresent()).findFirst()
                .map(x -> String.format(Locale.ROOT, "; adjusting to pH %.2f at %.0f °C instead of %.2f would meet it",
                        x.setpointForTarget().getAsDouble(), x.adjustKelvin() - Thermo.KELVIN_OFFSET, x.goalPH())).orElse("");
        String co2 = at.get().co2ForTarget().isPresent() ? String.format(Locale.ROOT,
                "; a CO2 level of %.3g kPa (%.2g %% at standard pressure) would give pH %.2f with this bicarbonate",
                at.get().co2ForTarget().getAsDouble() / 1000, at.get().co2ForTarget().getAsDouble() / 1013.25,
                target.midpoint()) : "";
        String u = at.get().uncertainty().map(x -> String.format(Locale.ROOT, " ± %.2f", x.pH())).orElse("");
        return List.of(rule.finding(f, target.pointer(), String.format(Locale.ROOT,
                "pH at %.0f °C is %.2f%s, target %s%s%s%s%s", t, pH, u, range, main, lever, setpoint, co2)));
    }
}
