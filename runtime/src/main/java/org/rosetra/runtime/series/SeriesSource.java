package org.rosetra.runtime.series;

import java.nio.file.Path;
import java.util.List;
import java.util.Objects;

/**
 * Which file to read and how: its delimiter and decimal mark, the header name of the time
 * column and the header names of the value columns, in the order the chunks carry them.
 *
 * @param file        the file to open (already resolved against the script's folder)
 * @param shownName   the name used in messages, e.g. {@code data/hoist-run.csv}
 * @param delimiter   {@code ','}, {@code ';'} or {@code '\t'}
 * @param decimalMark {@code '.'} or {@code ','} (then the delimiter must differ)
 * @param timeColumn  header name of the time column; chunk column 0
 * @param valueColumns header names of the other columns wanted; chunk columns 1..n
 */
public record SeriesSource(Path file, String shownName, char delimiter, char decimalMark,
                           String timeColumn, List<String> valueColumns) {

    public SeriesSource {
        Objects.requireNonNull(file, "file");
        Objects.requireNonNull(shownName, "shownName");
        Objects.requireNonNull(timeColumn, "timeColumn");
        valueColumns = List.copyOf(valueColumns);
        if (delimiter != ',' && delimiter != ';' && delimiter != '\t') {
            throw new IllegalArgumentException("delimiter must be ',', ';' or tab, not '" + delimiter + "'");
        }
        if (decimalMark != '.' && decimalMark != ',') {
            throw new IllegalArgumentException("decimal mark must be '.' or ',', not '" + decimalMark + "'");
        }
        if (delimiter == decimalMark) {
            throw new IllegalArgumentException("the delimiter and the decimal mark are both '" + delimiter + "'");
        }
    }

    /** The common export: comma-separated, decimal point, shown under the file's own name. */
    public static SeriesSource commaSeparated(Path file, String timeColumn, String... valueColumns) {
        return new SeriesSource(file, file.toString(), ',', '.', timeColumn, List.of(valueColumns));
    }

    /** Number of columns in each chunk: the time column and the value columns. */
    public int columnCount() {
        return 1 + valueColumns.size();
    }

    /** Header name of chunk column {@code i} (0 is time). */
    public String columnName(int i) {
        return i == 0 ? timeColumn : valueColumns.get(i - 1);
    }
}
