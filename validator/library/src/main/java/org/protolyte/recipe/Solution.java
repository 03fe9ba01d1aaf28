package org.protolyte.recipe;

import java.util.List;
import java.util.Map;

import org.protolyte.chemistry.Component;
import org.protolyte.chemistry.Species;

/**
 * The recipe as the chemistry sees it: the total molality of every component (mol/kg water), the
 * species they can form, the water mass and the amount of each ingredient, per basis.
 */
public record Solution(Map<Component, Double> totals, List<Species> species, double waterKg,
                       Map<Ingredient, Double> moles, double soluteVolumeLitres) {

    public Solution {
        totals = Map.copyOf(totals);
        species = List.copyOf(species);
        moles = Map.copyOf(moles);
    }

    /**
     * The working solution: this one made up with water to {@code factor} times its volume at {@code kelvin}, the
     * same moles in m_w = ρ (F·V − Σ n φ) (the density model's additive apparent volumes, so it is the same solution
     * as the recipe made at 1/F of every amount).
     */
    public Solution diluted(double factor, double kelvin) {
        double water = DensityModel.waterDensity(kelvin) * (factor * volumeLitres(kelvin) - soluteVolumeLitres);
        Map<Component, Double> t = new java.util.LinkedHashMap<>();
        totals.forEach((c, m) -> t.put(c, m * waterKg / water));
        return new Solution(t, species, water, moles, soluteVolumeLitres);
    }

    /** Litres of solution at a temperature: water at its density plus the solutes' apparent volumes. */
    public double volumeLitres(double kelvin) {
        return waterKg / DensityModel.waterDensity(kelvin) + soluteVolumeLitres;
    }
}
