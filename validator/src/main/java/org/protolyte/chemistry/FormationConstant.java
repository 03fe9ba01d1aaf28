package org.protolyte.chemistry;

/**
 * A formation constant log10 K at 298.15 K and infinite dilution, with the standard reaction enthalpy
 * ΔH° (J/mol) and heat-capacity change ΔCp° (J/(K·mol)) that carry it to other temperatures.
 *
 * <p>Integrated van 't Hoff equation with constant ΔCp° (Goldberg, Kishore and Lennen, J. Phys. Chem.
 * Ref. Data 31 (2002) 231, eq. 4):
 * <pre>
 *   ln K(T) = ln K(θ) − (ΔH°/R)(1/T − 1/θ) + (ΔCp°/R)[θ/T − 1 + ln(T/θ)]
 * </pre>
 */
public record FormationConstant(double log10K25, double deltaH, double deltaCp, double uncertainty,
                                TemperatureRange validity) {

    public static final FormationConstant UNITY = new FormationConstant(0, 0, 0, 0, TemperatureRange.UNBOUNDED);

    public FormationConstant {
        if (!Double.isFinite(log10K25) || !Double.isFinite(deltaH) || !Double.isFinite(deltaCp)) {
            throw new IllegalArgumentException("formation constant must be finite");
        }
    }

    public double log10K(double kelvin) {
        double theta = Thermo.T_REF;
        double lnK = log10K25 * Thermo.LN10
                - deltaH / Thermo.R * (1 / kelvin - 1 / theta)
                + deltaCp / Thermo.R * (theta / kelvin - 1 + Math.log(kelvin / theta));
        return lnK / Thermo.LN10;
    }

    /** The constant of the reaction that is this one followed by {@code other}: the logs and enthalpies add. */
    public FormationConstant plus(FormationConstant other) {
        return new FormationConstant(log10K25 + other.log10K25, deltaH + other.deltaH, deltaCp + other.deltaCp,
                Math.hypot(uncertainty, other.uncertainty), validity.intersect(other.validity));
    }
}
