package org.protolyte.chemistry;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.TreeSet;

/**
 * Where a solved condition stops being trustworthy: below the freezing point, outside water's range, constants used
 * beyond their data, an ionic strength beyond the activity model. A warning keeps the number with reduced accuracy;
 * an indeterminate caveat means no number can be given.
 */
final class ValidityJudge {

    /** A generous bound on a pKa extrapolated a few kelvin beyond its data (common practice), and the pH effect below
     *  which a component's constants outside their range do not void the result. */
    static final double EXTRAPOLATION_ERROR = 0.1;
    static final double MINOR_PH_EFFECT = 0.005;
    /**
     * How far (K) a complex's constant is carried beyond its data with a warning rather than no result: an ion pair's
     * ΔH° of a few kJ/mol moves its log K by about 0.1 over 20 K (van 't Hoff, derived), the size of its own uncertainty,
     * and the complexes correct an acid–base speciation whose own constants are valid there.
     */
    static final double COMPLEX_EXTRAPOLATION = 25;
    /**
     * The pH error per unit error in a single-ion log γ at the step that usually carries a buffer: the squared charges
     * of H2PO4- and HPO4-2 differ by 3 (log aH = log Ka + log(m_acid/m_base) + Δz²·f, derived from the mass-action law).
     */
    private static final int PHOSPHATE_CHARGE_SQUARES = 3;
    /** A form carries buffering when it is at least this fraction of its component (chosen). */
    private static final double PRESENT = 0.05;
    /**
     * An ion is covered by Pitzer's parameters when its pairs cover at least this share of the charge of opposite sign
     * around it (chosen: a tenth of the interactions missing is within the model's own uncertainty at 1 mol/kg).
     */
    static final double COVERED = 0.9;
    /** How far from 25 °C (K) a pair's 25 °C values pass without a warning (within the ±). */
    private static final double SLOPELESS_SPAN = 10;

    private ValidityJudge() {
    }

    /**
     * Below the freezing point ice forms and a liquid-state pH means nothing. With one component per species the
     * particle molality is Σ T_C whatever the pH (the groups of a macroion not counted: it is its own solute), so this
     * is known before solving.
     */
    static void checkNotFrozen(PreparedProblem p, double[] totals) {
        double kelvin = p.kelvin;
        double particles = 0;
        for (int j = 0; j < totals.length; j++) {
            particles += p.components[j].bound() ? 0 : totals[j];
        }
        double tf = Cryoscopy.freezingPointKelvin(particles);
        if (kelvin < tf) {
            throw new IndeterminateException(Caveat.indeterminate("below-freezing-point", String.format(Locale.ROOT,
                    "%.1f °C is below the estimated freezing point of the solution (%.2f °C): ice forms and a "
                            + "liquid-state pH means nothing there",
                    kelvin - Thermo.KELVIN_OFFSET, tf - Thermo.KELVIN_OFFSET)));
        }
    }

    /** Water's own range: outside it nothing can be said. */
    static void checkWaterRange(double kelvin) {
        if (!Water.VALIDITY.contains(kelvin)) {
            throw new IndeterminateException(Caveat.indeterminate("temperature-out-of-range", String.format(
                    Locale.ROOT, "%.1f °C is outside %s, where the water properties used are valid",
                    kelvin - Thermo.KELVIN_OFFSET, Water.VALIDITY)));
        }
    }

    /**
     * Above the warning limit the pH keeps the activity model: with Davies alone, the buffer ions have no Pitzer
     * parameters. The error to expect is derived from the two models where both exist: Δ = |log10 γ±(Davies) −
     * log10 γ±(Pitzer, NaCl)| at this ionic strength, taken as the error per unit z² of a single-ion log γ; a step whose
     * forms differ by Δz² in squared charge is then off by about Δz²·Δ in pH. With Pitzer's equations
     * ({@link Interactions}) the same limits hold for the ions that carry buffering without parameters, and every
     * pair of the ions that make up the solution is held to the range where its parameters are used.
     */
    static List<Caveat> ionicStrength(Workspace ws, double pH, double i) {
        PreparedProblem p = ws.p;
        if (p.interactions == null) {
            return daviesLimits(p, i, "the buffer ions have no Pitzer parameters here, so the pH keeps the "
                    + p.activity.name() + " equation");
        }
        List<Caveat> out = new ArrayList<>();
        if (!(i > IonInteraction.FROM)) {
            return out;
        }
        Interactions x = p.interactions;
        double[] share = bufferShares(ws, pH);
        double[] ionM = ws.ionMolality;
        x.ionMolalities(ws.m, ws.hydrogen(pH), ws.hydroxide(pH), ionM);
        Set<String> bare = new TreeSet<>();
        boolean[] matters = new boolean[x.ions];       // carries buffering, or a real share of its sign's charge
        for (int q = 0; q < x.ions; q++) {
            matters[q] = x.significant(q, ionM);
        }
        for (int s = 0; s < p.n; s++) {
            int j = p.comp[s];
            int ion = x.speciesIon[s];
            boolean carries = ion >= 0 && p.complexParts[s] == null && share[j] * EXTRAPOLATION_ERROR >= MINOR_PH_EFFECT
                    && ws.m[s] >= PRESENT * ws.total[j];
            if (carries) {
                matters[ion] = true;
                if (x.coveredShare(ion, ionM) < COVERED) {
                    bare.add(p.sp[s].name());
                }
            }
        }
        if (!bare.isEmpty()) {
            out.addAll(daviesLimits(p, i, String.join(", ", bare) + " carr" + (bare.size() == 1 ? "ies" : "y")
                    + " the buffering without Pitzer parameters against most of the ions of opposite charge here, so "
                    + (bare.size() == 1 ? "it keeps" : "they keep") + " the Davies equation"));
        }
        Pitzer.Mixture mix = x.mixture();
        Set<String> extrapolated = new TreeSet<>();
        for (int q = 0; q < mix.pairs; q++) {
            if (!matters[mix.cation[q]] || !matters[mix.anion[q]]) {
                continue;
            }
            if (i > mix.pairLimit[q]) {
                out.add(Caveat.indeterminate("ionic-strength-out-of-range", String.format(Locale.ROOT,
                        "ionic strength %.3f mol/kg is above %.2f mol/kg, the pure salt's at the highest molality where "
                                + "the Pitzer parameters of %s are used", i, mix.pairLimit[q], mix.pairName(q))));
            }
            if (mix.extrapolated[q] && Math.abs(p.kelvin - Thermo.T_REF) > SLOPELESS_SPAN) {
                extrapolated.add(mix.pairName(q));
            }
        }
        if (!extrapolated.isEmpty()) {
            out.add(Caveat.warning("pitzer-parameters-extrapolated", String.format(Locale.ROOT,
                    "%.1f °C is more than %.0f K from 25 °C, and the Pitzer parameters of %s have no published "
                            + "temperature derivatives: their 25 °C values are used, with an uncertainty bounded by the "
                            + "largest derivatives published for these salts, which the ± includes",
                    p.kelvin - Thermo.KELVIN_OFFSET, SLOPELESS_SPAN, String.join(", ", extrapolated))));
        }
        return out;
    }

    /** Davies' own limits: a warning with the error to expect, then no result. */
    private static List<Caveat> daviesLimits(PreparedProblem p, double i, String why) {
        ActivityModel activity = p.activity;
        if (i > activity.indeterminateAbove()) {
            return List.of(Caveat.indeterminate("ionic-strength-out-of-range", String.format(Locale.ROOT,
                    "ionic strength %.3f mol/kg is above %.1f mol/kg, where the Davies equation cannot be trusted: %s",
                    i, activity.indeterminateAbove(), why)));
        }
        if (i > activity.warnAbove()) {
            double delta = IonInteraction.daviesDisagreement(i);
            return List.of(Caveat.warning("ionic-strength-high", String.format(Locale.ROOT,
                    "ionic strength %.3f mol/kg is above %.1f mol/kg: %s; at this ionic strength it differs from "
                            + "Pitzer by %.3f in log γ± of sodium chloride, so expect an error of about %.2f pH where a "
                            + "step between charges −1 and −2 carries the buffering (H2PO4-/HPO4-2), more for higher "
                            + "charges",
                    i, activity.warnAbove(), why, delta, PHOSPHATE_CHARGE_SQUARES * delta)));
        }
        return List.of();
    }

    /** Each component's share of the buffer capacity at this pH: 1 for an open one. Refills the molalities. */
    private static double[] bufferShares(Workspace ws, double pH) {
        PreparedProblem p = ws.p;
        p.speciation.molalities(ws, pH);
        double beta = p.speciation.bufferSum(ws, pH);
        if (p.complexes) {
            BufferCapacity.componentTerms(ws);
        }
        double[] share = new double[p.components.length];
        for (int j = 0; j < share.length; j++) {
            share[j] = p.open(j) ? 1 : Math.abs(ws.term[j]) / beta;
        }
        return share;
    }

    /**
     * Components present whose constants are not valid at this temperature, judged at the solution (pH, I):
     * indeterminate where the component carries a real share of the buffering, a warning where even a 0.1 error in its
     * pKa would move the pH by less than 0.005 (dpH/dpKa_C = β_C/β, the component's share of the buffer capacity, see
     * {@link Equilibrium}). A trace of indicator or a minor amino acid does not void a medium's pH; the buffer that sets
     * it does. Refills the workspace's molalities at this pH.
     */
    static List<Caveat> temperature(Workspace ws, double pH, double ionicStrength, boolean describeMinor) {
        PreparedProblem p = ws.p;
        List<Caveat> out = new ArrayList<>();
        List<String> minor = new ArrayList<>();
        double t = p.kelvin - Thermo.KELVIN_OFFSET;
        boolean[] reported = new boolean[p.components.length];
        double[] shares = null;
        for (int i = 0; i < p.n; i++) {
            int j = p.comp[i];
            TemperatureRange v = p.sp[i].formation().validity();
            if (p.complexParts[i] != null) {
                if (!v.contains(p.kelvin)) {
                    complexOutOfRange(ws, i, pH, ionicStrength, v, describeMinor, minor, out);
                }
                continue;
            }
            if (reported[j] || !(ws.total[j] > 0 || p.open(j)) || v.contains(p.kelvin)) {
                continue;
            }
            reported[j] = true;
            if (shares == null) {
                shares = bufferShares(ws, pH);
            }
            double share = shares[j];
            if (share * EXTRAPOLATION_ERROR < MINOR_PH_EFFECT) {
                if (describeMinor) {
                    minor.add(String.format(Locale.ROOT, "%s (%s, %.2g %% of β)", p.sp[i].name(), v, 100 * share));
                }
            } else {
                out.add(Caveat.indeterminate("temperature-out-of-range", String.format(Locale.ROOT,
                        "%.1f °C is outside %s, where the constants of %s are valid", t, v, p.sp[i].name())));
            }
        }
        if (!minor.isEmpty()) {
            out.add(Caveat.warning("temperature-out-of-range-minor", String.format(Locale.ROOT,
                    "%.1f °C is outside the range of the constants of %s; each carries so little of the buffer "
                            + "capacity that even a %.1f error in its pKa moves the pH by less than %.3f",
                    t, String.join(", ", minor), EXTRAPOLATION_ERROR, MINOR_PH_EFFECT)));
        }
        return out;
    }

    /**
     * A complex's constant outside its range: its own effect, found by moving its log β by the extrapolation bound and
     * solving the charge balance again at the same activity coefficients, in a workspace of its own.
     */
    private static void complexOutOfRange(Workspace ws, int c, double pH, double ionicStrength, TemperatureRange v,
                                          boolean describeMinor, List<String> minor, List<Caveat> out) {
        PreparedProblem p = ws.p;
        double t = p.kelvin - Thermo.KELVIN_OFFSET;
        boolean near = p.kelvin > v.minKelvin() - COMPLEX_EXTRAPOLATION
                && p.kelvin < v.maxKelvin() + COMPLEX_EXTRAPOLATION;
        if (near && !describeMinor) {
            return;             // a warning at most, and the fast path reports none: the effect is not needed
        }
        Workspace moved = new Workspace(p.withLogBetaShift(c, EXTRAPOLATION_ERROR));
        System.arraycopy(ws.total, 0, moved.total, 0, ws.total.length);
        System.arraycopy(ws.freeBasis, 0, moved.freeBasis, 0, ws.freeBasis.length);
        moved.setActivityCoefficients(ionicStrength);
        double effect = Math.abs(ChargeBalance.root(moved, pH) - pH);
        if (effect < MINOR_PH_EFFECT) {
            if (describeMinor) {
                minor.add(String.format(Locale.ROOT, "%s (%s, pH effect %.1g)", p.sp[c].name(), v, effect));
            }
        } else if (near) {
            out.add(Caveat.warning("temperature-out-of-range-complex", String.format(Locale.ROOT,
                    "%.1f °C is outside %s, the data behind the constant of the complex %s; it is extrapolated by "
                            + "van 't Hoff, and a %.1f error in its log K would move the pH by %.3f", t, v,
                    p.sp[c].name(), EXTRAPOLATION_ERROR, effect)));
        } else {
            out.add(Caveat.indeterminate("temperature-out-of-range", String.format(Locale.ROOT,
                    "%.1f °C is outside %s, where the constant of the complex %s is valid, and it moves the pH by "
                            + "%.3f per %.1f in log K", t, v, p.sp[c].name(), effect, EXTRAPOLATION_ERROR)));
        }
    }
}
