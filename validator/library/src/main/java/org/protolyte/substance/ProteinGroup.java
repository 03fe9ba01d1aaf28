package org.protolyte.substance;

/**
 * The ionizable groups of proteins and peptides, each with the one-letter residue that carries it (none for the
 * termini) and the charge of its protonated form: the carboxyls, thiol and phenol are neutral acids, the amines,
 * imidazole and guanidine cationic acids.
 */
public enum ProteinGroup {
    N_TERMINUS("N-terminus", ' ', 1),
    C_TERMINUS("C-terminus", ' ', 0),
    ASP("Asp", 'D', 0),
    GLU("Glu", 'E', 0),
    HIS("His", 'H', 1),
    CYS("Cys", 'C', 0),
    TYR("Tyr", 'Y', 0),
    LYS("Lys", 'K', 1),
    ARG("Arg", 'R', 1);

    private final String label;
    private final char residue;
    private final int protonatedCharge;

    ProteinGroup(String label, char residue, int protonatedCharge) {
        this.label = label;
        this.residue = residue;
        this.protonatedCharge = protonatedCharge;
    }

    public String label() {
        return label;
    }

    public int protonatedCharge() {
        return protonatedCharge;
    }

    /** The group a one-letter residue code carries, if it carries one. */
    public static java.util.Optional<ProteinGroup> ofResidue(char code) {
        for (ProteinGroup g : values()) {
            if (g.residue == code) {
                return java.util.Optional.of(g);
            }
        }
        return java.util.Optional.empty();
    }

    public static ProteinGroup named(String label) {
        for (ProteinGroup g : values()) {
            if (g.label.equals(label)) {
                return g;
            }
        }
        throw new IllegalArgumentException("no protein group '" + label + "'");
    }
}
