package org.rosetra.runtime.series;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.List;

/**
 * Parses the rows that start in one byte range of a series file into reused column arrays
 * and hands them on chunk by chunk. One instance per part and thread.
 *
 * <p>The row loop works on a reused {@code byte[]} with no allocation per row or field. A row
 * that runs past the buffer's end is parsed again after the next read, so a row is never
 * seen in two pieces. Plain decimals take a fast path that is exact (an integer below 2^53
 * divided by an exact power of ten is rounded once, as {@link Double#parseDouble} rounds);
 * anything else goes through {@link DecimalText}.
 */
final class PartParser {

    /** Thrown when a quote is seen while quotes are not allowed: the reader then reads in one pass. */
    static final class QuoteSeen extends RuntimeException {
        private static final long serialVersionUID = 1L;

        QuoteSeen() {
            super("quote seen", null, false, false);
        }
    }

    private static final QuoteSeen QUOTE_SEEN = new QuoteSeen();
    private static final int INCOMPLETE = -1;
    private static final int SHOWN_TEXT_LIMIT = 40;
    /** A longer row is no row of a measured series: most likely a file without line breaks. */
    static final int LONGEST_ROW = 16 << 20;

    private final FileChannel channel;
    private final String shownName;
    private final List<String> headerNames;
    private final int[] columnOfField;
    private final int fieldCount;
    private final byte delimiter;
    private final byte decimalMark;
    private final boolean quotesAllowed;
    private final long fileEnd;
    private final ReadControl control;
    private final double[][] columns;
    private final int chunkRows;
    private final int part;
    /** The longest plain row: per field a sign, 18 digits, a decimal mark and a delimiter; then CR LF. */
    private final int plainRowBytes;

    private byte[] buffer;
    private int pos;
    private int limit;
    private long bufferStart;
    private boolean atFileEnd;
    private long countedUpTo;
    private long ownedEnd;

    private byte[] quotedText = new byte[64];
    private int quotedLength;
    private int quotedLineBreaks;
    private byte[] scratch = new byte[64];
    private boolean rowWasBlank;

    /** A parser for part number {@code part} (0 is the part at the file's start). */
    PartParser(int part, FileChannel channel, SeriesSource source, ColumnLayout layout, boolean quotesAllowed,
               long fileEnd, ReadControl control, ReadOptions options) {
        this.part = part;
        this.channel = channel;
        this.shownName = source.shownName();
        this.headerNames = layout.headerNames();
        this.columnOfField = layout.columnOfField();
        this.fieldCount = layout.fieldCount();
        this.delimiter = (byte) source.delimiter();
        this.decimalMark = (byte) source.decimalMark();
        this.quotesAllowed = quotesAllowed;
        this.fileEnd = fileEnd;
        this.control = control;
        this.chunkRows = options.chunkRows();
        this.columns = new double[source.columnCount()][chunkRows];
        this.buffer = new byte[options.bufferBytes()];
        this.plainRowBytes = fieldCount * 21 + 2;
    }

    private static final int NEEDS_DATA = 0;
    private static final int CHUNK_FULL = 1;
    private static final int PART_DONE = 2;

    // The row loop's state, kept between calls of parseRows.
    private long line;
    private long rows;
    private int inChunk;
    private long chunkFirstLine;
    private long firstRowLine;
    private double firstTime;
    private double previousTime;

    /**
     * Reads the rows that start in {@code [start, end)}. When {@code startsMidLine} the part
     * begins after the first line break at or after {@code start - 1} (that line belongs to
     * the part before). Lines and samples in chunks and errors count from {@code lineBase}
     * and {@code sampleBase}.
     */
    PartOutcome read(long start, long end, boolean startsMidLine, long lineBase, long sampleBase,
                     ChunkSink sink) throws IOException {
        ownedEnd = end;
        bufferStart = startsMidLine ? start - 1 : start;
        countedUpTo = start; // the byte before a mid-line start is the part before's
        pos = 0;
        limit = 0;
        atFileEnd = bufferStart >= fileEnd;
        line = lineBase;
        rows = 0;
        inChunk = 0;
        chunkFirstLine = lineBase;
        firstRowLine = lineBase;
        firstTime = Double.NaN;
        previousTime = Double.NaN;
        if (startsMidLine && !skipToNextLine()) {
            return new PartOutcome(0, 0, lineBase, Double.NaN, Double.NaN, null, false);
        }
        boolean stoppedEarly = false;
        try {
            // The row loop runs in parseRows, entered afresh for every chunk and buffer, so each
            // thread soon runs its compiled form rather than waiting in one long interpreted call.
            while (true) {
                int status = parseRows();
                if (status == CHUNK_FULL) {
                    boolean more = sink.accept(new Chunk(sampleBase + rows - inChunk, chunkFirstLine, inChunk, columns));
                    inChunk = 0;
                    if (!more || control.shouldStop(part)) {
                        stoppedEarly = true;
                        break;
                    }
                } else if (status == NEEDS_DATA) {
                    if (control.shouldStop(part)) {
                        stoppedEarly = true;
                        break;
                    }
                    refill();
                } else {
                    break;
                }
            }
            if (inChunk > 0 && !stoppedEarly) {
                stoppedEarly = !sink.accept(new Chunk(sampleBase + rows - inChunk, chunkFirstLine, inChunk, columns));
            }
            countProgress(Math.min(ownedEnd, fileEnd));
            return new PartOutcome(rows, line - lineBase, firstRowLine, firstTime, previousTime, null, stoppedEarly);
        } catch (SeriesDataException e) {
            control.failed(part);
            return new PartOutcome(rows, line - lineBase, firstRowLine, firstTime, previousTime, e, true);
        }
    }

    /** Parses rows until the chunk is full, the buffer runs out, or the part ends. */
    private int parseRows() {
        final double[] time = columns[0];
        long line = this.line;
        long rows = this.rows;
        int inChunk = this.inChunk;
        double previousTime = this.previousTime;
        int status;
        try {
            while (true) {
                if (pos >= limit) {
                    status = atFileEnd ? PART_DONE : NEEDS_DATA;
                    break;
                }
                if (bufferStart + pos >= ownedEnd) {
                    status = PART_DONE;
                    break;
                }
                int lineBreaks;
                if (limit - pos >= plainRowBytes && plainRow(inChunk)) {
                    lineBreaks = 1;
                    rowWasBlank = false;
                } else {
                    lineBreaks = parseRow(inChunk, line);
                }
                if (lineBreaks == INCOMPLETE) {
                    status = NEEDS_DATA;
                    break;
                }
                if (rowWasBlank) {
                    line += lineBreaks;
                    continue;
                }
                double t = time[inChunk];
                if (rows == 0) {
                    firstTime = t;
                    firstRowLine = line;
                } else if (!(t > previousTime)) {
                    throw new SeriesDataException(shownName, line, headerNames.get(fieldOf(0)),
                            "time " + t + " does not increase (the sample before is at " + previousTime + ")");
                }
                previousTime = t;
                if (inChunk == 0) {
                    chunkFirstLine = line;
                }
                line += lineBreaks;
                rows++;
                inChunk++;
                if (inChunk == chunkRows) {
                    status = CHUNK_FULL;
                    break;
                }
            }
        } finally {
            this.line = line;
            this.rows = rows;
            this.inChunk = inChunk;
            this.previousTime = previousTime;
        }
        return status;
    }

    private int fieldOf(int column) {
        for (int f = 0; f < fieldCount; f++) {
            if (columnOfField[f] == column) {
                return f;
            }
        }
        throw new IllegalStateException("column " + column + " is not in the layout");
    }

    /** Moves past the first line break; false when the file ends first. */
    private boolean skipToNextLine() throws IOException {
        while (true) {
            for (int p = pos; p < limit; p++) {
                if (buffer[p] == '\n') {
                    pos = p + 1;
                    return true;
                }
            }
            pos = limit;
            if (atFileEnd) {
                return false;
            }
            refill();
        }
    }

    /** Keeps the unparsed tail, grows the buffer if one row fills it, and reads more. */
    private void refill() throws IOException {
        if (pos > 0) {
            System.arraycopy(buffer, pos, buffer, 0, limit - pos);
            bufferStart += pos;
            limit -= pos;
            pos = 0;
        }
        if (limit == buffer.length) {
            if (buffer.length >= LONGEST_ROW) {
                throw new SeriesDataException(shownName, line, null, "a row longer than " + (LONGEST_ROW >> 20)
                        + " MiB: is this a CSV file with one row per line?");
            }
            buffer = Arrays.copyOf(buffer, Math.min(LONGEST_ROW, buffer.length * 2));
        }
        int want = (int) Math.min(buffer.length - limit, fileEnd - (bufferStart + limit));
        ByteBuffer target = ByteBuffer.wrap(buffer, limit, want);
        while (target.hasRemaining()) {
            int n = channel.read(target, bufferStart + target.position());
            if (n <= 0) {
                break; // the file shrank while being read: parse what there is
            }
        }
        limit = target.position();
        atFileEnd = bufferStart + limit >= fileEnd || target.hasRemaining();
        countProgress(Math.min(ownedEnd, bufferStart + limit));
    }

    private void countProgress(long upTo) {
        if (upTo > countedUpTo) {
            control.bytesRead(upTo - countedUpTo);
            countedUpTo = upTo;
        }
    }

    /**
     * The common row, parsed in one tight pass: every field a plain decimal (optional sign,
     * digits, optional decimal mark and digits; at most 18 digits, as {@link #parseRow}'s own
     * fast path takes them, so the value is the same), the row ending in a line break before
     * the buffer's end. Anything else (quotes, spaces, exponents, text in a skipped column, a
     * blank or short or long row, a row cut by the buffer's end) returns false with nothing
     * moved, and {@link #parseRow} reads the row and reports what is wrong with it. On true,
     * {@code pos} is past the row's line break.
     *
     * <p>It is only tried with {@link #plainRowBytes} left in the buffer, the longest plain row,
     * so its limit checks fail only on rows that are not plain. A limit that a plain row could
     * meet (the buffer's end, once per read) would be a branch the JIT sees rarely: it compiled
     * the loop without it and then threw the compiled code away at each new place a read cut a
     * row (three recompilations in a 5M-sample run, logged with -XX:+LogCompilation).
     */
    private boolean plainRow(int r) {
        final byte[] b = buffer;
        final int lim = pos + plainRowBytes; // the caller has checked that the buffer holds this much
        final byte delim = delimiter;
        final byte mark = decimalMark;
        final int[] fieldColumns = columnOfField;
        final int last = fieldCount - 1;
        int p = pos;
        for (int f = 0; ; f++) {
            int column = fieldColumns[f];
            if (column < 0) {
                return false; // a skipped column may hold anything: the general path reads it
            }
            if (p >= lim) {
                return false;
            }
            byte c = b[p];
            boolean negative = c == '-';
            if (negative || c == '+') {
                p++;
            }
            long mantissa = 0;
            int start = p;
            int d;
            while (p < lim && (d = (b[p] - '0') & 0xFF) < 10) {
                mantissa = mantissa * 10 + d;
                p++;
            }
            int digits = p - start;
            int fractionDigits = 0;
            if (p < lim && b[p] == mark) {
                int fractionStart = ++p;
                while (p < lim && (d = (b[p] - '0') & 0xFF) < 10) {
                    mantissa = mantissa * 10 + d;
                    p++;
                }
                fractionDigits = p - fractionStart;
                digits += fractionDigits;
            }
            if (p >= lim || digits == 0 || digits > 18 || mantissa > DecimalText.EXACT_INTEGER_LIMIT) {
                return false;
            }
            double value = fractionDigits == 0 ? (double) mantissa
                    : (double) mantissa / DecimalText.POWERS_OF_TEN[fractionDigits];
            columns[column][r] = negative ? -value : value;
            c = b[p];
            if (f < last) {
                if (c != delim) {
                    return false;
                }
                p++;
            } else {
                if (c == '\r') {
                    if (++p >= lim) {
                        return false;
                    }
                    c = b[p];
                }
                if (c != '\n') {
                    return false;
                }
                pos = p + 1;
                return true;
            }
        }
    }

    /**
     * Parses one row at {@code pos} into row {@code r} of the columns. Returns the line
     * breaks it took (0 for a last row without one) and moves {@code pos} past it, or
     * {@link #INCOMPLETE} when the buffer ends first. Sets {@link #rowWasBlank}.
     */
    private int parseRow(int r, long line) {
        final byte[] b = buffer;
        final int lim = limit;
        final boolean end = atFileEnd;
        final byte delim = delimiter;
        final byte mark = decimalMark;
        int p = pos;
        rowWasBlank = false;
        byte first = b[p];
        if (first == '\n' || first == '\r') {
            if (first == '\n') {
                pos = p + 1;
                rowWasBlank = true;
                return 1;
            }
            if (p + 1 >= lim) {
                if (!end) {
                    return INCOMPLETE;
                }
            } else if (b[p + 1] == '\n') {
                pos = p + 2;
                rowWasBlank = true;
                return 1;
            }
        }
        int extraLines = 0;
        for (int f = 0; f < fieldCount; f++) {
            final int column = columnOfField[f];
            if (p >= lim && !end) {
                return INCOMPLETE;
            }
            if (p < lim && b[p] == '"') {
                if (!quotesAllowed) {
                    throw QUOTE_SEEN;
                }
                int after = parseQuoted(p, line + extraLines);
                if (after == INCOMPLETE) {
                    return INCOMPLETE;
                }
                long fieldLine = line + extraLines;
                extraLines += quotedLineBreaks;
                p = after;
                if (column >= 0) {
                    columns[column][r] = quotedNumber(fieldLine, f);
                }
            } else if (column < 0) {
                while (p < lim) {
                    byte c = b[p];
                    if (c == delim || c == '\n') {
                        break;
                    }
                    if (c == '"' && !quotesAllowed) {
                        throw QUOTE_SEEN;
                    }
                    p++;
                }
                if (p >= lim && !end) {
                    return INCOMPLETE;
                }
            } else {
                final int start = p;
                boolean negative = false;
                if (p < lim) {
                    byte c = b[p];
                    if (c == '-') {
                        negative = true;
                        p++;
                    } else if (c == '+') {
                        p++;
                    }
                }
                long mantissa = 0;
                int digits = 0;
                int digitsBeforeMark = -1;
                while (p < lim) {
                    int d = b[p] - '0';
                    if (d >= 0 && d <= 9) {
                        mantissa = mantissa * 10 + d;
                        digits++;
                        p++;
                    } else if (b[p] == mark && digitsBeforeMark < 0) {
                        digitsBeforeMark = digits;
                        p++;
                    } else {
                        break;
                    }
                }
                if (p >= lim && !end) {
                    return INCOMPLETE;
                }
                boolean fieldEnds;
                if (p >= lim) {
                    fieldEnds = true;
                } else {
                    byte c = b[p];
                    if (c == '\r') {
                        if (p + 1 >= lim && !end) {
                            return INCOMPLETE;
                        }
                        fieldEnds = p + 1 >= lim || b[p + 1] == '\n';
                    } else {
                        fieldEnds = c == delim || c == '\n';
                    }
                }
                int fractionDigits = digitsBeforeMark < 0 ? 0 : digits - digitsBeforeMark;
                double value;
                if (fieldEnds && digits > 0 && digits <= 18 && mantissa <= DecimalText.EXACT_INTEGER_LIMIT
                        && fractionDigits < DecimalText.POWERS_OF_TEN.length) {
                    value = fractionDigits == 0 ? (double) mantissa
                            : (double) mantissa / DecimalText.POWERS_OF_TEN[fractionDigits];
                    if (negative) {
                        value = -value;
                    }
                } else {
                    while (p < lim && b[p] != delim && b[p] != '\n') {
                        if (b[p] == '"' && !quotesAllowed) {
                            throw QUOTE_SEEN;
                        }
                        p++;
                    }
                    if (p >= lim && !end) {
                        return INCOMPLETE;
                    }
                    int stop = p;
                    if (stop > start && b[stop - 1] == '\r' && (p >= lim || b[p] == '\n')) {
                        stop--;
                    }
                    value = slowNumber(b, start, stop, line + extraLines, f);
                }
                columns[column][r] = value;
            }
            // p is at the field's end: a delimiter, a line break, or the end of the file.
            if (p < lim && b[p] == '\r' && p + 1 >= lim && !end) {
                return INCOMPLETE;
            }
            boolean lineEnds = p >= lim || b[p] == '\n' || (b[p] == '\r' && (p + 1 >= lim || b[p + 1] == '\n'));
            if (f < fieldCount - 1) {
                if (lineEnds) {
                    throw new SeriesDataException(shownName, line + extraLines, headerNames.get(f + 1),
                            "missing: the row has " + (f + 1) + " field" + (f == 0 ? "" : "s")
                                    + ", the header has " + fieldCount);
                }
                if (b[p] != delim) {
                    throw afterQuote(line + extraLines, f);
                }
                p++;
            } else {
                if (p >= lim) {
                    pos = p;
                    return extraLines;
                }
                if (b[p] == '\n') {
                    pos = p + 1;
                    return extraLines + 1;
                }
                if (b[p] == '\r' && p + 1 >= lim) {
                    pos = p + 1;
                    return extraLines;
                }
                if (b[p] == '\r' && b[p + 1] == '\n') {
                    pos = p + 2;
                    return extraLines + 1;
                }
                if (b[p] == delim) {
                    throw new SeriesDataException(shownName, line + extraLines, null,
                            "the row has " + countFields(p, lim) + " fields, the header has " + fieldCount
                                    + " (" + String.join(", ", headerNames) + ")");
                }
                throw afterQuote(line + extraLines, f);
            }
        }
        throw new IllegalStateException("a row has no fields");
    }

    /** Fields in a row that has too many: the header's count plus those after {@code p}. */
    private int countFields(int p, int lim) {
        int n = fieldCount;
        boolean inQuotes = false;
        for (int q = p; q < lim && (inQuotes || buffer[q] != '\n'); q++) {
            if (buffer[q] == '"') {
                inQuotes = !inQuotes;
            } else if (buffer[q] == delimiter && !inQuotes) {
                n++;
            }
        }
        return n;
    }

    private SeriesDataException afterQuote(long line, int field) {
        return new SeriesDataException(shownName, line, headerNames.get(field),
                "text after the closing quote (a quote inside a quoted field is written \"\", RFC 4180)");
    }

    /**
     * Reads a quoted field starting at the quote at {@code p} into {@link #quotedText}.
     * Returns the position after the closing quote, or {@link #INCOMPLETE}.
     */
    private int parseQuoted(int p, long line) {
        final byte[] b = buffer;
        int q = p + 1;
        int length = 0;
        int breaks = 0;
        while (true) {
            if (q >= limit) {
                if (atFileEnd) {
                    throw new SeriesDataException(shownName, line, null,
                            "a quote opened here is not closed before the end of the file");
                }
                return INCOMPLETE;
            }
            byte c = b[q];
            if (c == '"') {
                if (q + 1 >= limit && !atFileEnd) {
                    return INCOMPLETE;
                }
                if (q + 1 < limit && b[q + 1] == '"') {
                    length = put(length, (byte) '"');
                    q += 2;
                    continue;
                }
                quotedLength = length;
                quotedLineBreaks = breaks;
                return q + 1;
            }
            if (c == '\n') {
                breaks++;
            }
            length = put(length, c);
            q++;
        }
    }

    private int put(int at, byte c) {
        if (at == quotedText.length) {
            quotedText = Arrays.copyOf(quotedText, at * 2);
        }
        quotedText[at] = c;
        return at + 1;
    }

    private double quotedNumber(long line, int field) {
        return checkedNumber(quotedText, 0, quotedLength, line, field);
    }

    private double slowNumber(byte[] b, int from, int to, long line, int field) {
        return checkedNumber(b, from, to, line, field);
    }

    private double checkedNumber(byte[] b, int from, int to, long line, int field) {
        if (scratch.length < to - from) {
            scratch = new byte[Math.max(to - from, scratch.length * 2)];
        }
        double value = DecimalText.parse(b, from, to, decimalMark, scratch);
        if (value == value) {
            return value;
        }
        String text = new String(b, from, to - from, StandardCharsets.UTF_8);
        if (text.isBlank()) {
            throw new SeriesDataException(shownName, line, headerNames.get(field), "missing value");
        }
        String shown = text.length() > SHOWN_TEXT_LIMIT ? text.substring(0, SHOWN_TEXT_LIMIT) + "..." : text;
        String hint = decimalMark == '.' && text.indexOf(',') >= 0 ? " (decimal mark is '.')"
                : decimalMark == ',' && text.indexOf('.') >= 0 ? " (decimal mark is ',')" : "";
        throw new SeriesDataException(shownName, line, headerNames.get(field),
                "\"" + shown + "\" is not a number" + hint);
    }
}
