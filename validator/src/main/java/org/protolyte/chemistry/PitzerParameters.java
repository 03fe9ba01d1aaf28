package org.protolyte.chemistry;

import java.util.LinkedHashMap;
import java.util.Map;

/**
 * Pitzer's ion-interaction parameters at 25 °C with their first temperature derivatives where published, each with its
 * source. Ions are named as in the substance library ("Na+", "HPO4-2"). A pair whose derivatives are not published
 * is used at its 25 °C values over {@link #WITHOUT_SLOPES} only; one with derivatives over {@link #WITH_SLOPES}.
 */
final class PitzerParameters {

    /** Where the 25 °C values and their first derivatives stand for the parameters (Pitzer 1991, ch. 3, §VI). */
    static final TemperatureRange WITH_SLOPES = TemperatureRange.celsius(0, 50);
    /** Where the 25 °C values alone are used: within 10 K of 25 °C. */
    static final TemperatureRange WITHOUT_SLOPES = TemperatureRange.celsius(15, 35);

    /**
     * β⁰, β¹, β², Cφ (kg/mol, kg²/mol² for Cφ) at 25 °C; α₁, α₂; d/dT of the four (per K, NaN where not published);
     * the highest molality of the salt in the fit, mol/kg.
     */
    record Binary(double beta0, double beta1, double beta2, double cPhi, double alpha1, double alpha2,
                  double dBeta0, double dBeta1, double dBeta2, double dCPhi, double maxMolality, String source) {

        boolean hasSlopes() {
            return !Double.isNaN(dBeta0);
        }

        TemperatureRange validity() {
            return hasSlopes() ? WITH_SLOPES : WITHOUT_SLOPES;
        }

        /** β⁰, β¹, β², Cφ at 25 °C + dt. */
        double[] at(double dt) {
            if (!hasSlopes()) {
                return new double[] {beta0, beta1, beta2, cPhi};
            }
            return new double[] {beta0 + dBeta0 * dt, beta1 + dBeta1 * dt, beta2 + dBeta2 * dt, cPhi + dCPhi * dt};
        }
    }

    private static final double NONE = Double.NaN;

    static final Map<String, Binary> BINARY;
    private static final Map<String, Double> THETA;
    private static final Map<String, Double> PSI;

    static {
        Map<String, Binary> b = new LinkedHashMap<>();
        // 1-1 salts: Pitzer and Mayorga, J. Phys. Chem. 77 (1973) 2300, Table I; slopes: Pitzer 1991, ch. 3, Table 12
        b.put("Na+|Cl-", new Binary(0.0765, 0.2664, 0, 0.00127, 2, 0, NONE, NONE, NONE, NONE, 6.0,
                "from memory: Pitzer and Mayorga 1973, Table I"));
        b.put("K+|Cl-", new Binary(0.04835, 0.2122, 0, -0.00084, 2, 0, NONE, NONE, NONE, NONE, 4.8,
                "from memory: Pitzer and Mayorga 1973, Table I"));
        BINARY = Map.copyOf(b);
        // mixing: Pitzer and Kim, J. Am. Chem. Soc. 96 (1974) 5701, from memory
        THETA = Map.of("K+|Na+", -0.012);
        PSI = Map.of("K+|Na+|Cl-", -0.0018);
    }

    private PitzerParameters() {
    }

    /** The parameters of a cation–anion pair, or null. */
    static Binary binary(String cation, String anion) {
        return BINARY.get(cation + "|" + anion);
    }

    /** θ of two ions of like sign, or null. */
    static Double theta(String a, String b) {
        return THETA.get(a.compareTo(b) < 0 ? a + "|" + b : b + "|" + a);
    }

    /** ψ of two ions of like sign with a third of the other, or null. */
    static Double psi(String a, String b, String other) {
        return PSI.get((a.compareTo(b) < 0 ? a + "|" + b : b + "|" + a) + "|" + other);
    }
}
