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
 * Where a source publishes its own equation, {@code equation} holds A1..A5 of
 * log10 K = A1 + A2·T + A3/T + A4·log10 T + A5/T² (T in kelvin; the form of Plummer and Busenberg, Geochim.
 * Cosmochim. Acta 46 (1982) 1011), and log10K25, ΔH° and ΔCp° are its values at 25 °C (derived by differentiation).
 */
public record FormationConstant(double log10K25, double deltaH, double deltaCp, double uncertainty,
                                TemperatureRange validity, double[] equation) {

    public static final FormationConstant UNITY = new FormationConstant(0, 0, 0, 0, TemperatureRange.UNBOUNDED);

    public FormationConstant {
        if (!Double.isFinite(log10K25) || !Double.isFinite(deltaH) || !Double.isFinite(deltaCp)) {
            throw new IllegalArgumentException("formation constant must be finite");
        }
        if (equation != null && equation.length != 5) {
            throw new IllegalArgumentException("a log10 K equation takes five coefficients");
        }
        equation = equation == null ? null : equation.clone();
    }

    public FormationConstant(double log10K25, double deltaH, double deltaCp, double uncertainty,
                             TemperatureRange validity) {
        this(log10K25, deltaH, deltaCp, uncertainty, validity, null);
    }

    /**
     * A constant given by its source's equation. ΔH° = R·T²·ln10·d(log10 K)/dT and ΔCp° = dΔH°/dT at 25 °C
     * (van 't Hoff).
     */
    public static FormationConstant ofEquation(double[] a, double uncertainty, TemperatureRange validity) {
        double t = Thermo.T_REF;
        double log = a[0] + a[1] * t + a[2] / t + a[3] * Math.log10(t) + a[4] / (t * t);
        double slope = a[1] - a[2] / (t * t) + a[3] / (t * Thermo.LN10) - 2 * a[4] / (t * t * t);
        double curvature = 2 * a[2] / (t * t * t) - a[3] / (t * t * Thermo.LN10) + 6 * a[4] / (t * t * t * t);
        double deltaH = Thermo.R * Thermo.LN10 * t * t * slope;
        double deltaCp = Thermo.R * Thermo.LN10 * (2 * t * slope + t * t * curvature);
        return new FormationConstant(log, deltaH, deltaCp, uncertainty, validity, a);
    }

    public double log10K(double kelvin) {
        if (equation != null) {
            return equation[0] + equation[1] * kelvin + equation[2] / kelvin + equation[3] * Math.log10(kelvin)
                    + equation[4] / (kelvin * kelvin);
        }
        double theta = Thermo.T_REF;
        double lnK = log10K25 * Thermo.LN10
                - deltaH / Thermo.R * (1 / kelvin - 1 / theta)
                + deltaCp / Thermo.R * (theta / kelvin - 1 + Math.log(kelvin / theta));
        return lnK / Thermo.LN10;
    }

    /**
     * A1..A5 of this constant's equation; the van 't Hoff form with constant ΔCp° is one too:
     * A1 = [ln K(θ) + ΔH°/(Rθ) − (ΔCp°/R)(1 + ln θ)]/ln 10, A3 = (ΔCp°θ − ΔH°)/(R ln 10), A4 = ΔCp°/R.
     */
    public double[] coefficients() {
        if (equation != null) {
            return equation.clone();
        }
        double theta = Thermo.T_REF;
        double r = Thermo.R;
        return new double[] {
                (log10K25 * Thermo.LN10 + deltaH / (r * theta) - deltaCp / r * (1 + Math.log(theta))) / Thermo.LN10,
                0, (deltaCp * theta - deltaH) / (r * Thermo.LN10), deltaCp / r, 0};
    }

    /** The constant of the reaction that is this one followed by {@code other}: the logs and enthalpies add. */
    public FormationConstant plus(FormationConstant other) {
        if (equation != null || other.equation != null) {
            double[] a = coefficients();
            double[] b = other.coefficients();
            for (int i = 0; i < 5; i++) {
                a[i] += b[i];
            }
            return ofEquation(a, Math.hypot(uncertainty, other.uncertainty), validity.intersect(other.validity));
        }
        return new FormationConstant(log10K25 + other.log10K25, deltaH + other.deltaH, deltaCp + other.deltaCp,
                Math.hypot(uncertainty, other.uncertainty), validity.intersect(other.validity));
    }

    /** The constant of {@code times} of this reaction at once: the logs and enthalpies scale. */
    public FormationConstant times(int times) {
        FormationConstant k = UNITY;
        for (int i = 0; i < times; i++) {
            k = k.plus(this);
        }
        return k;
    }
}
