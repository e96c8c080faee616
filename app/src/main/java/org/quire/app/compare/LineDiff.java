package org.quire.app.compare;

import java.util.ArrayList;
import java.util.List;

/**
 * A line-by-line comparison of two texts by their longest common subsequence of lines: the lines not in it
 * are removed from A or added in B. Removals are listed before additions at each place of change.
 *
 * <p>References: J. W. Hunt and M. D. McIlroy, "An algorithm for differential file comparison", Bell
 * Laboratories CSTR 41 (1976) (the longest common subsequence of lines); dynamic programming in O(n m).
 *
 * <p>Stateless and thread-safe.
 */
public final class LineDiff {
    /** Largest number of lines compared; longer texts are refused rather than filling memory. */
    public static final int MAX_LINES = 5_000;

    private LineDiff() {
    }

    /**
     * @return the edits turning {@code a} into {@code b}, every line of both texts once
     * @throws IllegalArgumentException when either text has more than {@link #MAX_LINES} lines
     */
    public static List<LineEdit> diff(List<String> a, List<String> b) {
        if (a.size() > MAX_LINES || b.size() > MAX_LINES) {
            throw new IllegalArgumentException("cannot compare texts of more than " + MAX_LINES + " lines ("
                    + a.size() + " and " + b.size() + ")");
        }
        int n = a.size();
        int m = b.size();
        int[][] lcs = new int[n + 1][m + 1];
        for (int i = n - 1; i >= 0; i--) {
            for (int j = m - 1; j >= 0; j--) {
                lcs[i][j] = a.get(i).equals(b.get(j)) ? lcs[i + 1][j + 1] + 1 : Math.max(lcs[i + 1][j], lcs[i][j + 1]);
            }
        }
        List<LineEdit> out = new ArrayList<>();
        int i = 0;
        int j = 0;
        while (i < n || j < m) {
            if (i < n && j < m && a.get(i).equals(b.get(j))) {
                out.add(new LineEdit(LineEdit.Kind.KEPT, i + 1, j + 1, a.get(i)));
                i++;
                j++;
            } else if (i < n && (j >= m || lcs[i + 1][j] >= lcs[i][j + 1])) {
                out.add(new LineEdit(LineEdit.Kind.REMOVED, i + 1, 0, a.get(i)));
                i++;
            } else {
                out.add(new LineEdit(LineEdit.Kind.ADDED, 0, j + 1, b.get(j)));
                j++;
            }
        }
        return out;
    }
}
