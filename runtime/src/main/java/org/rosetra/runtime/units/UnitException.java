package org.rosetra.runtime.units;

import java.util.Optional;

/**
 * A unit expression that cannot be read. Carries where the offending part lies within
 * the text (so a checker can turn it into a column) and, for an unknown symbol, the
 * nearest known one.
 */
public final class UnitException extends IllegalArgumentException {

    private static final long serialVersionUID = 1L;

    private final String text;
    private final int offset;
    private final int length;
    private final String suggestion;

    /**
     * @param problem    what is wrong and what to do, without the suggestion
     * @param text       the whole unit expression as given
     * @param offset     index of the offending part within {@code text}
     * @param length     its length in chars, at least 1 where the text has room
     * @param suggestion nearest known symbol, or null
     */
    public UnitException(String problem, String text, int offset, int length, String suggestion) {
        super(problem + (suggestion == null ? "" : "; did you mean '" + suggestion + "'?"));
        this.text = text;
        this.offset = offset;
        this.length = length;
        this.suggestion = suggestion;
    }

    /** The whole unit expression as given. */
    public String text() {
        return text;
    }

    /** Index (in chars, from 0) of the offending part within {@link #text()}. */
    public int offset() {
        return offset;
    }

    /** Length in chars of the offending part. */
    public int length() {
        return length;
    }

    /** The nearest known symbol, when the problem is an unknown one. */
    public Optional<String> suggestion() {
        return Optional.ofNullable(suggestion);
    }
}
