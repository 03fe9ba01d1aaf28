package org.protolyte.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.protolyte.chemistry.Pitzer;

/**
 * The Pitzer model against the mean activity and osmotic coefficients of NaCl and KCl at 25 °C to 2 mol/kg:
 * Robinson and Stokes, "Electrolyte Solutions" (2nd ed., 1959), Appendix 8.10, from memory. Pitzer's own fits
 * reproduce these tables to about 0.002; allowed 0.004.
 */
class PitzerTest {

    private static final double T25 = 298.15;

    @ParameterizedTest(name = "{0} {1} mol/kg: γ± {2}, φ {3}")
    @CsvSource({
            "Na+, 0.1, 0.778, 0.9324",
            "Na+, 0.5, 0.681, 0.9209",
            "Na+, 1.0, 0.657, 0.9355",
            "Na+, 2.0, 0.668, 0.9833",
            "K+, 0.1, 0.770, 0.9266",
            "K+, 0.5, 0.649, 0.9000",
            "K+, 1.0, 0.604, 0.8992",
            "K+, 2.0, 0.573, 0.9126"})
    void singleSalt(String cation, double m, double gamma, double phi) {
        assertEquals(gamma, Pitzer.meanActivityCoefficient(cation, m, T25), 0.004);
        assertEquals(phi, Pitzer.osmoticCoefficient(cation, "Cl-", m, T25), 0.004);
    }
}
