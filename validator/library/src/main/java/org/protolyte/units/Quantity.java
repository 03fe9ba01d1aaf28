package org.protolyte.units;

import org.protolyte.text.Excerpt;

/**
 * A number with its unit, as written in a document. Conversion to base happens once, at the boundary.
 *
 * @param written the number as the document gives it, digit for digit ("40.0" stays "40.0"): a recorded figure is
 *                printed as recorded
 */
public record Quantity(double value, Unit unit, String written) {

    public Quantity {
        if (!Double.isFinite(value)) {
            throw new UnitException("the number is not finite");
        }
    }

    /** A quantity the tool computed, not read: written in the shortest form that gives the value back. */
    public Quantity(double value, Unit unit) {
        this(value, unit, format(value));
    }

    public Dimension dimension() {
        return unit.dimension();
    }

    /** The value in the dimension's base unit (g, L, mol, mol/L, g/L, mol/kg, fraction, K, Pa, g/mL). */
    public double base() {
        return unit.toBase(value);
    }

    /**
     * Reads {@code "<number> <unit>"}, e.g. {@code "80 g"} or {@code "22 Cel"}: optional white space, a decimal number
     * ({@code [-+]?(digits[.digits]|.digits)}, an optional exponent), optional white space, the unit, optional white
     * space. One pass over the text, so the time is linear in its length whatever it holds.
     */
    public static Quantity parse(String text) {
        int end = text.length();
        while (end > 0 && isSpace(text.charAt(end - 1))) {
            end--;
        }
        int start = 0;
        while (start < end && isSpace(text.charAt(start))) {
            start++;
        }
        int i = start;
        if (i < end && (text.charAt(i) == '+' || text.charAt(i) == '-')) {
            i++;
        }
        int mantissa = digits(text, i, end);
        i += mantissa;
        if (i < end && text.charAt(i) == '.') {
            int fraction = digits(text, i + 1, end);
            if (mantissa + fraction > 0) {
                i += 1 + fraction;
                mantissa += fraction;
            }
        }
        if (mantissa > 0 && i < end && (text.charAt(i) == 'e' || text.charAt(i) == 'E')) {
            int j = i + 1;
            if (j < end && (text.charAt(j) == '+' || text.charAt(j) == '-')) {
                j++;
            }
            int exponent = digits(text, j, end);
            if (exponent > 0) {
                i = j + exponent;
            }
        }
        int unit = i;
        while (unit < end && isSpace(text.charAt(unit))) {
            unit++;
        }
        if (mantissa == 0 || unit == end) {
            throw new UnitException("'" + Excerpt.of(text) + "' is not of the form \"<number> <unit>\", e.g. \"20 mmol/L\"");
        }
        String number = text.substring(start, i);
        return of(Double.parseDouble(number), number, text.substring(unit, end));
    }

    /** The number of ASCII digits from {@code from}, up to {@code end}. */
    private static int digits(String text, int from, int end) {
        int i = from;
        while (i < end && text.charAt(i) >= '0' && text.charAt(i) <= '9') {
            i++;
        }
        return i - from;
    }

    /** White space as Java's regular expressions read {@code \s} (and the schema's quantity pattern with them). */
    private static boolean isSpace(char c) {
        return c == ' ' || c == '\t' || c == '\n' || c == '\u000B' || c == '\f' || c == '\r';
    }

    public static Quantity of(double value, String code) {
        return of(value, format(value), code);
    }

    /** A quantity read from a document: its value, its number as written, and its unit's code. */
    public static Quantity of(double value, String written, String code) {
        Unit u = Unit.ofCode(code).orElseThrow(() -> new UnitException(
                "unknown unit '" + Excerpt.of(code) + "'; accepted: " + Unit.codesOf(java.util.List.of(Unit.values()))));
        return new Quantity(value, u, written);
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

    /** As written: the document's digits and the unit's code. */
    @Override
    public String toString() {
        return written + " " + unit.code();
    }

    private static String format(double v) {
        return v == Math.rint(v) && Math.abs(v) < 1e15 ? Long.toString((long) v) : Double.toString(v);
    }
}
