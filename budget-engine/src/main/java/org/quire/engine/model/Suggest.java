package org.quire.engine.model;

import java.util.Collection;

/** Finds the known name nearest to a misspelt one (Levenshtein distance, ignoring case). */
public final class Suggest {
    private Suggest() {
    }

    /** @return the nearest candidate within a distance of about a third of the name's length, or null */
    public static String nearest(String name, Collection<String> candidates) {
        String best = null;
        int bestDistance = Integer.MAX_VALUE;
        for (String c : candidates) {
            int d = distance(name.toLowerCase(java.util.Locale.ROOT), c.toLowerCase(java.util.Locale.ROOT));
            if (d < bestDistance) {
                bestDistance = d;
                best = c;
            }
        }
        int limit = Math.max(1, (name.length() + 2) / 3);
        return bestDistance <= limit ? best : null;
    }

    /** @return " (did you mean 'x'?)" or an empty string */
    public static String hint(String name, Collection<String> candidates) {
        String s = nearest(name, candidates);
        return s == null ? "" : "; did you mean '" + s + "'?";
    }

    static int distance(String a, String b) {
        int[] prev = new int[b.length() + 1];
        int[] cur = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) {
            prev[j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            cur[0] = i;
            for (int j = 1; j <= b.length(); j++) {
                int cost = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
                cur[j] = Math.min(Math.min(cur[j - 1] + 1, prev[j] + 1), prev[j - 1] + cost);
            }
            int[] t = prev;
            prev = cur;
            cur = t;
        }
        return prev[b.length()];
    }
}
