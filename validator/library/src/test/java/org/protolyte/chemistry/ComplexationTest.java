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

/**
 * Species made of several components, solved with every mass balance and the charge balance. Every expected value
 * here is derived from the definitions (mass action, mass and charge balance, a Henderson–Hasselbalch limit); the
 * constants are invented test values, not data.
 */
class ComplexationTest {

    private static final SubstanceLibrary LIBRARY = LibraryLoader.shipped(new SchemaCatalog());
    private static final Component NA = LIBRARY.ion("Na+").orElseThrow();
    private static final Component CL = LIBRARY.ion("Cl-").orElseThrow();
    private static final Component M = new Component("M+2", 2);
    private static final AcidBaseSystem CITRATE = LIBRARY.system("citrate").orElseThrow();
    private static final Equilibrium DAVIES = new Equilibrium(Davies.INSTANCE);

    /** M+2 + Cit-3 ⇌ MCit- with log K, and M+2 + HCit-2 ⇌ MHCit (log K + pKa3 relative to the bases). */
    private static List<Species> species(double logK) {
        Component cit = CITRATE.basis();
        List<Species> s = new ArrayList<>(CITRATE.species());
        s.add(Species.free(M));
        s.add(Species.free(NA));
        s.add(Species.free(CL));
        s.add(new Species("MCit-", -1, Map.of(M, 1, cit, 1), 0,
                new FormationConstant(logK, 0, 0, 0, TemperatureRange.UNBOUNDED)));
        return s;
    }

    private static EquilibriumState solve(double logK, double metal, double sodium) {
        Map<Component, Double> totals = new LinkedHashMap<>();
        totals.put(CITRATE.basis(), 0.01);
        totals.put(M, metal);
        totals.put(CL, 2 * metal);
        totals.put(NA, sodium);
        return DAVIES.solve(species(logK), totals, 298.15);
    }

    private static double molality(EquilibriumState s, String name) {
        return s.species().stream().filter(x -> x.species().name().equals(name)).findFirst().orElseThrow().molality();
    }

    @Test
    void massChargeAndMassActionHoldAtTheSolution() {
        EquilibriumState s = solve(4.0, 0.005, 0.02);
        double charge = s.hydrogenMolality() - s.hydroxideMolality();
        for (SpeciesAmount sp : s.species()) {
            charge += sp.species().charge() * sp.molality();
        }
        assertEquals(0, charge, 1e-12);
        double citrate = 0;
        for (String f : List.of("H3Cit", "H2Cit-", "HCit-2", "Cit-3", "MCit-")) {
            citrate += molality(s, f);
        }
        assertEquals(0.01, citrate, 1e-14);
        assertEquals(0.005, molality(s, "M+2") + molality(s, "MCit-"), 1e-14);
        // K = a(MCit-) / (a(M+2) a(Cit-3)), with the Davies γ of each charge at the solution's I
        double a = Water.debyeHuckelA(298.15);
        double i = s.ionicStrength();
        double k = molality(s, "MCit-") * Math.pow(10, Davies.INSTANCE.log10Gamma(-1, i, a))
                / (molality(s, "M+2") * Math.pow(10, Davies.INSTANCE.log10Gamma(2, i, a))
                * molality(s, "Cit-3") * Math.pow(10, Davies.INSTANCE.log10Gamma(-3, i, a)));
        assertEquals(4.0, Math.log10(k), 1e-9);
    }

    /** Binding the fully deprotonated ligand pulls its acid forms apart: the metal releases protons, the pH falls. */
    @Test
    void aBindingMetalReleasesProtons() {
        double without = solve(4.0, 0, 0.02).pH();
        double with = solve(4.0, 0.005, 0.02).pH();
        assertTrue(with < without - 0.1, with + " vs " + without);
    }

    /** A vanishing constant gives back the solution without the complex, buffer capacity included. */
    @Test
    void aNegligibleComplexChangesNothing() {
        EquilibriumState weak = solve(-30, 0.005, 0.02);
        Map<Component, Double> totals = new LinkedHashMap<>();
        totals.put(CITRATE.basis(), 0.01);
        totals.put(M, 0.005);
        totals.put(CL, 0.01);
        totals.put(NA, 0.02);
        List<Species> plain = new ArrayList<>(species(0));
        plain.removeIf(x -> x.name().equals("MCit-"));
        EquilibriumState none = DAVIES.solve(plain, totals, 298.15);
        assertEquals(none.pH(), weak.pH(), 1e-10);
        assertEquals(none.bufferCapacity(), weak.bufferCapacity(), 1e-6 * none.bufferCapacity());
        assertEquals(none.osmolality(), weak.osmolality(), 1e-12);
    }

    /**
     * A complex takes particles out of solution: particles = T_M + T_Cit + Na + Cl + H + OH − m(MCit), so binding
     * lowers the particle molality by the complex's molality, less the protons it releases (derived).
     */
    @Test
    void aComplexCountsAsOneParticle() {
        EquilibriumState bound = solve(6.0, 0.005, 0.03);
        EquilibriumState free = solve(-30, 0.005, 0.03);
        double complex = molality(bound, "MCit-");
        assertTrue(complex > 0.004, "bound " + complex);
        double protonsReleased = bound.hydrogenMolality() + bound.hydroxideMolality()
                - free.hydrogenMolality() - free.hydroxideMolality();
        assertEquals(complex - protonsReleased, free.particleMolality() - bound.particleMolality(), 1e-12);
    }

    /**
     * The buffer capacity with complexes (implicit differentiation) is the slope of the titration: strong base added
     * per pH at fixed activity coefficients, β ≈ ΔC_Na/ΔpH by central difference (derived).
     */
    @Test
    void bufferCapacityIsTheSlopeOfTheTitration() {
        EquilibriumState s = solve(6.0, 0.005, 0.02);
        double i = s.ionicStrength();
        double h = 1e-6;
        double up = solveAt(6.0, 0.005, 0.02 + h, i).pH();
        double down = solveAt(6.0, 0.005, 0.02 - h, i).pH();
        assertEquals(2 * h / (up - down), solveAt(6.0, 0.005, 0.02, i).bufferCapacity(), 1e-5 * s.bufferCapacity());
    }

    private static EquilibriumState solveAt(double logK, double metal, double sodium, double ionicStrength) {
        Map<Component, Double> totals = new LinkedHashMap<>();
        totals.put(CITRATE.basis(), 0.01);
        totals.put(M, metal);
        totals.put(CL, 2 * metal);
        totals.put(NA, sodium);
        return DAVIES.solve(species(logK), totals, 298.15, ionicStrength);
    }
}
