package org.protolyte.chemistry;

import java.util.Map;
import java.util.OptionalDouble;

/**
 * Pitzer's ion-interaction equations for the strong electrolytes of saline concentrates, good to several mol/kg
 * where the Davies equation fails above a few tenths (Pitzer, "Activity Coefficients in Electrolyte Solutions",
 * 2nd ed., CRC 1991, chapter 3; Harvie, Møller and Weare, Geochim. Cosmochim. Acta 48 (1984) 723, eqs. for a
 * mixture of 1:1 salts). With α = 2 and b = 1.2 kg^½/mol^½:
 * <pre>
 *   φ − 1 = (2/Σm) [ −A_φ I^{3/2}/(1 + b√I) + Σ_c Σ_a m_c m_a (B^φ_ca + Z C_ca) + Σ_c<c' m_c m_c' (θ + Σ_a m_a ψ) ]
 *   B^φ = β⁰ + β¹ e^{−α√I},  C = Cφ / 2,  Z = Σ m_i |z_i|   (the mean activity coefficient: see {@link #lnGamma})
 * </pre>
 * A_φ = A·ln10/3 from the Debye–Hückel slope of {@link Water} (0.3915 at 25 °C). The parameters are for 25 °C
 * (Pitzer and Mayorga, J. Phys. Chem. 77 (1973) 2300; mixing terms Pitzer and Kim, J. Am. Chem. Soc. 96 (1974) 5701;
 * all from memory) and are used within 15–35 °C, where their temperature derivatives change them by less than the
 * check tolerances.
 */
public final class Pitzer {

    /** Where the 25 °C parameters are used. */
    public static final TemperatureRange VALIDITY = TemperatureRange.celsius(15, 35);

    private static final double ALPHA = 2.0;
    private static final double B = 1.2;

    /** β⁰, β¹ and Cφ of a 1:1 salt. */
    record Salt(double beta0, double beta1, double cPhi) {
    }

    /** Cation–anion parameters; ions are named as in the library ("Na+", "K+", "Cl-"). */
    private static final Map<String, Salt> SALTS = Map.of(
            "Na+|Cl-", new Salt(0.0765, 0.2664, 0.00127),
            "K+|Cl-", new Salt(0.04835, 0.2122, -0.00084));
    private static final double THETA_NA_K = -0.012;
    private static final double PSI_NA_K_CL = -0.0018;

    private Pitzer() {
    }

    /** The ions the parameters cover; a solution whose ionic strength comes from others is not for this model. */
    public static boolean covers(String ion) {
        return salineIndex(ion) >= 0;
    }

    /**
     * Osmotic coefficient of a solution of Na+, K+ and Cl- (mol/kg); empty if another ion is present or the
     * temperature is outside {@link #VALIDITY}.
     */
    public static OptionalDouble osmoticCoefficient(double na, double k, double cl, double kelvin) {
        if (!VALIDITY.contains(kelvin)) {
            return OptionalDouble.empty();
        }
        double aPhi = Water.debyeHuckelA(kelvin) * Thermo.LN10 / 3;
        double i = 0.5 * (na + k + cl);
        double s = Math.sqrt(i);
        double z = na + k + cl;
        double sum = -aPhi * i * s / (1 + B * s);
        sum += na * cl * (bPhi(SALTS.get("Na+|Cl-"), s) + z * SALTS.get("Na+|Cl-").cPhi() / 2);
        sum += k * cl * (bPhi(SALTS.get("K+|Cl-"), s) + z * SALTS.get("K+|Cl-").cPhi() / 2);
        sum += na * k * (THETA_NA_K + cl * PSI_NA_K_CL);
        return OptionalDouble.of(1 + 2 * sum / (na + k + cl));
    }

    /** Where a free ion sits in {@link #osmoticCoefficient}'s arguments: 0 Na+, 1 K+, 2 Cl-; −1 if not covered. */
    public static int salineIndex(String ion) {
        return switch (ion) {
            case "Na+" -> 0;
            case "K+" -> 1;
            case "Cl-" -> 2;
            default -> -1;
        };
    }

    /** Mean activity coefficient of sodium chloride at molality m: the reference electrolyte of saline solutions. */
    public static double sodiumChlorideMeanActivityCoefficient(double m, double kelvin) {
        return meanActivityCoefficient("Na+", m, kelvin);
    }

    /** Mean activity coefficient of a single 1:1 salt ("Na+" or "K+" with "Cl-") at molality m. */
    public static double meanActivityCoefficient(String cation, double m, double kelvin) {
        Salt p = SALTS.get(cation + "|Cl-");
        if (p == null) {
            throw new IllegalArgumentException("no Pitzer parameters for " + cation + " with Cl-");
        }
        return Math.exp(lnGamma(p, m, kelvin));
    }

    /**
     * ln γ± of a single 1:1 salt (Pitzer and Mayorga 1973): f^γ + m B^γ + m² C^γ, with
     * f^γ = −A_φ [√I/(1 + b√I) + (2/b) ln(1 + b√I)], B^γ = 2β⁰ + (2β¹/(α²I)) [1 − (1 + α√I − α²I/2) e^{−α√I}],
     * C^γ = 3Cφ/2.
     */
    static double lnGamma(Salt p, double m, double kelvin) {
        double aPhi = Water.debyeHuckelA(kelvin) * Thermo.LN10 / 3;
        double s = Math.sqrt(m);
        double f = -aPhi * (s / (1 + B * s) + 2 / B * Math.log1p(B * s));
        double x = ALPHA * s;
        double bGamma = 2 * p.beta0() + 2 * p.beta1() / (x * x) * (1 - (1 + x - x * x / 2) * Math.exp(-x));
        return f + m * bGamma + m * m * 1.5 * p.cPhi();
    }

    private static double bPhi(Salt p, double sqrtI) {
        return p.beta0() + p.beta1() * Math.exp(-ALPHA * sqrtI);
    }
}
