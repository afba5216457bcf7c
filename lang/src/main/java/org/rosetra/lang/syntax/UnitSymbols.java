package org.rosetra.lang.syntax;

import java.util.Set;
import java.util.function.Predicate;

/**
 * Which names the parser treats as unit symbols when a unit might go on over {@code *} or
 * {@code /} (see the grammar's rule on units after a number).
 */
public final class UnitSymbols {

    /** The symbols LANGUAGE.md requires, plus a few common SI ones. */
    private static final Set<String> CORE = Set.of(
            "%", "ue", "\u00B5\u03B5", "\u03BC\u03B5",
            "Pa", "kPa", "MPa", "GPa", "bar", "psi", "ksi", "Msi",
            "deg", "rad", "degC", "degF", "K", "ohm", "kohm", "\u03A9", "A", "mA", "V", "mV",
            "m", "cm", "mm", "um", "in", "ft", "kg", "N", "kN", "MN", "lbf", "kip",
            "s", "ms", "min", "h", "Hz");

    private UnitSymbols() {
    }

    /** The symbols known to the parser by default. */
    public static Predicate<String> core() {
        return CORE::contains;
    }
}
