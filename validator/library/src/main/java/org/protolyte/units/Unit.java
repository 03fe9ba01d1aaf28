package org.protolyte.units;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.stream.Collectors;

/**
 * The closed list of units a document may use: UCUM case-sensitive codes plus a short list of lab
 * spellings. Each unit converts to the dimension's base: g, L, mol, mol/L, g/L, mol/kg, a fraction
 * (0..1), K, Pa, g/mL and g/mol.
 */
public enum Unit {
    G("g", Dimension.MASS, 1, false),
    MG("mg", Dimension.MASS, 1e-3, false),
    UG("ug", Dimension.MASS, 1e-6, false),
    KG("kg", Dimension.MASS, 1e3, false),
    L("L", Dimension.VOLUME, 1, false),
    ML("mL", Dimension.VOLUME, 1e-3, false),
    UL("uL", Dimension.VOLUME, 1e-6, false),
    MOL("mol", Dimension.AMOUNT, 1, false),
    MMOL("mmol", Dimension.AMOUNT, 1e-3, false),
    UMOL("umol", Dimension.AMOUNT, 1e-6, false),
    MOL_PER_L("mol/L", Dimension.AMOUNT_CONCENTRATION, 1, false),
    MMOL_PER_L("mmol/L", Dimension.AMOUNT_CONCENTRATION, 1e-3, false),
    UMOL_PER_L("umol/L", Dimension.AMOUNT_CONCENTRATION, 1e-6, false),
    G_PER_L("g/L", Dimension.MASS_CONCENTRATION, 1, false),
    MG_PER_L("mg/L", Dimension.MASS_CONCENTRATION, 1e-3, false),
    MG_PER_ML("mg/mL", Dimension.MASS_CONCENTRATION, 1, false),
    MOL_PER_KG("mol/kg", Dimension.MOLALITY, 1, false),
    MMOL_PER_KG("mmol/kg", Dimension.MOLALITY, 1e-3, false),
    CEL("Cel", Dimension.TEMPERATURE, 1, false),
    K("K", Dimension.TEMPERATURE, 1, false),
    KPA("kPa", Dimension.PRESSURE, 1e3, false),
    G_PER_ML("g/mL", Dimension.DENSITY, 1, false),
    KG_PER_L("kg/L", Dimension.DENSITY, 1, false),
    G_PER_MOL("g/mol", Dimension.MOLAR_MASS, 1, false),
    KG_PER_MOL("kg/mol", Dimension.MOLAR_MASS, 1e3, false),
    // Lab spellings: not UCUM, accepted because recipes are written this way.
    LAB_M("M", Dimension.AMOUNT_CONCENTRATION, 1, true),
    LAB_MM("mM", Dimension.AMOUNT_CONCENTRATION, 1e-3, true),
    LAB_UM("µM", Dimension.AMOUNT_CONCENTRATION, 1e-6, true),
    LAB_DEG_C("°C", Dimension.TEMPERATURE, 1, true),
    LAB_KDA("kDa", Dimension.MOLAR_MASS, 1e3, true),     // a protein's mass as labs write it: 1 kDa ≙ 1 kg/mol
    PERCENT_W_V("% w/v", Dimension.MASS_CONCENTRATION, 10, true),   // g per 100 mL = 10 g/L
    PERCENT_V_V("% v/v", Dimension.VOLUME_FRACTION, 0.01, true),
    PERCENT_W_W("% w/w", Dimension.MASS_FRACTION, 0.01, true),
    PERCENT("%", Dimension.FRACTION, 0.01, false);

    /** Kelvin at 0 °C: t/°C = T/K − 273.15 (SI Brochure, 9th ed., BIPM 2019, section 2.3.1). */
    public static final double KELVIN_AT_ZERO_CELSIUS = 273.15;

    private final String code;
    private final Dimension dimension;
    private final double factor;
    private final boolean labSpelling;

    Unit(String code, Dimension dimension, double factor, boolean labSpelling) {
        this.code = code;
        this.dimension = dimension;
        this.factor = factor;
        this.labSpelling = labSpelling;
    }

    public String code() {
        return code;
    }

    public Dimension dimension() {
        return dimension;
    }

    public boolean isLabSpelling() {
        return labSpelling;
    }

    /** Converts a value in this unit to the dimension's base unit. */
    public double toBase(double value) {
        if (this == CEL || this == LAB_DEG_C) {
            return value + KELVIN_AT_ZERO_CELSIUS;
        }
        return value * factor;
    }

    /** Exact, case-sensitive lookup (UCUM codes are case-sensitive: "mL" is not "ml"). */
    public static Optional<Unit> ofCode(String code) {
        String c = code.strip();
        if (c.equals("uM")) {
            return Optional.of(LAB_UM);
        }
        for (Unit u : values()) {
            if (u.code.equals(c)) {
                return Optional.of(u);
            }
        }
        return Optional.empty();
    }

    public static List<Unit> ofDimension(Dimension d) {
        return Arrays.stream(values()).filter(u -> u.dimension == d).collect(Collectors.toList());
    }

    public static String codesOf(List<Unit> units) {
        return units.stream().map(u -> "'" + u.code + "'").collect(Collectors.joining(", "));
    }
}
