package org.protolyte.substance;

import java.util.Collections;
import java.util.Map;
import java.util.TreeMap;

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
                throw new IllegalArgumentException("formula '" + text + "' has an empty part");
            }
            java.util.regex.Matcher count = LEADING_COUNT.matcher(part);
            int digits = count.lookingAt() ? count.end() : 0;
            double multiplier = digits == 0 ? 1 : Double.parseDouble(part.substring(0, digits));
            if (multiplier == 0) {
                throw new IllegalArgumentException("formula '" + text + "': a count of zero");
            }
            String body = part.substring(digits);
            if (body.isEmpty()) {
                throw new IllegalArgumentException("formula '" + text + "': a count with nothing after it");
            }
            if (body.equals("H2O")) {
                water += multiplier;
            }
            Map<String, Integer> counts = new TreeMap<>();
            int end = parseGroup(text, body, 0, counts);
            if (end != body.length()) {
                throw new IllegalArgumentException("formula '" + text + "': unexpected '" + body.charAt(end) + "'");
            }
            counts.forEach((el, n) -> total.merge(el, n * multiplier, Double::sum));
        }
        return new Formula(text.strip(), total, water);
    }

    private static final java.util.regex.Pattern FRACTIONAL = java.util.regex.Pattern.compile("\\d+\\.\\d+[A-Z(]");
    private static final java.util.regex.Pattern LEADING_COUNT = java.util.regex.Pattern.compile("\\d+(\\.\\d+)?");

    /** Reads elements and parenthesised groups from {@code pos} until ')' or the end; returns the position. */
    private static int parseGroup(String text, String s, int pos, Map<String, Integer> into) {
        int i = pos;
        while (i < s.length() && s.charAt(i) != ')') {
            char c = s.charAt(i);
            Map<String, Integer> group = new TreeMap<>();
            if (c == '(') {
                i = parseGroup(text, s, i + 1, group);
                if (i >= s.length() || s.charAt(i) != ')') {
                    throw new IllegalArgumentException("formula '" + text + "': unbalanced '('");
                }
                if (group.isEmpty()) {
                    throw new IllegalArgumentException("formula '" + text + "': empty parentheses");
                }
                i++;
            } else if (Character.isUpperCase(c)) {
                int j = i + 1;
                while (j < s.length() && Character.isLowerCase(s.charAt(j))) {
                    j++;
                }
                String symbol = s.substring(i, j);
                if (AtomicWeights.of(symbol).isEmpty()) {
                    throw new IllegalArgumentException("formula '" + text + "': unknown element '" + symbol + "'");
                }
                group.put(symbol, 1);
                i = j;
            } else {
                throw new IllegalArgumentException("formula '" + text + "': unexpected '" + c + "'");
            }
            int j = i;
            while (j < s.length() && Character.isDigit(s.charAt(j))) {
                j++;
            }
            int count = j == i ? 1 : count(text, s.substring(i, j));
            i = j;
            try {
                group.forEach((el, n) -> into.merge(el, Math.multiplyExact(n, count), Math::addExact));
            } catch (ArithmeticException e) {
                throw new IllegalArgumentException("formula '" + text + "': more atoms than can be counted", e);
            }
        }
        return i;
    }

    private static int count(String text, String digits) {
        int n;
        try {
            n = Integer.parseInt(digits);
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("formula '" + text + "': the count " + digits + " is too large", e);
        }
        if (n == 0) {
            throw new IllegalArgumentException("formula '" + text + "': a count of zero");
        }
        return n;
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
