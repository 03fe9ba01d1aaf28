package org.protolyte.chemistry;

import java.util.ArrayList;
import java.util.Collection;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.OptionalDouble;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.MathIllegalStateException;

/**
 * Acid–base equilibrium of an aqueous solution at one temperature.
 *
 * <p>Unknown: the hydrogen-ion activity aH. For a given aH and given activity coefficients, every
 * species follows from its component's mass balance (mol/kg water):
 * <pre>
 *   m_s = β_s(T) · aH^p · γ_C · m_C / γ_s,     T_C = Σ_s m_s      (one component per species)
 * </pre>
 * and aH is the root of the charge balance
 * <pre>
 *   f(pH) = Σ_s z_s m_s + mH − mOH = 0,   mH = aH/γH,  mOH = Kw/(aH·γOH)   (water activity taken as 1)
 * </pre>
 * f falls strictly with pH (df/dpH = −ln10·(mH + mOH + Σ variances) &lt; 0), so a bracket on pH and
 * Brent's method always find the one root if there is one. The ionic strength I = ½ Σ z² m is then
 * iterated with the activity model until it no longer changes.
 *
 * <p>The reported pH is −log10(γH·mH) with γH from the activity model. A single-ion activity cannot
 * be measured; at I ≤ 0.1 mol/kg the Davies γH agrees with the Bates–Guggenheim convention that pH
 * meters are calibrated to (Buck et al., Pure Appl. Chem. 74 (2002) 2169) within a few thousandths.
 *
 * <p>Buffer capacity, analytic at fixed activity coefficients (Van Slyke's β, generalised):
 * <pre>
 *   β = dC_base/dpH = ln10 · (mH + mOH + Σ_C [Σ_s p_s² m_s − (Σ_s p_s m_s)²/T_C])
 * </pre>
 * For a component open to a gas phase (CO2(aq) held by Henry's law, species f fixed) its term is
 * ln10 · Σ_s z_s (p_s − p_f) m_s, which for carbonate is ln10 · (m_HCO3 + 4 m_CO3).
 */
public final class Equilibrium {

    private static final double PH_LOW = -2;
    private static final double PH_HIGH = 16;
    private static final int MAX_ITERATIONS = 200;
    /** A generous bound on a pKa extrapolated a few kelvin beyond its data (common practice), and the pH effect below
     *  which a component's constants outside their range do not void the result. */
    private static final double EXTRAPOLATION_ERROR = 0.1;
    private static final double MINOR_PH_EFFECT = 0.005;
    /**
     * How far (K) a complex's constant is carried beyond its data with a warning rather than no result: an ion pair's
     * ΔH° of a few kJ/mol moves its log K by about 0.1 over 20 K (van 't Hoff, derived), the size of its own uncertainty,
     * and the complexes correct an acid–base speciation whose own constants are valid there.
     */
    private static final double COMPLEX_EXTRAPOLATION = 25;

    /** Standard uncertainty of pKw from IAPWS R11-07 near ambient conditions, about 0.01 (from memory). */
    public static final double PKW_UNCERTAINTY = 0.01;

    private final ActivityModel activity;
    private final Map<Species, Double> logBetaShifts;
    private final Map<Species, Double> deltaHShifts;    // J/mol on the dissociation steps the species carries
    private final double pKwShift;

    public Equilibrium(ActivityModel activity) {
        this(activity, Map.of(), Map.of(), 0);
    }

    private Equilibrium(ActivityModel activity, Map<Species, Double> logBetaShifts, Map<Species, Double> deltaHShifts,
                        double pKwShift) {
        this.activity = activity;
        this.logBetaShifts = Map.copyOf(logBetaShifts);
        this.deltaHShifts = Map.copyOf(deltaHShifts);
        this.pKwShift = pKwShift;
    }

    /**
     * The same equilibrium with one dissociation step's pKa raised by {@code delta}: every species that
     * carries that step's proton has its log β raised by delta. For propagating a constant's uncertainty.
     */
    public Equilibrium withPKaShift(AcidBaseSystem system, int step, double delta) {
        return withStepShifts(Map.of(system, step(system, step, delta, 0)));
    }

    /** The same with one step's ΔH° of ionization raised by {@code delta} J/mol: its pKa moves away from 25 °C. */
    public Equilibrium withDeltaHShift(AcidBaseSystem system, int step, double delta) {
        return withStepShifts(Map.of(system, step(system, step, 0, delta)));
    }

    private static double[] step(AcidBaseSystem system, int step, double dPKa, double dDeltaH) {
        double[] d = new double[2 * system.steps().size()];
        d[2 * step] = dPKa;
        d[2 * step + 1] = dDeltaH;
        return d;
    }

    /**
     * The same equilibrium with several steps moved at once: {@code shifts.get(system)} holds, for step k, the
     * pKa change at [2k] and the ΔH° change (J/mol) at [2k + 1].
     */
    public Equilibrium withStepShifts(Map<AcidBaseSystem, double[]> shifts) {
        Map<Species, Double> logs = new java.util.HashMap<>(logBetaShifts);
        Map<Species, Double> enthalpies = new java.util.HashMap<>(deltaHShifts);
        for (Map.Entry<AcidBaseSystem, double[]> e : shifts.entrySet()) {
            List<Species> species = e.getKey().species();
            double[] d = e.getValue();
            for (int k = 0; 2 * k < d.length; k++) {
                for (int i = 0; i <= k; i++) {       // every species carrying step k's proton
                    if (d[2 * k] != 0) {
                        logs.merge(species.get(i), d[2 * k], Double::sum);
                    }
                    if (d[2 * k + 1] != 0) {
                        enthalpies.merge(species.get(i), d[2 * k + 1], Double::sum);
                    }
                }
            }
        }
        return new Equilibrium(activity, logs, enthalpies, pKwShift);
    }

    /** The same equilibrium with one complex's log K raised by {@code delta}: for its uncertainty. */
    public Equilibrium withLogKShift(Species complex, double delta) {
        Map<Species, Double> logs = new java.util.HashMap<>(logBetaShifts);
        logs.merge(complex, delta, Double::sum);
        return new Equilibrium(activity, logs, deltaHShifts, pKwShift);
    }

    /** The same equilibrium with pKw raised by {@code delta}. */
    public Equilibrium withPKwShift(double delta) {
        return new Equilibrium(activity, logBetaShifts, deltaHShifts, pKwShift + delta);
    }

    public ActivityModel activityModel() {
        return activity;
    }

    /**
     * Solves with the activity coefficients iterated to self-consistency.
     *
     * @param totals total molality of every component, mol/kg water
     * @throws IndeterminateException when the charge balance has no root or the iteration does not converge
     */
    public EquilibriumState solve(List<Species> species, Map<Component, Double> totals, double kelvin) {
        return solve(species, totals, kelvin, Double.NaN);
    }

    /**
     * Solves at a fixed ionic strength (activity coefficients held constant), as the analytic buffer
     * capacity assumes; NaN means self-consistent.
     */
    public EquilibriumState solve(List<Species> species, Map<Component, Double> totals, double kelvin,
                                  double fixedIonicStrength) {
        return solve(species, totals, kelvin, fixedIonicStrength, Map.of());
    }

    /**
     * Solves with some species held at a fixed molality by exchange with a gas phase (CO2(aq) under a stated
     * CO2 partial pressure): their component is then open, its total follows from the pH, and the
     * component's entry in {@code totals} is ignored.
     */
    public EquilibriumState solve(List<Species> species, Map<Component, Double> totals, double kelvin,
                                  double fixedIonicStrength, Map<Species, Double> fixedSpecies) {
        return prepare(species, totals.keySet(), kelvin, fixedSpecies).solve(totals, fixedIonicStrength);
    }

    /**
     * Everything about a problem that does not depend on the amounts: the species, their constants at the
     * temperature, Kw and the Debye–Hückel slope. A study that solves one recipe many times with other amounts
     * (Monte Carlo, a q.s. search) prepares once and solves many times.
     */
    public Prepared prepare(List<Species> species, Collection<Component> components, double kelvin,
                            Map<Species, Double> fixedSpecies) {
        return new Prepared(new Problem(species, components, kelvin, fixedSpecies));
    }

    /** pH, ionic strength (mol/kg), buffer capacity (mol/kg per pH) and osmolality (osmol/kg) of one solve. */
    public record Point(double pH, double ionicStrength, double bufferCapacity, double osmolality) {
    }

    /**
     * A problem prepared at one temperature, solved for any totals of its components. It keeps working arrays,
     * so one instance serves one thread.
     */
    public final class Prepared {
        private final Problem p;

        private Prepared(Problem p) {
            this.p = p;
        }

        /** Solves with the activity coefficients iterated to self-consistency (NaN) or at a fixed ionic strength. */
        public EquilibriumState solve(Map<Component, Double> totals, double fixedIonicStrength) {
            p.load(totals);
            frozen(p.total, p.kelvin);
            p.checkWaterRange();
            double[] r = iterate(fixedIonicStrength, Double.NaN, Double.NaN);
            p.setActivityCoefficients(r[1]);
            List<Caveat> caveats = new ArrayList<>(p.temperatureCaveats(r[0], true));
            caveats.addAll(ionicStrengthCaveats(r[1], p.a, p.kelvin));
            return p.state(r[0], r[1], caveats);
        }

        /**
         * The fast path: self-consistent pH, ionic strength and buffer capacity, started from {@code warm} (a
         * nearby solution, or null). Throws where {@link #solve} would report the state indeterminate.
         */
        public Point point(Map<Component, Double> totals, Point warm) {
            p.load(totals);
            return point(warm);
        }

        /** The same with the totals in the order of {@link #components()}. */
        public Point point(double[] totals, Point warm) {
            if (totals.length != p.total.length) {
                throw new IllegalArgumentException("expected " + p.total.length + " totals, got " + totals.length);
            }
            for (int j = 0; j < totals.length; j++) {
                if (!(totals[j] >= 0) || !Double.isFinite(totals[j])) {
                    throw new IllegalArgumentException("total of " + p.components[j].name() + " must be ≥ 0");
                }
                p.total[j] = totals[j];
            }
            return point(warm);
        }

        /** The components, in the order {@link #point(double[], Point)} takes their totals. */
        public List<Component> components() {
            return List.of(p.components);
        }

        /**
         * A step of a search (a load, a dose): the self-consistent pH, I and β whatever the caveats, which only the
         * search's result is judged by. Throws only where no number exists (frozen, outside water's range, no root,
         * no convergence).
         */
        public Point trial(Map<Component, Double> totals, Point warm) {
            p.load(totals);
            frozen(p.total, p.kelvin);
            p.checkWaterRange();
            double[] r = warm == null ? iterate(Double.NaN, Double.NaN, Double.NaN)
                    : iterate(Double.NaN, warm.pH(), warm.ionicStrength());
            p.setActivityCoefficients(r[1]);
            return p.point(r[0], r[1]);
        }

        private Point point(Point warm) {
            frozen(p.total, p.kelvin);
            p.checkWaterRange();
            double[] r = warm == null ? iterate(Double.NaN, Double.NaN, Double.NaN)
                    : iterate(Double.NaN, warm.pH(), warm.ionicStrength());
            p.setActivityCoefficients(r[1]);
            List<Caveat> caveats = p.temperatureCaveats(r[0], false);
            caveats.addAll(ionicStrengthCaveats(r[1], p.a, p.kelvin));
            for (Caveat c : caveats) {
                if (c.severity() == Caveat.Severity.INDETERMINATE) {
                    throw new IndeterminateException(c);
                }
            }
            return p.point(r[0], r[1]);
        }

        /**
         * {pH, I} from a nearby solution: Newton steps on the charge balance with the activity coefficients
         * updated from each step's molalities (the coupling through I is weak, so this converges in a few steps).
         * Null where it does not settle; the caller then takes the bracketed path.
         */
        private double[] coupled(double startPH, double startI) {
            double pH = startPH;
            double ionicStrength = startI;
            for (int k = 0; k < 30; k++) {
                p.setActivityCoefficients(ionicStrength);
                double f = p.chargeBalance(pH);
                double slope = -Thermo.LN10 * p.bufferSumOfWork(pH);
                double nextPH = pH - f / slope;
                // I where the pH is going, not where it was: without this the pH–I coupling converges only linearly
                double nextI = p.ionicStrengthOfWork(pH) + p.ionicStrengthSlopeOfWork(pH) * (nextPH - pH);
                if (!(Math.abs(nextPH - pH) < 1) || !(nextI > 0)) {
                    return null;
                }
                // the last step's error is a few per cent of the step before (the I coupling converges linearly), so a
                // step of 1e-8 leaves under 1e-9: enough for a study's q.s. (met to 1e-7) and its spread (1e-3 and up)
                boolean settled = Math.abs(nextPH - pH) < 1e-8
                        && Math.abs(nextI - ionicStrength) <= 1e-13 + 1e-7 * ionicStrength;
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
            // from scratch: the bracketed root at each ionic strength, starting from the strong ions alone
            double ionicStrength = Double.isNaN(fixedIonicStrength) ? p.strongIonicStrength() : fixedIonicStrength;
            double pH = Double.NaN;
            for (int i = 0; i < MAX_ITERATIONS; i++) {
                p.setActivityCoefficients(ionicStrength);
                pH = p.chargeBalanceRoot(pH);
                if (!Double.isNaN(fixedIonicStrength)) {
                    return new double[] {pH, ionicStrength};
                }
                double next = p.ionicStrength(pH);
                // relaxation keeps the fixed point from oscillating when strong ions dominate
                double step = next - ionicStrength;
                if (Math.abs(step) <= 1e-13 + 1e-10 * ionicStrength) {
                    return new double[] {pH, next};
                }
                ionicStrength = i < 20 ? next : ionicStrength + 0.5 * step;
            }
            throw new IndeterminateException(Caveat.indeterminate("activity-not-converged",
                    "the ionic strength did not converge with the " + activity.name() + " activity model"));
        }
    }

    /**
     * Above the warning limit the pH keeps the Davies equation: the buffer ions have no Pitzer parameters here. The
     * error to expect is derived from the two models where both exist: Δ = |log10 γ±(Davies) − log10 γ±(Pitzer, NaCl)|
     * at this ionic strength, taken as the error per unit z² of a single-ion log γ; a step whose forms differ by Δz² in
     * squared charge (log aH = log Ka + log(m_acid/m_base) + Δz²·f, Δz² = 3 for H2PO4-/HPO4-2) is then off by about
     * Δz²·Δ in pH.
     */
    private List<Caveat> ionicStrengthCaveats(double i, double debyeHuckelA, double kelvin) {
        List<Caveat> out = new ArrayList<>();
        if (i > activity.indeterminateAbove()) {
            out.add(Caveat.indeterminate("ionic-strength-out-of-range", String.format(Locale.ROOT,
                    "ionic strength %.3f mol/kg is above %.1f mol/kg, where the %s equation cannot be trusted",
                    i, activity.indeterminateAbove(), activity.name())));
        } else if (i > activity.warnAbove()) {
            double t = Pitzer.VALIDITY.contains(kelvin) ? kelvin : Thermo.T_REF;
            double delta = Math.abs(activity.log10Gamma(1, i, debyeHuckelA)
                    - Math.log10(Pitzer.meanActivityCoefficient("Na+", i, t)));
            out.add(Caveat.warning("ionic-strength-high", String.format(Locale.ROOT,
                    "ionic strength %.3f mol/kg is above %.1f mol/kg: the buffer ions have no Pitzer parameters here, so "
                            + "the pH keeps the %s equation; at this ionic strength it differs from Pitzer by %.3f in "
                            + "log γ± of sodium chloride, so expect an error of about %.2f pH where a step between "
                            + "charges −1 and −2 carries the buffering (H2PO4-/HPO4-2), more for higher charges",
                    i, activity.warnAbove(), activity.name(), delta, 3 * delta)));
        }
        return out;
    }

    /**
     * Below the freezing point ice forms and a liquid-state pH means nothing. With one component per
     * species the particle molality is Σ T_C whatever the pH, so this is known before solving.
     */
    private static void frozen(double[] totals, double kelvin) {
        double particles = 0;
        for (double t : totals) {
            particles += t;
        }
        double tf = Cryoscopy.freezingPointKelvin(particles);
        if (kelvin < tf) {
            throw new IndeterminateException(Caveat.indeterminate("below-freezing-point", String.format(Locale.ROOT,
                    "%.1f °C is below the estimated freezing point of the solution (%.2f °C): ice forms and a "
                            + "liquid-state pH means nothing there",
                    kelvin - Thermo.KELVIN_OFFSET, tf - Thermo.KELVIN_OFFSET)));
        }
    }

    /** The arrays of one solve: species, their components and constants at the temperature. */
    private final class Problem {
        final double kelvin;
        final int n;
        final Species[] sp;
        final int[] comp;          // index of the species' component
        final int[] protons;
        final int[] charge;
        final double[] log10Beta;
        final Map<Component, Integer> index;
        final Component[] components;
        /** Per species: null for a species of one component; for a complex its components and their counts. */
        final int[][] complexParts;
        final int[][] complexCounts;
        final boolean complexes;
        final double[] freeBasis;          // per component, mol/kg: the free basis species (complexes only; warm start)
        final double[] log10GammaComponent; // per component: log10 γ of its free basis at the current I
        final double[] complexEffect;       // per complex outside its range: |ΔpH| per 0.1 in log K, once judged
        final boolean[] coupledComponent;  // in at least one complex
        final int[] coupled;               // sized to the number of coupled components
        final double[] gammaComponent;     // γ of each component's free basis at the current I (powered path)
        final int[] complexIndex;          // the species that are complexes, in order
        final double[] complexWeight;      // complexes, powered: β/γ_s·Π γ_j^ν at the current I, so m = weight·aH^p·Π b^ν
        final boolean powered;             // the same bounds as the linear path: products of powers are safe to try
        final double[] basisSlope;         // d log10 b_j/dpH from the last buffer capacity (for dI/dpH)
        final double[] innerResidual;      // the coupled mass balances' Newton: residual and Jacobian, reused
        final double[][] innerJacobian;
        final double[] sumRhs;             // the buffer capacity's implicit differentiation: its arrays, reused
        final double[] sumCharge;
        final double[] sumDiagonal;
        final int[] sumPosition;
        final double[][] sumBlock;
        final double[] sumY;
        final double[] total;
        final double kw;
        final double a;
        final double[] log10Gamma;
        final double[] betaOverGamma;      // 10^(log β − log γ) at the current I (the linear path of molalities)
        final double[] powers;             // aH^p, p = 0 … the most protons a species carries
        final boolean linear;              // protons 0 … 12, |log β| < 250, |z| ≤ 8: the linear path is safe to try
        final double[] byCharge = new double[17];     // log10 γ for charges −8 … +8 at the current I
        final double[] inverseGammaByCharge = new double[17];
        final double[] beta;                          // 10^log β (the linear path)
        /** Working arrays of one evaluation, reused: a solve makes no garbage per evaluation. */
        final double[] work;
        final double[] workW;
        final double[] workMax;
        final double[] workSum;
        final double[] workTerm;      // per component: its term of β/ln10 (see bufferSumOfWork)
        double log10GammaH;
        double log10GammaOH;

        /** Per component: index of the species held fixed (open component), or −1 (closed). */
        final int[] fixedIndex;
        final double[] fixedMolality;

        Problem(List<Species> species, Collection<Component> componentSet, double kelvin, Map<Species, Double> fixed) {
            this.kelvin = kelvin;
            Map<Component, Integer> index = new LinkedHashMap<>();
            for (Component c : componentSet) {
                index.put(c, index.size());
            }
            List<Species> used = new ArrayList<>();
            for (Species s : species) {
                if (index.keySet().containsAll(s.components().keySet())) {
                    used.add(s);
                }
            }
            n = used.size();
            sp = used.toArray(new Species[0]);
            comp = new int[n];
            protons = new int[n];
            charge = new int[n];
            log10Beta = new double[n];
            complexParts = new int[n][];
            complexCounts = new int[n][];
            boolean anyComplex = false;
            for (int i = 0; i < n; i++) {
                Map<Component, Integer> parts = sp[i].components();
                if (sp[i].isComplex()) {
                    anyComplex = true;
                    List<Component> ordered = new ArrayList<>(parts.keySet());
                    // shown with its most negative part (the ligand): CaCit- under citrate
                    ordered.sort(java.util.Comparator.comparingInt(Component::charge).thenComparing(Component::name));
                    complexParts[i] = new int[ordered.size()];
                    complexCounts[i] = new int[ordered.size()];
                    for (int q = 0; q < ordered.size(); q++) {
                        complexParts[i][q] = index.get(ordered.get(q));
                        complexCounts[i][q] = parts.get(ordered.get(q));
                    }
                    comp[i] = complexParts[i][0];
                } else {
                    comp[i] = index.get(parts.keySet().iterator().next());
                }
                protons[i] = sp[i].protons();
                charge[i] = sp[i].charge();
                log10Beta[i] = sp[i].formation().log10K(kelvin) + logBetaShifts.getOrDefault(sp[i], 0.0)
                        + DissociationStep.pKaChangeFromDeltaH(deltaHShifts.getOrDefault(sp[i], 0.0), kelvin);
            }
            this.index = index;
            components = index.keySet().toArray(new Component[0]);
            total = new double[components.length];
            for (int j = 0; j < components.length; j++) {
                boolean hasSpecies = false;
                for (int i = 0; i < n; i++) {
                    hasSpecies |= complexParts[i] == null && comp[i] == j;
                }
                if (!hasSpecies) {
                    throw new IllegalArgumentException("component " + components[j].name() + " has no species");
                }
            }
            kw = Math.pow(10, -(Water.pKw(kelvin) + pKwShift));
            a = Water.debyeHuckelA(kelvin);
            log10Gamma = new double[n];
            betaOverGamma = new double[n];
            int maxProtons = 0;
            boolean ok = true;
            for (int i = 0; i < n; i++) {
                maxProtons = Math.max(maxProtons, protons[i]);
                ok &= protons[i] >= 0 && protons[i] <= 12 && Math.abs(log10Beta[i]) < 250 && Math.abs(charge[i]) <= 8;
            }
            beta = new double[n];
            for (int i = 0; i < n; i++) {
                beta[i] = Math.pow(10, log10Beta[i]);
            }
            linear = ok && !anyComplex;
            complexes = anyComplex;
            powered = ok && anyComplex;
            complexWeight = new double[n];
            gammaComponent = new double[components.length];
            complexIndex = java.util.stream.IntStream.range(0, n).filter(i -> complexParts[i] != null).toArray();
            freeBasis = new double[components.length];
            coupledComponent = new boolean[components.length];
            for (int i = 0; i < n; i++) {
                if (complexParts[i] != null) {
                    for (int j : complexParts[i]) {
                        coupledComponent[j] = true;
                    }
                }
            }
            int count = 0;
            for (boolean x : coupledComponent) {
                count += x ? 1 : 0;
            }
            coupled = new int[count];
            innerResidual = new double[count];
            basisSlope = new double[components.length];
            innerJacobian = new double[count][count];
            sumRhs = new double[components.length];
            sumCharge = new double[components.length];
            sumDiagonal = new double[components.length];
            sumPosition = new int[components.length];
            sumBlock = new double[count][count];
            sumY = new double[count];
            complexEffect = new double[n];
            java.util.Arrays.fill(complexEffect, Double.NaN);
            log10GammaComponent = new double[components.length];
            powers = new double[maxProtons + 1];
            work = new double[n];
            workW = new double[n];
            workMax = new double[components.length];
            workSum = new double[components.length];
            workTerm = new double[components.length];
            fixedIndex = new int[components.length];
            fixedMolality = new double[components.length];
            java.util.Arrays.fill(fixedIndex, -1);
            for (Map.Entry<Species, Double> e : fixed.entrySet()) {
                int i = used.indexOf(e.getKey());
                if (i < 0) {
                    throw new IllegalArgumentException("fixed species " + e.getKey().name() + " is not in the problem");
                }
                fixedIndex[comp[i]] = i;
                fixedMolality[comp[i]] = e.getValue();
            }
        }

        /** Takes the totals of this solve; a component the map does not name is absent (0). */
        void load(Map<Component, Double> totals) {
            java.util.Arrays.fill(total, 0);
            for (Map.Entry<Component, Double> e : totals.entrySet()) {
                Integer j = index.get(e.getKey());
                double t = e.getValue();
                if (j == null) {
                    throw new IllegalArgumentException("component " + e.getKey().name() + " was not prepared");
                }
                if (!(t >= 0) || !Double.isFinite(t)) {
                    throw new IllegalArgumentException("total of " + e.getKey().name() + " must be ≥ 0");
                }
                total[j] = t;
            }
        }

        boolean open(int component) {
            return fixedIndex[component] >= 0;
        }

        /** Water's own range: outside it nothing can be said. */
        void checkWaterRange() {
            if (!Water.VALIDITY.contains(kelvin)) {
                throw new IndeterminateException(Caveat.indeterminate("temperature-out-of-range", String.format(
                        Locale.ROOT, "%.1f °C is outside %s, where the water properties used are valid",
                        kelvin - Thermo.KELVIN_OFFSET, Water.VALIDITY)));
            }
        }

        /**
         * Components present whose constants are not valid at this temperature, judged at the solution (the working
         * molalities of pH filled): indeterminate where the component carries a real share of the buffering, a
         * warning where even a 0.1 error in its pKa would move the pH by less than 0.005 (dpH/dpKa_C = β_C/β, the
         * component's share of the buffer capacity, see the class comment). A trace of indicator or a minor amino
         * acid does not void a medium's pH; the buffer that sets it does.
         */
        List<Caveat> temperatureCaveats(double pH, boolean describeMinor) {
            List<Caveat> out = new ArrayList<>();
            List<String> minor = new ArrayList<>();
            double t = kelvin - Thermo.KELVIN_OFFSET;
            boolean[] reported = new boolean[components.length];
            double beta = -1;
            for (int i = 0; i < n; i++) {
                int j = comp[i];
                TemperatureRange v = sp[i].formation().validity();
                if (complexParts[i] != null) {
                    if (!v.contains(kelvin)) {
                        complexOutOfRange(i, pH, v, t, describeMinor, minor, out);
                    }
                    continue;
                }
                if (reported[j] || !(total[j] > 0 || open(j)) || v.contains(kelvin)) {
                    continue;
                }
                reported[j] = true;
                if (beta < 0) {
                    molalities(pH);
                    beta = bufferSumOfWork(pH);
                    if (complexes) {
                        ownTerms();
                    }
                }
                double share = open(j) ? 1 : Math.abs(workTerm[j]) / beta;
                if (share * EXTRAPOLATION_ERROR < MINOR_PH_EFFECT) {
                    if (describeMinor) {
                            minor.add(String.format(Locale.ROOT, "%s (%s, %.2g %% of β)", sp[i].name(), v, 100 * share));
                    }
                } else {
                    out.add(Caveat.indeterminate("temperature-out-of-range", String.format(Locale.ROOT,
                            "%.1f °C is outside %s, where the constants of %s are valid", t, v, sp[i].name())));
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
         * A complex's constant outside its range: its own effect, found by moving its log β by the extrapolation bound
         * and solving the charge balance again at the same activity coefficients. Judged at the first solve of the
         * prepared problem (the batches of a study are near it) and kept.
         */
        private void complexOutOfRange(int c, double pH, TemperatureRange v, double t, boolean describeMinor,
                                       List<String> minor, List<Caveat> out) {
            boolean near = kelvin > v.minKelvin() - COMPLEX_EXTRAPOLATION && kelvin < v.maxKelvin() + COMPLEX_EXTRAPOLATION;
            if (near && !describeMinor) {
                return;             // a warning at most, and the fast path reports none: the effect is not needed
            }
            if (Double.isNaN(complexEffect[c])) {
                double saved = log10Beta[c];
                double savedWeight = complexWeight[c];    // the powered path reads the weight, the log path log β
                double factor = Math.pow(10, EXTRAPOLATION_ERROR);
                log10Beta[c] = saved + EXTRAPOLATION_ERROR;
                complexWeight[c] = savedWeight * factor;
                double moved;
                try {
                    moved = chargeBalanceRoot(pH);
                } finally {
                    log10Beta[c] = saved;
                    complexWeight[c] = savedWeight;
                    molalities(pH);                   // the working molalities of pH again
                }
                complexEffect[c] = Math.abs(moved - pH);
            }
            double effect = complexEffect[c];
            if (effect < MINOR_PH_EFFECT) {
                if (describeMinor) {
                    minor.add(String.format(Locale.ROOT, "%s (%s, pH effect %.1g)", sp[c].name(), v, effect));
                }
            } else if (near) {
                out.add(Caveat.warning("temperature-out-of-range-complex", String.format(Locale.ROOT,
                        "%.1f °C is outside %s, the data behind the constant of the complex %s; it is extrapolated by "
                                + "van 't Hoff, and a %.1f error in its log K would move the pH by %.3f", t, v,
                        sp[c].name(), EXTRAPOLATION_ERROR, effect)));
            } else {
                out.add(Caveat.indeterminate("temperature-out-of-range", String.format(Locale.ROOT,
                        "%.1f °C is outside %s, where the constant of the complex %s is valid, and it moves the pH by "
                                + "%.3f per %.1f in log K", t, v, sp[c].name(), effect, EXTRAPOLATION_ERROR)));
            }
        }

        double strongIonicStrength() {
            double s = 0;
            for (int j = 0; j < components.length; j++) {
                s += total[j] * components[j].charge() * components[j].charge();
            }
            return 0.5 * s;
        }

        /** γ depends on the charge and I only (ActivityModel), so it is computed once per charge. */
        void setActivityCoefficients(double ionicStrength) {
            java.util.Arrays.fill(byCharge, Double.NaN);
            java.util.Arrays.fill(inverseGammaByCharge, Double.NaN);
            for (int i = 0; i < n; i++) {
                log10Gamma[i] = log10Gamma(charge[i], ionicStrength);
                if (linear) {
                    int k = charge[i] + byCharge.length / 2;
                    if (Double.isNaN(inverseGammaByCharge[k])) {
                        inverseGammaByCharge[k] = Math.pow(10, -log10Gamma[i]);
                    }
                    betaOverGamma[i] = beta[i] * inverseGammaByCharge[k];
                }
            }
            log10GammaH = log10Gamma(1, ionicStrength);
            log10GammaOH = log10Gamma(-1, ionicStrength);
            for (int j = 0; j < components.length; j++) {
                log10GammaComponent[j] = log10Gamma(components[j].charge(), ionicStrength);
            }
            if (powered) {              // γ by charge: a handful of powers of ten, then products
                double[] g = gammaComponent;
                for (int j = 0; j < components.length; j++) {
                    g[j] = gammaOfCharge(components[j].charge(), ionicStrength);
                }
                for (int i = 0; i < n; i++) {
                    double x = beta[i] / gammaOfCharge(charge[i], ionicStrength);
                    if (complexParts[i] == null) {
                        x *= g[comp[i]];
                    } else {
                        for (int q = 0; q < complexParts[i].length; q++) {
                            for (int r = 0; r < complexCounts[i][q]; r++) {
                                x *= g[complexParts[i][q]];
                            }
                        }
                    }
                    complexWeight[i] = x;
                }
            }
        }

        /** γ of a charge at the current I, each charge's power of ten taken once per I. */
        private double gammaOfCharge(int z, double ionicStrength) {
            int k = z + byCharge.length / 2;
            if (k < 0 || k >= byCharge.length) {
                return Math.pow(10, log10Gamma(z, ionicStrength));
            }
            if (Double.isNaN(inverseGammaByCharge[k])) {
                inverseGammaByCharge[k] = Math.pow(10, -log10Gamma(z, ionicStrength));
            }
            return 1 / inverseGammaByCharge[k];
        }

        private double log10Gamma(int z, double ionicStrength) {
            int k = z + byCharge.length / 2;
            if (k < 0 || k >= byCharge.length) {
                return activity.log10Gamma(z, ionicStrength, a);
            }
            if (Double.isNaN(byCharge[k])) {
                byCharge[k] = activity.log10Gamma(z, ionicStrength, a);
            }
            return byCharge[k];
        }

        /**
         * Fills and returns the working array of species molalities at this pH (valid until the next call), from the
         * mass balances: w_s = β_s/γ_s · aH^p_s, m_s = T_C · w_s / Σ_C w (γ of the free component cancels). Products
         * of powers of aH, not one exponential per species; log space where a component's weights leave the range
         * of a double.
         */
        double[] molalities(double pH) {
            if (complexes) {
                return complexMolalities(pH);
            }
            if (!linear) {
                return logMolalities(pH);
            }
            double x = Math.pow(10, -pH);
            double[] pw = powers;
            pw[0] = 1;
            for (int k = 1; k < pw.length; k++) {
                pw[k] = pw[k - 1] * x;
            }
            double[] w = workW;
            double[] sum = workSum;
            java.util.Arrays.fill(sum, 0);
            for (int i = 0; i < n; i++) {
                w[i] = betaOverGamma[i] * pw[protons[i]];
                sum[comp[i]] += w[i];
            }
            for (int j = 0; j < components.length; j++) {
                double d = open(j) ? w[fixedIndex[j]] : sum[j];
                if (!(d > Double.MIN_NORMAL && d < Double.MAX_VALUE)) {
                    return logMolalities(pH);
                }
            }
            double[] m = work;
            for (int i = 0; i < n; i++) {
                int j = comp[i];
                // closed: the component's total is shared out; open: scaled from the species held fixed
                m[i] = open(j) ? fixedMolality[j] * w[i] / w[fixedIndex[j]] : total[j] * w[i] / sum[j];
            }
            return m;
        }

        /**
         * With complexes the components are coupled. Each component's own species follow its free basis b_j,
         * m_s = b_j·w_s with w_s = β_s aH^p γ_j/γ_s, and a complex of several follows all of theirs,
         * m_c = β_c aH^p Π_j (γ_j b_j)^ν_cj / γ_c. The mass balances T_j = b_j Σ_s w_s + Σ_c ν_cj m_c are solved for
         * ln b by Newton's method: the Jacobian ∂T_j/∂ln b_k = δ_jk b_j Σ w + Σ_c ν_cj ν_ck m_c is symmetric and positive
         * definite, the steps are limited, and each solve starts from the last one's b.
         */
        private double[] complexMolalities(double pH) {
            int nc = components.length;
            double[] w = workW;
            double[] own = workSum;                   // Σ w over each component's own species
            java.util.Arrays.fill(own, 0);
            boolean products = powered;
            if (products) {                           // powers of aH, not one exponential per species
                double x = Math.pow(10, -pH);
                powers[0] = 1;
                for (int k = 1; k < powers.length; k++) {
                    powers[k] = powers[k - 1] * x;
                }
                for (int i = 0; i < n; i++) {
                    if (complexParts[i] == null) {
                        w[i] = complexWeight[i] * powers[protons[i]];
                        own[comp[i]] += w[i];
                    }
                }
                for (int j = 0; j < nc && products; j++) {
                    products = own[j] == 0 && total[j] <= 0 && !open(j) || own[j] > Double.MIN_NORMAL && own[j] < Double.MAX_VALUE;
                }
                if (!products) {
                    java.util.Arrays.fill(own, 0);
                }
            }
            if (!products) {
                for (int i = 0; i < n; i++) {
                    if (complexParts[i] == null) {
                        int j = comp[i];
                        w[i] = Math.exp(Thermo.LN10 * (log10Beta[i] - protons[i] * pH + log10GammaComponent[j] - log10Gamma[i]));
                        own[j] += w[i];
                    }
                }
            }
            double[] b = freeBasis;
            int[] unknown = new int[coupled.length];  // the coupled components solved for, as indices into b
            int u = 0;
            for (int j = 0; j < nc; j++) {
                if (open(j)) {
                    b[j] = fixedMolality[j] / w[fixedIndex[j]];
                } else if (total[j] <= 0) {
                    b[j] = 0;
                } else if (!coupledComponent[j]) {
                    b[j] = total[j] / own[j];         // in no complex: its own species share its total
                } else {
                    unknown[u++] = j;
                    if (!(b[j] > 0) || !Double.isFinite(b[j])) {
                        b[j] = total[j] / own[j];
                    }
                }
            }
            int[] position = new int[nc];
            java.util.Arrays.fill(position, -1);
            for (int q = 0; q < u; q++) {
                position[unknown[q]] = q;
            }
            double[] m = work;
            double[] residual = innerResidual;
            double[][] jacobian = innerJacobian;
            for (int iteration = 0; u > 0; iteration++) {
                complexesFromBasis(pH, m, products);
                for (int q = 0; q < u; q++) {
                    int j = unknown[q];
                    residual[q] = b[j] * own[j] - total[j];
                }
                for (int c : complexIndex) {
                    for (int x = 0; x < complexParts[c].length; x++) {
                        int row = position[complexParts[c][x]];
                        if (row >= 0) {
                            residual[row] += complexCounts[c][x] * m[c];
                        }
                    }
                }
                double worst = 0;
                for (int q = 0; q < u; q++) {
                    // each balance relative to its total: rows of order one, whatever the concentrations
                    residual[q] /= total[unknown[q]];
                    worst = Math.max(worst, Math.abs(residual[q]));
                }
                if (worst < 1e-13) {
                    break;
                }
                if (iteration == 200) {
                    throw new IndeterminateException(Caveat.indeterminate("complexation-not-converged",
                            "the mass balances of the complexes did not converge"));
                }
                for (int q = 0; q < u; q++) {
                    java.util.Arrays.fill(jacobian[q], 0, u, 0);
                    int j = unknown[q];
                    jacobian[q][q] = b[j] * own[j];
                }
                for (int c : complexIndex) {
                    for (int x = 0; x < complexParts[c].length; x++) {
                        int row = position[complexParts[c][x]];
                        if (row < 0) {
                            continue;
                        }
                        for (int y = 0; y < complexParts[c].length; y++) {
                            int col = position[complexParts[c][y]];
                            if (col >= 0) {
                                jacobian[row][col] += complexCounts[c][x] * complexCounts[c][y] * m[c];
                            }
                        }
                    }
                }
                for (int q = 0; q < u; q++) {
                    double t = total[unknown[q]];
                    for (int k = 0; k < u; k++) {
                        jacobian[q][k] /= t;
                    }
                }
                double[] step = solveInPlace(jacobian, residual, u);
                double largest = 0;
                for (double d : step) {
                    largest = Math.max(largest, Math.abs(d));
                }
                double scale = largest > 2 ? 2 / largest : 1;     // at most a factor e² per step
                for (int q = 0; q < u; q++) {
                    b[unknown[q]] *= Math.exp(-scale * step[q]);
                }
            }
            if (u == 0) {
                complexesFromBasis(pH, m, products);
            }
            for (int i = 0; i < n; i++) {
                if (complexParts[i] == null) {
                    m[i] = b[comp[i]] * w[i];
                }
            }
            return m;
        }

        /**
         * Solves A x = y by Gaussian elimination with partial pivoting, overwriting both; returns y as x. The systems
         * are a handful of coupled components, where a library call's allocations would cost more than the algebra.
         */
        private static double[] solveInPlace(double[][] a, double[] y, int size) {
            for (int col = 0; col < size; col++) {
                int pivot = col;
                for (int r = col + 1; r < size; r++) {
                    if (Math.abs(a[r][col]) > Math.abs(a[pivot][col])) {
                        pivot = r;
                    }
                }
                if (!(Math.abs(a[pivot][col]) > 0)) {
                    throw new IndeterminateException(Caveat.indeterminate("complexation-singular",
                            "the mass balances of the complexes are singular"));
                }
                double[] row = a[pivot];
                a[pivot] = a[col];
                a[col] = row;
                double t = y[pivot];
                y[pivot] = y[col];
                y[col] = t;
                for (int r = col + 1; r < size; r++) {
                    double f = a[r][col] / a[col][col];
                    if (f != 0) {
                        for (int k = col; k < size; k++) {
                            a[r][k] -= f * a[col][k];
                        }
                        y[r] -= f * y[col];
                    }
                }
            }
            for (int r = size - 1; r >= 0; r--) {
                double v = y[r];
                for (int k = r + 1; k < size; k++) {
                    v -= a[r][k] * y[k];
                }
                y[r] = v / a[r][r];
            }
            return y;
        }

        /**
         * The complexes' molalities from the free bases b (see {@link #complexMolalities}): products of powers where the
         * aH powers hold for this pH, else in log space.
         */
        private void complexesFromBasis(double pH, double[] m, boolean products) {
            for (int c : complexIndex) {
                if (products) {
                    double x = complexWeight[c] * powers[protons[c]];
                    for (int q = 0; q < complexParts[c].length; q++) {
                        double bj = freeBasis[complexParts[c][q]];
                        for (int r = 0; r < complexCounts[c][q]; r++) {
                            x *= bj;
                        }
                    }
                    m[c] = x;
                    continue;
                }
                double log = log10Beta[c] - protons[c] * pH - log10Gamma[c];
                boolean absent = false;
                for (int q = 0; q < complexParts[c].length; q++) {
                    int j = complexParts[c][q];
                    absent |= !(freeBasis[j] > 0);
                    log += complexCounts[c][q] * (log10GammaComponent[j] + Math.log10(freeBasis[j]));
                }
                m[c] = absent ? 0 : Math.exp(Thermo.LN10 * log);
            }
        }

        /**
         * With complexes: β = −df/dpH with every mass balance held, by implicit differentiation at fixed γ. At fixed
         * free bases ∂m_s/∂pH = −ln10·p_s·m_s; the bases follow from J·(d ln b/dpH) = ln10·(Σ_s ν_sj p_s m_s)_j with
         * J_jk = Σ_s ν_sj ν_sk m_s (a component in no complex on its own: J = T_j; an open one: d ln b/dpH = ln10·p of
         * its fixed species). Then df/dpH = −ln10 (mH + mOH + Σ z_s p_s m_s) + Σ_k (Σ_s z_s ν_sk m_s) d ln b_k/dpH.
         */
        private double complexBufferSum(double pH) {
            int nc = components.length;
            double[] m = work;
            double mH = Math.exp(Thermo.LN10 * (-pH - log10GammaH));
            double mOH = kw * Math.exp(Thermo.LN10 * (pH - log10GammaOH));
            double[] rhs = sumRhs;                    // Σ_s ν_sj p_s m_s
            double[] chargeWeight = sumCharge;        // Σ_s z_s ν_sj m_s
            double[] diagonal = sumDiagonal;          // Σ_s ν_sj² m_s
            java.util.Arrays.fill(rhs, 0);
            java.util.Arrays.fill(chargeWeight, 0);
            java.util.Arrays.fill(diagonal, 0);
            int[] position = sumPosition;             // index in the coupled block, or −1
            int u = 0;
            for (int j = 0; j < nc; j++) {
                position[j] = coupledComponent[j] && !open(j) && total[j] > 0 ? u++ : -1;
            }
            double[][] block = sumBlock;
            for (int q = 0; q < u; q++) {
                java.util.Arrays.fill(block[q], 0, u, 0);
            }
            double direct = mH + mOH;                 // −(∂f/∂pH at fixed b)/ln10
            for (int i = 0; i < n; i++) {
                direct += charge[i] * protons[i] * m[i];
                if (complexParts[i] == null) {
                    int j = comp[i];
                    rhs[j] += protons[i] * m[i];
                    chargeWeight[j] += charge[i] * m[i];
                    diagonal[j] += m[i];
                    continue;
                }
                for (int x = 0; x < complexParts[i].length; x++) {
                    int j = complexParts[i][x];
                    rhs[j] += complexCounts[i][x] * protons[i] * m[i];
                    chargeWeight[j] += charge[i] * complexCounts[i][x] * m[i];
                    diagonal[j] += complexCounts[i][x] * complexCounts[i][x] * m[i];
                    for (int y = 0; y < complexParts[i].length; y++) {
                        int k = complexParts[i][y];
                        if (position[j] >= 0 && position[k] >= 0 && k != j) {
                            block[position[j]][position[k]] += complexCounts[i][x] * complexCounts[i][y] * m[i];
                        } else if (position[j] >= 0 && open(k)) {
                            // an open component's slope is known: its column moves to the right-hand side
                            rhs[j] -= complexCounts[i][x] * complexCounts[i][y] * m[i] * protons[fixedIndex[k]];
                        }
                    }
                }
            }
            double[] d = basisSlope;                  // d ln b_j/dpH, divided by ln10
            java.util.Arrays.fill(d, 0);
            double[] y = sumY;
            for (int j = 0; j < nc; j++) {
                if (open(j)) {
                    d[j] = protons[fixedIndex[j]];
                } else if (position[j] >= 0) {
                    block[position[j]][position[j]] = diagonal[j];
                    y[position[j]] = rhs[j];
                } else if (diagonal[j] > 0) {
                    d[j] = rhs[j] / diagonal[j];      // in no complex: its own balance alone
                }
            }
            if (u > 0) {
                solveInPlace(block, y, u);
                for (int j = 0; j < nc; j++) {
                    if (position[j] >= 0) {
                        d[j] = y[position[j]];
                    }
                }
            }
            double sum = direct;
            for (int k = 0; k < nc; k++) {
                sum -= chargeWeight[k] * d[k];
            }
            return sum;
        }

        /** The same in log space, each component scaled by its largest weight: safe at any pH. */
        private double[] logMolalities(double pH) {
            double[] m = work;
            double[] maxLog = workMax;
            java.util.Arrays.fill(maxLog, Double.NEGATIVE_INFINITY);
            double[] w = workW;
            for (int i = 0; i < n; i++) {
                w[i] = log10Beta[i] - protons[i] * pH - log10Gamma[i];
                maxLog[comp[i]] = Math.max(maxLog[comp[i]], w[i]);
            }
            double[] sum = workSum;
            java.util.Arrays.fill(sum, 0);
            for (int i = 0; i < n; i++) {
                w[i] = Math.exp(Thermo.LN10 * (w[i] - maxLog[comp[i]]));
                sum[comp[i]] += w[i];
            }
            for (int i = 0; i < n; i++) {
                int j = comp[i];
                m[i] = open(j) ? fixedMolality[j] * w[i] / w[fixedIndex[j]] : total[j] * w[i] / sum[j];
            }
            return m;
        }

        double chargeBalance(double pH) {
            double[] m = molalities(pH);
            double f = Math.pow(10, -pH - log10GammaH) - kw * Math.pow(10, pH - log10GammaOH);
            for (int i = 0; i < n; i++) {
                f += charge[i] * m[i];
            }
            return f;
        }

        /**
         * The root of the charge balance in [PH_LOW, PH_HIGH]: Newton steps with the analytic slope
         * df/dpH = −ln10·(mH + mOH + Σ_C term_C) (the buffer capacity at fixed γ), each kept inside the bracket
         * that the signs so far prove, and bisection wherever a step would leave it. Brent's method is the
         * fallback should that ever fail to settle.
         */
        double chargeBalanceRoot(double guess) {
            double lo = PH_LOW;
            double hi = PH_HIGH;
            boolean warm = Double.isFinite(guess) && guess > lo && guess < hi;
            if (!warm) {
                checkBracket();
            }
            double x = warm ? guess : 7;
            for (int i = 0; i < 200; i++) {
                double f = chargeBalance(x);        // fills the working molalities
                if (f == 0) {
                    return x;
                }
                if (f > 0) {
                    lo = x;
                } else {
                    hi = x;
                }
                double slope = -Thermo.LN10 * bufferSumOfWork(x);
                double next = x - f / slope;
                if (Math.abs(next - x) < 1e-13) {
                    return next;                    // converged (next may sit on the bracket's edge x)
                }
                if (!(next > lo && next < hi)) {
                    if (warm && (lo == PH_LOW || hi == PH_HIGH)) {
                        checkBracket();             // leaving the warm start's neighbourhood: prove the bracket once
                        warm = false;
                    }
                    next = 0.5 * (lo + hi);
                }
                if (Math.abs(next - x) < 1e-13 || hi - lo < 1e-13) {
                    return next;
                }
                x = next;
            }
            checkBracket();
            try {
                return new BrentSolver(1e-14, 1e-12).solve(500, this::chargeBalance, PH_LOW, PH_HIGH);
            } catch (MathIllegalStateException e) {
                throw new IndeterminateException(Caveat.indeterminate("no-convergence",
                        "the charge balance did not converge: " + e.getMessage()));
            }
        }

        private void checkBracket() {
            if (!(chargeBalance(PH_LOW) > 0 && chargeBalance(PH_HIGH) < 0)) {
                throw new IndeterminateException(Caveat.indeterminate("no-root", String.format(Locale.ROOT,
                        "the charge balance has no root between pH %.0f and %.0f", PH_LOW, PH_HIGH)));
            }
        }

        /**
         * mH + mOH + Σ_C term_C: β/ln10 at fixed activity coefficients (see the class comment), from the
         * working molalities the last evaluation at this pH filled.
         */
        double bufferSumOfWork(double pH) {
            if (complexes) {
                return complexBufferSum(pH);
            }
            ownTerms();
            double sum = Math.exp(Thermo.LN10 * (-pH - log10GammaH)) + kw * Math.exp(Thermo.LN10 * (pH - log10GammaOH));
            for (double t : workTerm) {
                sum += t;
            }
            return sum;
        }

        /**
         * dI/dpH at fixed activity coefficients, from the state the last {@link #bufferSumOfWork} left: each species
         * moves as d ln m_s/dpH = ln10 (Σ_j ν_sj d_j − p_s), d_j the slope of its component's free basis (log10 per pH;
         * without complexes the mean bound protons p̄_j of a closed component, p_f of an open one), so
         * dI/dpH = ½ ln10 (mOH − mH + Σ_s z_s² m_s (Σ_j ν_sj d_j − p_s)).
         */
        double ionicStrengthSlopeOfWork(double pH) {
            double[] m = work;
            double sum = kw * Math.exp(Thermo.LN10 * (pH - log10GammaOH)) - Math.exp(Thermo.LN10 * (-pH - log10GammaH));
            for (int i = 0; i < n; i++) {
                double d;
                if (complexParts[i] != null) {
                    d = 0;
                    for (int q = 0; q < complexParts[i].length; q++) {
                        d += complexCounts[i][q] * basisSlope[complexParts[i][q]];
                    }
                } else if (complexes) {
                    d = basisSlope[comp[i]];
                } else {
                    int j = comp[i];
                    d = open(j) ? protons[fixedIndex[j]] : workSum[j];     // ownTerms leaves p̄ in workSum
                }
                sum += (double) charge[i] * charge[i] * m[i] * (d - protons[i]);
            }
            return 0.5 * Thermo.LN10 * sum;
        }

        /**
         * Each component's term of β/ln10 from its own species in the working molalities, a complex counted with the
         * component it is shown under (its ligand, as many times as it holds it): closed, Σ m_s (p_s − p̄)²; open (fixed
         * species f), Σ z_s (p_s − p_f) m_s, as CO2 enters or leaves. Without complexes these terms are the buffer
         * capacity; with them, each component's part of it for the report (a borate–polyol ester's proton exchange is
         * borate's).
         */
        private void ownTerms() {
            double[] m = work;
            double[] meanP = workSum;
            java.util.Arrays.fill(meanP, 0);
            double[] own = workMax;
            java.util.Arrays.fill(own, 0);
            for (int i = 0; i < n; i++) {
                own[comp[i]] += homeCount(i) * m[i];
            }
            for (int i = 0; i < n; i++) {
                int j = comp[i];
                if (own[j] > 0) {
                    meanP[j] += protons[i] * homeCount(i) * m[i] / own[j];
                }
            }
            double[] term = workTerm;
            java.util.Arrays.fill(term, 0);
            for (int i = 0; i < n; i++) {
                int j = comp[i];
                if (open(j)) {
                    if (complexParts[i] == null) {
                        term[j] += charge[i] * (protons[i] - protons[fixedIndex[j]]) * m[i];
                    }
                } else {
                    double d = protons[i] - meanP[j];
                    term[j] += homeCount(i) * m[i] * d * d;
                }
            }
        }

        /** How many of the component it is shown under a species holds: 1 for a free form. */
        private int homeCount(int i) {
            return complexParts[i] == null ? 1 : complexCounts[i][0];
        }

        /** The fast path's result at the solution (pH, I): β and osmolality from the molalities there. */
        Point point(double pH, double ionicStrength) {
            double[] m = molalities(pH);
            double particles = Math.exp(Thermo.LN10 * (-pH - log10GammaH)) + kw * Math.exp(Thermo.LN10 * (pH - log10GammaOH));
            for (int i = 0; i < n; i++) {
                particles += m[i];
            }
            return new Point(pH, ionicStrength, Thermo.LN10 * bufferSumOfWork(pH),
                    particles + activity.osmoticExcess(ionicStrength, a));
        }

        /** I from the working molalities the last evaluation at this pH filled. */
        double ionicStrengthOfWork(double pH) {
            double[] m = work;
            double s = Math.exp(Thermo.LN10 * (-pH - log10GammaH)) + kw * Math.exp(Thermo.LN10 * (pH - log10GammaOH));
            for (int i = 0; i < n; i++) {
                s += (double) charge[i] * charge[i] * m[i];
            }
            return 0.5 * s;
        }

        double ionicStrength(double pH) {
            double[] m = molalities(pH);
            double s = Math.pow(10, -pH - log10GammaH) + kw * Math.pow(10, pH - log10GammaOH);
            for (int i = 0; i < n; i++) {
                s += (double) charge[i] * charge[i] * m[i];
            }
            return 0.5 * s;
        }

        EquilibriumState state(double pH, double ionicStrength, List<Caveat> caveats) {
            double[] m = molalities(pH);
            double beta = Thermo.LN10 * bufferSumOfWork(pH);
            if (complexes) {
                ownTerms();
            }
            double mH = Math.pow(10, -pH - log10GammaH);
            double mOH = kw * Math.pow(10, pH - log10GammaOH);
            Map<Component, Double> sum = new java.util.HashMap<>();      // each component in every species it is part of
            for (int i = 0; i < n; i++) {
                for (Map.Entry<Component, Integer> e : sp[i].components().entrySet()) {
                    sum.merge(e.getKey(), e.getValue() * m[i], Double::sum);
                }
            }
            double particles = 0;
            List<SpeciesAmount> out = new ArrayList<>();
            for (int i = 0; i < n; i++) {
                Component home = components[comp[i]];
                double t = sum.getOrDefault(home, 0.0);
                particles += m[i];
                out.add(new SpeciesAmount(sp[i], home, m[i], Math.pow(10, log10Gamma[i]),
                        t > 0 ? sp[i].components().get(home) * m[i] / t : 0));
            }
            Map<Component, Double> byComponent = new LinkedHashMap<>();
            java.util.Set<Component> openSet = new java.util.HashSet<>();
            double scale = 1;       // with complexes the own terms are shares, not a partition: scaled to β less water's
            if (complexes) {
                double own = 0;
                for (double x : workTerm) {
                    own += x;
                }
                double rest = beta / Thermo.LN10 - mH - mOH;
                scale = own > rest && own > 0 ? Math.max(0, rest) / own : 1;
            }
            for (int j = 0; j < components.length; j++) {
                byComponent.put(components[j], Thermo.LN10 * workTerm[j] * scale);
                if (open(j)) {
                    openSet.add(components[j]);
                }
            }
            double total = particles + mH + mOH;
            double osmolality = total + activity.osmoticExcess(ionicStrength, a);
            String model = activity.name();
            double[] saline = new double[3];      // free Na+, K+, Cl-
            for (int i = 0; i < n; i++) {
                if (sp[i].protons() == 0 && sp[i].components().size() == 1 && Pitzer.covers(sp[i].name())) {
                    saline["Na+".equals(sp[i].name()) ? 0 : "K+".equals(sp[i].name()) ? 1 : 2] += m[i];
                }
            }
            double strong = saline[0] + saline[1] + saline[2];
            OptionalDouble phi = Pitzer.osmoticCoefficient(saline[0], saline[1], saline[2], kelvin);
            if (ionicStrength > activity.warnAbove() && 0.5 * strong >= 0.75 * ionicStrength && phi.isPresent()) {
                osmolality = phi.getAsDouble() * strong + (total - strong);
                model = "Pitzer for Na+, K+ and Cl- (Pitzer and Mayorga 1973), the other solutes ideal";
            }
            return new EquilibriumState(kelvin, pH, ionicStrength, beta, -Math.log10(kw), mH, mOH,
                    total, osmolality, model, out, caveats, byComponent, openSet);
        }
    }
}
