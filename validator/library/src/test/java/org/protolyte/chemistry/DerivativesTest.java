package org.protolyte.chemistry;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Function;

import org.apache.commons.math3.random.RandomGenerator;
import org.apache.commons.math3.random.Well19937c;
import org.junit.jupiter.api.Test;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.substance.LibraryLoader;
import org.protolyte.substance.SubstanceLibrary;

/**
 * The implicit-differentiation derivatives of a solved state against central differences of solving again, over
 * random recipes of the shipped library's buffers, salts, divalent ions with their complexes, and CO2 open or closed
 * (a property test: the two routes are independent, one linear solve at the root against two full solves).
 */
class DerivativesTest {

    private static final SubstanceLibrary LIBRARY = LibraryLoader.shipped(new SchemaCatalog());
    private static final Equilibrium DAVIES = new Equilibrium(Davies.INSTANCE);
    private static final List<String> SYSTEMS = List.of("phosphate", "citrate", "Tris", "acetate", "HEPES",
            "histidine", "borate", "MES", "glycine", "succinate", "lactate", "MOPS");
    /**
     * Central differences at H and H/2 combined by Richardson extrapolation (error of order H⁴): at this step both the
     * truncation and the solver's own noise (I settled to 1e-10 relative) stay well below the agreement asked.
     */
    private static final double H = 1e-3;
    private static final double RELATIVE = 1e-6;

    record Recipe(List<Species> species, Map<Component, Double> totals, double kelvin, Map<Species, Double> fixed,
                  List<AcidBaseSystem> systems) {
    }

    private static Recipe random(RandomGenerator r, double salt) {
        List<Species> species = new ArrayList<>();
        Map<Component, Double> totals = new LinkedHashMap<>();
        List<AcidBaseSystem> systems = new ArrayList<>();
        int count = 1 + r.nextInt(3);
        for (int k = 0; k < count; k++) {
            AcidBaseSystem s = LIBRARY.system(SYSTEMS.get(r.nextInt(SYSTEMS.size()))).orElseThrow();
            if (!systems.contains(s)) {
                systems.add(s);
                species.addAll(s.species());
                totals.put(s.basis(), 0.002 + 0.05 * r.nextDouble());
            }
        }
        for (String ion : List.of("Na+", "Cl-", "K+")) {
            Component c = LIBRARY.ion(ion).orElseThrow();
            species.add(Species.free(c));
            totals.put(c, 0.001 + salt * r.nextDouble());
        }
        if (r.nextBoolean()) {
            for (String ion : List.of("Ca+2", "Mg+2")) {
                Component c = LIBRARY.ion(ion).orElseThrow();
                species.add(Species.free(c));
                totals.put(c, 0.0005 + 0.002 * r.nextDouble());
            }
            species.addAll(LIBRARY.complexes());
        }
        double kelvin = 278.15 + 35 * r.nextDouble();
        Map<Species, Double> fixed = Map.of();
        if (r.nextInt(3) == 0) {
            AcidBaseSystem carbonate = LIBRARY.system("carbonate").orElseThrow();
            if (!systems.contains(carbonate)) {
                systems.add(carbonate);
                species.addAll(carbonate.species());
            }
            totals.putIfAbsent(carbonate.basis(), 0.0);
            fixed = Map.of(carbonate.species().get(0), CarbonDioxide.dissolvedMolality(kelvin, 5000 * r.nextDouble()));
        }
        return new Recipe(species, totals, kelvin, fixed, systems);
    }

    private static Equilibrium.Prepared prepared(Equilibrium e, Recipe x) {
        return e.prepare(x.species(), x.totals().keySet(), x.kelvin(), x.fixed());
    }

    private static Equilibrium.Point point(Equilibrium e, Recipe x, Map<Component, Double> totals) {
        return prepared(e, x).trial(totals, null);
    }

    /** The derivative of the solved state by central differences of solving again, Richardson-extrapolated. */
    private static double[] central(Function<Double, Equilibrium.Point> at) {
        double[] wide = difference(at, H);
        double[] narrow = difference(at, H / 2);
        double[] out = new double[3];
        for (int k = 0; k < 3; k++) {
            out[k] = (4 * narrow[k] - wide[k]) / 3;
        }
        return out;
    }

    private static double[] difference(Function<Double, Equilibrium.Point> at, double h) {
        Equilibrium.Point up = at.apply(h);
        Equilibrium.Point down = at.apply(-h);
        return new double[] {(up.pH() - down.pH()) / (2 * h), (up.ionicStrength() - down.ionicStrength()) / (2 * h),
                (up.bufferCapacity() - down.bufferCapacity()) / (2 * h)};
    }

    private static void agree(double[] expected, Derivatives.Response actual, String what) {
        double[] got = {actual.pH(), actual.ionicStrength(), actual.bufferCapacity()};
        String[] names = {"pH", "I", "β"};
        for (int k = 0; k < 3; k++) {
            // relative 1e-6, or absolute where the derivative itself is below what a difference resolves
            double tolerance = Math.max(RELATIVE * Math.abs(expected[k]), 2e-9);
            assertEquals(expected[k], got[k], tolerance, what + ": d" + names[k]);
        }
    }

    @Test
    void analyticDerivativesAgreeWithCentralDifferencesOverRandomRecipes() {
        agreeOverRandomRecipes(DAVIES, 0.1, 20_261_202L, 30);
    }

    /**
     * The same where Pitzer's composition terms take part (I from about 0.05 to 0.6 mol/kg, through the hand-over and
     * beyond it): their response to the molalities is followed by iteration, and must agree as closely.
     */
    @Test
    void derivativesFollowPitzersCompositionTerms() {
        agreeOverRandomRecipes(new Equilibrium(IonInteraction.INSTANCE), 0.4, 20_261_203L, 25);
    }

    private static void agreeOverRandomRecipes(Equilibrium model, double salt, long seed, int least) {
        RandomGenerator r = new Well19937c(seed);
        int checked = 0;
        int withComplexes = 0;
        int open = 0;
        for (int trial = 0; trial < 40; trial++) {
            Recipe x = random(r, salt);
            Equilibrium.Prepared base = prepared(model, x);
            try {
                base.trial(x.totals(), null);
            } catch (IndeterminateException e) {
                continue;
            }
            Derivatives d = base.derivatives();
            String label = "recipe " + trial + " " + x.totals().keySet().stream().map(Component::name).toList();
            for (AcidBaseSystem s : x.systems()) {
                for (int k = 0; k < s.steps().size(); k++) {
                    int step = k;
                    agree(central(h -> point(model.withPKaShift(s, step, h), x, x.totals())),
                            d.logBeta(Equilibrium.pKaShift(s, step)), label + " " + s.name() + " pKa" + (k + 1));
                }
            }
            for (Species c : LIBRARY.complexes()) {
                if (x.species().contains(c) && x.totals().keySet().containsAll(c.components().keySet())) {
                    agree(central(h -> point(model.withLogKShift(c, h), x, x.totals())), d.logBeta(Map.of(c, 1.0)),
                            label + " " + c.name() + " log K");
                    withComplexes++;
                }
            }
            agree(central(h -> point(model.withPKwShift(h), x, x.totals())), d.pKw(), label + " pKw");
            if (!x.fixed().isEmpty()) {
                agree(central(h -> base.withFixedScaled(Math.exp(h)).trial(x.totals(), null)), d.fixedScaled(),
                        label + " ln CO2");
            }
            List<Component> order = base.components();
            for (int j = 0; j < order.size(); j++) {
                Component c = order.get(j);
                double t = x.totals().get(c);
                if (t <= 0 || x.fixed().keySet().stream().anyMatch(f -> f.components().containsKey(c))) {
                    continue;
                }
                double[] dT = new double[order.size()];
                dT[j] = t;
                // a direction short enough that the pH moves little along it, even at an end point (dpH/dln T of 50)
                double size = t / (1 + Math.abs(d.totals(dT).pH()));
                dT[j] = size;
                agree(central(h -> {
                    Map<Component, Double> moved = new LinkedHashMap<>(x.totals());
                    moved.put(c, t + size * h);
                    return point(model, x, moved);
                }), d.totals(dT), label + " total of " + c.name());
            }
            checked++;
            open += x.fixed().isEmpty() ? 0 : 1;
        }
        assertTrue(checked >= least, "only " + checked + " recipes solved");
        assertTrue(withComplexes >= 20, "only " + withComplexes + " complexes checked");
        assertTrue(open >= 5, "only " + open + " recipes open to CO2");
    }

    @Test
    void aStateSolvedAtAFixedIonicStrengthHasNoDerivatives() {
        Recipe x = random(new Well19937c(7), 0.1);
        Equilibrium.Prepared p = prepared(DAVIES, x);
        p.solve(x.totals(), 0.1);
        assertThrows(IllegalStateException.class, p::derivatives);
    }
}
