package org.protolyte.recipe;

import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.protolyte.chemistry.Component;

/**
 * The molal totals of a recipe's batches as exact affine functions of its amounts, for studies that make
 * thousands of batches. Every component's moles and the water mass are linear in each fixed amount and titrant
 * dose ({@link Recipe#solution}: m_w = ρ (V − Σ n φ) / (1 + ρ Σ b φ) at fixed molality amounts b, or the stated
 * water plus the water the ingredients bring), so one solution per amount gives the coefficients, and a batch is
 * then arithmetic: T_j = (n_j⁰ + Σ_k ∂n_j/∂x_k Δx_k) / (m_w⁰ + Σ_k ∂m_w/∂x_k Δx_k).
 *
 * <p>Recipes with molality amounts are not linear in them (they enter the denominator), so {@link #of} is empty for
 * those and the caller makes each batch with {@link Recipe#solution}.
 */
public final class BatchTotals {

    private final List<Ingredient> ingredients;
    private final double[] nominal;         // per ingredient: its amount (titrants: 0)
    private final double[] moles0;          // per component
    private final double water0;
    private final double volume0;           // L of solute apparent volume
    private final double[][] dMoles;        // [ingredient][component]
    private final double[] dWater;
    private final double[] dVolume;

    private BatchTotals(List<Ingredient> ingredients, double[] nominal, double[] moles0, double water0, double volume0,
                        double[][] dMoles, double[] dWater, double[] dVolume) {
        this.ingredients = ingredients;
        this.nominal = nominal;
        this.moles0 = moles0;
        this.water0 = water0;
        this.volume0 = volume0;
        this.dMoles = dMoles;
        this.dWater = dWater;
        this.dVolume = dVolume;
    }

    /**
     * The affine map of {@code recipe} at a fraction of its final volume, with totals in the order of
     * {@code components} (a component the recipe does not carry stays 0); empty where the recipe is not linear in
     * its amounts, checked against {@link Recipe#solution} at a perturbed batch.
     */
    public static Optional<BatchTotals> of(Recipe recipe, List<Component> components, double volumeFraction) {
        List<Ingredient> ings = recipe.ingredients();
        if (ings.stream().anyMatch(i -> i.kind() == Ingredient.Kind.MOLALITY)) {
            return Optional.empty();
        }
        int n = ings.size();
        double[] nominal = new double[n];
        for (int k = 0; k < n; k++) {
            nominal[k] = ings.get(k).kind() == Ingredient.Kind.TITRANT ? 0 : ings.get(k).value();
        }
        Solution s0 = solution(recipe, nominal, volumeFraction);
        double[] moles0 = moles(s0, components);
        double[][] dMoles = new double[n][];
        double[] dWater = new double[n];
        double[] dVolume = new double[n];
        for (int k = 0; k < n; k++) {
            double step = Math.max(Math.abs(nominal[k]) * 1e-3, 1e-6);
            double[] x = nominal.clone();
            x[k] += step;
            Solution s = solution(recipe, x, volumeFraction);
            double[] m = moles(s, components);
            dMoles[k] = new double[components.size()];
            for (int j = 0; j < m.length; j++) {
                dMoles[k][j] = (m[j] - moles0[j]) / step;
            }
            dWater[k] = (s.waterKg() - s0.waterKg()) / step;
            dVolume[k] = (s.soluteVolumeLitres() - s0.soluteVolumeLitres()) / step;
        }
        BatchTotals b = new BatchTotals(ings, nominal, moles0, s0.waterKg(), s0.soluteVolumeLitres(), dMoles, dWater,
                dVolume);
        // the check: a batch off in every amount at once, against the recipe itself
        double[] probe = new double[n];
        for (int k = 0; k < n; k++) {
            probe[k] = ings.get(k).kind() == Ingredient.Kind.TITRANT ? 1e-3 * s0.waterKg() : nominal[k] * 1.013;
        }
        Solution exact = solution(recipe, probe, volumeFraction);
        double[] got = new double[components.size()];
        b.totals(probe, got);
        double[] want = moles(exact, components);
        for (int j = 0; j < got.length; j++) {
            double expected = want[j] / exact.waterKg();
            if (Math.abs(got[j] - expected) > 1e-9 * Math.abs(expected) + 1e-15) {
                return Optional.empty();
            }
        }
        return Optional.of(b);
    }

    /** Per ingredient, in the recipe's order: its nominal amount (titrants 0), the point the map starts from. */
    public double[] nominal() {
        return nominal.clone();
    }

    /**
     * Fills {@code out} with the molal totals of the batch with these amounts (per ingredient, in the recipe's
     * order: moles or the line's value, titrant moles) and returns the water mass, kg.
     */
    public double totals(double[] amounts, double[] out) {
        double water = water0;
        System.arraycopy(moles0, 0, out, 0, out.length);
        for (int k = 0; k < amounts.length; k++) {
            double d = amounts[k] - nominal[k];
            if (d != 0) {
                water += dWater[k] * d;
                double[] g = dMoles[k];
                for (int j = 0; j < out.length; j++) {
                    out[j] += g[j] * d;
                }
            }
        }
        if (!(water > 0)) {
            throw new IllegalStateException("no water is left in this batch");
        }
        for (int j = 0; j < out.length; j++) {
            out[j] /= water;
        }
        return water;
    }

    /** Litres of the batch at a temperature: its water at that density plus the solutes' apparent volumes. */
    public double volumeLitres(double[] amounts, double waterKg, double kelvin) {
        double v = volume0;
        for (int k = 0; k < amounts.length; k++) {
            v += dVolume[k] * (amounts[k] - nominal[k]);
        }
        return waterKg / DensityModel.waterDensity(kelvin) + v;
    }

    public List<Ingredient> ingredients() {
        return ingredients;
    }

    /**
     * The batch with these amounts (per ingredient, in the recipe's order; titrant moles) made the long way, through
     * {@link Recipe#solution}: what the map reproduces, and what a recipe without a map uses.
     */
    public static Solution solution(Recipe recipe, double[] amounts, double volumeFraction) {
        List<Ingredient> ings = recipe.ingredients();
        List<Ingredient> changed = new java.util.ArrayList<>();
        Map<Ingredient, Double> doses = new java.util.LinkedHashMap<>();
        for (int k = 0; k < ings.size(); k++) {
            Ingredient i = ings.get(k);
            if (i.kind() == Ingredient.Kind.TITRANT) {
                changed.add(i);
                if (amounts[k] > 0) {
                    doses.put(i, amounts[k]);
                }
            } else {
                changed.add(new Ingredient(i.line(), i.substance(), i.kind(), amounts[k], i.stockMolarity(),
                        i.stockDensity()));
            }
        }
        return new Recipe(recipe.formulation(), recipe.library(), changed, recipe.makeUpKelvin())
                .solution(doses, volumeFraction);
    }

    private static double[] moles(Solution s, List<Component> components) {
        double[] out = new double[components.size()];
        for (int j = 0; j < out.length; j++) {
            out[j] = s.totals().getOrDefault(components.get(j), 0.0) * s.waterKg();
        }
        return out;
    }
}
