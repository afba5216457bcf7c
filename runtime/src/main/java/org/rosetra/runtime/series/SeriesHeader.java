package org.rosetra.runtime.series;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;

/**
 * The header row of a series file: its column names, where the data starts and how many
 * lines the header takes (a quoted name may hold a line break, RFC 4180 section 2.6).
 *
 * @param names     column names in file order (unquoted names are trimmed of spaces)
 * @param dataStart byte offset of the first data row
 * @param lines     lines the header takes, normally 1
 */
public record SeriesHeader(List<String> names, long dataStart, int lines) {

    private static final int FIRST_READ = 64 * 1024;
    /** Longer than this is no header row: most likely a file without line breaks. */
    static final int LONGEST = 1 << 20;

    public SeriesHeader {
        names = List.copyOf(names);
    }

    /** Reads and parses the header row; the file's name in messages is {@code shownName}. */
    static SeriesHeader read(FileChannel channel, String shownName, char delimiter) throws IOException {
        long size = channel.size();
        if (size == 0) {
            throw new SeriesDataException(shownName, 1, null, "the file is empty");
        }
        int want = (int) Math.min(size, FIRST_READ);
        while (true) {
            byte[] bytes = new byte[want];
            ByteBuffer target = ByteBuffer.wrap(bytes);
            while (target.hasRemaining() && channel.read(target, target.position()) > 0) {
                // read until full or end of file
            }
            SeriesHeader header = parse(bytes, target.position(), target.position() == size, shownName, delimiter);
            if (header != null) {
                return header;
            }
            if (want >= size) {
                throw new SeriesDataException(shownName, 1, null, "a quote opened in the header is not closed");
            }
            if (want >= LONGEST) {
                throw new SeriesDataException(shownName, 1, null, "the header row is longer than "
                        + (LONGEST >> 20) + " MiB: is this a CSV file with one row per line?");
            }
            want = (int) Math.min(Math.min(size, LONGEST), (long) want * 4);
        }
    }

    /** Parses the header in {@code bytes[0..length)}; null when it runs past them and more may follow. */
    static SeriesHeader parse(byte[] bytes, int length, boolean wholeFile, String shownName, char delimiter) {
        int p = 0;
        if (length >= 3 && (bytes[0] & 0xFF) == 0xEF && (bytes[1] & 0xFF) == 0xBB && (bytes[2] & 0xFF) == 0xBF) {
            p = 3; // UTF-8 byte order mark, written by some spreadsheet exports
        }
        List<String> names = new ArrayList<>();
        int lines = 1;
        java.io.ByteArrayOutputStream field = new java.io.ByteArrayOutputStream();
        while (true) {
            field.reset();
            boolean quoted = p < length && bytes[p] == '"';
            if (quoted) {
                p++;
                while (true) {
                    if (p >= length) {
                        if (wholeFile) {
                            throw new SeriesDataException(shownName, 1, null, "a quote opened in the header is not closed");
                        }
                        return null;
                    }
                    byte c = bytes[p];
                    if (c == '"') {
                        if (p + 1 < length && bytes[p + 1] == '"') {
                            field.write('"'); // "" stands for one quote (RFC 4180 section 2.7)
                            p += 2;
                            continue;
                        }
                        if (p + 1 >= length && !wholeFile) {
                            return null;
                        }
                        p++;
                        break;
                    }
                    if (c == '\n') {
                        lines++;
                    }
                    field.write(c);
                    p++;
                }
            }
            int start = p;
            while (p < length && bytes[p] != delimiter && bytes[p] != '\n') {
                p++;
            }
            if (p >= length && !wholeFile) {
                return null;
            }
            int end = p;
            if (end > start && bytes[end - 1] == '\r' && (p >= length || bytes[p] == '\n')) {
                end--;
            }
            if (quoted && end > start) {
                String rest = new String(bytes, start, end - start, StandardCharsets.UTF_8);
                if (!rest.isBlank()) {
                    throw new SeriesDataException(shownName, lines, null,
                            "text after the closing quote of a header name: " + rest.strip());
                }
            }
            String name = quoted ? field.toString(StandardCharsets.UTF_8)
                    : new String(bytes, start, end - start, StandardCharsets.UTF_8).strip();
            names.add(name);
            if (p >= length) {
                return new SeriesHeader(names, length, lines);
            }
            if (bytes[p] == '\n') {
                return new SeriesHeader(names, p + 1, lines);
            }
            p++; // the delimiter
        }
    }
}
