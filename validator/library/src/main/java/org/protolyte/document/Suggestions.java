package org.protolyte.document;

import java.util.ArrayList;
import java.util.Collection;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

/** "Did you mean": the nearest names by edit distance (Levenshtein), ignoring case. */
public final class Suggestions {

    /**
     * The longest name that gets suggestions. No name of the trade is longer, and the edit distance costs the product
     * of the two lengths: a megabyte-long name would take minutes against every candidate.
     */
    public static final int LONGEST_NAME = 100;

    private Suggestions() {
    }

    public static Optional<String> nearest(String name, Collection<String> candidates) {
        List<String> n = nearest(name, candidates, 1);
        return n.isEmpty() ? Optional.empty() : Optional.of(n.get(0));
    }

    /**
     * Up to {@code limit} candidates within a distance of a third of the name's length (at least 2); none for a name
     * longer than {@link #LONGEST_NAME}.
     */
    public static List<String> nearest(String name, Collection<String> candidates, int limit) {
        if (name.length() > LONGEST_NAME) {
            return List.of();
        }
        String key = name.toLowerCase(Locale.ROOT);
        int threshold = Math.max(2, key.length() / 3);
        record Near(String name, int distance) {
        }
        List<Near> close = new ArrayList<>();
        for (String c : candidates) {
            int d = distance(key, c.toLowerCase(Locale.ROOT), threshold);
            if (d <= threshold) {
                close.add(new Near(c, d));
            }
        }
        close.sort(Comparator.comparingInt(Near::distance).thenComparing(Near::name));
        return close.stream().limit(limit).map(Near::name).toList();
    }

    /**
     * The edit distance, or a number above {@code bound} as soon as it must exceed it: it is at least the difference
     * of the lengths, and never less than the smallest entry of a row (Ukkonen's cut-off), so a far candidate costs
     * little.
     */
    private static int distance(String a, String b, int bound) {
        if (Math.abs(a.length() - b.length()) > bound) {
            return bound + 1;
        }
        int[] prev = new int[b.length() + 1];
        int[] cur = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) {
            prev[j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            cur[0] = i;
            int least = i;
            for (int j = 1; j <= b.length(); j++) {
                int cost = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
                cur[j] = Math.min(Math.min(cur[j - 1] + 1, prev[j] + 1), prev[j - 1] + cost);
                least = Math.min(least, cur[j]);
            }
            if (least > bound) {
                return bound + 1;
            }
            int[] t = prev;
            prev = cur;
            cur = t;
        }
        return prev[b.length()];
    }
}
