package org.protolyte.chemistry;

import java.util.ArrayList;
import java.util.List;

/**
 * Pitzer's ion-interaction equations for a mixture of electrolytes, in the form of Harvie, Møller and Weare,
 * Geochim. Cosmochim. Acta 48 (1984) 723, eqs. 1–9 (Pitzer, "Activity Coefficients in Electrolyte Solutions",
 * 2nd ed., CRC 1991, ch. 3), with b = 1.2 kg^½/mol^½ and the unsymmetrical mixing terms Eθ of Pitzer,
 * J. Solution Chem. 4 (1975) 249. For a cation M (an anion the same with the roles swapped):
 * <pre>
 *   ln γ_M = z_M² F + Σ_a m_a (2 B_Ma + Z C_Ma) + Σ_c m_c (2 Φ_Mc + Σ_a m_a ψ_Mca) + Σ_a&lt;a' m_a m_a' ψ_aa'M
 *            + |z_M| Σ_c Σ_a m_c m_a C_ca
 *   F = −A_φ [√I/(1 + b√I) + (2/b) ln(1 + b√I)] + Σ_c Σ_a m_c m_a B'_ca + Σ_i&lt;j m_i m_j Φ'_ij   (i, j alike)
 *   Σ m (φ − 1) = 2 [−A_φ I^{3/2}/(1 + b√I) + Σ_c Σ_a m_c m_a (B^φ_ca + Z C_ca) + Σ_i&lt;j m_i m_j (Φ^φ_ij + Σ_k m_k ψ_ijk)]
 *   B = β⁰ + β¹ g(α₁√I) + β² g(α₂√I),  B' = [β¹ g'(α₁√I) + β² g'(α₂√I)]/I,  B^φ = β⁰ + β¹ e^{−α₁√I} + β² e^{−α₂√I}
 *   g(x) = 2[1 − (1 + x) e^{−x}]/x²,  g'(x) = −2[1 − (1 + x + x²/2) e^{−x}]/x²,  C = Cφ/(2√|z_M z_X|),  Z = Σ m_i |z_i|
 * </pre>
 * A_φ = A·ln10/3 from the Debye–Hückel slope of {@link Water} (0.3914 at 25 °C). Neutral solutes count in Σ m only
 * (no λ terms: their γ is 1). The parameters are in {@link PitzerParameters}.
 */
public final class Pitzer {

    static final double B = 1.2;
    /** J(x) of Pitzer (1975), eq. 47: J ≈ x/(4 + C1 x^−C2 exp(−C3 x^C4)); constants from memory. */
    private static final double J1 = 4.581;
    private static final double J2 = 0.7237;
    private static final double J3 = 0.0120;
    private static final double J4 = 0.528;

    /** Sodium chloride at 25 °C, where Davies is compared with Pitzer. */
    private static final Mixture SODIUM_CHLORIDE_25 = salt("Na+", "Cl-", Thermo.T_REF);

    private Pitzer() {
    }

    /** Mean activity coefficient of a single salt of these two ions at molality m of the salt. */
    public static double meanActivityCoefficient(String cation, String anion, double m, double kelvin) {
        return meanActivityCoefficient(salt(cation, anion, kelvin), m);
    }

    private static double meanActivityCoefficient(Mixture x, double m) {
        double[] mol = x.saltMolalities(m);
        double[] ln = new double[2];
        x.lnGamma(mol, ln);
        int nu = x.nuCation + x.nuAnion;
        return Math.exp((x.nuCation * ln[0] + x.nuAnion * ln[1]) / nu);
    }

    /** Mean activity coefficient of a chloride ("Na+" or "K+") at molality m, 25 °C parameters. */
    public static double meanActivityCoefficient(String cation, double m, double kelvin) {
        return meanActivityCoefficient(cation, "Cl-", m, kelvin);
    }

    /** Mean activity coefficient of sodium chloride at molality m and 25 °C: the reference electrolyte. */
    public static double sodiumChlorideMeanActivityCoefficient(double m) {
        return meanActivityCoefficient(SODIUM_CHLORIDE_25, m);
    }

    /** Osmotic coefficient of a single salt of these two ions at molality m of the salt. */
    public static double osmoticCoefficient(String cation, String anion, double m, double kelvin) {
        Mixture x = salt(cation, anion, kelvin);
        double[] mol = x.saltMolalities(m);
        return 1 + x.osmoticExcess(mol) / (mol[0] + mol[1]);
    }

    /** A cation and an anion, by their names in the substance library. */
    public record Pair(String cation, String anion) {
        /** "Na+–HPO4-2". */
        public String name() {
            return cation + "–" + anion;
        }
    }

    /**
     * The cation–anion pairs among these ions whose parameters have no published temperature terms: their uncertainty
     * away from 25 °C is a constant of its own in the uncertainty budget.
     */
    public static List<Pair> pairsWithoutTemperatureTerms(List<Ion> ions) {
        List<Pair> out = new ArrayList<>();
        for (Ion c : ions) {
            for (Ion a : ions) {
                PitzerParameters.Binary b = c.charge() > 0 && a.charge() < 0
                        ? PitzerParameters.binary(c.name(), a.name()) : null;
                if (b != null && !b.hasSlopes()) {
                    out.add(new Pair(c.name(), a.name()));
                }
            }
        }
        return out;
    }

    /** How far β¹ of a pair without temperature terms may be off at this temperature (kg/mol; see SLOPE_BOUND). */
    public static double betaOneBound(double kelvin) {
        return PitzerParameters.SLOPE_BOUND[1] * Math.abs(kelvin - Thermo.T_REF);
    }

    private static Mixture salt(String cation, String anion, double kelvin) {
        int zc = charge(cation);
        int za = charge(anion);
        Mixture x = new Mixture(List.of(new Ion(cation, zc), new Ion(anion, za)), kelvin);
        if (x.pairs == 0) {
            throw new IllegalArgumentException("no Pitzer parameters for " + cation + " with " + anion);
        }
        return x;
    }

    /** The charge written at the end of an ion's name: "Na+" 1, "HPO4-2" −2. */
    static int charge(String ion) {
        int sign = Math.max(ion.lastIndexOf('+'), ion.lastIndexOf('-'));
        if (sign < 0) {
            return 0;
        }
        int s = ion.charAt(sign) == '+' ? 1 : -1;
        String digits = ion.substring(sign + 1);
        if (!digits.chars().allMatch(Character::isDigit)) {
            throw new IllegalArgumentException("no charge at the end of the ion's name: " + ion);
        }
        return digits.isEmpty() ? s : s * Integer.parseInt(digits);
    }

    /** An ion (or neutral solute) of a mixture, by its name in the substance library. */
    public record Ion(String name, int charge) {
    }

    /**
     * The interaction parameters among a fixed list of ions at one temperature, and the activity and osmotic
     * coefficients of any molalities of them. Immutable.
     */
    public static final class Mixture {

        final int n;
        final int[] z;
        final double aPhi;
        /** Cation–anion pairs with parameters: indices, β⁰, β¹, β², C, α₁, α₂. */
        final int pairs;
        final int[] cation;
        final int[] anion;
        final double[] beta0;
        final double[] beta1;
        final double[] beta2;
        final double[] c;
        final double[] alpha1;
        final double[] alpha2;
        /** Like-sign pairs that mix: θ where given, Eθ where the charges differ. */
        final int likes;
        final int[] likeI;
        final int[] likeJ;
        final double[] theta;
        /** Triplets i, j (alike), k (opposite) with ψ. */
        final int[][] triplet;
        final double[] psi;
        /** Which ions have at least one cation–anion pair with parameters. */
        final boolean[] parameterised;
        /** Per pair: the ionic strength of its pure salt at the highest molality where it is used, mol/kg. */
        final double[] pairLimit;
        /** Per pair: whether its parameters are its 25 °C values away from 25 °C (no published slopes). */
        final boolean[] extrapolated;
        private final List<Ion> ions;
        private final double kelvin;
        /** For a single salt (a cation and an anion): the ions per formula unit; 0 otherwise. */
        private final int nuCation;
        private final int nuAnion;

        public Mixture(List<Ion> ions, double kelvin) {
            this(ions, kelvin, -1);
        }

        /** @param bounded the pair (by its index here) moved by {@link PitzerParameters#SLOPE_BOUND}, or −1 */
        private Mixture(List<Ion> ions, double kelvin, int bounded) {
            this.ions = List.copyOf(ions);
            this.kelvin = kelvin;
            n = ions.size();
            z = new int[n];
            for (int i = 0; i < n; i++) {
                z[i] = ions.get(i).charge();
            }
            aPhi = Water.debyeHuckelA(kelvin) * Thermo.LN10 / 3;
            List<double[]> pairList = new ArrayList<>();
            parameterised = new boolean[n];
            List<Double> limits = new ArrayList<>();
            List<Boolean> unsloped = new ArrayList<>();
            double dt = kelvin - Thermo.T_REF;
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < n; j++) {
                    if (z[i] <= 0 || z[j] >= 0) {
                        continue;
                    }
                    PitzerParameters.Binary b = PitzerParameters.binary(ions.get(i).name(), ions.get(j).name());
                    if (b == null || !PitzerParameters.RANGE.contains(kelvin)) {
                        continue;
                    }
                    double[] at = pairList.size() == bounded ? b.bounded(dt) : b.at(dt);
                    pairList.add(new double[] {i, j, at[0], at[1], at[2],
                            at[3] / (2 * Math.sqrt(Math.abs(z[i] * z[j]))), b.alpha1(), b.alpha2()});
                    parameterised[i] = true;
                    parameterised[j] = true;
                    limits.add(b.ionicStrengthLimit(z[i], z[j]));
                    unsloped.add(!b.hasSlopes() && dt != 0);
                }
            }
            pairs = pairList.size();
            pairLimit = limits.stream().mapToDouble(Double::doubleValue).toArray();
            extrapolated = new boolean[pairs];
            for (int p = 0; p < pairs; p++) {
                extrapolated[p] = unsloped.get(p);
            }
            cation = new int[pairs];
            anion = new int[pairs];
            beta0 = new double[pairs];
            beta1 = new double[pairs];
            beta2 = new double[pairs];
            c = new double[pairs];
            alpha1 = new double[pairs];
            alpha2 = new double[pairs];
            for (int p = 0; p < pairs; p++) {
                double[] r = pairList.get(p);
                cation[p] = (int) r[0];
                anion[p] = (int) r[1];
                beta0[p] = r[2];
                beta1[p] = r[3];
                beta2[p] = r[4];
                c[p] = r[5];
                alpha1[p] = r[6];
                alpha2[p] = r[7];
            }
            List<int[]> likeList = new ArrayList<>();
            List<Double> thetaList = new ArrayList<>();
            for (int i = 0; i < n; i++) {
                for (int j = i + 1; j < n; j++) {
                    if (z[i] * z[j] <= 0) {
                        continue;
                    }
                    Double t = PitzerParameters.theta(ions.get(i).name(), ions.get(j).name());
                    if (t != null || z[i] != z[j]) {
                        likeList.add(new int[] {i, j});
                        thetaList.add(t == null ? 0 : t);
                    }
                }
            }
            likes = likeList.size();
            likeI = new int[likes];
            likeJ = new int[likes];
            theta = new double[likes];
            for (int q = 0; q < likes; q++) {
                likeI[q] = likeList.get(q)[0];
                likeJ[q] = likeList.get(q)[1];
                theta[q] = thetaList.get(q);
            }
            List<int[]> tripletList = new ArrayList<>();
            List<Double> psiList = new ArrayList<>();
            for (int[] like : likeList) {
                for (int k = 0; k < n; k++) {
                    if (z[k] * z[like[0]] >= 0) {
                        continue;
                    }
                    Double s = PitzerParameters.psi(ions.get(like[0]).name(), ions.get(like[1]).name(),
                            ions.get(k).name());
                    if (s != null) {
                        tripletList.add(new int[] {like[0], like[1], k});
                        psiList.add(s);
                    }
                }
            }
            triplet = tripletList.toArray(new int[0][]);
            psi = psiList.stream().mapToDouble(Double::doubleValue).toArray();
            boolean salt = n == 2 && z[0] > 0 && z[1] < 0;
            int g = salt ? gcd(z[0], -z[1]) : 1;
            nuCation = salt ? -z[1] / g : 0;
            nuAnion = salt ? z[0] / g : 0;
        }

        /** The molalities of the two ions of a single salt at molality m. */
        double[] saltMolalities(double m) {
            return new double[] {nuCation * m, nuAnion * m};
        }

        /** I = ½ Σ m z². */
        private double ionicStrength(double[] m) {
            double sum = 0;
            for (int i = 0; i < n; i++) {
                sum += m[i] * z[i] * z[i];
            }
            return 0.5 * sum;
        }

        /** Z = Σ m |z|. */
        private double chargeSum(double[] m) {
            double sum = 0;
            for (int i = 0; i < n; i++) {
                sum += m[i] * Math.abs(z[i]);
            }
            return sum;
        }

        /** Whether the ion at this index has cation–anion parameters with some other ion of the list. */
        public boolean parameterised(int ion) {
            return parameterised[ion];
        }

        /** The same ions with one pair that has no published slopes at the edge of what they allow here. */
        Mixture bounded(int pair) {
            return new Mixture(ions, kelvin, pair);
        }

        /** The index of the pair of these two ions, or −1. */
        int pair(String cationName, String anionName) {
            for (int q = 0; q < pairs; q++) {
                if (ions.get(cation[q]).name().equals(cationName) && ions.get(anion[q]).name().equals(anionName)) {
                    return q;
                }
            }
            return -1;
        }

        /** "Na+–HPO4-2": the ions of a pair, for messages. */
        String pairName(int pair) {
            return new Pair(ions.get(cation[pair]).name(), ions.get(anion[pair]).name()).name();
        }

        /** ln γ of every ion (0 for neutral solutes) at these molalities, into {@code out}. */
        public void lnGamma(double[] m, double[] out) {
            double ionic = ionicStrength(m);
            double zSum = chargeSum(m);
            java.util.Arrays.fill(out, 0, n, 0.0);
            if (!(ionic > 0)) {
                return;
            }
            double s = Math.sqrt(ionic);
            double f = -aPhi * (s / (1 + B * s) + 2 / B * Math.log1p(B * s));
            double cSum = 0;
            for (int p = 0; p < pairs; p++) {
                int i = cation[p];
                int j = anion[p];
                double x1 = alpha1[p] * s;
                double bb = beta0[p] + beta1[p] * g(x1) + (beta2[p] == 0 ? 0 : beta2[p] * g(alpha2[p] * s));
                double bPrime = (beta1[p] * gPrime(x1) + (beta2[p] == 0 ? 0 : beta2[p] * gPrime(alpha2[p] * s)))
                        / ionic;
                double mm = m[i] * m[j];
                f += mm * bPrime;
                cSum += mm * c[p];
                double w = 2 * bb + zSum * c[p];
                out[i] += m[j] * w;
                out[j] += m[i] * w;
            }
            double[] e = new double[2];
            for (int q = 0; q < likes; q++) {
                int i = likeI[q];
                int j = likeJ[q];
                mixing(z[i], z[j], ionic, e);
                double phi = theta[q] + e[0];
                f += m[i] * m[j] * e[1];
                out[i] += 2 * m[j] * phi;
                out[j] += 2 * m[i] * phi;
            }
            for (int t = 0; t < triplet.length; t++) {
                int i = triplet[t][0];
                int j = triplet[t][1];
                int k = triplet[t][2];
                out[i] += m[j] * m[k] * psi[t];
                out[j] += m[i] * m[k] * psi[t];
                out[k] += m[i] * m[j] * psi[t];
            }
            for (int i = 0; i < n; i++) {
                if (z[i] != 0) {
                    out[i] += z[i] * z[i] * f + Math.abs(z[i]) * cSum;
                } else {
                    out[i] = 0;
                }
            }
        }

        /** Σ m_i (φ − 1), mol/kg: what the interactions take from the ideal particle molality. */
        public double osmoticExcess(double[] m) {
            double ionic = ionicStrength(m);
            double zSum = chargeSum(m);
            if (!(ionic > 0)) {
                return 0;
            }
            double s = Math.sqrt(ionic);
            double sum = -aPhi * ionic * s / (1 + B * s);
            for (int p = 0; p < pairs; p++) {
                double bPhi = beta0[p] + beta1[p] * Math.exp(-alpha1[p] * s)
                        + (beta2[p] == 0 ? 0 : beta2[p] * Math.exp(-alpha2[p] * s));
                sum += m[cation[p]] * m[anion[p]] * (bPhi + zSum * c[p]);
            }
            double[] e = new double[2];
            for (int q = 0; q < likes; q++) {
                mixing(z[likeI[q]], z[likeJ[q]], ionic, e);
                sum += m[likeI[q]] * m[likeJ[q]] * (theta[q] + e[0] + ionic * e[1]);
            }
            for (int t = 0; t < triplet.length; t++) {
                sum += m[triplet[t][0]] * m[triplet[t][1]] * m[triplet[t][2]] * psi[t];
            }
            return 2 * sum;
        }

        /**
         * Eθ and Eθ' of two ions of like sign (Pitzer 1975, eqs. 41–42; zero for equal charges):
         * Eθ = (z_i z_j/4I)[J(x_ij) − ½J(x_ii) − ½J(x_jj)], x_ij = 6 z_i z_j A_φ √I,
         * Eθ' = −Eθ/I + (z_i z_j/8I²)[x_ij J'(x_ij) − ½x_ii J'(x_ii) − ½x_jj J'(x_jj)].
         */
        private void mixing(int zi, int zj, double ionic, double[] out) {
            if (zi == zj) {
                out[0] = 0;
                out[1] = 0;
                return;
            }
            double s = Math.sqrt(ionic);
            double zz = zi * zj;
            double xij = 6 * zz * aPhi * s;
            double xii = 6 * zi * zi * aPhi * s;
            double xjj = 6 * zj * zj * aPhi * s;
            double[] a = j(xij);
            double[] b = j(xii);
            double[] d = j(xjj);
            double e = zz / (4 * ionic) * (a[0] - 0.5 * b[0] - 0.5 * d[0]);
            out[0] = e;
            out[1] = -e / ionic + zz / (8 * ionic * ionic) * (xij * a[1] - 0.5 * xii * b[1] - 0.5 * xjj * d[1]);
        }
    }

    /** {J(x), J'(x)} from Pitzer's approximation (1975, eq. 47). */
    static double[] j(double x) {
        double ex = Math.exp(-J3 * Math.pow(x, J4));
        double d = 4 + J1 * Math.pow(x, -J2) * ex;
        double dPrime = J1 * Math.pow(x, -J2) * ex * (-J2 / x - J3 * J4 * Math.pow(x, J4 - 1));
        return new double[] {x / d, (d - x * dPrime) / (d * d)};
    }

    static double g(double x) {
        return 2 * (1 - (1 + x) * Math.exp(-x)) / (x * x);
    }

    static double gPrime(double x) {
        return -2 * (1 - (1 + x + x * x / 2) * Math.exp(-x)) / (x * x);
    }

    private static int gcd(int a, int b) {
        return b == 0 ? a : gcd(b, a % b);
    }
}
