package org.rosetra.runtime.series;

import java.util.List;

/** The name in a list closest to a misspelt one, for "did you mean" hints. */
final class NearestName {

    private NearestName() {
    }

    /** The closest name by edit distance, or null when none is close enough to help. */
    static String in(List<String> names, String wanted) {
        String best = null;
        int bestDistance = Integer.MAX_VALUE;
        for (String name : names) {
            int d = editDistance(name.toLowerCase(java.util.Locale.ROOT), wanted.toLowerCase(java.util.Locale.ROOT));
            if (d < bestDistance) {
                bestDistance = d;
                best = name;
            }
        }
        // A hint more than half rewritten would mislead more than it helps.
        return best != null && bestDistance <= Math.max(1, wanted.length() / 2) ? best : null;
    }

    /** Levenshtein distance: insertions, deletions and substitutions of one character. */
    static int editDistance(String a, String b) {
        return org.rosetra.runtime.text.EditDistance.between(a, b);
    }
}
