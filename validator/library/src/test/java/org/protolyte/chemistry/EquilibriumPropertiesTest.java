package org.protolyte.chemistry;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.substance.LibraryLoader;
import org.protolyte.substance.SubstanceLibrary;

/** Laws the solution must obey whatever the recipe: charge balance, monotone titration, positive buffer capacity. */
class EquilibriumPropertiesTest {

    private static final SubstanceLibrary LIBRARY = LibraryLoader.shipped(new SchemaCatalog());
    private static final Component NA = LIBRARY.ion("Na+").orElseThrow();
    private static final Component CL = LIBRARY.ion("Cl-").orElseThrow();
    private static final Equilibrium DAVIES = new Equilibrium(Davies.INSTANCE);

    /** Phosphate + citrate + Tris with sodium as the base: a three-system mixture. */
    private static EquilibriumState mixture(double sodium, double kelvin, double fixedI) {
        List<Species> species = new ArrayList<>();
        Map<Component, Double> totals = new LinkedHashMap<>();
        for (String name : List.of("phosphate", "citrate", "Tris")) {
            AcidBaseSystem s = LIBRARY.system(name).orElseThrow();
            species.addAll(s.species());
            totals.put(s.basis(), 0.01);
        }
        species.add(Species.free(NA));
        species.add(Species.free(CL));
        totals.put(NA, sodium);
        totals.put(CL, 0.05);
        return DAVIES.solve(species, totals, kelvin, fixedI);
    }

    @Test
    void chargeBalanceHoldsAtTheSolution() {
        for (double na = 0.0; na <= 0.12; na += 0.01) {
            EquilibriumState s = mixture(na, 298.15, Double.NaN);
            double charge = s.hydrogenMolality() - s.hydroxideMolality();
            for (SpeciesAmount sp : s.species()) {
                charge += sp.species().charge() * sp.molality();
            }
            assertEquals(0, charge, 1e-12, "residual at Na+ " + na);
        }
    }

    @Test
    void massBalanceHoldsForEveryComponent() {
        EquilibriumState s = mixture(0.04, 310.15, Double.NaN);
        Map<Component, Double> sums = new LinkedHashMap<>();
        s.species().forEach(sp -> sums.merge(sp.component(), sp.molality(), Double::sum));
        sums.forEach((c, m) -> assertEquals(c == NA ? 0.04 : c == CL ? 0.05 : 0.01, m, 1e-15, c.name()));
    }

    @Test
    void addingBaseNeverLowersThePH() {
        double previous = Double.NEGATIVE_INFINITY;
        for (double na = 0.0; na <= 0.12; na += 0.002) {
            double pH = mixture(na, 298.15, Double.NaN).pH();
            assertTrue(pH > previous, "pH fell from " + previous + " to " + pH + " at Na+ " + na);
            previous = pH;
        }
    }

    @Test
    void bufferCapacityIsPositive() {
        for (double na = 0.0; na <= 0.12; na += 0.005) {
            assertTrue(mixture(na, 298.15, Double.NaN).bufferCapacity() > 0);
        }
    }

    /** β = dC_base/dpH: the analytic value against a central difference at the same fixed ionic strength. */
    @Test
    void analyticBufferCapacityMatchesNumericalDerivative() {
        for (double na : new double[] {0.02, 0.045, 0.07}) {
            EquilibriumState s = mixture(na, 298.15, Double.NaN);
            double i = s.ionicStrength();
            double h = 1e-6;
            double numeric = 2 * h / (mixture(na + h, 298.15, i).pH() - mixture(na - h, 298.15, i).pH());
            assertEquals(numeric, s.bufferCapacity(), 1e-4 * numeric, "at Na+ " + na);
        }
    }

    /** Ionic strength as solved equals ½ Σ z² m over the species it reports. */
    @Test
    void ionicStrengthIsSelfConsistent() {
        EquilibriumState s = mixture(0.05, 298.15, Double.NaN);
        double i = 0.5 * (s.hydrogenMolality() + s.hydroxideMolality());
        for (SpeciesAmount sp : s.species()) {
            i += 0.5 * sp.species().charge() * sp.species().charge() * sp.molality();
        }
        assertEquals(i, s.ionicStrength(), 1e-9 * i);
    }

    @Test
    void ionicStrengthAboveTheDaviesLimitIsIndeterminate() {
        List<Species> species = List.of(Species.free(NA), Species.free(CL));
        EquilibriumState s = DAVIES.solve(species, Map.of(NA, 0.8, CL, 0.8), 298.15);
        assertTrue(s.caveats().stream().anyMatch(c -> c.code().equals("ionic-strength-out-of-range")));
        assertTrue(!s.determinate());
    }

    @Test
    void ionicStrengthAboveTheWarningLevelWarns() {
        List<Species> species = List.of(Species.free(NA), Species.free(CL));
        EquilibriumState s = DAVIES.solve(species, Map.of(NA, 0.3, CL, 0.3), 298.15);
        assertTrue(s.caveats().stream().anyMatch(c -> c.code().equals("ionic-strength-high")));
        assertTrue(s.determinate());
    }

    /**
     * 0.9 % NaCl freezes at about −0.52 °C (the isotonic reference of the trade, common practice); with φ = 1 the
     * estimate is −0.57 °C, so at −1 °C the solution is frozen and no pH is given.
     */
    @Test
    void belowTheFreezingPointNoPHIsGiven() {
        List<Species> species = List.of(Species.free(NA), Species.free(CL));
        Map<Component, Double> saline = Map.of(NA, 0.154, CL, 0.154);
        IndeterminateException e = org.junit.jupiter.api.Assertions.assertThrows(IndeterminateException.class,
                () -> DAVIES.solve(species, saline, 272.15));
        assertEquals("below-freezing-point", e.caveat().code());
        double tf = Cryoscopy.freezingPointKelvin(0.308) - Thermo.KELVIN_OFFSET;
        assertEquals(-0.52, tf, 0.06);
    }

    @Test
    void outsideTheConstantsTemperatureRangeIsIndeterminate() {
        AcidBaseSystem tris = LIBRARY.system("Tris").orElseThrow();
        EquilibriumState s = DAVIES.solve(tris.species(), Map.of(tris.basis(), 0.05), 394.15 - 30);
        assertTrue(s.caveats().stream().anyMatch(c -> c.code().equals("temperature-out-of-range")));
    }

    /** Goldberg et al. 2002 list dpKa/dT ≈ −0.028 K⁻¹ for Tris near 25 °C (from memory); the van 't Hoff form gives it. */
    @Test
    void trisPKaFallsWithTemperature() {
        DissociationStep step = LIBRARY.system("Tris").orElseThrow().steps().get(0);
        double slope = (step.pKa(299.15) - step.pKa(297.15)) / 2;
        assertEquals(-0.028, slope, 0.002);
    }
}
