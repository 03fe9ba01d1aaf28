package org.protolyte.chemistry;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * An ionizable drug substance whose dissolved amount is limited by its solids: the free form, of intrinsic solubility
 * S0 (the activity of its dissolved neutral form at saturation, {@code freeForm}), and any salts, each with its
 * solubility product. At a pH and temperature, with the activity coefficients and the counterions' activities held,
 * the total that a solid allows is
 * <pre>
 *   S_solid(pH) = a_k,sat / (γ_k · f_k(pH)),   a_k,sat = (Ksp / Π a_X^ν_X)^(1/ν_k)
 * </pre>
 * where k is the drug's form in that solid (ν_k of it) and f_k its fraction among the drug's forms, from the cumulative
 * formation constants: w_p = 10^(Σ pKa of the p most basic steps − p·pH) / γ_p, f_k = w_k / Σ w_p. For the free form
 * Ksp = S0 and the profile is Henderson–Hasselbalch's: a monoprotic acid HA gives S = S0 (1 + 10^(pH − pKa)), a base
 * S = S0 (1 + 10^(pKa − pH)) (γ = 1). The solubility is the least of the solids' totals; the pH where the free form's
 * and a salt's meet is that salt's pHmax (common practice).
 *
 * @param system    the drug's acid–base system, most protonated form first
 * @param freeForm  the solid of the uncharged drug: it dissolves into one form of the system, once
 * @param salts     salts of the drug: each dissolves into one form of the system and counterions (or H+)
 * @param deltaHUncertainty u(ΔH°) of each solid's dissolution, J/mol, by solid name
 */
public record DrugSubstance(String name, AcidBaseSystem system, SolidPhase freeForm, List<SolidPhase> salts,
                            Map<String, Double> deltaHUncertainty) {

    public DrugSubstance {
        salts = List.copyOf(salts);
        deltaHUncertainty = Map.copyOf(deltaHUncertainty);
        for (SolidPhase p : concat(freeForm, salts)) {
            if (formIn(system, p) < 0) {
                throw new IllegalArgumentException("the solid " + p.name() + " dissolves into no form of "
                        + system.name() + ", or into more than one");
            }
        }
        if (freeForm.ions().size() != 1) {
            throw new IllegalArgumentException("the free form of " + name + " must dissolve into one form of "
                    + system.name() + " alone");
        }
    }

    private static List<SolidPhase> concat(SolidPhase first, List<SolidPhase> rest) {
        List<SolidPhase> all = new ArrayList<>(List.of(first));
        all.addAll(rest);
        return all;
    }

    /** Every solid: the free form first, then the salts. */
    public List<SolidPhase> solids() {
        return concat(freeForm, salts);
    }

    /** The index of the system's form the solid dissolves into; −1 where none or several. */
    static int formIn(AcidBaseSystem system, SolidPhase p) {
        int found = -1;
        for (int k = 0; k < system.forms().size(); k++) {
            if (p.ions().containsKey(system.forms().get(k).name())) {
                if (found >= 0) {
                    return -1;
                }
                found = k;
            }
        }
        return found;
    }

    /**
     * The medium the drug dissolves in, held while the pH moves: its temperature, each form's activity coefficient
     * (by form name; 1 where absent) and the activity of every other ion a salt dissolves into (absent: no such ion,
     * the salt cannot form).
     */
    public record Medium(double kelvin, Map<String, Double> gamma, Map<String, Double> activities) {
        public Medium {
            gamma = Map.copyOf(gamma);
            activities = Map.copyOf(activities);
        }

        /** Ideal: γ = 1, no counterions. */
        public static Medium ideal(double kelvin) {
            return new Medium(kelvin, Map.of(), Map.of());
        }

        /** The medium of a solved equilibrium: its γ and free activities. */
        public static Medium of(EquilibriumState s) {
            Map<String, Double> g = new HashMap<>();
            Map<String, Double> a = new HashMap<>();
            for (SpeciesAmount x : s.species()) {
                g.put(x.species().name(), x.activityCoefficient());
                if (x.molality() > 0) {
                    a.put(x.species().name(), x.activityCoefficient() * x.molality());
                }
            }
            return new Medium(s.kelvin(), g, a);
        }

        double gamma(String form) {
            return gamma.getOrDefault(form, 1.0);
        }
    }

    /** What one solid allows at a pH: the total (mol/kg) and log10 of it; empty where its counterion is absent. */
    public OptionalDouble solubility(SolidPhase solid, double pH, Medium m) {
        int k = formIn(system, solid);
        String form = system.forms().get(k).name();
        double nu = solid.ions().get(form);
        double logIap = 0;   // of everything but the drug's form
        for (Map.Entry<String, Double> e : solid.ions().entrySet()) {
            if (e.getKey().equals(form)) {
                continue;
            }
            if (e.getKey().equals(SolidPhase.HYDROGEN)) {
                logIap -= e.getValue() * pH;
                continue;
            }
            Double a = m.activities().get(e.getKey());
            if (a == null || !(a > 0)) {
                return OptionalDouble.empty();
            }
            logIap += e.getValue() * Math.log10(a);
        }
        double logActivity = (solid.log10Ksp(m.kelvin()) - logIap) / nu;
        return OptionalDouble.of(logActivity - Math.log10(m.gamma(form)) - Math.log10(fractions(pH, m)[k]));
    }

    /**
     * Standard uncertainty of log10 of what a solid allows at a pH, to first order, its terms taken as independent:
     * log10 Ksp's (divided by ν_k, with u(ΔH°)·|1/T − 1/θ|/(R ln 10) away from 25 °C), each pKa's at the temperature
     * (its u and its u(ΔH°) and u(ΔCp°) terms), times ∂log10 f_k/∂pKa_j = [j ≥ k] − Σ_(m ≤ j) f_m, and the pH's,
     * times ∂log10 f_k/∂pH = n̄ − p_k (mean protons bound, less those of form k).
     */
    public double log10Uncertainty(SolidPhase solid, double pH, double pHUncertainty, Medium m) {
        int k = formIn(system, solid);
        double nu = solid.ions().get(system.forms().get(k).name());
        double t = m.kelvin();
        double uK = solid.solubility().uncertainty();
        double uT = deltaHUncertainty.getOrDefault(solid.name(), 0.0) / (Thermo.R * Thermo.LN10)
                * Math.abs(1 / t - 1 / Thermo.T_REF);
        double sum = (uK * uK + uT * uT) / (nu * nu);
        double[] f = fractions(pH, m);
        int n = system.steps().size();
        double below = 0;   // Σ_(m ≤ j) f_m
        for (int j = 0; j < n; j++) {
            below += f[j];
            DissociationStep step = system.steps().get(j);
            double uH = DissociationStep.pKaChangeFromDeltaH(step.deltaHUncertainty(), t);
            double uCp = DissociationStep.pKaChangeFromDeltaCp(step.deltaCpUncertainty(), t);
            double uPKa2 = step.uncertainty() * step.uncertainty() + uH * uH + uCp * uCp;
            double d = (j >= k ? 1 : 0) - below;
            sum += d * d * uPKa2;
        }
        double meanProtons = 0;
        for (int x = 0; x <= n; x++) {
            meanProtons += f[x] * (n - x);
        }
        double dpH = meanProtons - (n - k);
        sum += dpH * dpH * pHUncertainty * pHUncertainty;
        return Math.sqrt(sum);
    }

    /** The least of the solids' log10 totals at a pH, and which solid sets it. */
    public record Limit(SolidPhase solid, double log10Molality) {
    }

    public Limit solubility(double pH, Medium m) {
        Limit best = null;
        for (SolidPhase p : solids()) {
            OptionalDouble s = solubility(p, pH, m);
            if (s.isPresent() && (best == null || s.getAsDouble() < best.log10Molality())) {
                best = new Limit(p, s.getAsDouble());
            }
        }
        return best;   // never null: the free form has no counterion
    }

    /**
     * Each form's fraction at a pH, most protonated first: w_p = 10^(Σ pKa of the p most basic steps − p·pH) / γ.
     */
    public double[] fractions(double pH, Medium m) {
        int n = system.steps().size();
        double[] log = new double[n + 1];
        double sum = 0;
        for (int p = 0; p <= n; p++) {
            int k = n - p;   // the form with p protons more than the least protonated
            if (p > 0) {
                sum += system.steps().get(k).pKa(m.kelvin());
            }
            log[k] = sum - p * pH - Math.log10(m.gamma(system.forms().get(k).name()));
        }
        double top = java.util.Arrays.stream(log).max().orElseThrow();
        double total = 0;
        double[] f = new double[n + 1];
        for (int k = 0; k <= n; k++) {
            f[k] = Math.pow(10, log[k] - top);
            total += f[k];
        }
        for (int k = 0; k <= n; k++) {
            f[k] /= total;
        }
        return f;
    }

    /**
     * The pH at which a salt and the free form limit the solubility together, where it lies in 0–14: the salt's
     * pHmax, found by bisection on log S_free − log S_salt, which changes sign there; empty where the salt's
     * counterion is absent or they do not cross.
     */
    public OptionalDouble pHMax(SolidPhase salt, Medium m) {
        java.util.function.DoubleUnaryOperator gap = pH -> solubility(freeForm, pH, m).getAsDouble()
                - solubility(salt, pH, m).orElse(Double.NaN);
        return crossing(gap, 0, 14);
    }

    /**
     * The range of pH in 0–14 in which {@code molality} of the drug stays dissolved, the one holding or nearest
     * {@code pH}: its ends where the solubility falls to the amount (empty at an end the range reaches, 0 or 14);
     * empty altogether where the amount exceeds the solubility everywhere.
     */
    public Optional<Window> window(double molality, double pH, Medium m) {
        double log = Math.log10(molality);
        java.util.function.DoubleUnaryOperator room = x -> solubility(x, m).log10Molality() - log;
        int steps = 1400;   // a grid of 0.01 pH, then bisection to 1e-9 at each end
        double best = Double.NaN;
        for (int i = 0; i <= steps; i++) {
            double x = 14.0 * i / steps;
            if (room.applyAsDouble(x) >= 0 && (Double.isNaN(best) || Math.abs(x - pH) < Math.abs(best - pH))) {
                best = x;
            }
        }
        if (Double.isNaN(best)) {
            return Optional.empty();
        }
        OptionalDouble low = OptionalDouble.empty();
        for (double x = best; x > 0; x -= 0.01) {
            double lo = Math.max(0, x - 0.01);
            if (room.applyAsDouble(lo) < 0) {
                low = crossing(room, lo, x);
                break;
            }
        }
        OptionalDouble high = OptionalDouble.empty();
        for (double x = best; x < 14; x += 0.01) {
            double hi = Math.min(14, x + 0.01);
            if (room.applyAsDouble(hi) < 0) {
                high = crossing(room, x, hi);
                break;
            }
        }
        return Optional.of(new Window(low, high));
    }

    /** Where the drug stays dissolved: above {@code low} and below {@code high}; an empty end is open in 0–14. */
    public record Window(OptionalDouble low, OptionalDouble high) {
    }

    /** The root of f between lo and hi, where f changes sign there; empty otherwise. */
    private static OptionalDouble crossing(java.util.function.DoubleUnaryOperator f, double lo, double hi) {
        double fLo = f.applyAsDouble(lo);
        double fHi = f.applyAsDouble(hi);
        if (!(Math.signum(fLo) * Math.signum(fHi) < 0)) {
            return OptionalDouble.empty();
        }
        RootFinder.Function g = new RootFinder.Function() {
            @Override
            public double value(double x) {
                return f.applyAsDouble(x);
            }

            @Override
            public double slope() {
                return Double.NaN;   // bisection steps
            }
        };
        return OptionalDouble.of(RootFinder.solve(g, lo, fLo, hi, fHi, 0.5 * (lo + hi)));
    }
}
