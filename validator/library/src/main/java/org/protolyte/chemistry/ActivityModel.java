package org.protolyte.chemistry;

/** Single-ion activity coefficients as a function of ionic strength. */
public interface ActivityModel {

    /** log10 γ of an ion of the given charge at ionic strength I (mol/kg) and Debye–Hückel slope A. */
    double log10Gamma(int charge, double ionicStrength, double debyeHuckelA);

    /** d log10 γ / dI of an ion of the given charge (kg/mol): for the derivatives of a solved state. */
    double log10GammaSlope(int charge, double ionicStrength, double debyeHuckelA);

    /**
     * Σ m_i (φ − 1) per kg of water, mol/kg: what the ions' non-ideality takes from (or adds to) the particle
     * molality, consistent with {@link #log10Gamma} through the Gibbs–Duhem equation. Osmolality = Σ m_i + this.
     */
    double osmoticExcess(double ionicStrength, double debyeHuckelA);

    /** Ionic strength above which results lose accuracy and carry a warning, mol/kg. */
    double warnAbove();

    /** Ionic strength above which the model cannot be trusted at all, mol/kg. */
    double indeterminateAbove();

    String name();
}
