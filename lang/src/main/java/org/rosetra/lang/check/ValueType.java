package org.rosetra.lang.check;

import org.rosetra.runtime.units.Dimension;

/** What the dimension checker knows of an expression before anything is computed. */
sealed interface ValueType {

    /** A number or quantity; {@code perCase} when it is a column over cases or samples. */
    record Value(Dimension dimension, boolean perCase) implements ValueType {
    }

    /** A declared thing used by name: a rosette (maybe at one case), state, material, gauge. */
    record Entity(Symbol symbol, boolean caseChosen) implements ValueType {
    }

    /** Not known because of an error already reported; checks on it stay quiet. */
    record Unknown() implements ValueType {
    }

    ValueType UNKNOWN = new Unknown();
}
