package org.protolyte.chemistry;

/** Single-ion activity coefficients as a function of ionic strength. */
public interface ActivityModel {

    /** log10 γ of an ion of the given charge at ionic strength I (mol/kg) and Debye–Hückel slope A. */
    double log10Gamma(int charge, double ionicStrength, double debyeHuckelA);

    /** Ionic strength above which results lose accuracy and carry a warning, mol/kg. */
    double warnAbove();

    /** Ionic strength above which the model cannot be trusted at all, mol/kg. */
    double indeterminateAbove();

    String name();
}
