package org.protolyte.substance;

import java.util.List;
import java.util.Map;

/**
 * What one mole of a substance puts into solution: strong ions (mol per mol), acid–base systems in a
 * stated protonation state, and neutral solutes. Water of hydration comes from the formula.
 * Tris-HCl is Tris in its protonated form (TrisH+) plus one Cl-; Na2HPO4·7H2O is phosphate at HPO4-2
 * plus two Na+. Electroneutrality is checked when the library is loaded.
 */
public record Composition(Map<String, Double> ions, List<SystemPart> systems, Map<String, Double> solutes) {

    /** {@code count} moles of the acid–base system {@code system}, in its protonation state {@code form}. */
    public record SystemPart(String system, String form, double count) {
    }

    public Composition {
        ions = Map.copyOf(ions);
        systems = List.copyOf(systems);
        solutes = Map.copyOf(solutes);
    }

    public static Composition empty() {
        return new Composition(Map.of(), List.of(), Map.of());
    }

    public boolean isIonizable() {
        return !ions.isEmpty() || !systems.isEmpty();
    }
}
