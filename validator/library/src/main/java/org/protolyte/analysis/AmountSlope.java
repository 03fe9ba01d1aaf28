package org.protolyte.analysis;

import java.util.List;

import org.protolyte.chemistry.Component;
import org.protolyte.recipe.Solution;

/**
 * How a solution's molal totals and its water per litre move with one amount (a dose in mol, or an amount's relative
 * change). Every component's moles and the water mass are affine in each amount ({@link org.protolyte.recipe.BatchTotals}),
 * so the secant between two solutions is their slope, and T = n/m_w gives dT/dx = (dn/dx − T·dm_w/dx)/m_w.
 *
 * @param totals        dT/dx per component, mol/kg per unit of x, in the order asked
 * @param waterPerLitre m_w/V at the temperature, kg/L
 * @param dWaterPerLitre d(m_w/V)/dx
 */
record AmountSlope(double[] totals, double waterPerLitre, double dWaterPerLitre) {

    static AmountSlope between(Solution at, Solution moved, double step, List<Component> order, double kelvin) {
        double w0 = at.waterKg();
        double dWater = (moved.waterKg() - w0) / step;
        double[] slope = new double[order.size()];
        for (int j = 0; j < slope.length; j++) {
            double t0 = at.totals().getOrDefault(order.get(j), 0.0);
            double dMoles = (moved.totals().getOrDefault(order.get(j), 0.0) * moved.waterKg() - t0 * w0) / step;
            slope[j] = (dMoles - t0 * dWater) / w0;
        }
        double v0 = at.volumeLitres(kelvin);
        double dVolume = (moved.volumeLitres(kelvin) - v0) / step;
        return new AmountSlope(slope, w0 / v0, (dWater * v0 - w0 * dVolume) / (v0 * v0));
    }

    /** No amount moves: for a state without a dose to hold. */
    static AmountSlope none(Solution at, int components, double kelvin) {
        return new AmountSlope(new double[components], at.waterKg() / at.volumeLitres(kelvin), 0);
    }
}
