package org.protolyte.chemistry;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.Set;

import org.junit.jupiter.api.Test;

/**
 * The values the equilibrium is built from keep their definitions and refuse what cannot be chemistry: an acid–base
 * system's cumulative constants, a species' charge, a temperature range. The constants are invented test values.
 */
class ChemistryValuesTest {

    private static final TemperatureRange ANY = TemperatureRange.UNBOUNDED;
    private static final List<AcidBaseSystem.Form> FORMS = List.of(new AcidBaseSystem.Form("H3A", 0),
            new AcidBaseSystem.Form("H2A-", -1), new AcidBaseSystem.Form("HA-2", -2), new AcidBaseSystem.Form("A-3", -3));
    private static final List<DissociationStep> STEPS = List.of(new DissociationStep(2.1, 8_000, -140, 0.01, ANY),
            new DissociationStep(7.2, 3_600, -230, 0.02, TemperatureRange.celsius(5, 45)),
            new DissociationStep(12.3, 16_000, -240, 0.03, TemperatureRange.celsius(0, 50)));
    private static final AcidBaseSystem ACID = new AcidBaseSystem("A", FORMS, STEPS);

    /** log β_p is the sum of the p most basic pKa, and ΔH° of association the negated sum of theirs. */
    @Test
    void eachFormsConstantIsTheSumOfTheStepsItsProtonsCarry() {
        List<Species> s = ACID.species();
        assertEquals(List.of("H3A", "H2A-", "HA-2", "A-3"), s.stream().map(Species::name).toList());
        assertEquals(List.of(3, 2, 1, 0), s.stream().map(Species::protons).toList());
        assertEquals(2.1 + 7.2 + 12.3, s.get(0).formation().log10K25(), 1e-12);
        assertEquals(7.2 + 12.3, s.get(1).formation().log10K25(), 1e-12);
        assertEquals(12.3, s.get(2).formation().log10K25(), 1e-12);
        assertEquals(0, s.get(3).formation().log10K25(), 0);
        assertEquals(-(3_600 + 16_000), s.get(1).formation().deltaH(), 1e-9);
        assertEquals(230 + 240, s.get(1).formation().deltaCp(), 1e-9);
        assertEquals(Math.sqrt(0.02 * 0.02 + 0.03 * 0.03), s.get(1).formation().uncertainty(), 1e-12);
        assertEquals(TemperatureRange.celsius(5, 45), s.get(1).formation().validity());
        assertEquals(new Component("A-3", -3), ACID.basis());
        assertTrue(s.get(0).components().equals(Map.of(ACID.basis(), 1)));
    }

    @Test
    void aSystemNeedsOneFormMoreThanStepsEachOneChargeLower() {
        assertThrows(IllegalArgumentException.class, () -> new AcidBaseSystem("A", FORMS, STEPS.subList(0, 2)));
        List<AcidBaseSystem.Form> skipping = List.of(new AcidBaseSystem.Form("H2A", 0), new AcidBaseSystem.Form("A-2", -2));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> new AcidBaseSystem("A", skipping,
                STEPS.subList(0, 1))).getMessage().contains("one charge less"));
        List<AcidBaseSystem.Form> rising = List.of(new AcidBaseSystem.Form("A-", -1), new AcidBaseSystem.Form("HA", 0));
        assertThrows(IllegalArgumentException.class, () -> new AcidBaseSystem("A", rising, STEPS.subList(0, 1)));
    }

    @Test
    void aFormIsFoundByItsName() {
        assertEquals(0, ACID.indexOf("H3A"));
        assertEquals(2, ACID.indexOf("HA-2"));
        assertEquals(3, ACID.indexOf("A-3"));
        assertEquals(-1, ACID.indexOf("HA-"));
    }

    @Test
    void systemsAreEqualByNameFormsAndSteps() {
        AcidBaseSystem same = new AcidBaseSystem("A", FORMS, STEPS);
        assertEquals(ACID, same);
        assertEquals(ACID.hashCode(), same.hashCode());
        assertNotEquals(ACID, new AcidBaseSystem("B", FORMS, STEPS));
        List<DissociationStep> other = List.of(STEPS.get(0), STEPS.get(1), new DissociationStep(12.4, 16_000, -240, 0.03,
                TemperatureRange.celsius(0, 50)));
        assertNotEquals(ACID, new AcidBaseSystem("A", FORMS, other));
        assertNotEquals(ACID, "A");
        assertTrue(ACID.toString().contains("A"));
        assertEquals("A", ACID.name());
        assertEquals(FORMS, ACID.forms());
        assertEquals(STEPS, ACID.steps());
    }

    @Test
    void aSpeciesChargeIsItsComponentsAndProtons() {
        Component m = new Component("M+2", 2);
        Component a = ACID.basis();
        assertThrows(IllegalArgumentException.class, () -> new Species("MA", 0, Map.of(m, 1, a, 1), 0,
                FormationConstant.UNITY));
        assertThrows(IllegalArgumentException.class, () -> new Species("H", 1, Map.of(), 1, FormationConstant.UNITY));
        Species pair = new Species("MA-", -1, Map.of(m, 1, a, 1), 0, FormationConstant.UNITY);
        assertTrue(pair.isComplex());
        assertTrue(new Species("M2+4", 4, Map.of(m, 2), 0, FormationConstant.UNITY).isComplex());
        assertFalse(Species.free(m).isComplex());
        assertFalse(ACID.species().get(0).isComplex());
        assertEquals(new Species("MA-", -1, Map.of(m, 1, a, 1), 0, FormationConstant.UNITY).hashCode(), pair.hashCode());
        assertThrows(IllegalArgumentException.class, () -> new Component(" ", 0));
    }

    @Test
    void aTemperatureRangeHoldsItsEndsAndIntersects() {
        TemperatureRange r = TemperatureRange.celsius(5, 45);
        assertEquals(278.15, r.minKelvin(), 1e-12);
        assertEquals(318.15, r.maxKelvin(), 1e-12);
        assertTrue(r.contains(278.15));
        assertTrue(r.contains(318.15));
        assertFalse(r.contains(278.14));
        assertFalse(r.contains(318.16));
        assertEquals(TemperatureRange.celsius(5, 30), r.intersect(TemperatureRange.celsius(0, 30)));
        assertEquals(TemperatureRange.celsius(10, 45), TemperatureRange.celsius(10, 60).intersect(r));
        TemperatureRange disjoint = r.intersect(TemperatureRange.celsius(50, 60));
        assertEquals(disjoint.minKelvin(), disjoint.maxKelvin(), 0);
        assertFalse(disjoint.contains(300));
        assertEquals("5–45 °C", r.toString());
        assertThrows(IllegalArgumentException.class, () -> TemperatureRange.celsius(30, 20));
        assertThrows(IllegalArgumentException.class, () -> new TemperatureRange(Double.NaN, 300));
    }

    @Test
    void aFormationConstantMustBeFiniteAndItsEquationHaveFiveTerms() {
        assertThrows(IllegalArgumentException.class, () -> new FormationConstant(Double.NaN, 0, 0, 0, ANY));
        assertThrows(IllegalArgumentException.class, () -> new FormationConstant(1, Double.POSITIVE_INFINITY, 0, 0, ANY));
        assertThrows(IllegalArgumentException.class, () -> new FormationConstant(1, 0, Double.NaN, 0, ANY));
        assertThrows(IllegalArgumentException.class, () -> new FormationConstant(1, 0, 0, 0, ANY, new double[4]));
        double[] a = {1, 0, 0, 0, 0};
        FormationConstant k = new FormationConstant(1, 0, 0, 0, ANY, a);
        a[0] = 5;
        assertEquals(1, k.log10K(300), 1e-12);
        assertEquals(0, FormationConstant.UNITY.times(3).log10K25(), 0);
        assertEquals(0, new FormationConstant(2, 0, 0, 0, ANY).times(0).log10K25(), 0);
    }

    /** Two van 't Hoff constants add as such: logs, enthalpies and heat capacities, with no equation behind them. */
    @Test
    void twoVantHoffConstantsAddTermByTerm() {
        FormationConstant sum = new FormationConstant(2, -1_000, 10, 0.03, TemperatureRange.celsius(0, 40))
                .plus(new FormationConstant(3, -2_000, 20, 0.04, TemperatureRange.celsius(10, 50)));
        assertEquals(null, sum.equation());
        assertEquals(5, sum.log10K25(), 0);
        assertEquals(-3_000, sum.deltaH(), 0);
        assertEquals(30, sum.deltaCp(), 0);
        assertEquals(0.05, sum.uncertainty(), 1e-15);
        assertEquals(TemperatureRange.celsius(10, 40), sum.validity());
    }

    /** The association is the dissociation reversed: log K = pKa, ΔH° and ΔCp° change sign. */
    @Test
    void theAssociationReversesTheDissociation() {
        FormationConstant k = STEPS.get(1).association();
        assertEquals(7.2, k.log10K25(), 0);
        assertEquals(-3_600, k.deltaH(), 0);
        assertEquals(230, k.deltaCp(), 0);
        assertEquals(0.02, k.uncertainty(), 0);
        assertEquals(STEPS.get(1).validity(), k.validity());
        assertEquals(7.2, STEPS.get(1).pKa(Thermo.T_REF), 1e-12);
    }

    @Test
    void aStateIsDeterminateUnlessACaveatSaysOtherwise() {
        Caveat w = Caveat.warning("w", "a warning");
        Caveat x = Caveat.indeterminate("x", "no number");
        assertEquals(Caveat.Severity.WARNING, w.severity());
        assertEquals(Caveat.Severity.INDETERMINATE, x.severity());
        assertTrue(state(List.of(w)).determinate());
        assertFalse(state(List.of(w, x)).determinate());
        assertEquals("no number", new IndeterminateException(x).getMessage());
    }

    private static EquilibriumState state(List<Caveat> caveats) {
        return new EquilibriumState(298.15, 7, 0.1, 0.01, 14, 1e-7, 1e-7, 0.2, 0.19, "ideal", List.of(), caveats,
                Map.of(), Set.of());
    }

    /** ΔTf = Kf·m with Kf = 1.86 K·kg/mol (CRC Handbook, cryoscopic constants; from memory). */
    @Test
    void aMolalOfParticlesFreezesAt186Below() {
        assertEquals(273.15 - 1.86, Cryoscopy.freezingPointKelvin(1), 1e-12);
        assertEquals(273.15, Cryoscopy.freezingPointKelvin(0), 1e-12);
    }

    /**
     * Henry's law as Sander (2015) gives CO2: Hcp = 3.3e-4 mol/(m³·Pa) at 25 °C, d ln Hcp/d(1/T) = 2400 K; at 37 °C
     * Hcp = 3.3e-4·exp(2400·(1/310.15 − 1/298.15)) = 2.416e-4 (worked by hand), less soluble when warm.
     */
    @Test
    void carbonDioxideFollowsHenrysLawWithItsTemperatureDependence() {
        assertEquals(3.3e-4, CarbonDioxide.henry(298.15), 1e-12);
        assertEquals(3.3e-4 * Math.exp(2400 * (1 / 310.15 - 1 / 298.15)), CarbonDioxide.henry(310.15), 1e-12);
        assertEquals(2.416e-4, CarbonDioxide.henry(310.15), 0.001e-4);
        // 5 kPa at 37 °C: 2.416e-4 · 5000 mol/m³ over 993.3 kg/m³ of water
        assertEquals(CarbonDioxide.henry(310.15) * 5000 / Water.density(310.15),
                CarbonDioxide.dissolvedMolality(310.15, 5000), 1e-12);
        assertEquals(1.216e-3, CarbonDioxide.dissolvedMolality(310.15, 5000), 0.005e-3);
    }
}
