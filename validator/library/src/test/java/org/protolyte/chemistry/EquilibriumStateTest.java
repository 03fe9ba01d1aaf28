package org.protolyte.chemistry;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.junit.jupiter.api.Test;

/**
 * What a solved state reports follows from its species by definition: shares of each component, Davies activity
 * coefficients, the buffer capacity split per component, the particle molality, and the caveats where constants are
 * carried beyond their data. The constants are invented test values, not data.
 */
class EquilibriumStateTest {

    private static final Equilibrium DAVIES = new Equilibrium(Davies.INSTANCE);
    private static final Component NA = new Component("Na+", 1);
    private static final Component CL = new Component("Cl-", -1);
    private static final Component M = new Component("M+2", 2);
    private static final TemperatureRange ANY = TemperatureRange.UNBOUNDED;
    private static final AcidBaseSystem ACID = new AcidBaseSystem("A",
            List.of(new AcidBaseSystem.Form("H2A", 0), new AcidBaseSystem.Form("HA-", -1),
                    new AcidBaseSystem.Form("A-2", -2)),
            List.of(new DissociationStep(4.6, 0, 0, 0, ANY), new DissociationStep(6.8, 0, 0, 0, ANY)));
    private static final AcidBaseSystem AMINE = new AcidBaseSystem("B",
            List.of(new AcidBaseSystem.Form("BH+", 1), new AcidBaseSystem.Form("B", 0)),
            List.of(new DissociationStep(7.9, 0, 0, 0, ANY)));
    /** CO2(aq) held by a gas phase: H2CO3* ⇌ HCO3- ⇌ CO3-2 (invented pKa near carbonate's). */
    private static final AcidBaseSystem CARBONATE = new AcidBaseSystem("C",
            List.of(new AcidBaseSystem.Form("CO2", 0), new AcidBaseSystem.Form("HCO3-", -1),
                    new AcidBaseSystem.Form("CO3-2", -2)),
            List.of(new DissociationStep(6.35, 0, 0, 0, ANY), new DissociationStep(10.3, 0, 0, 0, ANY)));

    private static EquilibriumState buffer(double kelvin) {
        List<Species> species = new ArrayList<>(ACID.species());
        species.addAll(AMINE.species());
        species.add(Species.free(NA));
        species.add(Species.free(CL));
        Map<Component, Double> totals = new LinkedHashMap<>();
        totals.put(ACID.basis(), 0.02);
        totals.put(AMINE.basis(), 0.01);
        totals.put(NA, 0.05);
        totals.put(CL, 0.025);
        return DAVIES.solve(species, totals, kelvin);
    }

    private static SpeciesAmount amount(EquilibriumState s, String name) {
        return s.species().stream().filter(a -> a.species().name().equals(name)).findFirst().orElseThrow();
    }

    /** Mass action for every step at the solution: pKa(T) = pH + log10(a_acid/a_base) with Davies γ at its I. */
    @Test
    void everyStepObeysMassActionAtTheSolution() {
        for (double kelvin : new double[] {283.15, 310.15}) {
            EquilibriumState s = buffer(kelvin);
            for (AcidBaseSystem system : List.of(ACID, AMINE)) {
                for (int k = 0; k < system.steps().size(); k++) {
                    SpeciesAmount acid = amount(s, system.forms().get(k).name());
                    SpeciesAmount base = amount(s, system.forms().get(k + 1).name());
                    double logRatio = Math.log10(acid.activityCoefficient() * acid.molality()
                            / (base.activityCoefficient() * base.molality()));
                    assertEquals(system.steps().get(k).pKa(kelvin), s.pH() + logRatio, 1e-9,
                            system.forms().get(k).name() + " at " + kelvin + " K");
                }
            }
        }
    }

    /** A component prepared but absent has species of share 0, not 0/0. */
    @Test
    void anAbsentComponentsFormsHaveNoShare() {
        List<Species> species = new ArrayList<>(ACID.species());
        species.addAll(AMINE.species());
        species.add(Species.free(NA));
        species.add(Species.free(CL));
        Map<Component, Double> totals = new LinkedHashMap<>();
        totals.put(ACID.basis(), 0.02);
        totals.put(AMINE.basis(), 0.0);
        totals.put(NA, 0.03);
        EquilibriumState s = DAVIES.solve(species, totals, 298.15);
        assertEquals(0, amount(s, "BH+").fractionOfComponent(), 0);
        assertEquals(0, amount(s, "B").molality(), 0);
    }

    @Test
    void eachFormsShareIsItsMolalityOverItsComponentsTotal() {
        EquilibriumState s = buffer(310.15);
        for (String name : List.of("H2A", "HA-", "A-2")) {
            assertEquals(amount(s, name).molality() / 0.02, amount(s, name).fractionOfComponent(), 1e-12, name);
            assertEquals(ACID.basis(), amount(s, name).component());
        }
        assertEquals(1, amount(s, "Na+").fractionOfComponent(), 1e-15);
        assertEquals(amount(s, "BH+").molality() / 0.01, amount(s, "BH+").fractionOfComponent(), 1e-12);
    }

    @Test
    void activityCoefficientsAreDaviesAtTheSolutionsIonicStrength() {
        EquilibriumState s = buffer(310.15);
        double a = Water.debyeHuckelA(310.15);
        for (SpeciesAmount x : s.species()) {
            double expected = Math.pow(10, Davies.INSTANCE.log10Gamma(x.species().charge(), s.ionicStrength(), a));
            assertEquals(expected, x.activityCoefficient(), 1e-12, x.species().name());
        }
        assertEquals(-Math.log10(Math.pow(10, Davies.INSTANCE.log10Gamma(1, s.ionicStrength(), a))
                * s.hydrogenMolality()), s.pH(), 1e-10);
        assertEquals(Water.pKw(310.15), s.pKw(), 1e-10);
    }

    /** β = ln10 (mH + mOH) + Σ_C β_C without complexes: the per-component terms partition the rest exactly. */
    @Test
    void theComponentsBufferCapacitiesAddUpToTheWholeLessWater() {
        EquilibriumState s = buffer(298.15);
        double sum = Thermo.LN10 * (s.hydrogenMolality() + s.hydroxideMolality());
        for (double b : s.componentBufferCapacity().values()) {
            sum += b;
        }
        assertEquals(s.bufferCapacity(), sum, 1e-12 * s.bufferCapacity());
        assertEquals(0, s.componentBufferCapacity().get(NA), 0);
        assertTrue(s.componentBufferCapacity().get(ACID.basis()) > 0);
        assertTrue(s.componentBufferCapacity().get(AMINE.basis()) > 0);
        assertTrue(s.openComponents().isEmpty());
    }

    /**
     * Van Slyke for a closed diprotic acid: β_A = ln10 · T · Σ_s x_s (p_s − p̄)² over the forms' shares (the class
     * comment's Σ p² m − (Σ p m)²/T written out).
     */
    @Test
    void aClosedComponentsTermIsTheVarianceOfItsBoundProtons() {
        EquilibriumState s = buffer(298.15);
        double x2 = amount(s, "H2A").fractionOfComponent();
        double x1 = amount(s, "HA-").fractionOfComponent();
        double mean = 2 * x2 + x1;
        double variance = x2 * (2 - mean) * (2 - mean) + x1 * (1 - mean) * (1 - mean)
                + amount(s, "A-2").fractionOfComponent() * mean * mean;
        assertEquals(Thermo.LN10 * 0.02 * variance, s.componentBufferCapacity().get(ACID.basis()), 1e-12);
    }

    @Test
    void particlesAreEverySpeciesAndTheOsmolalityTakesDaviesOsmoticTerm() {
        EquilibriumState s = buffer(298.15);
        double particles = s.hydrogenMolality() + s.hydroxideMolality();
        for (SpeciesAmount x : s.species()) {
            particles += x.molality();
        }
        assertEquals(particles, s.particleMolality(), 1e-15);
        double expected = particles + Davies.INSTANCE.osmoticExcess(s.ionicStrength(), Water.debyeHuckelA(298.15));
        assertEquals(expected, s.osmolality(), 1e-15);
        assertEquals("Davies", s.osmolalityModel());
    }

    /**
     * Open to a gas phase that holds CO2(aq): carbonate's term is ln10 (m_HCO3 + 4 m_CO3) (the class comment), and the
     * fast path of a prepared open problem answers what a solve answers.
     */
    @Test
    void anOpenComponentsTermCountsTheChargeThatEntersWithCarbonDioxide() {
        List<Species> species = new ArrayList<>(CARBONATE.species());
        species.add(Species.free(NA));
        species.add(Species.free(CL));
        Map<Component, Double> totals = new LinkedHashMap<>();
        totals.put(CARBONATE.basis(), 0.0);
        totals.put(NA, 0.024);
        totals.put(CL, 0.001);
        Map<Species, Double> fixed = Map.of(CARBONATE.species().get(0), 1.2e-3);
        EquilibriumState s = DAVIES.solve(species, totals, 298.15, Double.NaN, fixed);
        assertTrue(s.openComponents().contains(CARBONATE.basis()));
        assertEquals(1.2e-3, amount(s, "CO2").molality(), 1e-18);
        double expected = Thermo.LN10 * (amount(s, "HCO3-").molality() + 4 * amount(s, "CO3-2").molality());
        assertEquals(expected, s.componentBufferCapacity().get(CARBONATE.basis()), 1e-12 * expected);
        assertEquals(s.bufferCapacity(), expected + Thermo.LN10 * (s.hydrogenMolality() + s.hydroxideMolality()),
                1e-9 * expected);
        Equilibrium.Prepared p = DAVIES.prepare(species, totals.keySet(), 298.15, fixed);
        Equilibrium.Point point = p.point(totals, null);
        assertEquals(s.pH(), point.pH(), 1e-8);
        assertEquals(s.bufferCapacity(), point.bufferCapacity(), 1e-7 * s.bufferCapacity());
        Equilibrium.Point warm = p.point(totals, new Equilibrium.Point(s.pH() + 0.05, s.ionicStrength() * 1.01, 0, 0));
        assertEquals(s.pH(), warm.pH(), 1e-8);
        assertEquals(s.ionicStrength(), warm.ionicStrength(), 1e-9 * s.ionicStrength());
    }

    /**
     * Above Davies' warning limit the message states how far Davies and Pitzer part for sodium chloride at this ionic
     * strength, |log10 γ±(Davies) − log10 γ±(Pitzer)|, and three times that in pH for a −1/−2 step.
     */
    @Test
    void theHighIonicStrengthWarningGivesTheGapBetweenTheModels() {
        EquilibriumState s = DAVIES.solve(List.of(Species.free(NA), Species.free(CL)), Map.of(NA, 0.3, CL, 0.3), 298.15);
        double a = Water.debyeHuckelA(298.15);
        double gap = Math.abs(Davies.INSTANCE.log10Gamma(1, 0.3, a)
                - Math.log10(Pitzer.meanActivityCoefficient("Na+", 0.3, 298.15)));
        Caveat c = s.caveats().stream().filter(x -> x.code().equals("ionic-strength-high")).findFirst().orElseThrow();
        assertTrue(c.message().contains(String.format(Locale.ROOT, "by %.3f in log γ±", gap)), c.message());
        assertTrue(c.message().contains(String.format(Locale.ROOT, "about %.2f pH", 3 * gap)), c.message());
        assertTrue(c.message().contains("0.300 mol/kg is above 0.2 mol/kg"), c.message());
        assertTrue(gap > 0.01, "the models part at 0.3 mol/kg: " + gap);
        EquilibriumState justBelow = DAVIES.solve(List.of(Species.free(NA), Species.free(CL)),
                Map.of(NA, 0.199, CL, 0.199), 298.15);
        assertTrue(justBelow.caveats().isEmpty(), justBelow.caveats().toString());
    }

    /** At 45 °C the gap is the one at 25 °C, where both models are compared (one figure at every temperature). */
    @Test
    void theHighIonicStrengthWarningTakesTheGapAtTwentyFiveDegrees() {
        EquilibriumState s = DAVIES.solve(List.of(Species.free(NA), Species.free(CL)), Map.of(NA, 0.3, CL, 0.3), 318.15);
        double gap = Math.abs(Davies.INSTANCE.log10Gamma(1, 0.3, Water.debyeHuckelA(298.15))
                - Math.log10(Pitzer.meanActivityCoefficient("Na+", 0.3, 298.15)));
        Caveat c = s.caveats().stream().filter(x -> x.code().equals("ionic-strength-high")).findFirst().orElseThrow();
        assertTrue(c.message().contains(String.format(Locale.ROOT, "by %.3f in log γ±", gap)), c.message());
    }

    /** M+2 + A-2 ⇌ MA with data for 20–30 °C only; at log K 7 it moves the pH by more than 0.005 per 0.1 in log K. */
    private static List<Species> withComplex(double logK, TemperatureRange validity) {
        List<Species> species = new ArrayList<>(ACID.species());
        species.add(Species.free(NA));
        species.add(Species.free(CL));
        species.add(Species.free(M));
        species.add(new Species("MA", 0, Map.of(M, 1, ACID.basis(), 1), 0,
                new FormationConstant(logK, 0, 0, 0, validity)));
        return species;
    }

    private static Map<Component, Double> complexTotals() {
        Map<Component, Double> totals = new LinkedHashMap<>();
        totals.put(ACID.basis(), 0.02);
        totals.put(M, 0.01);
        totals.put(NA, 0.02);
        totals.put(CL, 0.04);
        return totals;
    }

    @Test
    void aComplexCarriedAFewKelvinBeyondItsDataWarnsWithItsEffect() {
        TemperatureRange data = TemperatureRange.celsius(20, 30);
        EquilibriumState s = DAVIES.solve(withComplex(7.0, data), complexTotals(), 310.15);
        assertTrue(s.determinate(), s.caveats().toString());
        Caveat c = s.caveats().stream().filter(x -> x.code().equals("temperature-out-of-range-complex")).findFirst()
                .orElseThrow();
        // its effect: the pH of the complex written with log K + 0.1, at the same temperature
        EquilibriumState raised = DAVIES.solve(withComplex(7.1, data), complexTotals(), 310.15);
        double effect = Math.abs(raised.pH() - s.pH());
        assertTrue(effect > 0.005, "effect " + effect);
        java.util.regex.Matcher stated = java.util.regex.Pattern.compile("move the pH by ([0-9.]+)").matcher(c.message());
        assertTrue(stated.find(), c.message());
        // the caveat moves log K at the solution's activity coefficients; the rewritten complex iterates them again
        assertEquals(effect, Double.parseDouble(stated.group(1)), 0.002, c.message());
        Equilibrium.Prepared p = DAVIES.prepare(withComplex(7.0, data), complexTotals().keySet(), 310.15, Map.of());
        assertEquals(s.pH(), p.point(complexTotals(), null).pH(), 1e-8);
    }

    @Test
    void aComplexCarriedFarBeyondItsDataIsIndeterminate() {
        TemperatureRange data = TemperatureRange.celsius(20, 30);
        EquilibriumState s = DAVIES.solve(withComplex(7.0, data), complexTotals(), 333.15);
        assertFalse(s.determinate());
        assertTrue(s.caveats().stream().anyMatch(x -> x.code().equals("temperature-out-of-range")
                && x.message().contains("MA")), s.caveats().toString());
        Equilibrium.Prepared p = DAVIES.prepare(withComplex(7.0, data), complexTotals().keySet(), 333.15, Map.of());
        assertThrows(IndeterminateException.class, () -> p.point(complexTotals(), null));
        // 25 K beyond the data is the limit: 54.9 °C warns, 55.1 °C gives no number
        assertTrue(DAVIES.solve(withComplex(7.0, data), complexTotals(), 328.05).determinate());
        assertFalse(DAVIES.solve(withComplex(7.0, data), complexTotals(), 328.25).determinate());
    }

    @Test
    void aComplexOfNoConsequenceBeyondItsDataIsNamedAsMinor() {
        TemperatureRange data = TemperatureRange.celsius(20, 30);
        EquilibriumState s = DAVIES.solve(withComplex(-3, data), complexTotals(), 333.15);
        assertTrue(s.determinate(), s.caveats().toString());
        Caveat c = s.caveats().stream().filter(x -> x.code().equals("temperature-out-of-range-minor")).findFirst()
                .orElseThrow();
        assertTrue(c.message().contains("MA (20–30 °C, pH effect"), c.message());
        EquilibriumState inRange = DAVIES.solve(withComplex(7.0, data), complexTotals(), 298.15);
        assertTrue(inRange.caveats().isEmpty(), inRange.caveats().toString());
    }
}
