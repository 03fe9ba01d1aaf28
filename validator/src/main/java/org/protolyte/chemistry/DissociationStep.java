package org.protolyte.chemistry;

/**
 * One proton dissociation HnA ⇌ Hn−1A + H+ at infinite dilution: pKa at 298.15 K, the standard
 * enthalpy of ionization ΔH° (J/mol), its heat-capacity change ΔCp° (J/(K·mol)), the standard
 * uncertainty of the pKa and the temperatures over which the values hold.
 */
public record DissociationStep(double pKa25, double deltaH, double deltaCp, double uncertainty,
                               TemperatureRange validity) {

    /** The association H+ + Hn−1A ⇌ HnA is the reverse reaction: log K = pKa, ΔH and ΔCp change sign. */
    FormationConstant association() {
        return new FormationConstant(pKa25, -deltaH, -deltaCp, uncertainty, validity);
    }

    /** pKa at the given temperature (integrated van 't Hoff, see {@link FormationConstant}). */
    public double pKa(double kelvin) {
        return association().log10K(kelvin);
    }
}
