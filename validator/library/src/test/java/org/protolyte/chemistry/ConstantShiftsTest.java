package org.protolyte.chemistry;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;

/**
 * A shifted equilibrium is, by definition, the equilibrium of the same recipe whose constant was written with the
 * shift: a pKa raised by δ, a ΔH° of ionization raised by δ, a complex's log K raised by δ. Each expectation solves
 * the recipe with the changed constant; the constants are invented test values, not data.
 */
class ConstantShiftsTest {

    private static final Equilibrium DAVIES = new Equilibrium(Davies.INSTANCE);
    private static final Component NA = new Component("Na+", 1);
    private static final Component M = new Component("M+2", 2);
    private static final Component CL = new Component("Cl-", -1);
    private static final TemperatureRange ANY = TemperatureRange.UNBOUNDED;

    /** A triprotic acid H3A with three steps, like phosphate but invented. */
    private static AcidBaseSystem triprotic(double pKa1, double pKa2, double pKa3, double deltaH2) {
        return new AcidBaseSystem("A", List.of(new AcidBaseSystem.Form("H3A", 0), new AcidBaseSystem.Form("H2A-", -1),
                new AcidBaseSystem.Form("HA-2", -2), new AcidBaseSystem.Form("A-3", -3)),
                List.of(new DissociationStep(pKa1, 5_000, 0, 0, ANY), new DissociationStep(pKa2, deltaH2, -200, 0, ANY),
                        new DissociationStep(pKa3, 15_000, 0, 0, ANY)));
    }

    /** A monoprotic base BH+ ⇌ B + H+. */
    private static AcidBaseSystem amine(double pKa) {
        return new AcidBaseSystem("B", List.of(new AcidBaseSystem.Form("BH+", 1), new AcidBaseSystem.Form("B", 0)),
                List.of(new DissociationStep(pKa, 47_000, 0, 0, ANY)));
    }

    private static EquilibriumState solve(Equilibrium eq, AcidBaseSystem acid, AcidBaseSystem base, double kelvin) {
        List<Species> species = new ArrayList<>(acid.species());
        species.addAll(base.species());
        species.add(Species.free(NA));
        species.add(Species.free(CL));
        Map<Component, Double> totals = new LinkedHashMap<>();
        totals.put(acid.basis(), 0.02);
        totals.put(base.basis(), 0.01);
        totals.put(NA, 0.035);
        totals.put(CL, 0.004);
        return eq.solve(species, totals, kelvin);
    }

    @Test
    void aPKaShiftIsTheSystemWithThatPKaRaised() {
        AcidBaseSystem a = triprotic(2.1, 7.2, 12.3, 3_600);
        AcidBaseSystem b = amine(8.1);
        double shifted = solve(DAVIES.withPKaShift(a, 1, 0.3), a, b, 298.15).pH();
        double written = solve(DAVIES, triprotic(2.1, 7.5, 12.3, 3_600), b, 298.15).pH();
        assertEquals(written, shifted, 1e-10);
        double unshifted = solve(DAVIES, a, b, 298.15).pH();
        assertTrue(Math.abs(shifted - unshifted) > 0.05, "the shift moves the pH: " + unshifted + " → " + shifted);
    }

    @Test
    void shiftsOfTwoSystemsAtOnceAreBothSystemsRewritten() {
        AcidBaseSystem a = triprotic(2.1, 7.2, 12.3, 3_600);
        AcidBaseSystem b = amine(8.1);
        double[] dA = {0, 0, -0.2, 0, 0, 0};
        double[] dB = {0.25, 0};
        EquilibriumState shifted = solve(DAVIES.withStepShifts(Map.of(a, dA, b, dB)), a, b, 298.15);
        EquilibriumState written = solve(DAVIES, triprotic(2.1, 7.0, 12.3, 3_600), amine(8.35), 298.15);
        assertEquals(written.pH(), shifted.pH(), 1e-10);
        assertEquals(written.bufferCapacity(), shifted.bufferCapacity(), 1e-9 * written.bufferCapacity());
    }

    @Test
    void aShiftOfTheFirstStepIsThatStepRewritten() {
        AcidBaseSystem a = triprotic(4.0, 7.2, 12.3, 3_600);
        AcidBaseSystem b = amine(8.1);
        double shifted = solve(DAVIES.withPKaShift(a, 0, 0.5), a, b, 298.15).pH();
        double written = solve(DAVIES, triprotic(4.5, 7.2, 12.3, 3_600), b, 298.15).pH();
        assertEquals(written, shifted, 1e-10);
    }

    /** dpKa = dΔH°/(R ln10)·(1/T − 1/298.15): nothing at 25 °C, the rewritten step's pKa elsewhere. */
    @Test
    void aDeltaHShiftIsTheSystemWithThatEnthalpyRaised() {
        AcidBaseSystem a = triprotic(2.1, 7.2, 12.3, 3_600);
        AcidBaseSystem b = amine(8.1);
        double body = 310.15;
        double shifted = solve(DAVIES.withDeltaHShift(a, 1, 4_000), a, b, body).pH();
        double written = solve(DAVIES, triprotic(2.1, 7.2, 12.3, 7_600), b, body).pH();
        assertEquals(written, shifted, 1e-10);
        assertEquals(solve(DAVIES, a, b, 298.15).pH(), solve(DAVIES.withDeltaHShift(a, 1, 4_000), a, b, 298.15).pH(),
                1e-12);
    }

    @Test
    void thePKaChangeOfAnEnthalpyChangeIsTheVantHoffTerm() {
        DissociationStep step = new DissociationStep(7.2, 3_600, -200, 0, ANY);
        DissociationStep raised = new DissociationStep(7.2, 7_600, -200, 0, ANY);
        for (double t = 278.15; t <= 318.15; t += 10) {
            assertEquals(raised.pKa(t) - step.pKa(t), DissociationStep.pKaChangeFromDeltaH(4_000, t), 1e-12);
        }
    }

    /** Ideal activities, a neutral solute only: pH = pKw/2, so raising pKw by δ raises the pH by δ/2. */
    @Test
    void aPKwShiftRaisesNeutralPureWaterByHalfOfIt() {
        Equilibrium ideal = new Equilibrium(IdealActivity.INSTANCE);
        Component sugar = new Component("sugar", 0);
        List<Species> species = List.of(Species.free(sugar));
        Map<Component, Double> totals = Map.of(sugar, 0.01);
        EquilibriumState plain = ideal.solve(species, totals, 298.15);
        EquilibriumState shifted = ideal.withPKwShift(0.2).withPKwShift(0.1).solve(species, totals, 298.15);
        assertEquals(Water.pKw(298.15) / 2, plain.pH(), 1e-10);
        assertEquals(Water.pKw(298.15) + 0.3, shifted.pKw(), 1e-10);
        assertEquals(plain.pH() + 0.15, shifted.pH(), 1e-10);
    }

    /** M+2 + B ⇌ MB+2 with log K: the shifted complex is the complex written with log K + δ. */
    @Test
    void aLogKShiftIsTheComplexWrittenWithItsConstantRaised() {
        AcidBaseSystem b = amine(8.1);
        Species bound = complex(3.0);
        double shifted = solveWithComplex(DAVIES.withLogKShift(bound, 0.4).withLogKShift(bound, 0.2), bound);
        double written = solveWithComplex(DAVIES, complex(3.6));
        assertEquals(written, shifted, 1e-10);
    }

    private static Species complex(double logK) {
        return new Species("MB+2", 2, Map.of(M, 1, amine(8.1).basis(), 1), 0,
                new FormationConstant(logK, 0, 0, 0, ANY));
    }

    private static double solveWithComplex(Equilibrium eq, Species complex) {
        AcidBaseSystem b = amine(8.1);
        List<Species> species = new ArrayList<>(b.species());
        species.add(Species.free(M));
        species.add(Species.free(CL));
        species.add(complex);
        Map<Component, Double> totals = new LinkedHashMap<>();
        totals.put(b.basis(), 0.02);
        totals.put(M, 0.005);
        totals.put(CL, 0.02);
        return eq.solve(species, totals, 298.15).pH();
    }
}
