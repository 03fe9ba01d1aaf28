package org.protolyte.report;

/**
 * Text from a document, a library or a file name, made safe to print on a terminal or in a log: a newline,
 * escape sequence or bidi override in such text could otherwise forge a report line, repaint the screen or
 * reverse what the reader sees. Characters that are not shown as themselves are written as JSON writes them
 * ({@code \n}, {@code \r}, {@code \t}, {@code \u001b}), and a backslash as {@code \\}, so the escaped text reads
 * back unambiguously.
 */
public final class Printable {

    private static final String HEX = "0123456789abcdef";

    private Printable() {
    }

    /** {@code s} with every control character, bidi control, line or paragraph separator and backslash escaped. */
    public static String text(String s) {
        int first = 0;
        while (first < s.length() && !needsEscape(s, first)) {
            first++;
        }
        if (first == s.length()) {
            return s;
        }
        StringBuilder b = new StringBuilder(s.length() + 16).append(s, 0, first);
        for (int i = first; i < s.length(); i++) {
            char c = s.charAt(i);
            if (!needsEscape(s, i)) {
                b.append(c);
                continue;
            }
            switch (c) {
                case '\\' -> b.append("\\\\");
                case '\n' -> b.append("\\n");
                case '\r' -> b.append("\\r");
                case '\t' -> b.append("\\t");
                default -> b.append("\\u").append(HEX.charAt(c >> 12 & 0xf)).append(HEX.charAt(c >> 8 & 0xf))
                        .append(HEX.charAt(c >> 4 & 0xf)).append(HEX.charAt(c & 0xf));
            }
        }
        return b.toString();
    }

    private static boolean needsEscape(String s, int i) {
        char c = s.charAt(i);
        if (c == '\\' || c < 0x20 || (c >= 0x7f && c <= 0x9f)) {      // C0, DEL and C1 controls
            return true;
        }
        if ((c >= '\u202a' && c <= '\u202e') || (c >= '\u2066' && c <= '\u2069')   // bidi embeddings, overrides, isolates
                || c == '\u200e' || c == '\u200f' || c == '\u061c'                 // bidi marks
                || c == '\u2028' || c == '\u2029') {                               // line and paragraph separators
            return true;
        }
        if (Character.isHighSurrogate(c)) {          // a lone surrogate prints as '?': show what it is
            return i + 1 >= s.length() || !Character.isLowSurrogate(s.charAt(i + 1));
        }
        return Character.isLowSurrogate(c) && (i == 0 || !Character.isHighSurrogate(s.charAt(i - 1)));
    }
}
