package org.protolyte.chemistry;

/**
 * A mass-balance component: the fully deprotonated form of an acid–base system (PO4-3, Tris, acetate),
 * a strong ion (Na+, Cl-) or a neutral solute (sucrose). Its total molality is what a recipe fixes.
 *
 * <p>{@code bound}: an ionizable group of a macroion (the lysines of a protein). Its charge counts in the charge
 * balance, but not in the ionic strength, the activity coefficients or the particle molality: Debye–Hückel's point
 * ion does not describe a group on a macroion, whose pKa is taken as the apparent value in the protein (the null
 * model of protein titration: independent groups; common practice), and the macroion counts once, as its own solute.
 */
public record Component(String name, int charge, boolean bound) {
    public Component {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("component needs a name");
        }
    }

    public Component(String name, int charge) {
        this(name, charge, false);
    }

    /** The charge that enters the ionic strength and the activity coefficients: none for a bound group. */
    public int ionicCharge() {
        return bound ? 0 : charge;
    }
}
