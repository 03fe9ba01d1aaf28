package org.protolyte.chemistry;

/**
 * One proton dissociation HnA ⇌ Hn−1A + H+ at infinite dilution: pKa at 298.15 K, the standard
 * enthalpy of ionization ΔH° (J/mol), its heat-capacity change ΔCp° (J/(K·mol)), the standard
 * uncertainties of the pKa, of ΔH° (J/mol) and of ΔCp° (J/(K·mol)), the correlation of pKa and ΔH° (one fit
 * gives both) and the temperatures over which the values hold. {@code assumed} names the uncertainties that are
 * the library's stated defaults because the source gives none (empty: all are the source's).
 */
public record DissociationStep(double pKa25, double deltaH, double deltaCp, double uncertainty,
                               TemperatureRange validity, double deltaHUncertainty, double correlation,
                               double deltaCpUncertainty, java.util.List<String> assumed) {

    public DissociationStep {
        assumed = java.util.List.copyOf(assumed);
    }

    public DissociationStep(double pKa25, double deltaH, double deltaCp, double uncertainty,
                            TemperatureRange validity, double deltaHUncertainty, double correlation) {
        this(pKa25, deltaH, deltaCp, uncertainty, validity, deltaHUncertainty, correlation, 0, java.util.List.of());
    }

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

    /**
     * The change of pKa at a temperature when ΔCp° of ionization changes by {@code dDeltaCp} (J/(K·mol)):
     * d pKa(T) = −dΔCp°/(R ln 10) · [θ/T − 1 + ln(T/θ)], from the heat-capacity term of {@link FormationConstant}.
     */
    public static double pKaChangeFromDeltaCp(double dDeltaCp, double kelvin) {
        double theta = Thermo.T_REF;
        return -dDeltaCp / (Thermo.R * Thermo.LN10) * (theta / kelvin - 1 + Math.log(kelvin / theta));
    }
}
