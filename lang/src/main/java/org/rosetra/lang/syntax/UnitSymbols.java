package org.rosetra.lang.syntax;

import java.util.function.Predicate;
import org.rosetra.runtime.units.Units;

/**
 * Which names the parser treats as unit symbols when a unit might go on over {@code *} or
 * {@code /} (see the grammar's rule on units after a number).
 */
public final class UnitSymbols {

    private UnitSymbols() {
    }

    /** The symbols of the runtime's unit table. */
    public static Predicate<String> core() {
        return symbol -> Units.find(symbol).isPresent();
    }
}
