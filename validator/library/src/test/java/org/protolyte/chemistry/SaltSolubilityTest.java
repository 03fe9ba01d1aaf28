package org.protolyte.chemistry;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;

/**
 * The solubility table read as the class comment defines it: s = g·10/M mol/kg from g per 100 g of water, linear
 * between tabulated temperatures, K' = Π (ν_i s)^ν_i and the index log10(Q/K'). An invented 1:2 salt MX2 of molar
 * mass 100 g/mol with 10, 20 and 50 g/100 g at 0, 20 and 40 °C; every expected value is worked by hand below.
 */
class SaltSolubilityTest {

    private static final SaltSolubility MX2 = new SaltSolubility("MX2", "MX2", 100, Map.of("M+2", 1, "X-", 2),
            List.of("MX2 hexahydrate"), new double[] {0, 20, 40}, new double[] {10, 20, 50}, "invented");

    private static double kelvin(double celsius) {
        return celsius + Thermo.KELVIN_OFFSET;
    }

    @Test
    void saturatedMolalityIsTheTableInterpolatedLinearly() {
        assertEquals(1.0, MX2.saturatedMolality(kelvin(0)).getAsDouble(), 1e-12);    // 10 g · 10 / 100
        assertEquals(1.5, MX2.saturatedMolality(kelvin(10)).getAsDouble(), 1e-12);   // 15 g, halfway to 20 °C
        assertEquals(2.0, MX2.saturatedMolality(kelvin(20)).getAsDouble(), 1e-12);
        assertEquals(2.75, MX2.saturatedMolality(kelvin(25)).getAsDouble(), 1e-12);  // 27.5 g, a quarter to 40 °C
        assertEquals(5.0, MX2.saturatedMolality(kelvin(40)).getAsDouble(), 1e-12);
    }

    @Test
    void outsideTheTableNothingIsSaid() {
        assertTrue(MX2.saturatedMolality(kelvin(-0.01)).isEmpty());
        assertTrue(MX2.saturatedMolality(kelvin(40.01)).isEmpty());
        assertTrue(MX2.log10Product(kelvin(41)).isEmpty());
        assertTrue(MX2.index(Map.of("M+2", 0.1, "X-", 0.2), kelvin(-1)).isEmpty());
    }

    /** K' = (1·s)(2·s)² at s = 1.5: log10 1.5 + 2 log10 3 = 1.1303338. */
    @Test
    void theProductCountsEachIonWithItsStoichiometry() {
        assertEquals(Math.log10(1.5) + 2 * Math.log10(3.0), MX2.log10Product(kelvin(10)).getAsDouble(), 1e-12);
        assertEquals(1.1303338, MX2.log10Product(kelvin(10)).getAsDouble(), 1e-7);
    }

    /** Q = 0.5 · 2.0² = 2, so log10(Q/K') = 0.30103 − 1.1303338 at 10 °C; the saturated pure solution sits at 0. */
    @Test
    void theIndexIsTheLogOfTheRatioOfProducts() {
        assertEquals(0.30103 - 1.1303338, MX2.index(Map.of("M+2", 0.5, "X-", 2.0), kelvin(10)).getAsDouble(), 1e-6);
        assertEquals(0, MX2.index(Map.of("M+2", 1.5, "X-", 3.0), kelvin(10)).getAsDouble(), 1e-12);
    }

    @Test
    void anAbsentIonGivesNoIndex() {
        assertTrue(MX2.index(Map.of("M+2", 0.5), kelvin(10)).isEmpty());
        assertTrue(MX2.index(Map.of("M+2", 0.5, "X-", 0.0), kelvin(10)).isEmpty());
    }

    @Test
    void aTableMustHaveTwoRisingTemperaturesEachWithItsValue() {
        assertThrows(IllegalArgumentException.class, () -> table(new double[] {20}, new double[] {5}));
        assertThrows(IllegalArgumentException.class, () -> table(new double[] {0, 20}, new double[] {5}));
        assertThrows(IllegalArgumentException.class, () -> table(new double[] {0, 20, 20}, new double[] {5, 6, 7}));
        assertThrows(IllegalArgumentException.class, () -> table(new double[] {20, 0}, new double[] {5, 6}));
    }

    @Test
    void theTableIsCopiedNotShared() {
        double[] celsius = {0, 20};
        double[] grams = {10, 20};
        SaltSolubility s = table(celsius, grams);
        celsius[1] = 40;
        grams[1] = 90;
        assertEquals(1.5, s.saturatedMolality(kelvin(10)).getAsDouble(), 1e-12);
    }

    private static SaltSolubility table(double[] celsius, double[] grams) {
        return new SaltSolubility("MX2", "MX2", 100, Map.of("M+2", 1, "X-", 2), List.of(), celsius, grams, "invented");
    }
}
