package org.protolyte.analysis;

import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;

import org.protolyte.chemistry.Component;
import org.protolyte.chemistry.Equilibrium;
import org.protolyte.chemistry.IndeterminateException;
import org.protolyte.chemistry.RootFinder;
import org.protolyte.recipe.Ingredient;
import org.protolyte.recipe.Recipe;
import org.protolyte.recipe.Solution;

/**
 * The pH of a recipe along one titrant's dose at one condition, on one prepared problem: the moles of every component
 * and the water mass are affine in the dose ({@link AmountSlope}), so the totals at any dose are arithmetic, each solve
 * starts from the last one, and the slope dpH/dn comes from the derivatives of that solve. A search for a dose is then
 * Newton's method inside a bracket ({@link RootFinder}). One curve serves one thread.
 */
final class DoseCurve implements RootFinder.Function {

    private final Equilibrium.Prepared problem;
    private final double[] moles0;
    private final double[] molesPerDose;
    private final double water0;
    private final double waterPerDose;
    private final double[] totals;
    private final double[] slopeOfTotals;
    private double goal;
    private Equilibrium.Point warm;
    private double slope = Double.NaN;

    private DoseCurve(Equilibrium.Prepared problem, double[] moles0, double[] molesPerDose, double water0,
                      double waterPerDose) {
        this.problem = problem;
        this.moles0 = moles0;
        this.molesPerDose = molesPerDose;
        this.water0 = water0;
        this.waterPerDose = waterPerDose;
        this.totals = new double[moles0.length];
        this.slopeOfTotals = new double[moles0.length];
    }

    /** The curve of {@code titrant} at a temperature, CO2 state and fraction of the final volume, up to {@code reach} mol. */
    static DoseCurve of(Analyzer analyzer, Recipe recipe, Ingredient titrant, double reach, double kelvin,
                        OptionalDouble co2, double volumeFraction) {
        Solution none = recipe.solution(Map.of(), volumeFraction);
        Solution full = recipe.solution(Map.of(titrant, reach), volumeFraction);
        Equilibrium.Prepared p = analyzer.prepare(recipe, full, kelvin, co2, java.util.Set.of());
        List<Component> order = p.components();
        double[] m0 = new double[order.size()];
        double[] dm = new double[order.size()];
        for (int j = 0; j < m0.length; j++) {
            m0[j] = none.totals().getOrDefault(order.get(j), 0.0) * none.waterKg();
            dm[j] = (full.totals().getOrDefault(order.get(j), 0.0) * full.waterKg() - m0[j]) / reach;
        }
        return new DoseCurve(p, m0, dm, none.waterKg(), (full.waterKg() - none.waterKg()) / reach);
    }

    /** The pH with {@code moles} of titrant; leaves dpH/dn at that dose in {@link #slope()}. */
    double pH(double moles) {
        double water = water0 + moles * waterPerDose;
        for (int j = 0; j < totals.length; j++) {
            // at no dose a component the titrant alone brings is exactly absent
            totals[j] = Math.max(0, (moles0[j] + moles * molesPerDose[j]) / water);
            slopeOfTotals[j] = (molesPerDose[j] - totals[j] * waterPerDose) / water;
        }
        Equilibrium.Point p = problem.trial(totals, warm);
        warm = p;
        slope = slope(problem, slopeOfTotals);
        return p.pH();
    }

    /** dpH along a change of the totals at the problem's last solve; NaN where its balances are singular there. */
    static double slope(Equilibrium.Prepared problem, double[] dTotals) {
        try {
            return problem.derivatives().totals(dTotals).pH();
        } catch (IndeterminateException e) {
            // caught: no slope here; the search bisects this step instead (RootFinder takes NaN so)
            return Double.NaN;
        }
    }

    /**
     * The dose at which the pH is {@code goalPH}, between no titrant and reach, where the pH minus the goal is
     * {@code atNone} and {@code atReach}.
     */
    double doseFor(double goalPH, double atNone, double atReach, double reach) {
        goal = goalPH;
        return RootFinder.solve(this, 0, atNone, reach, atReach, 0);
    }

    @Override
    public double value(double moles) {
        return pH(moles) - goal;
    }

    @Override
    public double slope() {
        return slope;
    }
}
