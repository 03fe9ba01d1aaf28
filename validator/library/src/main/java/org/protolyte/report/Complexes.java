package org.protolyte.report;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.TreeMap;

import org.protolyte.chemistry.Component;
import org.protolyte.chemistry.EquilibriumState;
import org.protolyte.chemistry.SpeciesAmount;

/** Complexes in a solved equilibrium: which species are complexes, and how much of each component they bind. */
final class Complexes {
    private Complexes() {
    }

    /** Each component's total molality: Σ over species of its count times the species' molality. */
    static Map<Component, Double> totals(EquilibriumState s) {
        Map<Component, Double> t = new LinkedHashMap<>();
        for (SpeciesAmount a : s.species()) {
            a.species().components().forEach((c, nu) -> t.merge(c, nu * a.molality(), Double::sum));
        }
        return t;
    }

    /** The share of each of its components' totals (from {@link #totals}) that one complex holds, by name. */
    static Map<Component, Double> shares(Map<Component, Double> totals, SpeciesAmount complex) {
        Map<Component, Double> out = new TreeMap<>(java.util.Comparator.comparing(Component::name));
        // a component with no total (carbonate under no CO2) holds nothing in the complex: share 0, not 0/0
        complex.species().components().forEach((c, nu) -> out.put(c,
                totals.get(c) > 0 ? nu * complex.molality() / totals.get(c) : 0.0));
        return out;
    }
}
