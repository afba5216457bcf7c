package org.rosetra.lang.java;

import org.rosetra.lang.check.Builtins;
import org.rosetra.lang.check.NearestName;
import org.rosetra.lang.plan.EvaluationException;
import org.rosetra.lang.syntax.Name;
import org.rosetra.runtime.units.Dimension;

/** The dimension a Java function declares for a parameter or its result ({@code x: stress}). */
final class DeclaredDimension {
    private DeclaredDimension() {
    }

    /** The named dimension, {@code whenAbsent} when none is written; an unknown name is an error. */
    static Dimension of(Name name, Dimension whenAbsent) {
        if (name == null) {
            return whenAbsent;
        }
        return Builtins.dimensionNamed(name.text()).orElseThrow(() -> new EvaluationException(name.span(),
                "unknown dimension '" + name.text() + "'", hintFor(name.text())));
    }

    private static String hintFor(String wrong) {
        String nearest = NearestName.hint(wrong, Builtins.dimensionNames());
        return nearest != null ? nearest
                : "dimensions are named as in: none, stress, angle, temperature, length, force";
    }
}
