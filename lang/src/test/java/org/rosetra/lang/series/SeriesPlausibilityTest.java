package org.rosetra.lang.series;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Disabled;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * An arm reading beyond +-50,000 microstrain (5 %, far past what a bonded foil gauge survives on
 * a metal part: common practice) is flagged in the record with its times, and does not stop the
 * run: the sample is still reduced like any other.
 */
class SeriesPlausibilityTest {

    @Test
    void readingsBeyondFiftyThousandMicrostrainAreTabledInTheRecordAndTheRunGoesOn(@TempDir Path dir)
            throws Exception {
        SyntheticSeries data = SyntheticSeries.swaying(300, 51, Double.NaN, 0)
                .withReading(1, 120, "61000.00")    // arm b at 1.205 s
                .withReading(1, 180, "-75000.50")   // arm b at 1.805 s, the worst
                .withReading(0, 250, "50000.00")    // arm a at 2.505 s: on the limit, not beyond it
                .withReading(2, 40, "-50000.01");   // arm c at 0.405 s: just beyond
        data.write(dir.resolve("data.csv"));
        SeriesRun run = SeriesRun.of(dir, SeriesResultsTest.DECLARATIONS + """
                series run from "data.csv" {
                  time = "t_s" s
                  r    = "g1", "g2", "g3" ue
                }
                plot r.von_mises[run]
                """);
        assertEquals(0, run.status(), "a flag is not an error\n" + run.describe());
        assertEquals(300, run.samples("run"), "every sample is still read");
        // The flagged samples are reduced like the others: gamma_xy = 2 e_b - e_a - e_c.
        Map<String, double[]> expected = data.members(data::asRead, SeriesResultsTest.E, SeriesResultsTest.NU);
        data.assertExtremes(run, "run", "r", "gamma_xy", expected.get("gamma_xy"));
        data.assertExtremes(run, "run", "r", "von_mises", expected.get("von_mises"));

        String record = Files.readString(run.outDir().resolve("record.md"));
        assertTrue(record.contains("Readings beyond a plausible range"), record);
        String table = record.substring(record.indexOf("Readings beyond a plausible range"));
        table = table.substring(0, table.indexOf("\n\n", table.indexOf("| :")));
        String armB = line(table, "arm b");
        assertTrue(armB.contains("\"g2\""), "names the column: " + armB);
        assertTrue(armB.matches(".*\\| 2(\\.0+)? \\|.*"), "two readings of arm b: " + armB);
        assertTrue(armB.contains("| -75000.5 |") || armB.contains("| -75001 |"), "the worst, as shown: " + armB);
        assertTrue(armB.contains("1.805"), "the time of the worst: " + armB);
        assertTrue(armB.contains("1.205"), "the time of the first: " + armB);
        String armC = line(table, "arm c");
        assertTrue(armC.contains("0.405"), "just beyond the limit is flagged: " + armC);
        assertFalse(table.contains("arm a"), "exactly 50,000 ue is not beyond the limit:\n" + table);
    }

    @Test
    void aSeriesWithinTheRangeHasNoSuchTable(@TempDir Path dir) throws Exception {
        SyntheticSeries data = SyntheticSeries.swaying(200, 52, Double.NaN, 0);
        data.write(dir.resolve("data.csv"));
        SeriesRun run = SeriesRun.of(dir, SeriesResultsTest.DECLARATIONS + """
                series run from "data.csv" {
                  time = "t_s" s
                  r    = "g1", "g2", "g3" ue
                }
                """);
        assertEquals(0, run.status(), run.describe());
        assertFalse(Files.readString(run.outDir().resolve("record.md")).contains("plausible range"));
    }

    @Test
    void theCountOfFlaggedReadingsIsAWholeNumber(@TempDir Path dir) throws Exception {
        SyntheticSeries data = SyntheticSeries.swaying(200, 53, Double.NaN, 0)
                .withReading(1, 20, "61000.00")
                .withReading(1, 30, "62000.00");
        data.write(dir.resolve("data.csv"));
        SeriesRun run = SeriesRun.of(dir, SeriesResultsTest.DECLARATIONS + """
                series run from "data.csv" {
                  time = "t_s" s
                  r    = "g1", "g2", "g3" ue
                }
                """);
        assertEquals(0, run.status(), run.describe());
        String record = Files.readString(run.outDir().resolve("record.md"));
        String armB = line(record.substring(record.indexOf("Readings beyond a plausible range")), "arm b");
        assertTrue(armB.contains("| 2 |"), "a count of readings has no decimals: " + armB);
    }

    private static String line(String table, String containing) {
        for (String l : table.split("\n")) {
            if (l.contains(containing)) {
                return l;
            }
        }
        throw new AssertionError("no row with " + containing + " in\n" + table);
    }
}
