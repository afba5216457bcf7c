package org.rosetra.lang.series;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The same invented samples written with another delimiter or decimal mark, or with quoted
 * header names (RFC 4180, section 2), give the same results as the test's own reduction.
 */
class SeriesFormatsTest {

    private static void assertAllMembers(SyntheticSeries data, SeriesRun run) throws Exception {
        assertEquals(0, run.status(), run.describe());
        assertEquals(data.n, run.samples("run"));
        Map<String, double[]> expected = data.members(data::asRead, SeriesResultsTest.E, SeriesResultsTest.NU);
        for (String member : ClosedForm.MEMBERS) {
            data.assertExtremes(run, "run", "r", member, expected.get(member));
        }
    }

    private static String script(String extraFields) {
        return SeriesResultsTest.DECLARATIONS + "series run from \"data.csv\" {\n"
                + "  time = \"t_s\" s\n"
                + "  r    = \"g1\", \"g2\", \"g3\" ue\n"
                + extraFields
                + "}\n";
    }

    @Test
    void semicolonsBetweenFieldsAndADecimalComma(@TempDir Path dir) throws Exception {
        SyntheticSeries data = SyntheticSeries.swaying(300, 41, Double.NaN, 0);
        Files.writeString(dir.resolve("data.csv"), data.csv(';', ',', false), StandardCharsets.US_ASCII);
        assertAllMembers(data, SeriesRun.of(dir, script("  delimiter = \";\"\n  decimal = \",\"\n")));
    }

    @Test
    void tabsBetweenFields(@TempDir Path dir) throws Exception {
        SyntheticSeries data = SyntheticSeries.swaying(300, 42, Double.NaN, 0);
        Files.writeString(dir.resolve("data.csv"), data.csv('\t', '.', false), StandardCharsets.US_ASCII);
        assertAllMembers(data, SeriesRun.of(dir, script("  delimiter = \"tab\"\n")));
    }

    @Test
    void tabsAndADecimalCommaWithQuotedHeaderNames(@TempDir Path dir) throws Exception {
        SyntheticSeries data = SyntheticSeries.swaying(300, 43, Double.NaN, 0);
        Files.writeString(dir.resolve("data.csv"), data.csv('\t', ',', true), StandardCharsets.US_ASCII);
        assertAllMembers(data, SeriesRun.of(dir, script("  delimiter = \"tab\"\n  decimal = \",\"\n")));
    }

    @Test
    void quotedHeaderNamesWithCommasAndDoubledQuotesInside(@TempDir Path dir) throws Exception {
        SyntheticSeries data = SyntheticSeries.swaying(300, 44, Double.NaN, 0);
        // RFC 4180, 2.6 and 2.7: a field with a comma is quoted; a quote inside is doubled.
        String csv = data.csv().replaceFirst("t_s,g1,g2,g3", "\"time, s\",\"arm a\",\"arm \"\"b\"\"\",\"arm c\"");
        Files.writeString(dir.resolve("data.csv"), csv, StandardCharsets.US_ASCII);
        String script = SeriesResultsTest.DECLARATIONS + """
                series run from "data.csv" {
                  time = "time, s" s
                  r    = "arm a", "arm \\"b\\"", "arm c" ue
                }
                """;
        assertAllMembers(data, SeriesRun.of(dir, script));
    }

    @Test
    void quotedValuesAndLineFeedsOnlyReadTheSame(@TempDir Path dir) throws Exception {
        SyntheticSeries data = SyntheticSeries.swaying(300, 45, Double.NaN, 0);
        StringBuilder csv = new StringBuilder("t_s,g1,g2,g3\n");
        for (int i = 0; i < data.n; i++) {
            csv.append(data.time[i]).append(",\"").append(data.arms[0][i]).append("\",")
                    .append(data.arms[1][i]).append(',').append(data.arms[2][i]).append('\n');
        }
        Files.writeString(dir.resolve("data.csv"), csv, StandardCharsets.US_ASCII);
        assertAllMembers(data, SeriesRun.of(dir, script("")));
    }
}
