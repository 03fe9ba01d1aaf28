package org.protolyte.chemistry;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;

/**
 * With complexes the buffer capacity comes from implicit differentiation of the coupled mass balances; by definition it
 * is the strong base taken up per pH at fixed activity coefficients, β = dC_Na/dpH, which a central difference of two
 * solves measures without that algebra. Complexes of every kind: protonated (MHA), of a ligand twice (MB2), and of an
 * open component (MCO3 under a CO2 partial pressure). The constants are invented test values, not data.
 */
class ComplexBufferCapacityTest {

    private static final Equilibrium DAVIES = new Equilibrium(Davies.INSTANCE);
    private static final Component NA = new Component("Na+", 1);
    private static final Component CL = new Component("Cl-", -1);
    private static final Component M = new Component("M+2", 2);
    private static final TemperatureRange ANY = TemperatureRange.UNBOUNDED;
    private static final AcidBaseSystem ACID = new AcidBaseSystem("A",
            List.of(new AcidBaseSystem.Form("H3A", 0), new AcidBaseSystem.Form("H2A-", -1),
                    new AcidBaseSystem.Form("HA-2", -2), new AcidBaseSystem.Form("A-3", -3)),
            List.of(new DissociationStep(3.1, 0, 0, 0, ANY), new DissociationStep(4.8, 0, 0, 0, ANY),
                    new DissociationStep(6.4, 0, 0, 0, ANY)));
    private static final AcidBaseSystem BASE = new AcidBaseSystem("B",
            List.of(new AcidBaseSystem.Form("BH+", 1), new AcidBaseSystem.Form("B", 0)),
            List.of(new DissociationStep(9.3, 0, 0, 0, ANY)));
    private static final AcidBaseSystem CARBONATE = new AcidBaseSystem("C",
            List.of(new AcidBaseSystem.Form("CO2", 0), new AcidBaseSystem.Form("HCO3-", -1),
                    new AcidBaseSystem.Form("CO3-2", -2)),
            List.of(new DissociationStep(6.35, 0, 0, 0, ANY), new DissociationStep(10.3, 0, 0, 0, ANY)));

    private static List<Species> species() {
        List<Species> s = new ArrayList<>(ACID.species());
        s.addAll(BASE.species());
        s.add(Species.free(NA));
        s.add(Species.free(CL));
        s.add(Species.free(M));
        s.add(new Species("MA-", -1, Map.of(M, 1, ACID.basis(), 1), 0, new FormationConstant(4.5, 0, 0, 0, ANY)));
        s.add(new Species("MHA", 0, Map.of(M, 1, ACID.basis(), 1), 1, new FormationConstant(8.9, 0, 0, 0, ANY)));
        s.add(new Species("MB2+2", 2, Map.of(M, 1, BASE.basis(), 2), 0, new FormationConstant(4.0, 0, 0, 0, ANY)));
        return s;
    }

    private static EquilibriumState solve(double sodium, double fixedI) {
        Map<Component, Double> t = new LinkedHashMap<>();
        t.put(ACID.basis(), 0.01);
        t.put(BASE.basis(), 0.02);
        t.put(NA, sodium);
        t.put(CL, 0.03);
        t.put(M, 0.005);
        return DAVIES.solve(species(), t, 298.15, fixedI);
    }

    /** From pH about 4 to 11: the acid's steps, the amine's, and water's own term where hydroxide carries it. */
    @ParameterizedTest(name = "Na+ {0} mol/kg")
    @ValueSource(doubles = {0.02, 0.035, 0.05, 0.06, 0.075})
    void bufferCapacityIsTheSlopeOfTheTitration(double sodium) {
        EquilibriumState s = solve(sodium, Double.NaN);
        double i = s.ionicStrength();
        double h = 1e-7;
        double numeric = 2 * h / (solve(sodium + h, i).pH() - solve(sodium - h, i).pH());
        assertEquals(numeric, s.bufferCapacity(), 1e-4 * numeric, "pH " + s.pH());
    }

    /** Each reported share is ν·m over the component's total in every species it is part of: the given total. */
    @Test
    void aSpeciesShareCountsTheComponentInEverySpeciesThatHoldsIt() {
        EquilibriumState s = solve(0.05, Double.NaN);
        double ligand = 0;
        double amine = 0;
        for (SpeciesAmount a : s.species()) {
            int count = a.species().components().get(a.component());
            double total = a.component().equals(ACID.basis()) ? 0.01 : a.component().equals(BASE.basis()) ? 0.02
                    : a.component().equals(M) ? 0.005 : a.component().equals(NA) ? 0.05 : 0.03;
            assertEquals(count * a.molality() / total, a.fractionOfComponent(), 1e-12, a.species().name());
            ligand += a.component().equals(ACID.basis()) ? a.fractionOfComponent() : 0;
            amine += a.component().equals(BASE.basis()) ? a.fractionOfComponent() : 0;
        }
        assertEquals(1, ligand, 1e-12);     // every complex of A is shown under A, its most negative part
        assertEquals(1, amine, 1e-12);      // MB2+2 under B (charge 0 below M's +2), counted twice
    }

    /** The per-component terms share out β less water's own term and never exceed it. */
    @ParameterizedTest(name = "Na+ {0} mol/kg")
    @ValueSource(doubles = {0.02, 0.05, 0.075})
    void theComponentsTermsNeverExceedTheBufferCapacityLessWater(double sodium) {
        EquilibriumState s = solve(sodium, Double.NaN);
        double rest = s.bufferCapacity() - Thermo.LN10 * (s.hydrogenMolality() + s.hydroxideMolality());
        double sum = 0;
        for (double b : s.componentBufferCapacity().values()) {
            assertTrue(b >= 0, s.componentBufferCapacity().toString());
            sum += b;
        }
        assertTrue(sum <= rest * (1 + 1e-12), sum + " > " + rest);
        assertTrue(sum >= 0.5 * rest, sum + " ≪ " + rest);
    }

    /** A buffer in no complex beside complexed ones: its own balance alone, the titration slope still. */
    @ParameterizedTest(name = "Na+ {0} mol/kg")
    @ValueSource(doubles = {0.03, 0.045})
    void aBufferInNoComplexBesideComplexesBuffersAsTheTitrationSays(double sodium) {
        EquilibriumState s = withFreeBuffer(sodium, Double.NaN);
        double i = s.ionicStrength();
        double h = 1e-7;
        double numeric = 2 * h / (withFreeBuffer(sodium + h, i).pH() - withFreeBuffer(sodium - h, i).pH());
        assertEquals(numeric, s.bufferCapacity(), 1e-4 * numeric, "pH " + s.pH());
    }

    private static EquilibriumState withFreeBuffer(double sodium, double fixedI) {
        AcidBaseSystem free = new AcidBaseSystem("E", List.of(new AcidBaseSystem.Form("HE", 0),
                new AcidBaseSystem.Form("E-", -1)), List.of(new DissociationStep(5.5, 0, 0, 0, ANY)));
        List<Species> s = new ArrayList<>(species());
        s.addAll(free.species());
        Map<Component, Double> t = new LinkedHashMap<>();
        t.put(ACID.basis(), 0.01);
        t.put(BASE.basis(), 0.02);
        t.put(free.basis(), 0.02);
        t.put(NA, sodium);
        t.put(CL, 0.01);
        t.put(M, 0.005);
        return DAVIES.solve(s, t, 298.15, fixedI);
    }

    /**
     * Open to CO2 (CO2(aq) held), with M+2 + CO3-2 ⇌ MCO3 and M+2 + HCO3- ⇌ MHCO3+: base taken up per pH with the
     * gas phase supplying carbonate, β = dC_Na/dpH again.
     */
    @ParameterizedTest(name = "Na+ {0} mol/kg")
    @ValueSource(doubles = {0.01, 0.025, 0.04})
    void anOpenComponentInAComplexBuffersAsTheTitrationSays(double sodium) {
        EquilibriumState s = open(sodium, Double.NaN);
        double i = s.ionicStrength();
        double h = 1e-7;
        double numeric = 2 * h / (open(sodium + h, i).pH() - open(sodium - h, i).pH());
        assertEquals(numeric, s.bufferCapacity(), 1e-4 * numeric, "pH " + s.pH());
    }

    private static EquilibriumState open(double sodium, double fixedI) {
        List<Species> s = new ArrayList<>(CARBONATE.species());
        s.add(Species.free(NA));
        s.add(Species.free(CL));
        s.add(Species.free(M));
        s.add(new Species("MCO3", 0, Map.of(M, 1, CARBONATE.basis(), 1), 0, new FormationConstant(3.2, 0, 0, 0, ANY)));
        s.add(new Species("MHCO3+", 1, Map.of(M, 1, CARBONATE.basis(), 1), 1,
                new FormationConstant(11.3, 0, 0, 0, ANY)));
        Map<Component, Double> t = new LinkedHashMap<>();
        t.put(CARBONATE.basis(), 0.0);
        t.put(NA, sodium);
        t.put(CL, 0.01);
        t.put(M, 0.002);
        return DAVIES.solve(s, t, 298.15, fixedI, Map.of(CARBONATE.species().get(0), 1.2e-3));
    }
}
