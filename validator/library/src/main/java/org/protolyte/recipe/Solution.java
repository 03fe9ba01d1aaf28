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

    /**
     * This solution mixed with {@code otherParts} volumes of {@code other} per volume of this one, both measured at
     * {@code kelvin}: the moles, the water and the solutes' apparent volumes add (the density model's additive
     * volumes), and the species of both are present.
     */
    public Solution mixed(Solution other, double otherParts, double kelvin) {
        double scale = otherParts * volumeLitres(kelvin) / other.volumeLitres(kelvin);
        double water = waterKg + scale * other.waterKg;
        Map<Component, Double> t = new java.util.LinkedHashMap<>();
        totals.forEach((c, m) -> t.merge(c, m * waterKg / water, Double::sum));
        other.totals.forEach((c, m) -> t.merge(c, m * scale * other.waterKg / water, Double::sum));
        java.util.Set<Species> all = new java.util.LinkedHashSet<>(species);
        all.addAll(other.species);
        Map<Ingredient, Double> n = new java.util.LinkedHashMap<>(moles);
        other.moles.forEach((i, x) -> n.merge(i, x * scale, Double::sum));
        return new Solution(t, List.copyOf(all), water, n, soluteVolumeLitres + scale * other.soluteVolumeLitres);
    }

    /** Litres of solution at a temperature: water at its density plus the solutes' apparent volumes. */
    public double volumeLitres(double kelvin) {
        return waterKg / DensityModel.waterDensity(kelvin) + soluteVolumeLitres;
    }
}
