package org.protolyte.chemistry;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;

/**
 * Pitzer's osmotic coefficient for a mixture of NaCl and KCl, written out term by term from Harvie, Møller and Weare,
 * Geochim. Cosmochim. Acta 48 (1984) 723 (α = 2, b = 1.2; β⁰, β¹, Cφ of Pitzer and Mayorga 1973, Table I, with their
 * temperature derivatives from Pitzer 1991, ch. 3, Table 12, θ(Na,K) = −0.012 and ψ(Na,K,Cl) = −0.0018 of HMW84, all
 * read in the reproduction of those tables in pytzer, mvdh7/pytzer pytzer/tables.py and parameters.py), and where
 * the equilibrium takes it for the osmolality: above Davies' warning limit, with Na+, K+ and Cl- carrying at least three quarters of I, within 15–35 °C.
 */
class PitzerOsmolalityTest {

    private static final Component NA = new Component("Na+", 1);
    private static final Component K = new Component("K+", 1);
    private static final Component CL = new Component("Cl-", -1);
    private static final Component SUGAR = new Component("sucrose", 0);
    private static final Component MG = new Component("Mg+2", 2);
    private static final Equilibrium DAVIES = new Equilibrium(Davies.INSTANCE);

    /** φ − 1 = (2/Σm)[−Aφ I^1.5/(1 + b√I) + Σ m_c m_a (Bφ + Z C) + m_Na m_K (θ + m_Cl ψ)], C = Cφ/2, Z = Σ m|z|. */
    private static double phi(double na, double k, double cl, double kelvin) {
        double aPhi = Water.debyeHuckelA(kelvin) * Math.log(10) / 3;
        double i = (na + k + cl) / 2;
        double z = na + k + cl;
        double root = Math.sqrt(i);
        double dt = kelvin - 298.15;
        double naCl = 0.0765 + 7.159e-4 * dt + (0.2664 + 7.005e-4 * dt) * Math.exp(-2 * root)
                + z * (0.00127 - 10.54e-5 * dt) / 2;
        double kCl = 0.04835 + 5.794e-4 * dt + (0.2122 + 10.71e-4 * dt) * Math.exp(-2 * root)
                + z * (-0.00084 - 5.095e-5 * dt) / 2;
        double sum = -aPhi * Math.pow(i, 1.5) / (1 + 1.2 * root) + na * cl * naCl + k * cl * kCl
                + na * k * (-0.012 + cl * -0.0018);
        return 1 + 2 * sum / (na + k + cl);
    }

    @Test
    void aMixtureOfSodiumAndPotassiumChloridesTakesTheMixingTerms() {
        for (double[] m : new double[][] {{0.5, 0.5, 1.0}, {1.5, 0.3, 1.8}, {0.2, 1.0, 1.2}}) {
            assertEquals(phi(m[0], m[1], m[2], 298.15), Pitzer.osmoticCoefficient(m[0], m[1], m[2], 298.15).orElseThrow(),
                    1e-12);
        }
        assertEquals(phi(0.6, 0.4, 1.0, 308.15), Pitzer.osmoticCoefficient(0.6, 0.4, 1.0, 308.15).orElseThrow(), 1e-12);
    }

    @Test
    void theParametersHoldFrom15To35Celsius() {
        assertTrue(Pitzer.osmoticCoefficient(1, 0, 1, 288.15).isPresent());
        assertTrue(Pitzer.osmoticCoefficient(1, 0, 1, 308.15).isPresent());
        assertTrue(Pitzer.osmoticCoefficient(1, 0, 1, 288.0).isEmpty());
        assertTrue(Pitzer.osmoticCoefficient(1, 0, 1, 308.3).isEmpty());
    }

    private static EquilibriumState saline(double na, double k, double mg, double sugar, double kelvin) {
        List<Species> species = List.of(Species.free(NA), Species.free(K), Species.free(CL), Species.free(SUGAR),
                Species.free(MG));
        Map<Component, Double> totals = new LinkedHashMap<>();
        totals.put(NA, na);
        totals.put(K, k);
        totals.put(MG, mg);
        totals.put(CL, na + k + 2 * mg);
        totals.put(SUGAR, sugar);
        return DAVIES.solve(species, totals, kelvin);
    }

    /** Osmolality = φ·(m_Na + m_K + m_Cl) + the other particles counted as ideal (EquilibriumState). */
    @Test
    void aSalineConcentrateCountsItsSaltWithPitzersCoefficientAndTheRestAsIdeal() {
        EquilibriumState s = saline(0.4, 0.1, 0, 0.1, 298.15);
        double strong = 0.4 + 0.1 + 0.5;
        double expected = phi(0.4, 0.1, 0.5, 298.15) * strong + 0.1 + s.hydrogenMolality() + s.hydroxideMolality();
        assertEquals(expected, s.osmolality(), 1e-12);
        assertTrue(s.osmolalityModel().startsWith("Pitzer"), s.osmolalityModel());
    }

    /** Below 0.2 mol/kg the Davies term stands; outside 15–35 °C too. */
    @Test
    void belowTheWarningLimitOrOutsideItsTemperaturesDaviesStands() {
        EquilibriumState dilute = saline(0.15, 0.04, 0, 0.1, 298.15);
        assertEquals("Davies", dilute.osmolalityModel());
        assertEquals(dilute.particleMolality()
                + Davies.INSTANCE.osmoticExcess(dilute.ionicStrength(), Water.debyeHuckelA(298.15)),
                dilute.osmolality(), 1e-12);
        assertEquals("Davies", saline(0.4, 0.1, 0, 0.1, 310.15).osmolalityModel());
    }

    /**
     * Magnesium at 0.05 mol/kg with 0.2 NaCl (Cl- 0.3): I = ½(0.2 + 4·0.05 + 0.3) = 0.35 and Na+ with Cl- carry
     * ½(0.2 + 0.3)/0.35 = 71 % of it — under three quarters, so no Pitzer; at 0.02 mol/kg Mg with 0.3 NaCl
     * (Cl- 0.34), I = 0.36 and the share is ½(0.3 + 0.34)/0.36 = 89 %.
     */
    @Test
    void pitzerTakesOverOnlyWhereSodiumPotassiumAndChlorideCarryThreeQuartersOfTheIonicStrength() {
        assertEquals("Davies", saline(0.2, 0, 0.05, 0, 298.15).osmolalityModel());
        assertTrue(saline(0.3, 0, 0.02, 0, 298.15).osmolalityModel().startsWith("Pitzer"));
    }
}
