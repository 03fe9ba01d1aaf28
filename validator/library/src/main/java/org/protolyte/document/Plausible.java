package org.protolyte.document;

import java.util.Optional;

import org.protolyte.units.Dimension;
import org.protolyte.units.Quantity;
import org.protolyte.units.Unit;

/**
 * The plausible range of a quantity read from any document, in the dimension's base unit, checked once after
 * the unit is converted. A value outside is a mistake in the document (a slip of the exponent, a wrong unit),
 * never something to compute with: one check, shared by every reader.
 */
public record Plausible(double min, boolean minIncluded, double max, boolean maxIncluded, String unit, double scale,
        String why) {

    /** pH is read in liquid water: 0 to 100 °C at ambient pressure (water boils at 100 °C at 101.325 kPa). */
    public static final Plausible LIQUID_TEMPERATURE = new Plausible(Unit.CEL.toBase(0), true, Unit.CEL.toBase(100), true, "Cel", 1,
            "pH is read and adjusted in liquid water at ambient pressure (common practice)");
    /** A condition may be frozen storage, down to liquid-nitrogen vapour; above 100 °C water boils. */
    public static final Plausible CONDITION_TEMPERATURE = new Plausible(Unit.CEL.toBase(-200), true, Unit.CEL.toBase(100), true, "Cel", 1,
            "conditions range from storage over liquid nitrogen to boiling water at ambient pressure (common practice)");
    /** A weighing tolerance is a part of the amount: more than nothing, less than all of it. */
    public static final Plausible TOLERANCE = new Plausible(0, false, 1, false, "%", 100,
            "a tolerance is a part of the amount (common practice)");

    /** Why the quantity is outside this range, or empty. */
    public Optional<String> check(String what, Quantity q) {
        double v = q.base();
        boolean low = minIncluded ? v < min : v <= min;
        boolean high = maxIncluded ? v > max : v >= max;
        if (!low && !high) {
            return Optional.empty();
        }
        if (min > 0 && !(v > 0)) {
            return Optional.of(unit.equals("Cel") ? what + " of " + q + " is below absolute zero"
                    : what + " must be greater than zero, not " + q);
        }
        return Optional.of(what + " of " + q + " is outside the plausible range " + (minIncluded ? "[" : "(")
                + show(min) + ", " + show(max) + (maxIncluded ? "]" : ")") + " " + unit + ": " + why);
    }

    private String show(double base) {
        double v = unit.equals("Cel") ? Math.round((base - Unit.KELVIN_AT_ZERO_CELSIUS) * 1e6) / 1e6 : base * scale;
        return v == Math.rint(v) && Math.abs(v) < 1e6 ? Long.toString((long) v) : Double.toString(v);
    }

    /** The range every quantity of the dimension must lie in, wherever it appears. */
    public static Plausible of(Dimension d) {
        return switch (d) {
            case MASS -> new Plausible(1e-9, true, 1e8, true, "g", 1,
                    "from 1 ng, below any balance, to 100 t, beyond the largest batches made (common practice)");
            case VOLUME -> new Plausible(1e-7, true, 1e5, true, "L", 1,
                    "from 0.1 uL, below any pipette, to 100 m3, beyond the largest bioreactors (common practice)");
            case AMOUNT -> new Plausible(1e-15, true, 1e6, true, "mol", 1,
                    "from 1 fmol to 1e6 mol, beyond the largest batches made (common practice)");
            case AMOUNT_CONCENTRATION -> new Plausible(1e-15, true, 60, true, "mol/L", 1,
                    "from 1 fmol/L, below any trace element, to 60 mol/L; pure water is 55.3 mol/L (common practice)");
            case MASS_CONCENTRATION -> new Plausible(1e-12, true, 3000, true, "g/L", 1,
                    "from 1 pg/L to 3000 g/L, denser than any aqueous solution (common practice)");
            case MOLALITY -> new Plausible(1e-15, true, 100, true, "mol/kg", 1,
                    "from 1 fmol/kg to 100 mol/kg, beyond the most soluble salts (common practice)");
            case VOLUME_FRACTION, MASS_FRACTION, FRACTION -> new Plausible(0, true, 1, true, "%", 100,
                    "a fraction lies between 0 and 100 %");
            case TEMPERATURE -> CONDITION_TEMPERATURE;
            case PRESSURE -> new Plausible(0, true, 1e6, true, "kPa", 1e-3,
                    "up to 1 MPa (10 bar), beyond any vessel a medium is held in (common practice)");
            case DENSITY -> new Plausible(0.1, true, 25, true, "g/mL", 1,
                    "between the lightest liquids and the densest element, osmium at 22.6 g/mL (CRC Handbook, from memory)");
            case MOLAR_MASS -> new Plausible(1, true, 1e8, true, "g/mol", 1,
                    "from hydrogen's 1 g/mol to 100 000 kDa, beyond the largest protein assemblies (common practice)");
        };
    }
}
