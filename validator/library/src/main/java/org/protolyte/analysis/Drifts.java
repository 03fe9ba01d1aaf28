package org.protolyte.analysis;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;

import org.protolyte.chemistry.AcidBaseSystem;
import org.protolyte.chemistry.EquilibriumState;
import org.protolyte.chemistry.Thermo;
import org.protolyte.document.Formulation;
import org.protolyte.recipe.Recipe;

/** The pH changes between a recipe's conditions that a report shows, each with its main cause ({@link Drift}). */
final class Drifts {

    private Drifts() {
    }

    private static boolean isReference(Formulation.Condition c) {
        return c.name().equals("preparation") || c.name().equals("use");
    }

    /**
     * pH change between the pairs of conditions that matter, in document order, with its main cause: every pair that
     * holds a reference condition (the first, one named "preparation" or "use", or the first at the pH target's
     * temperature). At most four lines per condition, where every pair would give a report quadratic in the conditions.
     */
    static List<Drift> of(Recipe recipe, List<ConditionResult> results) {
        List<Drift> out = new ArrayList<>();
        Optional<Formulation.PhTarget> target = recipe.formulation().pHTarget();
        int atTarget = -1;
        for (int i = 0; i < results.size() && target.isPresent() && atTarget < 0; i++) {
            if (Formulation.sameTemperature(results.get(i).condition().kelvin(), target.get().kelvin())) {
                atTarget = i;
            }
        }
        for (int i = 0; i < results.size(); i++) {
            for (int j = i + 1; j < results.size(); j++) {
                ConditionResult a = results.get(i);
                ConditionResult b = results.get(j);
                boolean reference = i == 0 || i == atTarget || j == atTarget
                        || isReference(a.condition()) || isReference(b.condition());
                if (!reference || !a.determinate() || !b.determinate()) {
                    continue;
                }
                double ta = a.condition().kelvin();
                double tb = b.condition().kelvin();
                double mid = (ta + tb) / 2;
                // a system that carries less of β than water's own H+ and OH- (an unbuffered solution) is not the
                // cause, however small the share that would otherwise win
                EquilibriumState sa = a.state().orElseThrow();
                double water = Thermo.LN10 * (sa.hydrogenMolality() + sa.hydroxideMolality()) / sa.bufferCapacity();
                Optional<String> cause = Optional.empty();
                double slope = 0;
                double share = 0;
                double weight = -1;
                for (BufferContribution bc : a.buffers()) {
                    AcidBaseSystem sys = recipe.library().system(bc.system()).orElseThrow();
                    double nearest = bc.nearestPKa();
                    // the step whose pKa is nearest the pH carries the buffering; its slope at the mean temperature
                    DissociationStepSlope d = DissociationStepSlope.of(sys, nearest, ta, mid);
                    if (bc.share() > water && bc.share() * Math.abs(d.slope()) > weight) {
                        weight = bc.share() * Math.abs(d.slope());
                        cause = Optional.of(bc.system());
                        slope = d.slope();
                        share = bc.share();
                    }
                }
                OptionalDouble ca = a.condition().co2Pascal();
                OptionalDouble cb = b.condition().co2Pascal();
                Optional<String> co2 = ca.equals(cb) ? Optional.empty()
                        : Optional.of("CO2 " + co2Text(ca) + " → " + co2Text(cb));
                out.add(new Drift(a.condition().name(), b.condition().name(), ta - Thermo.KELVIN_OFFSET,
                        tb - Thermo.KELVIN_OFFSET, b.state().orElseThrow().pH() - a.state().orElseThrow().pH(), cause,
                        slope, share, co2));
            }
        }
        return out;
    }

    private static String co2Text(OptionalDouble pascal) {
        return pascal.isPresent() ? String.format(Locale.ROOT, "%.3g kPa", pascal.getAsDouble() / 1000) : "closed";
    }
}
