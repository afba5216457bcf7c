package org.rosetra.runtime.series;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The source's settings, header parsing on its own, and the "did you mean" distance. */
class SeriesSourceTest {

    @Test
    void delimiterAndDecimalMarkMustDiffer() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new SeriesSource(Path.of("a.csv"), "a.csv", ',', ',', "t", List.of()));
        assertEquals("the delimiter and the decimal mark are both ','", e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> new SeriesSource(Path.of("a.csv"), "a.csv", '|', '.', "t", List.of()));
        assertThrows(IllegalArgumentException.class, () -> new SeriesSource(Path.of("a.csv"), "a.csv", ';', ':', "t", List.of()));
    }

    @Test
    void columnsAreTimeThenValuesInTheOrderAskedFor() {
        SeriesSource s = SeriesSource.commaSeparated(Path.of("run.csv"), "t_s", "g3", "g1");
        assertEquals(3, s.columnCount());
        assertEquals("t_s", s.columnName(0));
        assertEquals("g3", s.columnName(1));
        assertEquals("g1", s.columnName(2));
    }

    private static SeriesHeader header(String text) {
        byte[] b = text.getBytes(StandardCharsets.UTF_8);
        return SeriesHeader.parse(b, b.length, true, "h.csv", ',');
    }

    @Test
    void headerForms() {
        // RFC 4180 section 2: CRLF ends a record; quoted names may hold delimiters, "" and line breaks.
        assertEquals(List.of("t_s", "g1"), header("t_s,g1\r\n1,2\r\n").names());
        assertEquals(8, header("t_s,g1\r\n1,2\r\n").dataStart());
        assertEquals(List.of("t_s", "g1"), header("\uFEFFt_s,g1\n").names());
        assertEquals(List.of("a,b", "say \"hi\"", "two\nlines"), header("\"a,b\",\"say \"\"hi\"\"\",\"two\nlines\"\n").names());
        assertEquals(2, header("\"a,b\",\"say \"\"hi\"\"\",\"two\nlines\"\n").lines());
        assertEquals(List.of("t_s", "", "g1"), header("t_s,,g1").names());
        byte[] cut = "\"t_s".getBytes(StandardCharsets.UTF_8);
        assertNull(SeriesHeader.parse(cut, cut.length, false, "h.csv", ','), "more to read");
    }

    @Test
    void editDistanceOfTheTextbookExample() {
        // Common textbook example of Levenshtein distance: kitten -> sitting takes 3 edits.
        assertEquals(3, NearestName.editDistance("kitten", "sitting"));
        assertEquals(0, NearestName.editDistance("g1", "g1"));
        assertEquals("temp_c", NearestName.in(List.of("t_s", "temp_c", "g1"), "Temp_C"));
        assertNull(NearestName.in(List.of("t_s", "g1"), "temperature"));
    }
}
