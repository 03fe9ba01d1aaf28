package org.protolyte.units;

/** The gas phase a condition is open to where it names no other: dry air at standard pressure. */
public final class Air {

    /** Pa: the standard atmosphere, exact by definition (10th CGPM, 1954, resolution 4). */
    public static final double STANDARD_PRESSURE = 101325;
    /** CO2 in dry air, mole fraction: 419.3 ppm, the NOAA global mean for 2023 (NOAA release of 2024, read). */
    public static final double CO2_FRACTION = 4.193e-4;

    private Air() {
    }

    /** The CO2 partial pressure of dry air at a gas pressure, Pa. */
    public static double co2Pascal(double pressure) {
        return CO2_FRACTION * pressure;
    }
}
