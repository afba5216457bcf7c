package org.rosetra.lang.check;

/** What a field's value has to be. */
public enum FieldKind {
    /** A value of the field's dimension: {@code E = 205 GPa}. */
    QUANTITY,
    /** One or more numbers with one trailing unit, of the field's dimension. */
    READINGS,
    /** One of a fixed set of words: {@code state = plane_stress}. */
    CHOICE,
    /** The name of something declared: {@code gauge = foil350}. */
    REFERENCE,
    /** {@code rectangular}, {@code delta}, {@code tee} or {@code arms(...)}. */
    LAYOUT,
    /** A column of a CSV file with its unit: {@code time = "t_s" s}. */
    COLUMN,
    /** A string: {@code delimiter = ";"}. */
    TEXT,
    /** A time window {@code 0 s to 2 s}, or the name of a baseline. */
    WINDOW_OR_BASELINE
}
