package org.protolyte.units;

import java.util.regex.Matcher;
import java.util.regex.Pattern;

/** A number with its unit, as written in a document. Conversion to base happens once, at the boundary. */
public record Quantity(double value, Unit unit) {

    private static final Pattern TEXT =
            Pattern.compile("\\s*([-+]?(?:\\d+\\.?\\d*|\\.\\d+)(?:[eE][-+]?\\d+)?)\\s*(\\S.*?)\\s*");

    public Quantity {
        if (!Double.isFinite(value)) {
            throw new UnitException("the number is not finite");
        }
    }

    public Dimension dimension() {
        return unit.dimension();
    }

    /** The value in the dimension's base unit (g, L, mol, mol/L, g/L, mol/kg, fraction, K, Pa, g/mL). */
    public double base() {
        return unit.toBase(value);
    }

    /** Reads {@code "<number> <unit>"}, e.g. {@code "80 g"} or {@code "22 Cel"}. */
    public static Quantity parse(String text) {
        Matcher m = TEXT.matcher(text);
        if (!m.matches()) {
            throw new UnitException("'" + text + "' is not of the form \"<number> <unit>\", e.g. \"20 mmol/L\"");
        }
        double v = Double.parseDouble(m.group(1));
        return of(v, m.group(2));
    }

    public static Quantity of(double value, String code) {
        Unit u = Unit.ofCode(code).orElseThrow(() -> new UnitException(
                "unknown unit '" + code + "'; accepted: " + Unit.codesOf(java.util.List.of(Unit.values()))));
        return new Quantity(value, u);
    }

    /** Checks that this quantity measures one of the given dimensions, naming what was expected. */
    public Quantity require(String what, Dimension... allowed) {
        for (Dimension d : allowed) {
            if (d == unit.dimension()) {
                return this;
            }
        }
        StringBuilder accepted = new StringBuilder();
        for (Dimension d : allowed) {
            if (accepted.length() > 0) {
                accepted.append("; ");
            }
            accepted.append(d.description()).append(": ").append(Unit.codesOf(Unit.ofDimension(d)));
        }
        String extra = unit == Unit.PERCENT
                ? " (a bare '%' is ambiguous for an amount: write '% w/v', '% v/v' or '% w/w')" : "";
        throw new UnitException(what + " cannot be given in '" + unit.code() + "'" + extra
                + "; accepted: " + accepted);
    }

    @Override
    public String toString() {
        return format(value) + " " + unit.code();
    }

    private static String format(double v) {
        return v == Math.rint(v) && Math.abs(v) < 1e15 ? Long.toString((long) v) : Double.toString(v);
    }
}
