package org.protolyte.chemistry;

/**
 * Properties of liquid water at 0.1 MPa that the equilibrium needs: density, relative permittivity,
 * the ion product and the Debye–Hückel limiting-law slope.
 */
public final class Water {

    /**
     * Molar mass of water used by IAPWS R11-07, g/mol: part of that formulation of Kw, and used nowhere else
     * (stoichiometry takes water from the atomic weights, {@code substance.AtomicWeights.WATER}).
     */
    private static final double MOLAR_MASS = 18.015268;
    /**
     * Range of the formulations below taken together: Malmberg–Maryott is fitted on 0–100 °C; down to −5 °C
     * (a salt solution that is still liquid) it is a short extrapolation.
     */
    public static final TemperatureRange VALIDITY = TemperatureRange.celsius(-5, 100);

    private Water() {
    }

    /**
     * Density of air-free water at 0.101325 MPa, kg/m³, 0–150 °C: Kell, J. Chem. Eng. Data 20 (1975) 97,
     * eq. 16 (IPTS-68; the shift to ITS-90 is below 0.001 kg/m³ here). Coefficients from memory.
     */
    public static double density(double kelvin) {
        double t = kelvin - Thermo.KELVIN_OFFSET;
        double num = 999.83952 + 16.945176 * t - 7.9870401e-3 * t * t - 46.170461e-6 * t * t * t
                + 105.56302e-9 * t * t * t * t - 280.54253e-12 * t * t * t * t * t;
        return num / (1 + 16.879850e-3 * t);
    }

    /**
     * Relative permittivity of water, 0–100 °C: Malmberg and Maryott, J. Res. Natl. Bur. Stand. 56 (1956) 1,
     * ε = 87.740 − 0.40008 t + 9.398e-4 t² − 1.410e-6 t³. Coefficients from memory.
     */
    public static double permittivity(double kelvin) {
        double t = kelvin - Thermo.KELVIN_OFFSET;
        return 87.740 - 0.40008 * t + 9.398e-4 * t * t - 1.410e-6 * t * t * t;
    }

    /**
     * Debye–Hückel slope A for log10 γ on the molal scale, kg^½·mol^−½:
     * A = (2π N_A ρw)^½ · (e²/(4π ε0 ε k T))^{3/2} / ln 10, here as 1.82484e6 · ρw^½ / (ε T)^{3/2} with ρw in
     * g/cm³ (Robinson and Stokes, "Electrolyte Solutions", 2nd ed., ch. 9; the numerical factor from the
     * CODATA constants).
     */
    public static double debyeHuckelA(double kelvin) {
        double rho = density(kelvin) / 1000.0;
        double eps = permittivity(kelvin);
        return 1.82484e6 * Math.sqrt(rho) / Math.pow(eps * kelvin, 1.5);
    }

    /**
     * pKw on the molal scale from IAPWS R11-07 (Bandura and Lvov, J. Phys. Chem. Ref. Data 35 (2006) 15):
     * <pre>
     *   pKw = −2n[log10(1+Q) − Q/(Q+1)·ρ(β0 + β1/T + β2·ρ)] + pKw,G + 2·log10(Mw/1000)
     *   Q   = ρ·exp(α0 + α1/T + α2·ρ^{2/3}/T²)
     *   pKw,G = 0.61415 + 48251.33/T − 67707.93/T² + 10102100/T³
     * </pre>
     * with ρ in g/cm³, taken at 0.1 MPa from {@link #density(double)}.
     */
    public static double pKw(double kelvin) {
        return pKw(kelvin, density(kelvin) / 1000.0);
    }

    /** pKw at a temperature and a density of water (g/cm³), as in R11-07's own check table. */
    public static double pKw(double kelvin, double rho) {
        final double n = 6;
        final double alpha0 = -0.864671;
        final double alpha1 = 8659.19;
        final double alpha2 = -22786.2;
        final double beta0 = 0.642044;
        final double beta1 = -56.8534;
        final double beta2 = -0.375754;
        double t = kelvin;
        double q = rho * Math.exp(alpha0 + alpha1 / t + alpha2 / (t * t) * Math.pow(rho, 2.0 / 3.0));
        double pKwG = 0.61415 + 48251.33 / t - 67707.93 / (t * t) + 10102100 / (t * t * t);
        return -2 * n * (Math.log10(1 + q) - q / (q + 1) * rho * (beta0 + beta1 / t + beta2 * rho))
                + pKwG + 2 * Math.log10(MOLAR_MASS / 1000.0);
    }
}
