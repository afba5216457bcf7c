package org.rosetra.runtime.series;

/**
 * Bad data in a series file, reported as {@code FILE:LINE: error: column "NAME": problem}.
 * The line is 1-based (the header is line 1); 0 means the whole file (it cannot be read).
 */
public final class SeriesDataException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    private final String shownName;
    private final long line;
    private final String column;
    private final String problem;

    /**
     * @param column the header name of the column at fault, or null when no one column is
     */
    public SeriesDataException(String shownName, long line, String column, String problem) {
        super(format(shownName, line, column, problem), null, false, false);
        this.shownName = shownName;
        this.line = line;
        this.column = column;
        this.problem = problem;
    }

    private static String format(String shownName, long line, String column, String problem) {
        StringBuilder s = new StringBuilder(shownName);
        if (line > 0) {
            s.append(':').append(line);
        }
        s.append(": error: ");
        if (column != null) {
            s.append("column \"").append(column).append("\": ");
        }
        return s.append(problem).toString();
    }

    public String shownName() {
        return shownName;
    }

    public long line() {
        return line;
    }

    /** The column's header name, or null. */
    public String column() {
        return column;
    }

    public String problem() {
        return problem;
    }

    /** The same error with its line moved by {@code offset} (parts count lines from their start). */
    SeriesDataException shiftedBy(long offset) {
        return new SeriesDataException(shownName, line + offset, column, problem);
    }

    @Override
    public String toString() {
        return getMessage();
    }
}
