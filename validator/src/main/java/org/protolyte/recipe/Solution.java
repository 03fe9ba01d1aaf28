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

    /** Litres of solution at a temperature: water at its density plus the solutes' apparent volumes. */
    public double volumeLitres(double kelvin) {
        return waterKg / DensityModel.waterDensity(kelvin) + soluteVolumeLitres;
    }
}
