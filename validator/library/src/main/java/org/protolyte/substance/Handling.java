package org.protolyte.substance;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * Handling data a rule reads: hazard classifications, light sensitivity, solubility in water and how the solid
 * exchanges water with air, each with its source. Empty where the library has no data: rules then say nothing
 * rather than guess.
 */
public record Handling(List<Hazard> hazards, Optional<Light> lightSensitivity, Optional<Solubility> solubility,
                       Optional<Hygroscopy> hygroscopy) {

    /** A harmonised (or supplier) hazard classification, e.g. "Skin Corr. 1B" with "H314". */
    public record Hazard(String classification, String statement, String appliesTo, String source) {
    }

    /**
     * Light sensitivity with its source. {@code photosensitiser}: the substance absorbs light and passes it on to
     * others (riboflavin); {@code withPhotosensitiser}: the hazard arises only where a photosensitiser is present too
     * (HEPES forms hydrogen peroxide with riboflavin under light, not alone).
     */
    public record Light(String text, String source, boolean photosensitiser, boolean withPhotosensitiser) {
    }

    /** Solubility of the form in water at a temperature: g/L and/or the pharmacopoeial term (Ph. Eur. 1.4). */
    public record Solubility(OptionalDouble gramsPerLitre, Optional<String> term, double celsius, String source) {
    }

    /** hygroscopic, deliquescent, efflorescent or stable, with what it means for a weighing. */
    public record Hygroscopy(String behaviour, String text, String source) {
    }

    public Handling {
        hazards = List.copyOf(hazards);
    }

    public static Handling none() {
        return new Handling(List.of(), Optional.empty(), Optional.empty(), Optional.empty());
    }
}
