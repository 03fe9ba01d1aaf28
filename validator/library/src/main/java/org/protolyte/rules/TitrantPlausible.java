package org.protolyte.rules;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.protolyte.analysis.BufferContribution;
import org.protolyte.analysis.ConditionResult;
import org.protolyte.analysis.FormulationAnalysis;
import org.protolyte.analysis.TitrantResult;
import org.protolyte.chemistry.AcidBaseSystem;

/**
 * The q.s. amount makes sense for the buffer as written. Equivalents are counted per titratable proton: a polyprotic
 * acid gives up, between the pH before adjustment and the goal, as many protons as its mean proton number falls by
 * (from its species fractions), and each of those takes one equivalent. Titrating to near a pKa takes a good fraction
 * of the last of them; more than {@code maxEquivalents} per proton means the titrant, not the buffer, sets the pH, and
 * close to a whole one means the recipe converts the buffer into another salt form that could be weighed instead
 * (Tris + 1 eq HCl is Tris-HCl). A protein's groups are not the buffer as written: the buffer is the largest other
 * system, and the protons the protein's groups exchange between the two pH values (each group's mean proton number,
 * as for the buffer) are taken off the q.s. before it is counted in equivalents.
 */
public final class TitrantPlausible implements CheckKind {

    @Override
    public String id() {
        return "titrant-plausible";
    }

    @Override
    public String summary() {
        return "the q.s. amount is plausible for the buffer form as written";
    }

    @Override
    public List<Finding> check(FormulationAnalysis a, Rule rule) {
        double max = rule.number("maxEquivalents", 1.0);
        double nearFull = rule.number("nearFullEquivalent", 0.9);
        List<Finding> out = new ArrayList<>();
        Optional<ConditionResult> first = a.conditions().stream().filter(ConditionResult::determinate).findFirst();
        if (first.isEmpty()) {
            return out;
        }
        List<BufferContribution> proteinGroups = new ArrayList<>();
        Optional<BufferContribution> buffer = Optional.empty();
        for (BufferContribution c : first.get().buffers()) {
            if (a.recipe().library().system(c.system()).map(AcidBaseSystem::bound).orElse(false)) {
                proteinGroups.add(c);
            } else if (buffer.isEmpty() || c.bufferCapacityPerLitre() > buffer.get().bufferCapacityPerLitre()) {
                buffer = Optional.of(c);
            }
        }
        if (buffer.isEmpty()) {
            return out;
        }
        BufferContribution b = buffer.get();
        Optional<AcidBaseSystem> system = a.recipe().library().system(b.system());
        for (TitrantResult t : a.titrants()) {
            if (!t.used() || t.unreachable().isPresent() || system.isEmpty()
                    || !Double.isFinite(t.startPH())) {
                continue;
            }
            int protons = titratableProtons(system.get(), t.goalKelvin(), t.startPH(), t.goalPH());
            double byProtein = 0;
            for (BufferContribution g : proteinGroups) {
                AcidBaseSystem s = a.recipe().library().system(g.system()).orElseThrow();
                byProtein += g.molesPerBasis() * Math.abs(meanProtons(s, t.goalKelvin(), t.startPH())
                        - meanProtons(s, t.goalKelvin(), t.goalPH()));
            }
            double eq = (t.moles() - byProtein) / b.molesPerBasis();
            String pointer = t.ingredient().line().pointer() + "/adjustTo";
            String head = String.format(Locale.ROOT, "q.s. %s is %.3g mmol%s, %.2f equivalents of the %s buffer "
                    + "(%.3g mmol), which has %d titratable proton%s between pH %.2f and %.2f",
                    t.ingredient().substance().name(), t.moles() * 1000, proteinGroups.isEmpty() ? ""
                            : String.format(Locale.ROOT, " (%.3g mmol of it taken by the protein's groups)",
                            byProtein * 1000), eq, b.system(), b.molesPerBasis() * 1000,
                    protons, protons == 1 ? "" : "s", t.startPH(), t.goalPH());
            if (eq > max * protons) {
                out.add(rule.finding(a.recipe().formulation(), pointer, head + String.format(Locale.ROOT,
                        ": more than the %.2f equivalents the buffer can take up there, so excess titrant sets the pH",
                        max * protons)));
            } else if (eq >= protons - 1 + nearFull) {
                out.add(rule.finding(a.recipe().formulation(), pointer, head + ": nearly a whole equivalent per "
                        + "proton, which converts the buffer into another salt form; check that the intended form "
                        + "was written"));
            }
        }
        return out;
    }

    /**
     * Protons the system exchanges between two pH values at a temperature: the change of its mean proton number,
     * from the fractions of its forms (thermodynamic pKa at that temperature), rounded up; at least one.
     */
    static int titratableProtons(AcidBaseSystem system, double kelvin, double fromPH, double toPH) {
        double change = Math.abs(meanProtons(system, kelvin, fromPH) - meanProtons(system, kelvin, toPH));
        return Math.max(1, (int) Math.ceil(change - 1e-6));
    }

    /**
     * Mean number of protons bound at a pH: the form with p protons has weight 10^(Σ pKa of the p most basic steps −
     * p·pH) (steps listed most acidic first).
     */
    static double meanProtons(AcidBaseSystem system, double kelvin, double pH) {
        int n = system.steps().size();
        double[] logWeight = new double[n + 1];
        double sum = 0;
        for (int p = 1; p <= n; p++) {
            sum += system.steps().get(n - p).pKa(kelvin);
            logWeight[p] = sum - p * pH;
        }
        double top = java.util.Arrays.stream(logWeight).max().orElse(0);
        double total = 0;
        double bound = 0;
        for (int p = 0; p <= n; p++) {
            double w = Math.pow(10, logWeight[p] - top);
            total += w;
            bound += p * w;
        }
        return bound / total;
    }
}
