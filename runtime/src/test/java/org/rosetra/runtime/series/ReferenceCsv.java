package org.rosetra.runtime.series;

import java.util.ArrayList;
import java.util.List;

/**
 * A plain RFC 4180 reader on a String, written character by character in the test, with
 * values from {@link Double#parseDouble}: the independent reference the streaming reader is
 * checked against.
 */
final class ReferenceCsv {

    private ReferenceCsv() {
    }

    /** All records of the text (BOM dropped, blank lines skipped), fields unquoted. */
    static List<List<String>> records(String text, char delimiter) {
        if (text.startsWith("\uFEFF")) {
            text = text.substring(1);
        }
        List<List<String>> records = new ArrayList<>();
        List<String> fields = new ArrayList<>();
        StringBuilder field = new StringBuilder();
        boolean quoted = false;
        boolean wasQuoted = false;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (quoted) {
                if (c == '"' && i + 1 < text.length() && text.charAt(i + 1) == '"') {
                    field.append('"');
                    i++;
                } else if (c == '"') {
                    quoted = false;
                } else {
                    field.append(c);
                }
            } else if (c == '"') {
                quoted = true;
                wasQuoted = true;
            } else if (c == delimiter) {
                fields.add(field.toString());
                field.setLength(0);
            } else if (c == '\n' || (c == '\r' && i + 1 < text.length() && text.charAt(i + 1) == '\n')) {
                if (c == '\r') {
                    i++;
                }
                fields.add(field.toString());
                if (!(fields.size() == 1 && fields.get(0).isEmpty() && !wasQuoted)) {
                    records.add(fields);
                }
                fields = new ArrayList<>();
                field.setLength(0);
                wasQuoted = false;
            } else {
                field.append(c);
            }
        }
        if (field.length() > 0 || !fields.isEmpty() || wasQuoted) {
            fields.add(field.toString());
            records.add(fields);
        }
        return records;
    }

    /** The wanted columns of every data row, as doubles, column by column. */
    static double[][] columns(String text, char delimiter, char decimalMark, List<String> wanted) {
        List<List<String>> records = records(text, delimiter);
        List<String> header = records.get(0).stream().map(String::strip).toList();
        double[][] columns = new double[wanted.size()][records.size() - 1];
        for (int c = 0; c < wanted.size(); c++) {
            int field = header.indexOf(wanted.get(c));
            for (int r = 1; r < records.size(); r++) {
                String s = records.get(r).get(field).strip();
                columns[c][r - 1] = Double.parseDouble(decimalMark == ',' ? s.replace(',', '.') : s);
            }
        }
        return columns;
    }
}
