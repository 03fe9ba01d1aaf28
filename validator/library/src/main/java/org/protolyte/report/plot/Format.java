package org.protolyte.report.plot;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/** Numbers and text as they go into the SVG and the table: Locale-free, escaped, never NaN. */
public final class Format {

    /** Digits of a number in the table: more than the constants justify, enough to read a curve back. */
    private static final MathContext TABLE_DIGITS = new MathContext(6, RoundingMode.HALF_EVEN);
    /** What the table shows for a missing value. */
    static final String NONE = "—";

    private Format() {
    }

    /** A coordinate in user units, at most 2 decimals. */
    static String coordinate(double v) {
        if (!Double.isFinite(v)) {
            throw new IllegalStateException("coordinate " + v);     // clipping keeps every drawn value finite
        }
        return plain(BigDecimal.valueOf(v).setScale(2, RoundingMode.HALF_EVEN));
    }

    /** A data value for the table: 6 significant digits, or {@link #NONE}. */
    static String number(double v) {
        return Double.isFinite(v) ? decimal(new BigDecimal(v).round(TABLE_DIGITS)) : NONE;
    }

    /** A decimal without trailing zeros; with its exponent where plain digits would run long. */
    static String decimal(BigDecimal b) {
        double a = Math.abs(b.doubleValue());
        return a != 0 && (a >= 1e15 || a < 1e-6) ? b.stripTrailingZeros().toString() : plain(b);
    }

    private static String plain(BigDecimal b) {
        return b.signum() == 0 ? "0" : b.stripTrailingZeros().toPlainString();
    }

    /**
     * Text from a document made safe as XML character data or an attribute value: markup characters escaped;
     * tabs and line breaks become spaces; other control characters, bidi controls, lone surrogates and
     * non-characters are dropped, as XML forbids them or they could reorder what the reader sees.
     */
    public static String text(String s) {
        StringBuilder b = new StringBuilder(s.length() + 8);
        for (int i = 0; i < s.length(); ) {
            int c = s.codePointAt(i);
            i += Character.charCount(c);
            switch (c) {
                case '&' -> b.append("&amp;");
                case '<' -> b.append("&lt;");
                case '>' -> b.append("&gt;");
                case '"' -> b.append("&quot;");
                case '\'' -> b.append("&#39;");
                case '\t', '\n', '\r', 0x2028, 0x2029 -> b.append(' ');
                default -> {
                    if (!dropped(c)) {
                        b.appendCodePoint(c);
                    }
                }
            }
        }
        return b.toString();
    }

    private static boolean dropped(int c) {
        return Character.isISOControl(c) || c <= 0xFFFF && Character.isSurrogate((char) c)
                || c >= 0x202A && c <= 0x202E || c >= 0x2066 && c <= 0x2069 || c == 0x200E || c == 0x200F
                || c == 0x061C || c == 0xFFFE || c == 0xFFFF;
    }

    /** {@code s} cut to {@code max} characters, with an ellipsis where it was cut (the table keeps it whole). */
    static String fit(String s, int max) {
        if (s.codePointCount(0, s.length()) <= max) {
            return s;
        }
        return s.substring(0, s.offsetByCodePoints(0, max - 1)) + "…";
    }
}
