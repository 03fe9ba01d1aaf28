package org.protolyte.chemistry;

/**
 * A mass-balance component: the fully deprotonated form of an acid–base system (PO4-3, Tris, acetate),
 * a strong ion (Na+, Cl-) or a neutral solute (sucrose). Its total molality is what a recipe fixes.
 */
public record Component(String name, int charge) {
    public Component {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("component needs a name");
        }
    }
}
