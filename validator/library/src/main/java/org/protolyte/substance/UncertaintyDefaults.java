package org.protolyte.substance;

/**
 * The standard uncertainties a dissociation step is given where its source gives none: never zero, and large
 * beside what was read. Reports name each step that uses one in their {@code assumed} text.
 */
public final class UncertaintyDefaults {

    /**
     * u(ΔH°) of a published ΔH° without one, kJ/mol: about twice the spread of the published values for one reaction
     * in the review of Goldberg, Kishore and Lennen (J. Phys. Chem. Ref. Data 31 (2002) 231, p. 242, reaction 3 of
     * the buffer on that page: 11.0, 13.1 and 12.23 kJ/mol, standard deviation 1.05 kJ/mol).
     */
    public static final double DELTA_H = 2.0;

    /**
     * u(ΔH°) where ΔH° is not published (0 in the library), kJ/mol: half the span of the ionization enthalpies read
     * for this library, from −7.3 kJ/mol (oxalate step 2; Kettler, Palmer and Wesolowski, J. Chem. Eng. Data 43
     * (1998) 337, abstract) to +44.5 kJ/mol (the amino group of six amino acids; Bretti, Giuffrè, Lando and
     * Sammartano, SpringerPlus 5 (2016), abstract, −44.5 kJ/mol for protonation), rounded up.
     */
    public static final double UNPUBLISHED_DELTA_H = 26;

    /**
     * u(ΔCp°) of a published ΔCp° without one, J/(K·mol): above every uncertainty read (27 J/(K·mol) for oxalate
     * step 2, Kettler et al. 1998; 8 for succinate step 2).
     */
    public static final double DELTA_CP = 50;

    /**
     * u(ΔCp°) where ΔCp° is not published (0 in the library), J/(K·mol): half the span of the values read, from
     * −231 J/(K·mol) (oxalate step 1, Kettler et al. 1998) to +144 (Goldberg et al. 2002, p. 242), rounded up.
     */
    public static final double UNPUBLISHED_DELTA_CP = 190;

    /**
     * u(ΔH°) of a drug's solid whose ΔH° of solution is not published (taken as 0), kJ/mol: as large as the enthalpies
     * of solution of crystalline drugs themselves, commonly 20 to 50 kJ/mol (from memory, not read here), so that an
     * unknown temperature dependence is never counted as none.
     */
    public static final double UNPUBLISHED_SOLUTION_DELTA_H = 40;

    /** The words of the reports' {@code assumed} text. */
    public static final String STATED = "where a source gives no uncertainty for ΔH° or ΔCp° of a dissociation step, "
            + "the library's defaults are used: u(ΔH°) " + fmt(DELTA_H) + " kJ/mol (" + fmt(UNPUBLISHED_DELTA_H)
            + " where ΔH° is not published and taken as 0), u(ΔCp°) " + fmt(DELTA_CP) + " J/(K·mol) ("
            + fmt(UNPUBLISHED_DELTA_CP) + " where ΔCp° is not published and taken as 0)";

    private static String fmt(double v) {
        return v == Math.rint(v) ? String.valueOf((long) v) : String.valueOf(v);
    }

    private UncertaintyDefaults() {
    }
}
