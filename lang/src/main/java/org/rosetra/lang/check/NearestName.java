package org.rosetra.lang.check;

import java.util.Collection;
import java.util.Optional;

/** The closest of some known names to a misspelt one, for "did you mean ...?" hints. */
public final class NearestName {

    private NearestName() {
    }

    /**
     * The candidate nearest to {@code wrong} by edit distance (case differences cost little),
     * if it is near enough to be a plausible typo; ties go to the first candidate.
     */
    public static Optional<String> of(String wrong, Collection<String> candidates) {
        String best = null;
        int bestDistance = Integer.MAX_VALUE;
        for (String candidate : candidates) {
            int distance = distance(wrong, candidate);
            if (distance < bestDistance) {
                best = candidate;
                bestDistance = distance;
            }
        }
        int allowed = Math.max(1, Math.min(3, wrong.length() / 3 + 1));
        return best != null && bestDistance <= allowed && !best.equals(wrong)
                ? Optional.of(best) : Optional.empty();
    }

    /** "did you mean 'x'?" or null. */
    public static String hint(String wrong, Collection<String> candidates) {
        return of(wrong, candidates).map(name -> "did you mean '" + name + "'?").orElse(null);
    }

    /** Levenshtein distance where a change of letter case alone counts as zero. */
    static int distance(String a, String b) {
        return org.rosetra.runtime.text.EditDistance.between(a, b);
    }
}
