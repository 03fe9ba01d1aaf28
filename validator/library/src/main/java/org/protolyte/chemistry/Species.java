package org.protolyte.chemistry;

import java.util.Map;

/**
 * A species in solution, defined by the components it is made of, the protons it carries relative to
 * them, and its formation constant from those: Σ νj·Cj + p·H+ ⇌ species, β = a(species)/Π a(Cj)^νj·a(H+)^p.
 * A free component is the species made of itself with β = 1. Acid–base forms, metal complexes, ion
 * pairs and borate–polyol esters are all species of this one kind.
 */
public record Species(String name, int charge, Map<Component, Integer> components, int protons,
                      FormationConstant formation) {

    public Species {
        components = Map.copyOf(components);
        if (components.isEmpty()) {
            throw new IllegalArgumentException("species " + name + " has no components");
        }
        int c = protons;
        for (Map.Entry<Component, Integer> e : components.entrySet()) {
            c += e.getKey().charge() * e.getValue();
        }
        if (c != charge) {
            throw new IllegalArgumentException("species " + name + " has charge " + charge
                    + " but its components and protons add up to " + c);
        }
    }

    /** Equal species share name and charge; the deep hash of the components and constant is not needed. */
    @Override
    public int hashCode() {
        return 31 * name.hashCode() + charge;
    }

    /** A species of several components, or of one component more than once: a complex, ion pair or ester. */
    public boolean isComplex() {
        return components.size() > 1 || components.values().iterator().next() != 1;
    }

    public static Species free(Component c) {
        return new Species(c.name(), c.charge(), Map.of(c, 1), 0, FormationConstant.UNITY);
    }
}
