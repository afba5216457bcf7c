package org.rosetra.lang.syntax;

/** What a plot statement draws. */
public enum PlotKind {
    /** Mohr's circles of strain and of stress. */
    MOHR,
    /** Normal and shear strain against direction, 0 to 180 deg. */
    DIRECTIONS,
    /** A value against the cases, or against time for a series. */
    VALUE
}
