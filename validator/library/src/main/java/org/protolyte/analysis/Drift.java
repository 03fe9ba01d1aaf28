package org.protolyte.analysis;

import java.util.Optional;

/**
 * The pH change between two conditions and what causes most of it: the acid–base system whose pKa moves
 * most with temperature, weighted by its share of the buffering, with its dpKa/dT (per kelvin). A system that
 * carries less of β than water's own H⁺ and OH⁻ is not named: where none carries more, the cause is water's own
 * ionisation. Where the two conditions differ in CO2, that
 * exchange is named in {@code co2Change}: it usually moves the pH more than temperature does.
 */
public record Drift(String from, String to, double fromCelsius, double toCelsius, double change,
                    Optional<String> system, double dpKadT, double share, Optional<String> co2Change) {

    /** The same change read from {@code to} back to {@code from}. */
    public Drift reversed() {
        return new Drift(to, from, toCelsius, fromCelsius, -change, system, dpKadT, share, co2Change);
    }
}
