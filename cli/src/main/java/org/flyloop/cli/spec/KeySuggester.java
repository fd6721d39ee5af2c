package org.flyloop.cli.spec;

import java.util.Collection;
import java.util.Locale;
import java.util.Optional;

/**
 * Finds the known word closest to a mistyped one, for "did you mean" hints.
 *
 * <p>Distance is the optimal-string-alignment variant of the Damerau–Levenshtein distance
 * (insertions, deletions, substitutions and transpositions of adjacent characters, each cost 1;
 * F. J. Damerau, "A technique for computer detection and correction of spelling errors",
 * Comm. ACM 7(3), 1964), computed case-insensitively with {@code -} and {@code _} treated alike.
 * A word is suggested when its distance is at most 1 for words of up to 3 letters, 2 up to 6
 * letters and 3 beyond (common practice, no source).
 */
public final class KeySuggester {

    private KeySuggester() {
    }

    /** The closest known word within the allowed distance, if any. */
    public static Optional<String> closest(String typed, Collection<String> known) {
        String a = normalize(typed);
        String best = null;
        int bestDistance = Integer.MAX_VALUE;
        for (String candidate : known) {
            int d = distance(a, normalize(candidate));
            if (d < bestDistance) {
                bestDistance = d;
                best = candidate;
            }
        }
        if (best == null || bestDistance > allowedDistance(best.length())) {
            return Optional.empty();
        }
        return Optional.of(best);
    }

    private static int allowedDistance(int length) {
        return length <= 3 ? 1 : length <= 6 ? 2 : 3;
    }

    private static String normalize(String s) {
        return s.toLowerCase(Locale.ROOT).replace('-', '_');
    }

    /**
     * Optimal-string-alignment distance (Damerau 1964, restricted form: no substring is edited
     * twice).
     */
    static int distance(String a, String b) {
        int[][] d = new int[a.length() + 1][b.length() + 1];
        for (int i = 0; i <= a.length(); i++) {
            d[i][0] = i;
        }
        for (int j = 0; j <= b.length(); j++) {
            d[0][j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            for (int j = 1; j <= b.length(); j++) {
                int cost = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
                int best = Math.min(Math.min(d[i - 1][j] + 1, d[i][j - 1] + 1), d[i - 1][j - 1] + cost);
                if (i > 1 && j > 1 && a.charAt(i - 1) == b.charAt(j - 2) && a.charAt(i - 2) == b.charAt(j - 1)) {
                    best = Math.min(best, d[i - 2][j - 2] + 1);
                }
                d[i][j] = best;
            }
        }
        return d[a.length()][b.length()];
    }
}
