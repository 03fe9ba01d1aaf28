package org.protolyte.chemistry;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The solver evaluates the mass balances by products of powers where they fit in a double and in log space where
 * they do not; the answer cannot depend on which. Each case sets a recipe beside one that differs only by what the
 * chemistry says cannot matter (a component's only species holds its total whatever its constant; a complex of
 * vanishing constant forms nothing). The constants are invented test values, not data.
 */
class SolverPathsTest {

    private static final Equilibrium DAVIES = new Equilibrium(Davies.INSTANCE);
    private static final Equilibrium IDEAL = new Equilibrium(IdealActivity.INSTANCE);
    private static final Component NA = new Component("Na+", 1);
    private static final Component CL = new Component("Cl-", -1);
    private static final Component M = new Component("M+2", 2);
    private static final TemperatureRange ANY = TemperatureRange.UNBOUNDED;
    private static final AcidBaseSystem ACID = new AcidBaseSystem("A",
            List.of(new AcidBaseSystem.Form("H2A", 0), new AcidBaseSystem.Form("HA-", -1),
                    new AcidBaseSystem.Form("A-2", -2)),
            List.of(new DissociationStep(4.2, 0, 0, 0, ANY), new DissociationStep(6.9, 0, 0, 0, ANY)));

    private static EquilibriumState solve(List<Species> extra, Map<Component, Double> extraTotals) {
        List<Species> species = new ArrayList<>(ACID.species());
        species.add(Species.free(NA));
        species.add(Species.free(CL));
        species.addAll(extra);
        Map<Component, Double> totals = new LinkedHashMap<>();
        totals.put(ACID.basis(), 0.02);
        totals.put(NA, 0.03);
        totals.put(CL, 0.002);
        totals.putAll(extraTotals);
        return DAVIES.solve(species, totals, 298.15);
    }

    /**
     * X−7 held as its only species H12X+5: its total is all there is of it, whatever its constant. log β = 0 takes the
     * products of powers; −249 underflows them (aH^12·β below the smallest double) and takes log space; 300 is past
     * the products' bound and takes log space from the start.
     */
    @ParameterizedTest(name = "log β = {0}")
    @ValueSource(doubles = {-249, 300})
    void aComponentsOnlySpeciesHoldsItsTotalWhateverItsConstant(double logBeta) {
        Component x = new Component("X-7", -7);
        EquilibriumState reference = solve(List.of(only(x, 0)), Map.of(x, 0.001));
        EquilibriumState s = solve(List.of(only(x, logBeta)), Map.of(x, 0.001));
        assertEquals(reference.pH(), s.pH(), 1e-10);
        assertEquals(reference.ionicStrength(), s.ionicStrength(), 1e-12);
        assertEquals(reference.bufferCapacity(), s.bufferCapacity(), 1e-9 * reference.bufferCapacity());
        assertEquals(reference.osmolality(), s.osmolality(), 1e-12);
        double held = s.species().stream().filter(a -> a.species().name().equals("H12X+5")).findFirst().orElseThrow()
                .molality();
        assertEquals(0.001, held, 1e-15);
    }

    private static Species only(Component x, double logBeta) {
        return new Species("H12X+5", 5, Map.of(x, 1), 12, new FormationConstant(logBeta, 0, 0, 0, ANY));
    }

    /** A second complex of log K −300 forms nothing, but it takes the log-space path for every complex. */
    @Test
    void aVanishingComplexChangesNothingAndTakesLogSpace() {
        Species bound = new Species("MA", 0, Map.of(M, 1, ACID.basis(), 1), 0, new FormationConstant(3.5, 0, 0, 0, ANY));
        Species protonated = new Species("MHA+", 1, Map.of(M, 1, ACID.basis(), 1), 1,
                new FormationConstant(7.9, 0, 0, 0, ANY));
        Species vanishing = new Species("M2A+2", 2, Map.of(M, 2, ACID.basis(), 1), 0,
                new FormationConstant(-300, 0, 0, 0, ANY));
        Map<Component, Double> metal = new LinkedHashMap<>();
        metal.put(M, 0.005);
        metal.put(CL, 0.012);
        EquilibriumState products = solve(List.of(Species.free(M), bound, protonated), metal);
        EquilibriumState logs = solve(List.of(Species.free(M), bound, protonated, vanishing), metal);
        assertEquals(products.pH(), logs.pH(), 1e-10);
        assertEquals(products.ionicStrength(), logs.ionicStrength(), 1e-12);
        assertEquals(products.bufferCapacity(), logs.bufferCapacity(), 1e-8 * products.bufferCapacity());
        assertEquals(products.osmolality(), logs.osmolality(), 1e-12);
        for (String name : List.of("MA", "MHA+", "M+2", "HA-")) {
            assertEquals(molality(products, name), molality(logs, name), 1e-12 * molality(products, name), name);
        }
        assertEquals(0, molality(logs, "M2A+2"), 1e-30);
    }

    /** Species of a component the recipe does not hold are left out: they cannot change the answer. */
    @Test
    void speciesOfAbsentComponentsAreLeftOut() {
        Component y = new Component("Y+", 1);
        EquilibriumState plain = solve(List.of(), Map.of());
        EquilibriumState more = solve(List.of(Species.free(y),
                new Species("YA-", -1, Map.of(y, 1, ACID.basis(), 1), 0, new FormationConstant(5, 0, 0, 0, ANY))),
                Map.of());
        assertEquals(plain.pH(), more.pH(), 1e-12);
        assertEquals(plain.species().size(), more.species().size());
    }

    /**
     * 200 mol/kg of chloride with nothing to balance it needs mH = 200, pH −2.3 on the ideal scale; as much sodium needs
     * mOH = 200, pH above 16. Neither root lies in the bracket, and no pH is given.
     */
    @Test
    void aChargeBalanceWithoutARootInTheBracketIsIndeterminate() {
        List<Species> species = List.of(Species.free(NA), Species.free(CL));
        for (Component ion : List.of(NA, CL)) {
            Map<Component, Double> totals = new LinkedHashMap<>();
            totals.put(NA, 0.0);
            totals.put(CL, 0.0);
            totals.put(ion, 200.0);
            IndeterminateException e = assertThrows(IndeterminateException.class,
                    () -> IDEAL.solve(species, totals, 298.15));
            assertEquals("no-root", e.caveat().code());
            assertTrue(e.getMessage().contains("pH -2 and 16"), e.getMessage());
        }
    }

    @Test
    void aComponentWithoutSpeciesIsRefused() {
        Component z = new Component("Z+", 1);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> DAVIES.solve(List.of(Species.free(NA)), Map.of(NA, 0.01, z, 0.01), 298.15));
        assertTrue(e.getMessage().contains("Z+"), e.getMessage());
    }

    @Test
    void aFixedSpeciesOutsideTheProblemIsRefused() {
        Species stranger = Species.free(new Component("CO2", 0));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> DAVIES.solve(
                List.of(Species.free(NA), Species.free(CL)), Map.of(NA, 0.01, CL, 0.01), 298.15, Double.NaN,
                Map.of(stranger, 1e-5)));
        assertTrue(e.getMessage().contains("CO2"), e.getMessage());
    }

    /** Water's own properties hold from −5 to 100 °C: outside, nothing can be said. */
    @Test
    void outsideWatersRangeNoPHIsGiven() {
        List<Species> species = List.of(Species.free(NA), Species.free(CL));
        IndeterminateException e = assertThrows(IndeterminateException.class,
                () -> DAVIES.solve(species, Map.of(NA, 0.01, CL, 0.01), 374.15));
        assertEquals("temperature-out-of-range", e.caveat().code());
        assertTrue(e.getMessage().contains("101.0 °C"), e.getMessage());
        Equilibrium.Prepared p = DAVIES.prepare(species, List.of(NA, CL), 374.15, Map.of());
        assertThrows(IndeterminateException.class, () -> p.point(Map.of(NA, 0.01, CL, 0.01), null));
        assertThrows(IndeterminateException.class, () -> p.trial(Map.of(NA, 0.01, CL, 0.01), null));
    }

    /** Charges beyond ±8 take log space and Davies' γ of their own charge, like any other ion. */
    @Test
    void ionsOfHighChargeTakeTheirOwnActivityCoefficients() {
        Component q = new Component("Q+9", 9);
        Component r = new Component("R-9", -9);
        EquilibriumState s = solve(List.of(Species.free(q), Species.free(r)), Map.of(q, 1e-4, r, 1e-4));
        double a = Water.debyeHuckelA(298.15);
        for (String name : List.of("Q+9", "R-9", "HA-", "Na+")) {
            SpeciesAmount x = s.species().stream().filter(y -> y.species().name().equals(name)).findFirst().orElseThrow();
            assertEquals(Math.pow(10, Davies.INSTANCE.log10Gamma(x.species().charge(), s.ionicStrength(), a)),
                    x.activityCoefficient(), 1e-12, name);
        }
        double charge = s.hydrogenMolality() - s.hydroxideMolality();
        for (SpeciesAmount x : s.species()) {
            charge += x.species().charge() * x.molality();
        }
        assertEquals(0, charge, 1e-12);
    }

    /** 0.154 mol/kg NaCl is 0.308 mol/kg of particles: ΔTf = 1.86 · 0.308 = 0.573 K, so at −1 °C it is ice. */
    @Test
    void belowTheFreezingPointTheMessageGivesBothTemperatures() {
        List<Species> species = List.of(Species.free(NA), Species.free(CL));
        Map<Component, Double> saline = Map.of(NA, 0.154, CL, 0.154);
        IndeterminateException e = assertThrows(IndeterminateException.class,
                () -> DAVIES.solve(species, saline, 272.15));
        assertTrue(e.getMessage().startsWith("-1.0 °C is below the estimated freezing point of the solution (-0.57 °C)"),
                e.getMessage());
        Equilibrium.Prepared p = DAVIES.prepare(species, List.of(NA, CL), 272.15, Map.of());
        assertThrows(IndeterminateException.class, () -> p.point(saline, null));
        assertThrows(IndeterminateException.class, () -> p.trial(saline, null));
        // at 0 °C it is still liquid: neutral, pH = pKw/2 on the ideal scale
        assertEquals(Water.pKw(273.15) / 2, IDEAL.solve(species, saline, 273.15).pH(), 1e-9);
    }

    /** Open to CO2 (CO2(aq) held) the answer is the same whether the molalities take products or log space. */
    @Test
    void anOpenComponentGivesTheSameAnswerInLogSpace() {
        AcidBaseSystem carbonate = new AcidBaseSystem("C", List.of(new AcidBaseSystem.Form("CO2", 0),
                new AcidBaseSystem.Form("HCO3-", -1), new AcidBaseSystem.Form("CO3-2", -2)),
                List.of(new DissociationStep(6.35, 0, 0, 0, ANY), new DissociationStep(10.3, 0, 0, 0, ANY)));
        Component x = new Component("X-7", -7);
        EquilibriumState[] s = new EquilibriumState[2];
        for (int k = 0; k < 2; k++) {
            List<Species> species = new ArrayList<>(carbonate.species());
            species.add(Species.free(NA));
            species.add(Species.free(CL));
            species.add(only(x, k == 0 ? 0 : 300));
            Map<Component, Double> totals = new LinkedHashMap<>();
            totals.put(carbonate.basis(), 0.0);
            totals.put(NA, 0.03);
            totals.put(CL, 0.002);
            totals.put(x, 0.001);
            s[k] = DAVIES.solve(species, totals, 298.15, Double.NaN, Map.of(carbonate.species().get(0), 1.2e-3));
        }
        assertEquals(s[0].pH(), s[1].pH(), 1e-10);
        assertEquals(s[0].bufferCapacity(), s[1].bufferCapacity(), 1e-9 * s[0].bufferCapacity());
        for (String name : List.of("CO2", "HCO3-", "CO3-2")) {
            assertEquals(molality(s[0], name), molality(s[1], name), 1e-12 * molality(s[0], name), name);
        }
        assertEquals(1.2e-3, molality(s[1], "CO2"), 1e-18);
    }

    private static double molality(EquilibriumState s, String name) {
        return s.species().stream().filter(a -> a.species().name().equals(name)).findFirst().orElseThrow().molality();
    }
}
