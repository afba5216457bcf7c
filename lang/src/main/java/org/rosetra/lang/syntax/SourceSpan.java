package org.rosetra.lang.syntax;

/**
 * Where a piece of syntax sits in its file. Lines and columns are 1-based; {@code endColumn}
 * is the column just past the last character, so a one-character token at column 5 has
 * {@code endColumn} 6.
 */
public record SourceSpan(String file, int line, int column, int endLine, int endColumn) {

    /** The span from the start of this one to the end of {@code last}. */
    public SourceSpan to(SourceSpan last) {
        return new SourceSpan(file, line, column, last.endLine, last.endColumn);
    }

    @Override
    public String toString() {
        return file + ":" + line + ":" + column;
    }
}
