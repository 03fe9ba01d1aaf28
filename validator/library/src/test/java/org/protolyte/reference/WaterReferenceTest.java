package org.protolyte.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;
import org.protolyte.chemistry.Davies;
import org.protolyte.chemistry.Equilibrium;
import org.protolyte.chemistry.EquilibriumState;
import org.protolyte.chemistry.Water;

/** Water properties against their published formulations and tables. */
class WaterReferenceTest {

    /** IAPWS R11-07 (Bandura and Lvov 2006), Table 3 check values (read as reproduced in public IAPWS test code). */
    @ParameterizedTest(name = "pKw({0} K, {1} g/cm³) = {2}")
    @CsvSource({
        "300, 1.0, 13.906565",
        "600, 0.07, 21.048874",
        "600, 0.7, 11.203153",
        "800, 0.2, 15.089765",
        "800, 1.2, 6.438330"})
    void ionProductMatchesTheReleaseCheckTable(double kelvin, double rho, double pKw) {
        assertEquals(pKw, Water.pKw(kelvin, rho), 1e-6);
    }

    /** CRC Handbook, "Ionization constant of water" (computed there with Bandura and Lvov 2006 at 0.1 MPa). */
    @ParameterizedTest(name = "pKw({0} °C) = {1}")
    @CsvSource({"0, 14.946", "25, 13.995", "50, 13.264", "75, 12.696"})
    void ionProductAtAtmosphericPressureMatchesHandbook(double celsius, double pKw) {
        assertEquals(pKw, Water.pKw(celsius + 273.15), 0.002);
    }

    /** Neutral water: pH = pKw/2 with the CRC values above (0 and 25 °C). */
    @ParameterizedTest(name = "neutral pH at {0} °C = {1}")
    @CsvSource({"0, 7.473", "25, 6.9975"})
    void pureWaterIsNeutralAtHalfTheIonProduct(double celsius, double neutral) {
        EquilibriumState s = new Equilibrium(Davies.INSTANCE).solve(List.of(), Map.of(), celsius + 273.15);
        assertEquals(neutral, s.pH(), 0.0015);
    }

    /**
     * 37 °C is not tabulated in the CRC table; Marshall and Franck (1981, CRC "Ionization constant of normal and
     * heavy water") give pKw 13.685 at 35 °C and 13.542 at 40 °C, so neutral pH at 37 °C lies between 6.771 and 6.843.
     */
    @Test
    void pureWaterAtBodyTemperatureIsNeutralBetweenTheTabulatedNeighbours() {
        EquilibriumState s = new Equilibrium(Davies.INSTANCE).solve(List.of(), Map.of(), 310.15);
        assertTrue(s.pH() > 13.542 / 2 && s.pH() < 13.685 / 2, "neutral pH at 37 °C was " + s.pH());
        assertEquals(s.pKw() / 2, s.pH(), 1e-6);
    }

    /** Tanaka et al., Metrologia 38 (2001) 301, Table 1 coefficients (read); valid 0–40 °C. */
    @ParameterizedTest(name = "density at {0} °C")
    @CsvSource({"0", "4", "10", "20", "25", "30", "37", "40"})
    void densityAgreesWithTanakaWithinTheirCommonRange(double t) {
        double a1 = -3.983035, a2 = 301.797, a3 = 522528.9, a4 = 69.34881, a5 = 999.974950;
        double tanaka = a5 * (1 - (t + a1) * (t + a1) * (t + a2) / (a3 * (t + a4)));
        assertEquals(tanaka, Water.density(t + 273.15), 0.01);
    }

    /**
     * IAPWS-08 liquid water at 298.15 K and 0.1 MPa: 997.047013 kg/m³ (read in public IAPWS test code). Kell's
     * equation is on the IPTS-68 scale and sits 0.002 kg/m³ (2 ppm) below it.
     */
    @Test
    void densityAt25CelsiusMatchesIapws() {
        assertEquals(997.047013, Water.density(298.15), 0.003);
    }

    /** Malmberg and Maryott, J. Res. NBS 56 (1956) 1: ε(25 °C) = 78.30 (read in the paper). */
    @Test
    void permittivityAt25CelsiusMatchesMalmbergAndMaryott() {
        assertEquals(78.30, Water.permittivity(298.15), 0.01);
    }

    /**
     * Mean activity coefficients of HCl at low molality, Robinson and Stokes, "Electrolyte Solutions", Appendix 8.10
     * (from memory: 0.966 at 0.001, 0.929 at 0.005, 0.905 at 0.01 mol/kg, 25 °C). Davies must agree within 0.005 here.
     */
    @ParameterizedTest(name = "γ±(HCl, {0} mol/kg) = {1}")
    @CsvSource({"0.001, 0.966", "0.005, 0.929", "0.01, 0.905"})
    void daviesMatchesDiluteHydrochloricAcid(double m, double gamma) {
        double a = Water.debyeHuckelA(298.15);
        double g = Math.pow(10, Davies.INSTANCE.log10Gamma(1, m, a));
        assertEquals(gamma, g, 0.005);
    }

    /**
     * The Debye–Hückel A against its tabulated values (Appendix IV, "Debye–Hückel equation and Kielland table", of the
     * 1979 groundwater handbook at hydrogeologistswithoutborders.org, read): 0.4883, 0.5085, 0.5319 and 0.5425 at 0,
     * 25, 50 and 60 °C. That table predates the present constants and uses the molar scale, which parts from the molal
     * one by up to 0.5 %; allowed 0.004, a tenth of the rise from 0 to 60 °C.
     */
    @ParameterizedTest(name = "A at {0} °C = {1}")
    @CsvSource({"0, 0.4883", "25, 0.5085", "50, 0.5319", "60, 0.5425"})
    void debyeHuckelSlopeFollowsTheTabulatedValues(double celsius, double a) {
        assertEquals(a, Water.debyeHuckelA(celsius + 273.15), 0.004);
    }
}
