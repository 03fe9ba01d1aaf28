package org.protolyte.text;

/** User text as a message quotes it: a long one is cut, so that one bad value cannot flood a report. */
public final class Excerpt {

    /** Texts up to this length are quoted whole; longer ones are cut to {@link #KEPT} characters and their length. */
    public static final int WHOLE = 60;
    public static final int KEPT = 40;

    private Excerpt() {
    }

    /** {@code text}, or its first 40 characters (never half a surrogate pair), "…" and "(N characters)". */
    public static String of(String text) {
        if (text.length() <= WHOLE) {
            return text;
        }
        int cut = Character.isHighSurrogate(text.charAt(KEPT - 1)) ? KEPT - 1 : KEPT;
        return text.substring(0, cut) + "… (" + text.length() + " characters)";
    }
}
