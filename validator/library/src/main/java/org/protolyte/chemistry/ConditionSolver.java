package org.protolyte.chemistry;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * One condition of a prepared problem solved for the workspace's totals: the pH and the ionic strength made
 * consistent with the activity model, then judged ({@link ValidityJudge}) and reported as a full state or as the
 * figures of a {@link Equilibrium.Point}. Every path through the engine comes here.
 */
final class ConditionSolver {

    private static final int MAX_ITERATIONS = 200;
    /** Fixed-point iterations on I before the relaxation that keeps it from oscillating when strong ions dominate. */
    private static final int UNRELAXED_ITERATIONS = 20;
    private static final double RELAXATION = 0.5;
    /** I is settled when an iteration moves it by less than this plus this fraction of it. */
    private static final double I_ABSOLUTE = 1e-13;
    private static final double I_RELATIVE = 1e-10;
    /** Pitzer's composition terms are settled when an iteration moves none by more than this (log10 γ). */
    private static final double SPECIFIC_SETTLED = 1e-12;
    /** The coupled pH–I Newton: at most this many steps, each under one pH unit, settled at these steps (see below). */
    private static final int MAX_COUPLED_STEPS = 30;
    private static final double COUPLED_PH_STEP = 1e-8;
    private static final double COUPLED_I_RELATIVE = 1e-7;

    final Workspace ws;
    private final PreparedProblem p;
    /** The last self-consistent solution {pH, I}, or null (none yet, or the last was at a fixed I). */
    private double[] last;

    ConditionSolver(PreparedProblem p) {
        this.p = p;
        this.ws = new Workspace(p);
    }

    /** The full state with its caveats, the activity coefficients self-consistent (NaN) or at a fixed I. */
    EquilibriumState state(double fixedIonicStrength) {
        admissible();
        last = null;
        double[] r = iterate(fixedIonicStrength, Double.NaN, Double.NaN);
        ws.setActivityCoefficients(r[1]);
        last = Double.isNaN(fixedIonicStrength) ? r : null;
        List<Caveat> caveats = new ArrayList<>(ValidityJudge.temperature(ws, r[0], r[1], true));
        caveats.addAll(ValidityJudge.ionicStrength(ws, r[0], r[1]));
        return state(r[0], r[1], caveats);
    }

    /** The self-consistent figures; throws where {@link #state} would report the state indeterminate. */
    Equilibrium.Point point(Equilibrium.Point warm) {
        double[] r = converge(warm);
        List<Caveat> caveats = ValidityJudge.temperature(ws, r[0], r[1], false);
        caveats.addAll(ValidityJudge.ionicStrength(ws, r[0], r[1]));
        for (Caveat c : caveats) {
            if (c.severity() == Caveat.Severity.INDETERMINATE) {
                throw new IndeterminateException(c);
            }
        }
        return figures(r[0], r[1]);
    }

    /** The self-consistent figures whatever the caveats: a step of a search, which only its result is judged by. */
    Equilibrium.Point trial(Equilibrium.Point warm) {
        double[] r = converge(warm);
        return figures(r[0], r[1]);
    }

    /** {pH, I} self-consistent from a nearby solution (or null), the activity coefficients left at that I. */
    private double[] converge(Equilibrium.Point warm) {
        last = null;
        admissible();
        double[] r = warm == null ? iterate(Double.NaN, Double.NaN, Double.NaN)
                : iterate(Double.NaN, warm.pH(), warm.ionicStrength());
        ws.setActivityCoefficients(r[1]);
        last = r;
        return r;
    }

    /** The derivatives of the last self-consistent solution. */
    Derivatives derivatives() {
        if (last == null) {
            throw new IllegalStateException("no self-consistent solution to differentiate");
        }
        ws.setActivityCoefficients(last[1]);
        return new Derivatives(ws, last[0], last[1]);
    }

    /** What no number can be given for, known before solving. */
    private void admissible() {
        ValidityJudge.checkNotFrozen(p, ws.total);
        ValidityJudge.checkWaterRange(p.kelvin);
    }

    /**
     * {pH, I} from a nearby solution: Newton steps on the charge balance with the activity coefficients updated from
     * each step's molalities (the coupling through I is weak, so this converges in a few steps). Null where it does
     * not settle; the caller then takes the bracketed path.
     */
    private double[] coupled(double startPH, double startI) {
        double pH = startPH;
        double ionicStrength = startI;
        for (int k = 0; k < MAX_COUPLED_STEPS; k++) {
            ws.setActivityCoefficients(ionicStrength);
            double f = ChargeBalance.value(ws, pH);
            double slope = -Thermo.LN10 * p.speciation.bufferSum(ws, pH);
            double nextPH = pH - f / slope;
            // I where the pH is going, not where it was: without this the pH–I coupling converges only linearly
            double nextI = ionicStrengthOfWork(pH) + BufferCapacity.ionicStrengthSlope(ws, pH) * (nextPH - pH);
            if (!(Math.abs(nextPH - pH) < 1) || !(nextI > 0)) {
                return null;
            }
            double moved = ws.updateSpecific(nextPH, nextI);
            // the last step's error is a few per cent of the step before (the I coupling converges linearly), so a
            // step of 1e-8 leaves under 1e-9: enough for a study's q.s. (met to 1e-7) and its spread (1e-3 and up)
            boolean settled = Math.abs(nextPH - pH) < COUPLED_PH_STEP && moved < COUPLED_PH_STEP
                    && Math.abs(nextI - ionicStrength) <= I_ABSOLUTE + COUPLED_I_RELATIVE * ionicStrength;
            pH = nextPH;
            ionicStrength = nextI;
            if (settled) {
                return new double[] {pH, ionicStrength};
            }
        }
        return null;
    }

    /** {pH, I}: the charge balance solved at each ionic strength until I no longer changes. */
    private double[] iterate(double fixedIonicStrength, double startPH, double startI) {
        if (Double.isNaN(fixedIonicStrength) && !Double.isNaN(startPH)) {
            double[] r = coupled(startPH, startI);
            if (r != null) {
                return r;
            }
        }
        // from scratch: the bracketed root at each ionic strength, starting from the strong ions alone (and, at a
        // fixed I, from the charge-and-I part of the activity coefficients alone)
        ws.clearSpecific();
        double ionicStrength = Double.isNaN(fixedIonicStrength) ? strongIonicStrength() : fixedIonicStrength;
        double pH = Double.NaN;
        for (int i = 0; i < MAX_ITERATIONS; i++) {
            ws.setActivityCoefficients(ionicStrength);
            pH = ChargeBalance.root(ws, pH);
            if (!Double.isNaN(fixedIonicStrength)) {
                return new double[] {pH, ionicStrength};
            }
            double next = ionicStrength(pH);
            double step = next - ionicStrength;
            double moved = ws.updateSpecific(pH, next);
            if (Math.abs(step) <= I_ABSOLUTE + I_RELATIVE * ionicStrength && moved <= SPECIFIC_SETTLED) {
                return new double[] {pH, next};
            }
            ionicStrength = i < UNRELAXED_ITERATIONS ? next : ionicStrength + RELAXATION * step;
        }
        throw new IndeterminateException(Caveat.indeterminate("activity-not-converged",
                "the ionic strength did not converge with the " + p.activity.name() + " activity model"));
    }

    private double strongIonicStrength() {
        double s = 0;
        for (int j = 0; j < p.components.length; j++) {
            s += ws.total[j] * p.componentIonCharge[j] * p.componentIonCharge[j];
        }
        return 0.5 * s;
    }

    /** I = ½ Σ z² m at this pH. */
    private double ionicStrength(double pH) {
        double[] m = p.speciation.molalities(ws, pH);
        double s = Math.pow(10, -pH - ws.log10GammaH) + p.kw * Math.pow(10, pH - ws.log10GammaOH);
        for (int i = 0; i < p.n; i++) {
            s += (double) p.ionCharge[i] * p.ionCharge[i] * m[i];
        }
        return 0.5 * s;
    }

    /** I from the working molalities the last evaluation at this pH filled. */
    private double ionicStrengthOfWork(double pH) {
        double[] m = ws.m;
        double s = ws.hydrogen(pH) + ws.hydroxide(pH);
        for (int i = 0; i < p.n; i++) {
            s += (double) p.ionCharge[i] * p.ionCharge[i] * m[i];
        }
        return 0.5 * s;
    }

    /** The figures at the solution (pH, I): β and osmolality from the molalities there. */
    private Equilibrium.Point figures(double pH, double ionicStrength) {
        double[] m = p.speciation.molalities(ws, pH);
        double particles = ws.hydrogen(pH) + ws.hydroxide(pH);
        for (int i = 0; i < p.n; i++) {
            particles += p.particle[i] * m[i];
        }
        return new Equilibrium.Point(pH, ionicStrength, Thermo.LN10 * p.speciation.bufferSum(ws, pH),
                particles + osmoticExcess(m, ws.hydrogen(pH), ws.hydroxide(pH), ionicStrength));
    }

    /** Σ m(φ − 1) of the activity model, Gibbs–Duhem consistent with its γ: osmolality = Σ m + this. */
    private double osmoticExcess(double[] m, double mH, double mOH, double ionicStrength) {
        return p.activity.osmoticExcess(ionicStrength, p.debyeHuckelA)
                + (p.interactions == null ? 0 : p.interactions.osmoticExcess(m, mH, mOH, ws.ionMolality));
    }

    private EquilibriumState state(double pH, double ionicStrength, List<Caveat> caveats) {
        double[] m = p.speciation.molalities(ws, pH);
        double beta = Thermo.LN10 * p.speciation.bufferSum(ws, pH);
        if (p.complexes) {
            BufferCapacity.componentTerms(ws);
        }
        double mH = Math.pow(10, -pH - ws.log10GammaH);
        double mOH = p.kw * Math.pow(10, pH - ws.log10GammaOH);
        Map<Component, Double> sum = new HashMap<>();      // each component in every species it is part of
        for (int i = 0; i < p.n; i++) {
            for (Map.Entry<Component, Integer> e : p.sp[i].components().entrySet()) {
                sum.merge(e.getKey(), e.getValue() * m[i], Double::sum);
            }
        }
        double particles = 0;
        List<SpeciesAmount> out = new ArrayList<>();
        for (int i = 0; i < p.n; i++) {
            Component home = p.components[p.comp[i]];
            double t = sum.getOrDefault(home, 0.0);
            particles += p.particle[i] * m[i];
            out.add(new SpeciesAmount(p.sp[i], home, m[i], Math.pow(10, ws.log10Gamma[i]),
                    t > 0 ? p.sp[i].components().get(home) * m[i] / t : 0));
        }
        Map<Component, Double> byComponent = new LinkedHashMap<>();
        Set<Component> openSet = new HashSet<>();
        double scale = 1;       // with complexes the own terms are shares, not a partition: scaled to β less water's
        if (p.complexes) {
            double own = 0;
            for (double x : ws.term) {
                own += x;
            }
            double rest = beta / Thermo.LN10 - mH - mOH;
            scale = own > rest && own > 0 ? Math.max(0, rest) / own : 1;
        }
        for (int j = 0; j < p.components.length; j++) {
            byComponent.put(p.components[j], Thermo.LN10 * ws.term[j] * scale);
            if (p.open(j)) {
                openSet.add(p.components[j]);
            }
        }
        double total = particles + mH + mOH;
        double osmolality = total + osmoticExcess(m, mH, mOH, ionicStrength);
        return new EquilibriumState(p.kelvin, pH, ionicStrength, beta, -Math.log10(p.kw), mH, mOH,
                total, osmolality, p.activity.name(), out, caveats, byComponent, openSet);
    }
}
