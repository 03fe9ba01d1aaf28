package org.protolyte.chemistry;

import java.util.ArrayList;
import java.util.Collection;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.ToDoubleFunction;
import java.util.stream.IntStream;

/**
 * Everything about a solve that does not depend on the amounts, fixed once prepared: the species that the components
 * form, each one's component and charges, the constants at the temperature (log β, Kw, the Debye–Hückel slope), the
 * species held by a gas phase, and which speciation path the numbers allow. Immutable, so one instance serves any
 * number of threads, each with its own {@link Workspace}.
 */
final class PreparedProblem {

    /** The linear path's bounds: products of powers of aH stay inside a double (see {@link FreeSpeciation}). */
    private static final int MAX_LINEAR_PROTONS = 12;
    private static final double MAX_LINEAR_LOG_BETA = 250;
    private static final int MAX_LINEAR_CHARGE = 8;

    final ActivityModel activity;
    final double kelvin;
    final int n;
    final Species[] sp;
    /** Each species' index (the first, should one be listed twice). */
    final Map<Species, Integer> speciesIndex;
    final int[] comp;               // index of the species' component (a complex: the component it is shown under)
    final int[] protons;
    final int[] charge;
    /** The charge in the ionic strength and the activity coefficients: 0 for a group bound to a macroion. */
    final int[] ionCharge;
    /** Per component, the same. */
    final int[] componentIonCharge;
    /** 1 for a species that counts as a particle in the osmolality, 0 for a bound group (its macroion counts). */
    final double[] particle;
    final double[] log10Beta;
    final double[] beta;            // 10^log β (the linear and powered paths)
    final Map<Component, Integer> index;
    final Component[] components;
    /** Per species: null for a species of one component; for a complex its components and their counts. */
    final int[][] complexParts;
    final int[][] complexCounts;
    final int[] complexIndex;       // the species that are complexes, in order
    final boolean complexes;
    final boolean[] coupledComponent;   // in at least one complex
    final int coupledCount;
    final boolean linear;           // no complexes, and within the linear bounds
    final boolean powered;          // complexes, within the same bounds: products of powers are safe to try
    final int maxProtons;
    final double kw;
    final double debyeHuckelA;
    /** Per component: index of the species held fixed (open component), or −1 (closed). */
    final int[] fixedIndex;
    final double[] fixedMolality;
    final Speciation speciation;
    /** Pitzer's composition terms where the activity model hands over to them ({@link IonInteraction}), else null. */
    final Interactions interactions;

    /**
     * @param logBeta log10 β of each species at the temperature, shifts included
     * @param pKw     pKw at the temperature, shift included
     */
    PreparedProblem(ActivityModel activity, List<Species> species, Collection<Component> componentSet, double kelvin,
                    Map<Species, Double> fixed, ToDoubleFunction<Species> logBeta, double pKw) {
        this.activity = activity;
        this.kelvin = kelvin;
        Map<Component, Integer> idx = new LinkedHashMap<>();
        for (Component c : componentSet) {
            idx.put(c, idx.size());
        }
        List<Species> used = new ArrayList<>();
        for (Species s : species) {
            if (idx.keySet().containsAll(s.components().keySet())) {
                used.add(s);
            }
        }
        n = used.size();
        sp = used.toArray(new Species[0]);
        Map<Species, Integer> at = new java.util.HashMap<>();
        for (int i = n - 1; i >= 0; i--) {
            at.put(sp[i], i);
        }
        speciesIndex = Map.copyOf(at);
        comp = new int[n];
        protons = new int[n];
        charge = new int[n];
        ionCharge = new int[n];
        particle = new double[n];
        log10Beta = new double[n];
        complexParts = new int[n][];
        complexCounts = new int[n][];
        for (int i = 0; i < n; i++) {
            Map<Component, Integer> parts = sp[i].components();
            if (sp[i].isComplex()) {
                List<Component> ordered = new ArrayList<>(parts.keySet());
                // shown with its most negative part (the ligand): CaCit- under citrate
                ordered.sort(Comparator.comparingInt(Component::charge).thenComparing(Component::name));
                complexParts[i] = new int[ordered.size()];
                complexCounts[i] = new int[ordered.size()];
                for (int q = 0; q < ordered.size(); q++) {
                    complexParts[i][q] = idx.get(ordered.get(q));
                    complexCounts[i][q] = parts.get(ordered.get(q));
                }
                comp[i] = complexParts[i][0];
            } else {
                comp[i] = idx.get(parts.keySet().iterator().next());
            }
            protons[i] = sp[i].protons();
            charge[i] = sp[i].charge();
            boolean bound = parts.keySet().stream().anyMatch(Component::bound);
            ionCharge[i] = bound ? 0 : charge[i];
            particle[i] = bound ? 0 : 1;
            log10Beta[i] = logBeta.applyAsDouble(sp[i]);
        }
        index = idx;
        components = idx.keySet().toArray(new Component[0]);
        componentIonCharge = java.util.Arrays.stream(components).mapToInt(Component::ionicCharge).toArray();
        for (int j = 0; j < components.length; j++) {
            boolean hasSpecies = false;
            for (int i = 0; i < n; i++) {
                hasSpecies |= complexParts[i] == null && comp[i] == j;
            }
            if (!hasSpecies) {
                throw new IllegalArgumentException("component " + components[j].name() + " has no species");
            }
        }
        kw = Math.pow(10, -pKw);
        debyeHuckelA = Water.debyeHuckelA(kelvin);
        int most = 0;
        boolean ok = true;
        for (int i = 0; i < n; i++) {
            most = Math.max(most, protons[i]);
            ok &= protons[i] >= 0 && protons[i] <= MAX_LINEAR_PROTONS && Math.abs(log10Beta[i]) < MAX_LINEAR_LOG_BETA
                    && Math.abs(charge[i]) <= MAX_LINEAR_CHARGE;
        }
        maxProtons = most;
        beta = new double[n];
        for (int i = 0; i < n; i++) {
            beta[i] = Math.pow(10, log10Beta[i]);
        }
        complexIndex = IntStream.range(0, n).filter(i -> complexParts[i] != null).toArray();
        complexes = complexIndex.length > 0;
        linear = ok && !complexes;
        powered = ok && complexes;
        coupledComponent = new boolean[components.length];
        for (int c : complexIndex) {
            for (int j : complexParts[c]) {
                coupledComponent[j] = true;
            }
        }
        int count = 0;
        for (boolean x : coupledComponent) {
            count += x ? 1 : 0;
        }
        coupledCount = count;
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
        speciation = complexes ? CoupledSpeciation.INSTANCE : FreeSpeciation.INSTANCE;
        interactions = activity instanceof IonInteraction ? new Interactions(this) : null;
    }

    /**
     * The same problem with one species' log β raised by {@code delta} (for judging that constant's own effect; −1 for
     * none) and every species held by a gas phase scaled by {@code fixedScale} (a partial pressure scaled).
     */
    private PreparedProblem(PreparedProblem p, int species, double delta, double fixedScale) {
        activity = p.activity;
        kelvin = p.kelvin;
        n = p.n;
        sp = p.sp;
        speciesIndex = p.speciesIndex;
        comp = p.comp;
        protons = p.protons;
        charge = p.charge;
        ionCharge = p.ionCharge;
        componentIonCharge = p.componentIonCharge;
        particle = p.particle;
        log10Beta = p.log10Beta.clone();
        beta = p.beta.clone();
        if (species >= 0) {
            log10Beta[species] += delta;
            beta[species] = Math.pow(10, log10Beta[species]);
        }
        index = p.index;
        components = p.components;
        complexParts = p.complexParts;
        complexCounts = p.complexCounts;
        complexIndex = p.complexIndex;
        complexes = p.complexes;
        coupledComponent = p.coupledComponent;
        coupledCount = p.coupledCount;
        linear = p.linear;
        powered = p.powered;
        maxProtons = p.maxProtons;
        kw = p.kw;
        debyeHuckelA = p.debyeHuckelA;
        fixedIndex = p.fixedIndex;
        fixedMolality = p.fixedMolality.clone();
        for (int j = 0; j < fixedMolality.length; j++) {
            fixedMolality[j] *= fixedScale;
        }
        speciation = p.speciation;
        interactions = p.interactions;
    }

    PreparedProblem withLogBetaShift(int species, double delta) {
        return new PreparedProblem(this, species, delta, 1);
    }

    PreparedProblem withFixedScaled(double factor) {
        return new PreparedProblem(this, -1, 0, factor);
    }

    boolean open(int component) {
        return fixedIndex[component] >= 0;
    }

    /** Σ_j ν_ij x_j over the components species i is made of (x_j itself for a species of one component). */
    double overParts(int i, double[] perComponent) {
        if (complexParts[i] == null) {
            return perComponent[comp[i]];
        }
        double sum = 0;
        for (int q = 0; q < complexParts[i].length; q++) {
            sum += complexCounts[i][q] * perComponent[complexParts[i][q]];
        }
        return sum;
    }

    /** How many of the component it is shown under a species holds: 1 for a free form. */
    int homeCount(int i) {
        return complexParts[i] == null ? 1 : complexCounts[i][0];
    }

    /** Checks and copies the totals of one solve into {@code total}; a component the map does not name is absent. */
    void load(Map<Component, Double> totals, double[] total) {
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

    /** The same for totals in the order of {@link #components}. */
    void load(double[] totals, double[] total) {
        if (totals.length != total.length) {
            throw new IllegalArgumentException("expected " + total.length + " totals, got " + totals.length);
        }
        for (int j = 0; j < totals.length; j++) {
            if (!(totals[j] >= 0) || !Double.isFinite(totals[j])) {
                throw new IllegalArgumentException("total of " + components[j].name() + " must be ≥ 0");
            }
            total[j] = totals[j];
        }
    }
}
