package org.protolyte.substance;

import java.util.Map;
import java.util.Optional;

/**
 * IUPAC conventional atomic weights (CIAAW, "Standard atomic weights of the elements 2021", Pure Appl.
 * Chem. 94 (2022) 573, table of abridged and conventional values): single values for the elements whose
 * standard atomic weights are intervals (H, Li, B, C, N, O, Mg, Si, S, Cl, Br), standard values otherwise.
 */
public final class AtomicWeights {

    private static final Map<String, Double> WEIGHTS = Map.ofEntries(
            Map.entry("H", 1.008),
            Map.entry("Li", 6.94),
            Map.entry("B", 10.81),
            Map.entry("C", 12.011),
            Map.entry("N", 14.007),
            Map.entry("O", 15.999),
            Map.entry("F", 18.998403162),
            Map.entry("Na", 22.98976928),
            Map.entry("Mg", 24.305),
            Map.entry("Al", 26.9815384),
            Map.entry("Si", 28.085),
            Map.entry("P", 30.973761998),
            Map.entry("S", 32.06),
            Map.entry("Cl", 35.45),
            Map.entry("K", 39.0983),
            Map.entry("Ca", 40.078),
            Map.entry("Mn", 54.938043),
            Map.entry("Fe", 55.845),
            Map.entry("Co", 58.933194),
            Map.entry("Ni", 58.6934),
            Map.entry("Cu", 63.546),
            Map.entry("Zn", 65.38),
            Map.entry("Se", 78.971),
            Map.entry("Br", 79.904),
            Map.entry("Mo", 95.95),
            Map.entry("I", 126.90447));

    /**
     * Water, g/mol, from the weights above (2 × 1.008 + 15.999): the mass of water of hydration and of water weighed as
     * a component, so that a hydrate less its water is its anhydrous salt to the last digit.
     */
    public static final double WATER = 2 * WEIGHTS.get("H") + WEIGHTS.get("O");

    private AtomicWeights() {
    }

    public static Optional<Double> of(String symbol) {
        return Optional.ofNullable(WEIGHTS.get(symbol));
    }
}
