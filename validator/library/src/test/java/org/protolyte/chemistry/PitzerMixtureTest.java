package org.protolyte.chemistry;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

/**
 * The mixture form of Pitzer's equations against laws it must obey whatever its parameters: the Gibbs–Duhem equation
 * between its activity and osmotic coefficients, and the derivative of Pitzer's J(x) that the unsymmetrical mixing
 * terms use. Derived here; no published number is needed for either.
 */
class PitzerMixtureTest {

    private static final double T25 = 298.15;

    /**
     * Σ_i m_i d ln γ_i = d[Σ_i m_i (φ − 1)] along any path of composition (Gibbs–Duhem with ln a_w = −M_w Σ m φ).
     * Cl-/SO4-2 differ in charge, so Eθ and Eθ' take part; Na+/K+ bring θ and ψ; NaCl and KCl their β and C.
     */
    @Test
    void activityAndOsmoticCoefficientsObeyGibbsDuhem() {
        List<Pitzer.Ion> ions = List.of(new Pitzer.Ion("Na+", 1), new Pitzer.Ion("K+", 1),
                new Pitzer.Ion("Cl-", -1), new Pitzer.Ion("SO4-2", -2), new Pitzer.Ion("sucrose", 0));
        Pitzer.Mixture x = new Pitzer.Mixture(ions, T25);
        double[] m = {1.2, 0.4, 1.0, 0.3, 0.2};
        double[] dm = {0.3, -0.1, 0.1, 0.05, 0.1};
        double h = 1e-5;
        double[] up = new double[5];
        double[] down = new double[5];
        double[] lnUp = new double[5];
        double[] lnDown = new double[5];
        for (int i = 0; i < 5; i++) {
            up[i] = m[i] + h * dm[i];
            down[i] = m[i] - h * dm[i];
        }
        x.lnGamma(up, lnUp);
        x.lnGamma(down, lnDown);
        double lhs = 0;
        for (int i = 0; i < 5; i++) {
            lhs += m[i] * (lnUp[i] - lnDown[i]) / (2 * h);
        }
        double rhs = (x.osmoticExcess(up) - x.osmoticExcess(down)) / (2 * h);
        assertTrue(Math.abs(rhs) > 0.01, "the path moves the osmotic excess");
        assertEquals(rhs, lhs, 1e-7 * Math.abs(rhs) + 1e-9);
    }

    @Test
    void jPrimeIsTheSlopeOfJ() {
        for (double v : new double[] {0.05, 0.3, 1, 4, 20}) {
            double h = 1e-6 * v;
            double slope = (Pitzer.j(v + h)[0] - Pitzer.j(v - h)[0]) / (2 * h);
            assertEquals(slope, Pitzer.j(v)[1], 1e-6 * Math.abs(slope));
        }
        // J(x) → x/4 − 1 + … for large x (Pitzer 1975): the ratio tends to 1/4
        assertEquals(0.25, Pitzer.j(1e6)[0] / 1e6, 1e-3);
    }

    /** A neutral solute counts in Σ m but has no γ of its own; a salt without parameters is refused by name. */
    @Test
    void neutralsAndMissingSalts() {
        Pitzer.Mixture x = new Pitzer.Mixture(List.of(new Pitzer.Ion("Na+", 1), new Pitzer.Ion("Cl-", -1),
                new Pitzer.Ion("glucose", 0)), T25);
        double[] ln = new double[3];
        x.lnGamma(new double[] {1, 1, 0.5}, ln);
        assertEquals(0, ln[2]);
        assertTrue(ln[0] < 0 && ln[1] < 0);
        assertEquals(-2, Pitzer.charge("HPO4-2"));
        assertEquals(0, Pitzer.charge("CO2(aq)"));
        assertThrows(IllegalArgumentException.class, () -> Pitzer.charge("bis-Tris"));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Pitzer.meanActivityCoefficient("Ca+2", "NO3-", 1, T25));
        assertTrue(e.getMessage().contains("Ca+2"), e.getMessage());
    }
}
