package org.protolyte.service;

/** JSON string literals for the service's own small bodies and log lines (RFC 8259, section 7). */
final class Json {

    private Json() {
    }

    /** {@code text} as a quoted JSON string; control characters and the quote and backslash are escaped. */
    static String quote(String text) {
        StringBuilder b = new StringBuilder(text.length() + 2).append('"');
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            switch (c) {
                case '"' -> b.append("\\\"");
                case '\\' -> b.append("\\\\");
                case '\n' -> b.append("\\n");
                case '\r' -> b.append("\\r");
                case '\t' -> b.append("\\t");
                default -> {
                    if (c < 0x20 || c == 0x2028 || c == 0x2029) {
                        b.append(String.format("\\u%04x", (int) c));
                    } else {
                        b.append(c);
                    }
                }
            }
        }
        return b.append('"').toString();
    }
}
