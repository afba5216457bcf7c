package org.rosetra.lang.check;

import org.rosetra.lang.syntax.Declaration;

/** The kinds of block a script can write, each with its own fields (see {@link Builtins}). */
public enum BlockKind {
    MATERIAL, GAUGE, ROSETTE, STRAIN, STRESS, BASELINE, CASE, SERIES;

    public static BlockKind of(Declaration.Kind kind) {
        return valueOf(kind.name());
    }

    public String keyword() {
        return name().toLowerCase(java.util.Locale.ROOT);
    }

    /** Blocks of readings: their other lines are rosettes with readings or columns. */
    public boolean holdsReadings() {
        return this == BASELINE || this == CASE || this == SERIES;
    }
}
