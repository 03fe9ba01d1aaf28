package org.protolyte.chemistry;

import java.util.Arrays;

/**
 * The mutable state of solves of one {@link PreparedProblem}: the totals, the activity coefficients at the current
 * ionic strength and the working arrays of one evaluation, reused so that a solve makes no garbage per evaluation.
 * One workspace serves one thread.
 */
final class Workspace {

    /** γ is kept per charge for charges −8 … +8; beyond, it is computed each time. */
    private static final int CHARGES = 17;

    final PreparedProblem p;
    final double[] total;
    final double[] log10Gamma;
    final double[] betaOverGamma;      // 10^(log β − log γ) at the current I (the linear path of molalities)
    final double[] log10GammaComponent; // per component: log10 γ of its free basis at the current I
    final double[] gammaComponent;     // γ of each component's free basis at the current I (powered path)
    final double[] complexWeight;      // powered: β/γ_s·Π γ_j^ν at the current I, so m = weight·aH^p·Π b^ν
    private final double[] byCharge = new double[CHARGES];     // log10 γ for charges −8 … +8 at the current I
    private final double[] inverseGammaByCharge = new double[CHARGES];
    double log10GammaH;
    double log10GammaOH;
    final double[] powers;             // aH^p, p = 0 … the most protons a species carries
    /** Species molalities of the last evaluation (valid until the next one). */
    final double[] m;
    final double[] w;
    final double[] perComponent;       // Σ w, or the mean bound protons p̄ that BufferCapacity.componentTerms leaves
    final double[] perComponentMax;
    final double[] term;               // per component: its term of β/ln10 (see BufferCapacity.componentTerms)
    final double[] freeBasis;          // per component, mol/kg: the free basis species (complexes; warm start)
    final double[] basisSlope;         // d log10 b_j/dpH from the last buffer capacity (for dI/dpH)
    final int[] unknown;               // the coupled mass balances' Newton: unknowns, residual and Jacobian
    final int[] position;
    final double[] residual;
    final double[][] jacobian;
    final double[] sumRhs;             // the buffer capacity's implicit differentiation
    final double[] sumCharge;
    final double[] sumDiagonal;
    final int[] sumPosition;
    final double[][] sumBlock;
    final double[] sumY;
    /** Pitzer's composition terms of log10 γ ({@link Interactions}): per species, per component, {H+, OH-}. */
    final double[] specific;
    final double[] specificComponent;
    final double[] specificWater = new double[2];
    private final double[] nextSpecific;
    private final double[] nextComponent;
    private final double[] nextWater = new double[2];
    final double[] ionMolality;
    final double[] ionLn;
    private boolean specificOn;

    Workspace(PreparedProblem p) {
        this.p = p;
        int n = p.n;
        int nc = p.components.length;
        int u = p.coupledCount;
        total = new double[nc];
        log10Gamma = new double[n];
        betaOverGamma = new double[n];
        log10GammaComponent = new double[nc];
        gammaComponent = new double[nc];
        complexWeight = new double[n];
        powers = new double[p.maxProtons + 1];
        m = new double[n];
        w = new double[n];
        perComponent = new double[nc];
        perComponentMax = new double[nc];
        term = new double[nc];
        freeBasis = new double[nc];
        basisSlope = new double[nc];
        unknown = new int[u];
        position = new int[nc];
        residual = new double[u];
        jacobian = new double[u][u];
        sumRhs = new double[nc];
        sumCharge = new double[nc];
        sumDiagonal = new double[nc];
        sumPosition = new int[nc];
        sumBlock = new double[u][u];
        sumY = new double[u];
        specific = new double[n];
        specificComponent = new double[nc];
        nextSpecific = new double[n];
        nextComponent = new double[nc];
        int ions = p.interactions == null ? 0 : p.interactions.ions;
        ionMolality = new double[ions];
        ionLn = new double[ions];
    }

    /** The composition terms from the molalities at this pH and the current coefficients; returns the largest change. */
    double updateSpecific(double pH, double ionicStrength) {
        if (p.interactions == null || !specificOn && ionicStrength <= IonInteraction.FROM) {
            return 0;           // Davies' own below the hand-over (w and its slope vanish there)
        }
        double[] mm = p.speciation.molalities(this, pH);
        double w = p.interactions.specific(mm, hydrogen(pH), hydroxide(pH), ionMolality, ionLn, nextSpecific,
                nextComponent, nextWater);
        double moved = Math.max(Math.abs(nextWater[0] - specificWater[0]), Math.abs(nextWater[1] - specificWater[1]));
        for (int i = 0; i < p.n; i++) {
            moved = Math.max(moved, Math.abs(nextSpecific[i] - specific[i]));
        }
        for (int j = 0; j < nextComponent.length; j++) {
            moved = Math.max(moved, Math.abs(nextComponent[j] - specificComponent[j]));
        }
        System.arraycopy(nextSpecific, 0, specific, 0, p.n);
        System.arraycopy(nextComponent, 0, specificComponent, 0, nextComponent.length);
        specificWater[0] = nextWater[0];
        specificWater[1] = nextWater[1];
        specificOn = w > 0 || moved > 0;
        return moved;
    }

    /** No composition terms: the charge-and-I part alone. */
    void clearSpecific() {
        Arrays.fill(specific, 0);
        Arrays.fill(specificComponent, 0);
        specificWater[0] = 0;
        specificWater[1] = 0;
        specificOn = false;
    }

    /**
     * The activity coefficients at this ionic strength: the charge-and-I part once per charge, plus Pitzer's composition
     * terms where {@link #updateSpecific} left some.
     */
    void setActivityCoefficients(double ionicStrength) {
        Arrays.fill(byCharge, Double.NaN);
        Arrays.fill(inverseGammaByCharge, Double.NaN);
        for (int i = 0; i < p.n; i++) {
            log10Gamma[i] = log10Gamma(p.ionCharge[i], ionicStrength);
            if (p.linear) {
                int k = p.ionCharge[i] + CHARGES / 2;
                if (Double.isNaN(inverseGammaByCharge[k])) {
                    inverseGammaByCharge[k] = Math.pow(10, -log10Gamma[i]);
                }
                betaOverGamma[i] = p.beta[i] * inverseGammaByCharge[k];
            }
        }
        log10GammaH = log10Gamma(1, ionicStrength);
        log10GammaOH = log10Gamma(-1, ionicStrength);
        for (int j = 0; j < p.components.length; j++) {
            log10GammaComponent[j] = log10Gamma(p.componentIonCharge[j], ionicStrength);
        }
        if (specificOn) {
            addSpecific();
            return;
        }
        if (p.powered) {              // γ by charge: a handful of powers of ten, then products
            for (int j = 0; j < p.components.length; j++) {
                gammaComponent[j] = gammaOfCharge(p.componentIonCharge[j], ionicStrength);
            }
            for (int i = 0; i < p.n; i++) {
                double x = p.beta[i] / gammaOfCharge(p.ionCharge[i], ionicStrength);
                if (p.complexParts[i] == null) {
                    x *= gammaComponent[p.comp[i]];
                } else {
                    for (int q = 0; q < p.complexParts[i].length; q++) {
                        for (int r = 0; r < p.complexCounts[i][q]; r++) {
                            x *= gammaComponent[p.complexParts[i][q]];
                        }
                    }
                }
                complexWeight[i] = x;
            }
        }
    }

    /** The composition terms added to the charge-and-I part, and the products of the paths made from them again. */
    private void addSpecific() {
        for (int i = 0; i < p.n; i++) {
            log10Gamma[i] += specific[i];
            betaOverGamma[i] = p.beta[i] * Math.pow(10, -log10Gamma[i]);
        }
        log10GammaH += specificWater[0];
        log10GammaOH += specificWater[1];
        for (int j = 0; j < p.components.length; j++) {
            log10GammaComponent[j] += specificComponent[j];
            gammaComponent[j] = Math.pow(10, log10GammaComponent[j]);
        }
        if (p.powered) {
            for (int i = 0; i < p.n; i++) {
                complexWeight[i] = Math.pow(10, p.log10Beta[i] - log10Gamma[i] + p.overParts(i, log10GammaComponent));
            }
        }
    }

    /** Free hydrogen and hydroxide molalities at this pH and the current activity coefficients. */
    double hydrogen(double pH) {
        return Math.exp(Thermo.LN10 * (-pH - log10GammaH));
    }

    double hydroxide(double pH) {
        return p.kw * Math.exp(Thermo.LN10 * (pH - log10GammaOH));
    }

    /** aH^k for k = 0 … the most protons, into {@link #powers}. */
    void fillPowers(double pH) {
        double x = Math.pow(10, -pH);
        powers[0] = 1;
        for (int k = 1; k < powers.length; k++) {
            powers[k] = powers[k - 1] * x;
        }
    }

    /** γ of a charge at the current I, each charge's power of ten taken once per I. */
    private double gammaOfCharge(int z, double ionicStrength) {
        int k = z + CHARGES / 2;
        if (k < 0 || k >= CHARGES) {
            return Math.pow(10, log10Gamma(z, ionicStrength));
        }
        if (Double.isNaN(inverseGammaByCharge[k])) {
            inverseGammaByCharge[k] = Math.pow(10, -log10Gamma(z, ionicStrength));
        }
        return 1 / inverseGammaByCharge[k];
    }

    private double log10Gamma(int z, double ionicStrength) {
        int k = z + CHARGES / 2;
        if (k < 0 || k >= CHARGES) {
            return p.activity.log10Gamma(z, ionicStrength, p.debyeHuckelA);
        }
        if (Double.isNaN(byCharge[k])) {
            byCharge[k] = p.activity.log10Gamma(z, ionicStrength, p.debyeHuckelA);
        }
        return byCharge[k];
    }
}
