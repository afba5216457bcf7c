package org.rosetra.lang.series;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.util.HexFormat;
import java.util.Locale;
import org.junit.jupiter.api.Disabled;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * What the calculation record says about a series (DESIGN.md, "Outputs": traceable, "a SHA-256
 * of every input file ... every correction applied with its values").
 */
class SeriesRecordTest {
    static final String SCRIPT = SeriesTemperatureTest.DECLARATIONS + """
            series run from "data.csv" {
              time        = "t_s" s
              r           = "g1", "g2", "g3" ue
              temperature = "temp_c" degC
              zero        = 0 s to 1 s
            }
            let peak = max(r.von_mises[run])
            """;

    @Test
    void theRecordNamesTheFileWithItsDigestRowsAndTimeSpan(@TempDir Path dir) throws Exception {
        SyntheticSeries data = SyntheticSeries.swaying(250, 81, 18, 27);
        data.write(dir.resolve("data.csv"));
        SeriesRun run = SeriesRun.of(dir, SCRIPT);
        assertEquals(0, run.status(), run.describe());
        String record = Files.readString(run.outDir().resolve("record.md"));
        // SHA-256 (FIPS 180-4) of the bytes written, computed here with the JDK.
        String digest = HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256")
                .digest(Files.readAllBytes(dir.resolve("data.csv"))));
        assertTrue(record.contains(digest), "the record holds the data file's SHA-256\n" + record);
        String row = record.lines().filter(l -> l.startsWith("| run |")).findFirst().orElseThrow();
        assertTrue(row.contains("| 250 |"), "the number of rows: " + row);
        assertTrue(row.contains("0.005") && row.contains("2.495"), "the time span, first to last sample: " + row);
    }

    @Test
    void theRecordGivesTheZeroSubtractedFromEachArm(@TempDir Path dir) throws Exception {
        SyntheticSeries data = SyntheticSeries.swaying(250, 82, 18, 27);
        data.write(dir.resolve("data.csv"));
        SeriesRun run = SeriesRun.of(dir, SCRIPT);
        assertEquals(0, run.status(), run.describe());
        String record = Files.readString(run.outDir().resolve("record.md"));
        // The mean of arm a's corrected readings over the window (LANGUAGE.md, Measured series).
        double sum = 0;
        int count = 0;
        for (int i = 0; i < data.n && data.t[i] <= 1; i++) {
            sum += SeriesTemperatureTest.corrected(data.microstrain[0][i], data.temp[i]) / 1e-6;
            count++;
        }
        String armA = String.format(Locale.ROOT, "%.1f", sum / count);
        assertTrue(record.contains(armA), "the zero of arm a, " + armA + " ue, is in the record\n" + record);
    }

    @Test
    void theCorrectionsSectionCoversASeries(@TempDir Path dir) throws Exception {
        SyntheticSeries data = SyntheticSeries.swaying(250, 83, 18, 27);
        data.write(dir.resolve("data.csv"));
        SeriesRun run = SeriesRun.of(dir, SCRIPT);
        assertEquals(0, run.status(), run.describe());
        String record = Files.readString(run.outDir().resolve("record.md"));
        String section = record.substring(record.indexOf("## Corrections applied"));
        section = section.substring(0, section.indexOf("\n## ", 5));
        assertTrue(!section.contains("No readings were corrected"), section);
    }
}
