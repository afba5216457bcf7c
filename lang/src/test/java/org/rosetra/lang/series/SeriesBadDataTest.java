package org.rosetra.lang.series;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Bad data in a series file (LANGUAGE.md, "Measured series": "a value that is missing or not a
 * number, a time that does not increase, or a column that is not there, is an error naming the
 * file, its line and the column"; "Running and results": exit 2, nothing computed or written).
 * Each file has the header on line 1 and its fault on the line given.
 */
class SeriesBadDataTest {
    static final String SCRIPT = SeriesResultsTest.DECLARATIONS + """
            series run from "data.csv" {
              time        = "t_s" s
              r           = "g1", "g2", "g3" ue
              temperature = "temp_c" degC
            }
            let peak = max(r.von_mises[run])
            check "limit": r.von_mises <= 200 MPa
            plot r.von_mises[run]
            """;

    static final String HEADER = "t_s,g1,g2,g3,temp_c\n";
    static final String GOOD = "0.00,100,50,-20,21.5\n0.01,101,51,-21,21.5\n0.02,102,52,-22,21.6\n";

    static Stream<Arguments> faults() {
        return Stream.of(
                Arguments.of("a missing arm value", HEADER + GOOD + "0.03,103,,-23,21.6\n", 5, "\"g2\"", "missing"),
                Arguments.of("a missing time", HEADER + GOOD + ",103,53,-23,21.6\n", 5, "\"t_s\"", "missing"),
                Arguments.of("a missing temperature at the end of a row", HEADER + GOOD + "0.03,103,53,-23,\n", 5,
                        "\"temp_c\"", "missing"),
                Arguments.of("a value that is not a number", HEADER + GOOD + "0.03,103,5O,-23,21.6\n", 5, "\"g2\"",
                        "\"5O\" is not a number"),
                Arguments.of("a time that is not a number", HEADER + GOOD + "0.03s,103,53,-23,21.6\n", 5, "\"t_s\"",
                        "not a number"),
                Arguments.of("a time that repeats", HEADER + GOOD + "0.02,103,53,-23,21.6\n", 5, "\"t_s\"",
                        "does not increase"),
                Arguments.of("a time that goes back", HEADER + GOOD + "0.03,1,1,1,21\n0.025,103,53,-23,21.6\n", 6,
                        "\"t_s\"", "does not increase"),
                Arguments.of("an arm column that is not there", "t_s,g1,g_2,g3,temp_c\n" + GOOD, 1, "\"g2\"",
                        "did you mean \"g_2\""),
                Arguments.of("a temperature column that is not there", "t_s,g1,g2,g3,temp_C\n" + GOOD, 1,
                        "\"temp_c\"", "did you mean \"temp_C\""),
                Arguments.of("a time column that is not there", "time_s,g1,g2,g3,temp_c\n" + GOOD, 1, "\"t_s\"",
                        "not in the header"),
                Arguments.of("a row too short", HEADER + GOOD + "0.03,103,53\n", 5, "\"g3\"", "3 fields"),
                Arguments.of("a row too long", HEADER + GOOD + "0.03,103,53,-23,21.6,7\n", 5, "", "6 fields"),
                Arguments.of("an empty file", "", 1, "", "empty"),
                Arguments.of("a header and no rows", HEADER, 2, "", "no data rows"),
                Arguments.of("a header without a line end and no rows", HEADER.strip(), 2, "", "no data rows"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("faults")
    void isAnErrorAtItsLineNamingTheColumnAndWritesNothing(String fault, String csv, int line, String column,
                                                          String words, @TempDir Path dir) throws Exception {
        Files.writeString(dir.resolve("data.csv"), csv, StandardCharsets.US_ASCII);
        SeriesRun run = SeriesRun.of(dir, SCRIPT);
        assertEquals(2, run.status(), fault + ": exit 2\n" + run.describe());
        String prefix = "data.csv:" + line + ": error: ";
        assertTrue(run.err().contains(prefix), fault + ": the error names the file and line " + line + ":\n" + run.err());
        String message = run.err().substring(run.err().indexOf(prefix));
        message = message.substring(0, message.indexOf('\n') < 0 ? message.length() : message.indexOf('\n'));
        assertTrue(message.contains(column), fault + ": the error names the column " + column + ":\n" + message);
        assertTrue(message.contains(words), fault + ": the error says " + words + ":\n" + message);
        assertTrue(!run.err().contains("Exception") && !run.err().contains("\tat "), "no stack trace:\n" + run.err());
        assertTrue(run.wroteNothing(), fault + ": no results.json and no output folder");
        assertEquals("", run.out(), fault + ": no verdict is printed when nothing was computed");
    }
}
