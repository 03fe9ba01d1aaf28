package org.protolyte.chemistry;

/**
 * One proton dissociation HnA ⇌ Hn−1A + H+ at infinite dilution: pKa at 298.15 K, the standard
 * enthalpy of ionization ΔH° (J/mol), its heat-capacity change ΔCp° (J/(K·mol)), the standard
 * uncertainties of the pKa and of ΔH° (J/mol, 0 where the source gives none), their correlation (one fit
 * gives both) and the temperatures over which the values hold.
 */
public record DissociationStep(double pKa25, double deltaH, double deltaCp, double uncertainty,
                               TemperatureRange validity, double deltaHUncertainty, double correlation) {

    public DissociationStep(double pKa25, double deltaH, double deltaCp, double uncertainty, TemperatureRange validity) {
        this(pKa25, deltaH, deltaCp, uncertainty, validity, 0, 0);
    }

    /** The association H+ + Hn−1A ⇌ HnA is the reverse reaction: log K = pKa, ΔH and ΔCp change sign. */
    FormationConstant association() {
        return new FormationConstant(pKa25, -deltaH, -deltaCp, uncertainty, validity);
    }

    /** pKa at the given temperature (integrated van 't Hoff, see {@link FormationConstant}). */
    public double pKa(double kelvin) {
        return association().log10K(kelvin);
    }

    /**
     * The change of pKa at a temperature when ΔH° of ionization changes by {@code dDeltaH} (J/mol):
     * d pKa(T) = dΔH°/(R ln 10) · (1/T − 1/298.15), from the van 't Hoff term of {@link FormationConstant}.
     */
    public static double pKaChangeFromDeltaH(double dDeltaH, double kelvin) {
        return dDeltaH / (Thermo.R * Thermo.LN10) * (1 / kelvin - 1 / Thermo.T_REF);
    }
}
