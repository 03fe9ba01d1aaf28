package org.protolyte.substance;

import java.util.Collections;
import java.util.Map;
import java.util.TreeMap;

import org.protolyte.text.Excerpt;

/**
 * A chemical formula such as {@code Na2HPO4·7H2O}, {@code C4H11NO3·HCl} or {@code Ca(CH3COO)2}: element
 * counts, the water of hydration and the molar mass from {@link AtomicWeights}. Parts of an adduct are
 * separated by '·' (also '.', '*' or a space) and may carry a leading count; a fractional count such as the
 * sesquihydrate's {@code ·1.5H2O} is written after '·', '*' or a space.
 */
public final class Formula {

    private final String text;
    private final Map<String, Double> elements;
    private final double hydrationWater;

    private Formula(String text, Map<String, Double> elements, double hydrationWater) {
        this.text = text;
        this.elements = Collections.unmodifiableMap(elements);
        this.hydrationWater = hydrationWater;
    }

    public static Formula parse(String text) {
        if (text.length() > MAX_LENGTH) {
            throw new IllegalArgumentException("formula '" + Excerpt.of(text) + "' is longer than " + MAX_LENGTH
                    + " characters");
        }
        java.util.List<String> parts = new java.util.ArrayList<>();
        for (String coarse : text.strip().split("\\s*[·•*]\\s*|\\s+", -1)) {
            if (FRACTIONAL.matcher(coarse).lookingAt()) {
                parts.add(coarse);                      // "1.5H2O": the '.' is a decimal point
            } else {
                parts.addAll(java.util.List.of(coarse.split("\\s*\\.\\s*", -1)));
            }
        }
        Map<String, Double> total = new TreeMap<>();
        double water = 0;
        for (String part : parts) {
            if (part.isEmpty()) {
                throw new IllegalArgumentException("formula '" + Excerpt.of(text) + "' has an empty part");
            }
            java.util.regex.Matcher count = LEADING_COUNT.matcher(part);
            int digits = count.lookingAt() ? count.end() : 0;
            double multiplier = digits == 0 ? 1 : Double.parseDouble(part.substring(0, digits));
            if (multiplier > MAX_ATOMS) {
                throw new IllegalArgumentException("formula '" + Excerpt.of(text) + "': the count "
                        + Excerpt.of(part.substring(0, digits)) + " is above " + MAX_ATOMS);
            }
            if (multiplier == 0) {
                throw new IllegalArgumentException("formula '" + Excerpt.of(text) + "': a count of zero");
            }
            String body = part.substring(digits);
            if (body.isEmpty()) {
                throw new IllegalArgumentException("formula '" + Excerpt.of(text) + "': a count with nothing after it");
            }
            if (body.equals("H2O")) {
                water += multiplier;
            }
            Map<String, Long> counts = new TreeMap<>();
            int end = parseGroup(text, body, 0, counts, 0);
            if (end != body.length()) {
                throw new IllegalArgumentException("formula '" + Excerpt.of(text) + "': unexpected '" + body.charAt(end) + "'");
            }
            counts.forEach((el, n) -> total.merge(el, n * multiplier, Double::sum));
        }
        if (total.values().stream().anyMatch(n -> n > MAX_ATOMS)) {
            throw new IllegalArgumentException("formula '" + Excerpt.of(text) + "' has more than " + MAX_ATOMS
                    + " atoms of one element per formula unit");
        }
        return new Formula(text.strip(), total, water);
    }

    private static final java.util.regex.Pattern FRACTIONAL = java.util.regex.Pattern.compile("\\d+\\.\\d+[A-Z(]");
    private static final java.util.regex.Pattern LEADING_COUNT = java.util.regex.Pattern.compile("\\d+(\\.\\d+)?");

    /** Characters: the longest shipped formula has under 60. */
    static final int MAX_LENGTH = 500;
    /** Parentheses nest at most this deep; real formulas need two or three levels. */
    static final int MAX_DEPTH = 8;
    /** Atoms of one element per formula unit at most: a polymer's nominal formula stays far below. */
    static final long MAX_ATOMS = 1_000_000_000L;

    /**
     * Reads elements and parenthesised groups from {@code pos} until ')' or the end; returns the position.
     * Counts are multiplied in checked long arithmetic and bounded, so no nesting can wrap them to zero.
     */
    private static int parseGroup(String text, String s, int pos, Map<String, Long> into, int depth) {
        if (depth > MAX_DEPTH) {
            throw new IllegalArgumentException("formula '" + Excerpt.of(text) + "': parentheses nested deeper than "
                    + MAX_DEPTH + " levels");
        }
        int i = pos;
        while (i < s.length() && s.charAt(i) != ')') {
            char c = s.charAt(i);
            Map<String, Long> group = new TreeMap<>();
            if (c == '(') {
                i = parseGroup(text, s, i + 1, group, depth + 1);
                if (i >= s.length() || s.charAt(i) != ')') {
                    throw new IllegalArgumentException("formula '" + Excerpt.of(text) + "': unbalanced '('");
                }
                if (group.isEmpty()) {
                    throw new IllegalArgumentException("formula '" + Excerpt.of(text) + "': empty parentheses");
                }
                i++;
            } else if (Character.isUpperCase(c)) {
                int j = i + 1;
                while (j < s.length() && Character.isLowerCase(s.charAt(j))) {
                    j++;
                }
                String symbol = s.substring(i, j);
                if (AtomicWeights.of(symbol).isEmpty()) {
                    throw new IllegalArgumentException("formula '" + Excerpt.of(text) + "': unknown element '"
                            + Excerpt.of(symbol) + "'");
                }
                group.put(symbol, 1L);
                i = j;
            } else {
                throw new IllegalArgumentException("formula '" + Excerpt.of(text) + "': unexpected '" + c + "'");
            }
            int j = i;
            while (j < s.length() && Character.isDigit(s.charAt(j))) {
                j++;
            }
            long count = j == i ? 1 : count(text, s.substring(i, j));
            i = j;
            for (Map.Entry<String, Long> e : group.entrySet()) {
                into.merge(e.getKey(), atoms(text, e.getValue(), count), (a, b) -> atoms(text, a + b, 1));
            }
        }
        return i;
    }

    private static long count(String text, String digits) {
        if (digits.length() > 10 || Long.parseLong(digits) > MAX_ATOMS) {
            throw new IllegalArgumentException("formula '" + Excerpt.of(text) + "': the count " + Excerpt.of(digits)
                    + " is above " + MAX_ATOMS);
        }
        long n = Long.parseLong(digits);
        if (n == 0) {
            throw new IllegalArgumentException("formula '" + Excerpt.of(text) + "': a count of zero");
        }
        return n;
    }

    private static long atoms(String text, long n, long times) {
        long product;
        try {
            product = Math.multiplyExact(n, times);
        } catch (ArithmeticException e) {
            // caught: a product beyond long is above the limit, and refused with the message just below
            product = Long.MAX_VALUE;
        }
        if (product > MAX_ATOMS) {
            throw new IllegalArgumentException("formula '" + Excerpt.of(text) + "' has more than " + MAX_ATOMS
                    + " atoms of one element per formula unit");
        }
        return product;
    }


    public String text() {
        return text;
    }

    public Map<String, Double> elements() {
        return elements;
    }

    /** Moles of water of hydration per mole (the {@code ·nH2O} parts). */
    public double hydrationWater() {
        return hydrationWater;
    }

    /** g/mol from the IUPAC conventional atomic weights. */
    public double molarMass() {
        double m = 0;
        for (Map.Entry<String, Double> e : elements.entrySet()) {
            m += AtomicWeights.of(e.getKey()).orElseThrow() * e.getValue();
        }
        return m;
    }

    @Override
    public String toString() {
        return text;
    }
}
