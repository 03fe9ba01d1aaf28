package org.protolyte.chemistry;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;

/** The pH–solubility profile of a drug from its solids, against Henderson–Hasselbalch's forms by hand. */
class DrugSubstanceTest {

    private static final double T25 = 298.15;

    /** A monoprotic drug: forms {@code acid} (charge z) and {@code base} (z − 1), pKa, S0 of the uncharged one. */
    static DrugSubstance monoprotic(String acid, String base, int z, double pKa, double log10S0, SolidPhase... salts) {
        AcidBaseSystem system = new AcidBaseSystem("drug", List.of(new AcidBaseSystem.Form(acid, z),
                new AcidBaseSystem.Form(base, z - 1)), List.of(new DissociationStep(pKa, 0, 0, 0.02,
                TemperatureRange.celsius(0, 50))));
        String uncharged = z == 0 ? acid : base;
        SolidPhase free = new SolidPhase("drug (free form)", uncharged, Map.of(uncharged, 1.0),
                new FormationConstant(log10S0, 0, 0, 0.1, TemperatureRange.celsius(0, 50)));
        return new DrugSubstance("drug", system, free, List.of(salts), Map.of("drug (free form)", 20e3));
    }

    private static double molality(DrugSubstance d, double pH) {
        return Math.pow(10, d.solubility(pH, DrugSubstance.Medium.ideal(T25)).log10Molality());
    }

    @Test
    void aWeakAcidDissolvesAsS0TimesOnePlusTenToThePhLessPKa() {
        DrugSubstance d = monoprotic("HA", "A-", 0, 7.41, Math.log10(0.005));
        for (double pH : new double[] {3, 7.41, 8.5, 10}) {
            assertEquals(0.005 * (1 + Math.pow(10, pH - 7.41)), molality(d, pH), 1e-12 * molality(d, pH), "pH " + pH);
        }
    }

    @Test
    void aWeakBaseDissolvesAsS0TimesOnePlusTenToThePKaLessPh() {
        DrugSubstance d = monoprotic("BH+", "B", 1, 6.0, -4);
        for (double pH : new double[] {2, 6, 9}) {
            assertEquals(1e-4 * (1 + Math.pow(10, 6.0 - pH)), molality(d, pH), 1e-12 * molality(d, pH), "pH " + pH);
        }
    }

    /**
     * Where an amount of a weak acid begins to separate as the pH falls: pHp = pKa + log10((S − S0)/S0), from
     * S = S0 (1 + 10^(pH − pKa)) solved for pH (by hand; the worked example's numbers are in the reference package).
     */
    @Test
    void theWindowOfAWeakAcidOpensAtThePhWhereTheAmountIsItsSolubility() {
        DrugSubstance d = monoprotic("HA", "A-", 0, 7.41, Math.log10(0.005));
        DrugSubstance.Window w = d.window(0.0393, 9, DrugSubstance.Medium.ideal(T25)).orElseThrow();
        assertEquals(7.41 + Math.log10((0.0393 - 0.005) / 0.005), w.low().getAsDouble(), 1e-8);
        assertTrue(w.high().isEmpty(), "no upper end without a salt");
        // below S0 it dissolves at every pH
        DrugSubstance.Window all = d.window(0.004, 5, DrugSubstance.Medium.ideal(T25)).orElseThrow();
        assertTrue(all.low().isEmpty() && all.high().isEmpty());
    }

    /**
     * A hydrochloride BH+Cl− with Ksp = a(BH+)·a(Cl−) in chloride of activity a: the salt allows [BH+] = Ksp/a, so
     * S_salt = (Ksp/a)(1 + 10^(pH − pKa)) and the free base S0 (1 + 10^(pKa − pH)); they meet at
     * pHmax = pKa + log10(S0 a/Ksp) (derived here from the two mass-action laws).
     */
    @Test
    void aSaltAndTheFreeBaseMeetAtPhMax() {
        SolidPhase salt = new SolidPhase("drug hydrochloride", "BHCl", Map.of("BH+", 1.0, "Cl-", 1.0),
                new FormationConstant(-3, 0, 0, 0.1, TemperatureRange.celsius(0, 50)));
        DrugSubstance d = monoprotic("BH+", "B", 1, 6.0, -4, salt);
        DrugSubstance.Medium chloride = new DrugSubstance.Medium(T25, Map.of(), Map.of("Cl-", 0.1));
        double pHMax = d.pHMax(salt, chloride).getAsDouble();
        assertEquals(6.0 + Math.log10(1e-4 * 0.1 / 1e-3), pHMax, 1e-8);
        DrugSubstance.Limit below = d.solubility(pHMax - 1, chloride);
        assertEquals("drug hydrochloride", below.solid().name());
        assertEquals(Math.log10(1e-3 / 0.1 * (1 + Math.pow(10, pHMax - 1 - 6.0))), below.log10Molality(), 1e-10);
        assertEquals("drug (free form)", d.solubility(pHMax + 1, chloride).solid().name());
        // without chloride the salt cannot form: no pHmax, the free base alone limits
        assertTrue(d.pHMax(salt, DrugSubstance.Medium.ideal(T25)).isEmpty());
        // the amount at pHmax is the most that dissolves: a little more is refused on both sides
        double most = molality(d, pHMax);
        assertTrue(d.window(most * 0.999, pHMax, chloride).orElseThrow().low().isPresent());
        assertTrue(d.window(most * 1.01, pHMax, chloride).isEmpty());
    }

    /** Activity coefficients: the uncharged form's γ lowers its molality at saturation, an ion's its share. */
    @Test
    void activityCoefficientsEnterThroughTheFormsMolalities() {
        DrugSubstance d = monoprotic("HA", "A-", 0, 5.0, -3);
        DrugSubstance.Medium m = new DrugSubstance.Medium(T25, Map.of("HA", 1.1, "A-", 0.8), Map.of());
        // a(HA) = S0 → m(HA) = S0/1.1; m(A-)/m(HA) = Ka·γ(HA)/(γ(A-)·a(H))
        double mHA = 1e-3 / 1.1;
        double expected = mHA * (1 + Math.pow(10, 6.0 - 5.0) * 1.1 / 0.8);
        assertEquals(Math.log10(expected), d.solubility(6.0, m).log10Molality(), 1e-12);
    }

    /**
     * The uncertainty by hand for a weak acid at pH = pKa + 1 at 37 °C: f(HA) = 1/11, ∂log f/∂pKa = 1 − f(HA)
     * = 10/11, ∂log f/∂pH = n̄ − 1 = −10/11; u(log S0) 0.1 and u(ΔH°) 20 kJ/mol through van 't Hoff.
     */
    @Test
    void theUncertaintyAddsS0PKaPhAndTheSolutionEnthalpy() {
        DrugSubstance d = monoprotic("HA", "A-", 0, 5.0, -3);
        double t = 310.15;
        double pH = d.system().steps().get(0).pKa(t) + 1;
        double uT = 20e3 / (Thermo.R * Thermo.LN10) * Math.abs(1 / t - 1 / Thermo.T_REF);
        double uPKa = 0.02;
        double uPH = 0.05;
        double byHand = Math.sqrt(0.1 * 0.1 + uT * uT + Math.pow(10.0 / 11 * uPKa, 2) + Math.pow(10.0 / 11 * uPH, 2));
        DissociationStep step = d.system().steps().get(0);
        double uH = DissociationStep.pKaChangeFromDeltaH(step.deltaHUncertainty(), t);
        double uCp = DissociationStep.pKaChangeFromDeltaCp(step.deltaCpUncertainty(), t);
        byHand = Math.sqrt(byHand * byHand + Math.pow(10.0 / 11, 2) * (uH * uH + uCp * uCp));
        assertEquals(byHand, d.log10Uncertainty(d.freeForm(), pH, uPH, DrugSubstance.Medium.ideal(t)), 1e-9);
        assertFalse(uT == 0);
    }

    @Test
    void aSolidMustDissolveIntoOneFormOfTheDrug() {
        SolidPhase stray = new SolidPhase("other", "X", Map.of("Cl-", 1.0),
                new FormationConstant(-3, 0, 0, 0.1, TemperatureRange.celsius(0, 50)));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> monoprotic("BH+", "B", 1, 6.0, -4, stray));
        assertTrue(e.getMessage().contains("other"), e.getMessage());
    }
}
