package org.protolyte.chemistry;

/** Physical constants and the standard state. */
public final class Thermo {
    /** Molar gas constant, J/(K·mol): CODATA 2018 exact value (R = N_A·k). */
    public static final double R = 8.314462618;
    /** Reference temperature of the tabulated constants, K. */
    public static final double T_REF = 298.15;
    /** Kelvin at 0 °C, the unit layer's one copy. */
    public static final double KELVIN_OFFSET = org.protolyte.units.Unit.KELVIN_AT_ZERO_CELSIUS;
    public static final double LN10 = Math.log(10);

    private Thermo() {
    }
}
