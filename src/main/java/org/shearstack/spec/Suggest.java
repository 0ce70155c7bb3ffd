package org.shearstack.spec;

import java.util.Collection;
import java.util.Optional;

/** "Did you mean": the nearest candidate by edit distance (Levenshtein 1966), if close enough. */
public final class Suggest {

    private Suggest() {
    }

    public static Optional<String> nearest(String written, Collection<String> candidates) {
        String best = null;
        int bestDistance = Integer.MAX_VALUE;
        for (String c : candidates) {
            int d = distance(written, c);
            if (d < bestDistance) {
                best = c;
                bestDistance = d;
            }
        }
        int allowed = Math.max(2, written.length() / 3);
        return best != null && bestDistance <= allowed ? Optional.of(best) : Optional.empty();
    }

    /** Levenshtein edit distance: insertions, deletions and substitutions each cost 1. */
    public static int distance(String a, String b) {
        int[] previous = new int[b.length() + 1];
        int[] current = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) {
            previous[j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            current[0] = i;
            for (int j = 1; j <= b.length(); j++) {
                int cost = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
                current[j] = Math.min(Math.min(current[j - 1] + 1, previous[j] + 1), previous[j - 1] + cost);
            }
            int[] t = previous;
            previous = current;
            current = t;
        }
        return previous[b.length()];
    }
}
