package org.rosetra.runtime.units;

import java.util.Collection;
import java.util.Locale;
import java.util.Optional;

/**
 * Picks the known symbol a user most likely meant: one that differs only in letter case
 * first (the usual slip, "Mpa"), else the closest by edit distance if it is close enough
 * to be a plausible typo.
 */
final class NearestSymbol {

    private NearestSymbol() {
    }

    static Optional<String> to(String written, Collection<String> known) {
        for (String candidate : known) {
            if (candidate.equalsIgnoreCase(written)) {
                return Optional.of(candidate);
            }
        }
        String best = null;
        int bestDistance = Integer.MAX_VALUE;
        for (String candidate : known) {
            int distance = editDistance(written.toLowerCase(Locale.ROOT),
                    candidate.toLowerCase(Locale.ROOT));
            if (distance < bestDistance) {
                best = candidate;
                bestDistance = distance;
            }
        }
        // beyond this a "suggestion" is noise: 'xyz' should not become 'Hz'
        int tolerated = Math.max(1, written.length() / 3);
        return bestDistance <= tolerated ? Optional.ofNullable(best) : Optional.empty();
    }

    /** Levenshtein distance, two-row dynamic programme. */
    static int editDistance(String a, String b) {
        return org.rosetra.runtime.text.EditDistance.between(a, b);
    }
}
