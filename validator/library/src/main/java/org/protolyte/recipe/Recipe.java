package org.protolyte.recipe;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.protolyte.chemistry.AcidBaseSystem;
import org.protolyte.chemistry.Component;
import org.protolyte.chemistry.Species;
import org.protolyte.document.DocumentException;
import org.protolyte.document.Formulation;
import org.protolyte.substance.Composition;
import org.protolyte.substance.Substance;
import org.protolyte.substance.SubstanceLibrary;
import org.protolyte.substance.AtomicWeights;

/**
 * A formulation with every substance resolved and every amount in moles (or mol/kg) per basis. It
 * makes the {@link Solution} for any amounts of its titrants.
 *
 * @param makeUpKelvin temperature at which the volume is made up (the preparation condition, else 20 °C)
 */
public record Recipe(Formulation formulation, SubstanceLibrary library, List<Ingredient> ingredients,
                     double makeUpKelvin) {

    public Recipe {
        ingredients = List.copyOf(ingredients);
    }

    public List<Ingredient> titrants() {
        return ingredients.stream().filter(i -> i.kind() == Ingredient.Kind.TITRANT).toList();
    }

    /** Makes the solution with the given moles (per basis) of each titrant; absent titrants are zero. */
    public Solution solution(Map<Ingredient, Double> titrantMoles) {
        return solution(titrantMoles, 1);
    }

    /**
     * The solution at a fraction of its final volume, before making up (finalVolume basis): the same solutes
     * in less water, as the meter sees it when the pH is adjusted at part volume.
     */
    public Solution solution(Map<Ingredient, Double> titrantMoles, double volumeFraction) {
        boolean finalVolume = formulation.basis().finalVolume();
        double basis = formulation.basis().amount() * (finalVolume ? volumeFraction : 1);
        double rho = DensityModel.waterDensity(makeUpKelvin);
        Map<Ingredient, Double> fixed = new LinkedHashMap<>();
        double fixedVolume = 0;       // L of solute apparent volume from fixed amounts
        double molalVolume = 0;       // L per kg water from molality amounts
        double extraWater = 0;        // kg of water the ingredients bring (waterMass basis)
        Ingredient bulkiest = null;
        double bulkiestVolume = 0;
        for (Ingredient ing : ingredients) {
            double phi = DensityModel.apparentMolarVolume(ing.substance()) / 1000;
            if (ing.kind() == Ingredient.Kind.MOLALITY) {
                molalVolume += ing.value() * phi;
                continue;
            }
            double n = ing.kind() == Ingredient.Kind.TITRANT ? titrantMoles.getOrDefault(ing, 0.0) : ing.value();
            fixed.put(ing, n);
            if (ing.substance().solvent()) {
                extraWater += n * AtomicWeights.WATER / 1000;
                continue;
            }
            fixedVolume += n * phi;
            if (n * phi > bulkiestVolume) {
                bulkiest = ing;
                bulkiestVolume = n * phi;
            }
            extraWater += n * ing.substance().hydrationWater() * AtomicWeights.WATER / 1000;
            if (ing.hasStock()) {
                extraWater += stockWater(ing, n);
            }
        }
        double waterKg;
        if (finalVolume) {
            // V = m_w/ρ + Σ n φ + m_w Σ b φ  ⇒  m_w = ρ (V − Σ n φ) / (1 + ρ Σ b φ)
            waterKg = rho * (basis - fixedVolume) / (1 + rho * molalVolume);
        } else {
            waterKg = basis + extraWater;
        }
        if (!(waterKg > 0)) {
            String pointer = bulkiest == null ? formulation.basis().pointer() : bulkiest.line().pointer() + "/amount";
            throw new DocumentException(formulation.document().problem(pointer, String.format(java.util.Locale.ROOT,
                    "the solutes take up %.2f L, more than the final volume of %.3g L, %.2f L of it %s: no water "
                            + "is left; check the amounts and their units", fixedVolume, basis, bulkiestVolume,
                    bulkiest == null ? "" : bulkiest.substance().name())));
        }
        Map<Ingredient, Double> moles = new LinkedHashMap<>(fixed);
        for (Ingredient ing : ingredients) {
            if (ing.kind() == Ingredient.Kind.MOLALITY) {
                moles.put(ing, ing.value() * waterKg);
            }
        }
        return build(moles, waterKg, fixedVolume + molalVolume * waterKg);
    }

    /** kg of water in {@code n} moles' worth of stock: stock mass less solute mass, or the density model. */
    private double stockWater(Ingredient ing, double n) {
        double litres = n / ing.stockMolarity();
        double m = ing.substance().molarMass().orElse(0);
        if (ing.stockDensity() > 0) {
            return litres * ing.stockDensity() - n * m / 1000;
        }
        double phi = DensityModel.apparentMolarVolume(ing.substance()) / 1000;
        return DensityModel.waterDensity(293.15) * (litres - n * phi);
    }

    private Solution build(Map<Ingredient, Double> moles, double waterKg, double soluteVolume) {
        Map<Component, Double> totals = new LinkedHashMap<>();
        Set<Species> species = new LinkedHashSet<>();
        for (Map.Entry<Ingredient, Double> e : moles.entrySet()) {
            Substance s = e.getKey().substance();
            double molality = e.getValue() / waterKg;
            Composition c = s.composition();
            c.ions().forEach((name, count) -> {
                Component ion = library.ion(name).orElseThrow();
                totals.merge(ion, count * molality, Double::sum);
                species.add(Species.free(ion));
            });
            c.solutes().forEach((name, count) -> {
                Component solute = library.solute(name).orElseThrow();
                totals.merge(solute, count * molality, Double::sum);
                species.add(Species.free(solute));
            });
            for (Composition.SystemPart part : c.systems()) {
                AcidBaseSystem system = library.system(part.system()).orElseThrow();
                totals.merge(system.basis(), part.count() * molality, Double::sum);
                species.addAll(system.species());
            }
        }
        for (Species complex : library.complexes()) {       // every complex whose components are all present
            if (totals.keySet().containsAll(complex.components().keySet())) {
                species.add(complex);
            }
        }
        return new Solution(totals, new ArrayList<>(species), waterKg, moles, soluteVolume);
    }
}
