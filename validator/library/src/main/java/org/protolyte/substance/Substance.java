package org.protolyte.substance;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * One library entry: a specific form of a material (glucose monohydrate, not glucose).
 *
 * @param molarMass            g/mol: from the formula where there is one, else the declared (nominal) value
 * @param apparentMolarVolume  cm³/mol at infinite dilution, 25 °C, for the density model
 * @param density              g/mL of the neat material (liquids), for amounts in mL and % v/v
 * @param handling             hazards and light sensitivity, where the library has them
 * @param origin               the library file the entry came from
 */
public record Substance(String name, List<String> synonyms, Optional<Formula> formula, OptionalDouble molarMass,
                        boolean nominalMolarMass, boolean solvent, Composition composition,
                        OptionalDouble apparentMolarVolume, String apparentMolarVolumeSource,
                        OptionalDouble density, String notes, Handling handling, String origin) {

    public Substance {
        synonyms = List.copyOf(synonyms);
    }

    /** Equal substances share a name; hashing every field (a recipe's maps do it per batch) is not needed. */
    @Override
    public int hashCode() {
        return name.hashCode();
    }

    /** Moles of water of hydration per mole of substance. */
    public double hydrationWater() {
        return formula.map(Formula::hydrationWater).orElse(0.0);
    }
}
