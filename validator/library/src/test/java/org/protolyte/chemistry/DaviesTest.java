package org.protolyte.chemistry;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The Davies equation as published: log10 γ = −A z² (√I/(1+√I) − 0.3 I), the 0.3 of Davies, "Ion Association"
 * (Butterworths 1962) p. 41 (his 1938 paper had 0.2). Expected values are worked by hand from that equation with
 * A = 0.5091, not read from the code.
 */
class DaviesTest {

    private static final double A = 0.5091;

    @ParameterizedTest(name = "z = {0}, I = {1} mol/kg")
    @CsvSource({
            "1, 0.1, -0.10703984",   // −0.5091 (0.2402531 − 0.03)
            "2, 0.5, -0.53804450",   // −4 · 0.5091 (0.4142136 − 0.15)
            "3, 0.01, -0.40279066",  // −9 · 0.5091 (0.0909091 − 0.003)
            "0, 0.5, 0"})            // a neutral species has γ = 1
    void logGammaIsDaviesEquation(int z, double ionicStrength, double expected) {
        assertEquals(expected, Davies.INSTANCE.log10Gamma(z, ionicStrength, A), 1e-7);
    }

    /**
     * Σ m_i (φ − 1) of the Davies model in the Debye–Hückel closed form: −(2/3) α I^{3/2} σ(√I) + 0.3 α I², α = A ln 10,
     * σ(x) = (3/x³)(1 + x − 1/(1 + x) − 2 ln(1 + x)) (Robinson and Stokes, "Electrolyte Solutions", 2nd ed., ch. 9,
     * from memory), the second term from the 0.3 I of Davies' equation through Bjerrum's relation.
     */
    @ParameterizedTest(name = "I = {0} mol/kg")
    @ValueSource(doubles = {0.01, 0.05, 0.1, 0.3, 0.5})
    void osmoticExcessIsTheDebyeHuckelClosedFormWithDaviesLinearTerm(double i) {
        double x = Math.sqrt(i);
        double sigma = 3 / (x * x * x) * (1 + x - 1 / (1 + x) - 2 * Math.log(1 + x));
        double alpha = A * Math.log(10);
        double expected = -2.0 / 3 * alpha * i * x * sigma + 0.3 * alpha * i * i;
        assertEquals(expected, Davies.INSTANCE.osmoticExcess(i, A), 1e-9 + 1e-7 * Math.abs(expected));
    }
}
