package org.protolyte.chemistry;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;

import org.junit.jupiter.api.Test;

/**
 * The two temperature forms of a constant agree with each other. Expected values are derived from the definitions
 * (van 't Hoff: d ln K/dT = ΔH°/RT², dΔH°/dT = ΔCp°); the constants are invented test values, not data.
 */
class FormationConstantTest {

    private static final FormationConstant VANT_HOFF =
            new FormationConstant(-6.5, -12_000, -150, 0.02, TemperatureRange.celsius(0, 50));

    @Test
    void theVantHoffFormWrittenAsAnEquationGivesTheSameConstantAtEveryTemperature() {
        FormationConstant asEquation = FormationConstant.ofEquation(VANT_HOFF.coefficients(), 0.02,
                TemperatureRange.celsius(0, 50));
        for (double t = 273.15; t <= 333.15; t += 5) {
            assertEquals(VANT_HOFF.log10K(t), asEquation.log10K(t), 1e-10, "at " + t + " K");
        }
        assertEquals(VANT_HOFF.deltaH(), asEquation.deltaH(), 1e-6);
        assertEquals(VANT_HOFF.deltaCp(), asEquation.deltaCp(), 1e-6);
    }

    @Test
    void anEquationsEnthalpyAndHeatCapacityAreItsDerivatives() {
        // an equation with every term: central differences of log10 K give ΔH° = R T² ln10 d(log10 K)/dT
        double[] a = {-171.9, -0.078, 2839.3, 71.6, 1.0e4};
        FormationConstant k = FormationConstant.ofEquation(a, 0, TemperatureRange.UNBOUNDED);
        double t = Thermo.T_REF;
        double h = 1e-3;
        double slope = (k.log10K(t + h) - k.log10K(t - h)) / (2 * h);
        double deltaH = Thermo.R * Thermo.LN10 * t * t * slope;
        assertEquals(deltaH, k.deltaH(), 1e-3 * Math.abs(deltaH));
        double hPlus = Thermo.R * Thermo.LN10 * (t + h) * (t + h) * (k.log10K(t + 2 * h) - k.log10K(t)) / (2 * h);
        double hMinus = Thermo.R * Thermo.LN10 * (t - h) * (t - h) * (k.log10K(t) - k.log10K(t - 2 * h)) / (2 * h);
        assertEquals((hPlus - hMinus) / (2 * h), k.deltaCp(), 1e-2 * Math.abs(k.deltaCp()));
        assertEquals(k.log10K(t), k.log10K25(), 1e-12);
    }

    @Test
    void addingAnEquationToAVantHoffConstantAddsTheLogsAtEveryTemperature() {
        FormationConstant eq = FormationConstant.ofEquation(new double[] {-171.9065, -0.077993, 2839.319, 71.595, 0},
                0.02, TemperatureRange.celsius(0, 90));
        FormationConstant sum = eq.plus(VANT_HOFF);
        assertNotNull(sum.equation());
        for (double t = 278.15; t <= 318.15; t += 10) {
            assertEquals(eq.log10K(t) + VANT_HOFF.log10K(t), sum.log10K(t), 1e-10);
        }
        assertEquals(Math.hypot(0.02, 0.02), sum.uncertainty(), 1e-12);
        assertEquals(3 * VANT_HOFF.log10K(300), VANT_HOFF.times(3).log10K(300), 1e-10);
    }
}
