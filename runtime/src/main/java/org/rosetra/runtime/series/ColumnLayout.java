package org.rosetra.runtime.series;

import java.util.Arrays;
import java.util.List;

/**
 * Where the wanted columns sit in the file's rows: for each field of a row, the chunk column
 * it fills, or -1 when the field is not wanted.
 */
record ColumnLayout(List<String> headerNames, int[] columnOfField) {

    static ColumnLayout of(SeriesSource source, SeriesHeader header) {
        List<String> names = header.names();
        int[] columnOfField = new int[names.size()];
        Arrays.fill(columnOfField, -1);
        for (int column = 0; column < source.columnCount(); column++) {
            String wanted = source.columnName(column);
            int field = names.indexOf(wanted);
            if (field < 0) {
                // A name another column already asks for is not the one meant.
                List<String> others = names.stream()
                        .filter(n -> !source.valueColumns().contains(n) && !n.equals(source.timeColumn())).toList();
                String nearest = NearestName.in(others, wanted);
                throw new SeriesDataException(source.shownName(), 1, wanted,
                        "not in the header (its columns: " + String.join(", ", names) + ")"
                                + (nearest == null ? "" : "; did you mean \"" + nearest + "\"?"));
            }
            if (names.lastIndexOf(wanted) != field) {
                throw new SeriesDataException(source.shownName(), 1, wanted,
                        "appears more than once in the header, so which one is meant is unclear");
            }
            if (columnOfField[field] >= 0) {
                throw new SeriesDataException(source.shownName(), 1, wanted, "is asked for twice");
            }
            columnOfField[field] = column;
        }
        return new ColumnLayout(names, columnOfField);
    }

    int fieldCount() {
        return columnOfField.length;
    }
}
