package org.protolyte.chemistry;

import java.util.LinkedHashMap;
import java.util.Map;

/**
 * Pitzer's ion-interaction parameters at 25 °C with their first temperature derivatives where published, each with its
 * source and the highest molality of its salt where it is used. Ions are named as in the substance library ("Na+",
 * "HPO4-2"). Every pair is used over {@link #RANGE}; a pair whose derivatives are not published at its 25 °C values,
 * with the uncertainty {@link #SLOPE_BOUND} leaves.
 */
final class PitzerParameters {

    /** Where the 25 °C values and their first derivatives stand for the parameters (Pitzer 1991, ch. 3, §VI). */
    static final TemperatureRange RANGE = TemperatureRange.celsius(0, 50);
    /**
     * The largest first derivatives (per K) of β⁰, β¹ and Cφ published for the salts here (Pitzer 1991, ch. 3,
     * Table 12: NaCl 7.159e-4, KH2PO4 28.60e-4, NaOH −18.94e-5): a pair without its own is taken to be off by at most
     * these times |T − 25 °C|.
     */
    static final double[] SLOPE_BOUND = {7.159e-4, 28.60e-4, -18.94e-5};
    /**
     * Where the range of a fit is not given with the values read: the data compiled for the salt by May, Rowland,
     * Hefter and Königsberger, J. Chem. Eng. Data 56 (2011) 5066 ("Max_C", read in pyEQL's pitzer_activity.tsv), and
     * {@link #NO_RANGE} for a salt not in that compilation (chosen: the lowest range of the fits here, KHCO3's). No
     * pair is used beyond the ionic strength {@link #RANGE_CAP} (mol/kg): the widest range of a fit read here, NaCl's
     * 6.0 mol/kg (Pitzer 1991, ch. 3, Table 12).
     */
    static final double RANGE_CAP = 6.0;
    static final double NO_RANGE = 1;

    /**
     * β⁰, β¹, β², Cφ (kg/mol, kg²/mol² for Cφ) at 25 °C; α₁, α₂; d/dT of the four (per K, NaN where not published);
     * the highest molality of the salt where the pair is used, mol/kg.
     */
    record Binary(double beta0, double beta1, double beta2, double cPhi, double alpha1, double alpha2,
                  double dBeta0, double dBeta1, double dBeta2, double dCPhi, double maxMolality, String source) {

        boolean hasSlopes() {
            return !Double.isNaN(dBeta0);
        }

        /** β⁰, β¹, β², Cφ at 25 °C + dt. */
        double[] at(double dt) {
            if (!hasSlopes()) {
                return new double[] {beta0, beta1, beta2, cPhi};
            }
            return new double[] {beta0 + dBeta0 * dt, beta1 + dBeta1 * dt, beta2 + dBeta2 * dt, cPhi + dCPhi * dt};
        }

        /** The same moved by what {@link #SLOPE_BOUND} allows at 25 °C + dt: unchanged where the slopes are known. */
        double[] bounded(double dt) {
            double[] v = at(dt);
            if (!hasSlopes()) {
                double d = Math.abs(dt);
                v[0] += SLOPE_BOUND[0] * d;
                v[1] += SLOPE_BOUND[1] * d;
                v[3] += SLOPE_BOUND[2] * d;
            }
            return v;
        }

        /** The ionic strength of the pure salt of charges zc, za at its highest molality, at most RANGE_CAP, mol/kg. */
        double ionicStrengthLimit(int zc, int za) {
            int g = gcd(zc, -za);
            return Math.min(RANGE_CAP, 0.5 * maxMolality * ((double) -za / g * zc * zc + (double) zc / g * za * za));
        }
    }

    private static final double NONE = Double.NaN;

    static final Map<String, Binary> BINARY;
    private static final Map<String, Double> THETA;
    private static final Map<String, Double> PSI;

    static {
        Map<String, Binary> b = new LinkedHashMap<>();
        // Read in reproductions of the tables (none of the papers was reachable itself): PM73 = Pitzer and Mayorga,
        // J. Phys. Chem. 77 (1973) 2300, Tables I (1-1), II (organic 1-1) and VI (2-1, printed as (4/3)β⁰, (4/3)β¹,
        // (2^{5/2}/3)Cφ and unscaled here), as reproduced in pytzer (mvdh7/pytzer, pytzer/tables.py, parameters.py);
        // slopes: Pitzer, "Activity Coefficients in Electrolyte Solutions", 2nd ed. (1991), ch. 3, Table 12 (= Silvester
        // and Pitzer, J. Solution Chem. 7 (1978) 327, Table I), same reproduction, with its maximum molality;
        // HMW84 = Harvie, Møller and Weare 1984 (pytzer, and PHREEQC's database/pitzer.dat); FW86 = Felmy and Weare,
        // Geochim. Cosmochim. Acta 50 (1986) 2771; GT17 = Gallego-Urrea and Turner, Mar. Chem. 195 (2017) 84, Table S6.
        // May11 = May, Rowland, Hefter and Königsberger 2011 (see RANGE_CAP).
        binary(b, "Na+", "Cl-", 0.0765, 0.2664, 0.00127, 7.159e-4, 7.005e-4, -10.54e-5, 6.0, "PM73 Table I; slopes P91 Table 12");
        binary(b, "K+", "Cl-", 0.04835, 0.2122, -0.00084, 5.794e-4, 10.71e-4, -5.095e-5, 4.5, "PM73 Table I; slopes P91 Table 12");
        binary(b, "H+", "Cl-", 0.1775, 0.2945, 0.0008, NONE, NONE, NONE, 4.5,
                "PM73 Table I (the sign of dCφ/dT differs between reproductions: no slopes used)");
        binary(b, "Na+", "OH-", 0.0864, 0.253, 0.0044, 7.000e-4, 1.340e-4, -18.94e-5, 4.2, "PM73 Table I; slopes P91 Table 12");
        binary(b, "K+", "OH-", 0.1298, 0.32, 0.0041, NONE, NONE, NONE, 14, "PM73 Table I; range May11");
        binary(b, "Na+", "H2PO4-", -0.0533, 0.0396, 0.00795, NONE, NONE, NONE, 6.5, "PM73 Table I; range May11");
        binary(b, "K+", "H2PO4-", -0.0678, -0.1042, 0.0, 6.045e-4, 28.60e-4, -10.11e-5, 1.8, "PM73 Table I; slopes P91 Table 12");
        binary(b, "Na+", "HPO4-2", -0.0777 * 0.75, 1.954 * 0.75, 0.0554 * 3 / Math.pow(2, 2.5), NONE, NONE, NONE, 2.0,
                "PM73 Table VI, printed −0.0777, 1.954, 0.0554, unscaled; range May11");
        binary(b, "K+", "HPO4-2", 0.0330 * 0.75, 1.699 * 0.75, 0.0309 * 3 / Math.pow(2, 2.5), NONE, NONE, NONE, 7,
                "PM73 Table VI, printed 0.0330, 1.699, 0.0309, unscaled; range May11");
        binary(b, "Na+", "CH3COO-", 0.1426, 0.3237, -0.00629, NONE, NONE, NONE, 4.5, "PM73 Table II; range May11");
        binary(b, "K+", "CH3COO-", 0.1587, 0.3251, -0.00660, NONE, NONE, NONE, 3.5, "PM73 Table II; range May11");
        binary(b, "Na+", "SO4-2", 0.01958, 1.113, 0.00497, NONE, NONE, NONE, 3.0, "HMW84 (PM73 Table VI unscaled)");
        binary(b, "K+", "SO4-2", 0.04995, 0.7793, 0.0, NONE, NONE, NONE, 2.0, "HMW84 (PM73 Table VI unscaled); range May11");
        binary(b, "Na+", "HCO3-", 0.0277, 0.0411, 0.0, NONE, NONE, NONE, 1.3, "HMW84; range May11");
        binary(b, "K+", "HCO3-", 0.0296, -0.013, -0.008, NONE, NONE, NONE, 1.0, "HMW84; range May11");
        binary(b, "Na+", "CO3-2", 0.0399, 1.389, 0.0044, NONE, NONE, NONE, 3.115, "HMW84; range May11");
        binary(b, "K+", "CO3-2", 0.1488, 1.43, -0.0015, NONE, NONE, NONE, 8.102, "HMW84; range May11");
        binary(b, "Na+", "B(OH)4-", -0.0427, 0.089, 0.0114, NONE, NONE, NONE, NO_RANGE, "FW86; no range known");
        binary(b, "K+", "B(OH)4-", 0.035, 0.14, 0.0, NONE, NONE, NONE, NO_RANGE, "FW86; no range known");
        binary(b, "TrisH+", "Cl-", 0.04181, 0.16024, -0.00132, NONE, NONE, NONE, NO_RANGE, "GT17 Table S6; no range known");
        BINARY = Map.copyOf(b);
        // mixing: HMW84 (the same as Pitzer and Kim, J. Am. Chem. Soc. 96 (1974) 5701), read in pytzer and PHREEQC
        THETA = Map.of("K+|Na+", -0.012);
        PSI = Map.of("K+|Na+|Cl-", -0.0018);
    }

    private PitzerParameters() {
    }

    /** A pair with α₁ = 2 and no β² (every pair here: none is a 2-2 salt). */
    private static void binary(Map<String, Binary> b, String cation, String anion, double beta0, double beta1,
                               double cPhi, double dBeta0, double dBeta1, double dCPhi, double maxMolality,
                               String source) {
        b.put(cation + "|" + anion, new Binary(beta0, beta1, 0, cPhi, 2, 0, dBeta0, dBeta1, Double.isNaN(dBeta0) ? NONE : 0,
                dCPhi, maxMolality, source));
    }

    private static int gcd(int a, int b) {
        return b == 0 ? a : gcd(b, a % b);
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
