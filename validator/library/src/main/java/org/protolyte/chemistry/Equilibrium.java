package org.protolyte.chemistry;

import java.util.Collection;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

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

    /** Standard uncertainty of pKw from IAPWS R11-07 near ambient conditions, about 0.01 (from memory). */
    public static final double PKW_UNCERTAINTY = 0.01;

    private final ActivityModel activity;
    private final Map<Species, Double> logBetaShifts;
    private final Map<Species, Double> deltaHShifts;    // J/mol on the dissociation steps the species carries
    private final Map<Species, Double> deltaCpShifts;   // J/(K·mol), likewise
    private final double pKwShift;

    public Equilibrium(ActivityModel activity) {
        this(activity, Map.of(), Map.of(), Map.of(), 0);
    }

    private Equilibrium(ActivityModel activity, Map<Species, Double> logBetaShifts, Map<Species, Double> deltaHShifts,
                        Map<Species, Double> deltaCpShifts, double pKwShift) {
        this.activity = activity;
        this.logBetaShifts = Map.copyOf(logBetaShifts);
        this.deltaHShifts = Map.copyOf(deltaHShifts);
        this.deltaCpShifts = Map.copyOf(deltaCpShifts);
        this.pKwShift = pKwShift;
    }

    /**
     * The same equilibrium with one dissociation step's pKa raised by {@code delta}: every species that
     * carries that step's proton has its log β raised by delta. For propagating a constant's uncertainty.
     */
    public Equilibrium withPKaShift(AcidBaseSystem system, int step, double delta) {
        return withStepShifts(Map.of(system, step(system, step, delta, 0)));
    }

    /**
     * The log β changes that raising one step's pKa by one makes: every species that carries that step's proton (the
     * first {@code step + 1} of the system, most protonated first) by one. For {@link Derivatives#logBeta}.
     */
    public static Map<Species, Double> pKaShift(AcidBaseSystem system, int step) {
        Map<Species, Double> out = new java.util.LinkedHashMap<>();
        for (int i = 0; i <= step; i++) {
            out.put(system.species().get(i), 1.0);
        }
        return out;
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
        Map<Species, Double> logs = new HashMap<>(logBetaShifts);
        Map<Species, Double> enthalpies = new HashMap<>(deltaHShifts);
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
        return new Equilibrium(activity, logs, enthalpies, deltaCpShifts, pKwShift);
    }

    /** The same with one step's ΔCp° of ionization raised by {@code delta} J/(K·mol): its pKa moves away from 25 °C. */
    public Equilibrium withDeltaCpShift(AcidBaseSystem system, int step, double delta) {
        Map<Species, Double> cp = new HashMap<>(deltaCpShifts);
        for (int i = 0; i <= step; i++) {       // every species carrying the step's proton
            cp.merge(system.species().get(i), delta, Double::sum);
        }
        return new Equilibrium(activity, logBetaShifts, deltaHShifts, cp, pKwShift);
    }

    /** The same equilibrium with one complex's log K raised by {@code delta}: for its uncertainty. */
    public Equilibrium withLogKShift(Species complex, double delta) {
        Map<Species, Double> logs = new HashMap<>(logBetaShifts);
        logs.merge(complex, delta, Double::sum);
        return new Equilibrium(activity, logs, deltaHShifts, deltaCpShifts, pKwShift);
    }

    /** The same equilibrium with pKw raised by {@code delta}. */
    public Equilibrium withPKwShift(double delta) {
        return new Equilibrium(activity, logBetaShifts, deltaHShifts, deltaCpShifts, pKwShift + delta);
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
        return new Prepared(new PreparedProblem(activity, species, components, kelvin, fixedSpecies,
                s -> s.formation().log10K(kelvin) + logBetaShifts.getOrDefault(s, 0.0)
                        + DissociationStep.pKaChangeFromDeltaH(deltaHShifts.getOrDefault(s, 0.0), kelvin)
                        + DissociationStep.pKaChangeFromDeltaCp(deltaCpShifts.getOrDefault(s, 0.0), kelvin),
                Water.pKw(kelvin) + pKwShift));
    }

    /** pH, ionic strength (mol/kg), buffer capacity (mol/kg per pH) and osmolality (osmol/kg) of one solve. */
    public record Point(double pH, double ionicStrength, double bufferCapacity, double osmolality) {
    }

    /**
     * A problem prepared at one temperature, solved for any totals of its components. It keeps a workspace, so one
     * instance serves one thread.
     */
    public static final class Prepared {
        private final PreparedProblem problem;
        private final ConditionSolver solver;

        private Prepared(PreparedProblem problem) {
            this.problem = problem;
            this.solver = new ConditionSolver(problem);
        }

        /** Solves with the activity coefficients iterated to self-consistency (NaN) or at a fixed ionic strength. */
        public EquilibriumState solve(Map<Component, Double> totals, double fixedIonicStrength) {
            problem.load(totals, solver.ws.total);
            return solver.state(fixedIonicStrength);
        }

        /**
         * The fast path: self-consistent pH, ionic strength and buffer capacity, started from {@code warm} (a
         * nearby solution, or null). Throws where {@link #solve} would report the state indeterminate.
         */
        public Point point(Map<Component, Double> totals, Point warm) {
            problem.load(totals, solver.ws.total);
            return solver.point(warm);
        }

        /** The same with the totals in the order of {@link #components()}. */
        public Point point(double[] totals, Point warm) {
            problem.load(totals, solver.ws.total);
            return solver.point(warm);
        }

        /**
         * The derivatives of the last self-consistent solution of this problem (by {@link #solve} with NaN,
         * {@link #point} or {@link #trial}): how its pH, I and β respond to the constants and the totals.
         *
         * @throws IllegalStateException where there is none
         */
        public Derivatives derivatives() {
            return solver.derivatives();
        }

        /**
         * The same problem with every species held by a gas phase scaled by {@code factor}: the partial pressure
         * scaled (Henry's law is linear), for a search over it.
         */
        public Prepared withFixedScaled(double factor) {
            return new Prepared(problem.withFixedScaled(factor));
        }

        /** The components, in the order {@link #point(double[], Point)} takes their totals. */
        public List<Component> components() {
            return List.of(problem.components);
        }

        /**
         * A step of a search (a load, a dose): the self-consistent pH, I and β whatever the caveats, which only the
         * search's result is judged by. Throws only where no number exists (frozen, outside water's range, no root,
         * no convergence).
         */
        public Point trial(Map<Component, Double> totals, Point warm) {
            problem.load(totals, solver.ws.total);
            return solver.trial(warm);
        }

        /** The same with the totals in the order of {@link #components()}. */
        public Point trial(double[] totals, Point warm) {
            problem.load(totals, solver.ws.total);
            return solver.trial(warm);
        }
    }
}
