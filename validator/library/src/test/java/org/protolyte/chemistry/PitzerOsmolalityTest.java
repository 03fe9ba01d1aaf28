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
 * read in the reproduction of those tables in pytzer, mvdh7/pytzer pytzer/tables.py and parameters.py), and the
 * osmolality the equilibrium takes from it once Pitzer carries the solution.
 */
class PitzerOsmolalityTest {

    private static final Component NA = new Component("Na+", 1);
    private static final Component K = new Component("K+", 1);
    private static final Component CL = new Component("Cl-", -1);
    private static final Component SUGAR = new Component("sucrose", 0);
    private static final Equilibrium PITZER = new Equilibrium(IonInteraction.INSTANCE);

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

    private static final List<Pitzer.Ion> SALINE = List.of(new Pitzer.Ion("Na+", 1), new Pitzer.Ion("K+", 1),
            new Pitzer.Ion("Cl-", -1));

    private static double mixturePhi(double na, double k, double cl, double kelvin) {
        return 1 + new Pitzer.Mixture(SALINE, kelvin).osmoticExcess(new double[] {na, k, cl}) / (na + k + cl);
    }

    @Test
    void aMixtureOfSodiumAndPotassiumChloridesTakesTheMixingTerms() {
        for (double[] m : new double[][] {{0.5, 0.5, 1.0}, {1.5, 0.3, 1.8}, {0.2, 1.0, 1.2}}) {
            assertEquals(phi(m[0], m[1], m[2], 298.15), mixturePhi(m[0], m[1], m[2], 298.15), 1e-12);
        }
        assertEquals(phi(0.6, 0.4, 1.0, 308.15), mixturePhi(0.6, 0.4, 1.0, 308.15), 1e-12);
        assertEquals(phi(0.6, 0.4, 1.0, 278.15), mixturePhi(0.6, 0.4, 1.0, 278.15), 1e-12);
    }

    private static EquilibriumState saline(double na, double k, double sugar, double kelvin) {
        List<Species> species = List.of(Species.free(NA), Species.free(K), Species.free(CL), Species.free(SUGAR));
        Map<Component, Double> totals = new LinkedHashMap<>();
        totals.put(NA, na);
        totals.put(K, k);
        totals.put(CL, na + k);
        totals.put(SUGAR, sugar);
        return PITZER.solve(species, totals, kelvin);
    }

    /**
     * From I = 0.3 mol/kg the osmolality is Pitzer's alone: φ·(m_Na + m_K + m_Cl) + the neutral solute, whose γ is 1
     * (and H+ and OH-, of 1e-7 mol/kg); at 5 °C and 37 °C too, with the chlorides' temperature terms.
     */
    @Test
    void aSalineConcentrateCountsItsSaltWithPitzersCoefficient() {
        for (double kelvin : new double[] {278.15, 298.15, 310.15}) {
            EquilibriumState s = saline(0.4, 0.1, 0.1, kelvin);
            double expected = phi(0.4, 0.1, 0.5, kelvin) * 1.0 + 0.1;
            assertEquals(expected, s.osmolality(), 1e-6, () -> kelvin + " K");
            assertTrue(s.osmolalityModel().contains("Pitzer"), s.osmolalityModel());
        }
    }

    /** Below I = 0.1 mol/kg the osmotic term is Davies' own. */
    @Test
    void belowTheHandOverDaviesStands() {
        EquilibriumState dilute = saline(0.06, 0.02, 0.1, 298.15);
        assertEquals(dilute.particleMolality()
                + Davies.INSTANCE.osmoticExcess(dilute.ionicStrength(), Water.debyeHuckelA(298.15)),
                dilute.osmolality(), 1e-12);
    }
}
