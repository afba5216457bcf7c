package org.rosetra.lang.series;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The zero of a series (LANGUAGE.md, "Measured series"): a time window whose per-arm mean of
 * corrected readings is subtracted from every sample, or a baseline's readings.
 */
class SeriesZeroTest {
    static final double E = SeriesResultsTest.E;
    static final double NU = SeriesResultsTest.NU;

    @Test
    void aZeroWindowSubtractsEachArmsMeanOverTheWindowFromEverySample(@TempDir Path dir) throws Exception {
        SyntheticSeries data = SyntheticSeries.swaying(500, 21, Double.NaN, 0);
        data.write(dir.resolve("data.csv"));
        SeriesRun run = SeriesRun.of(dir, SeriesResultsTest.DECLARATIONS + """
                series run from "data.csv" {
                  time = "t_s" s
                  r    = "g1", "g2", "g3" ue
                  zero = 0 s to 2 s
                }
                let peak = max(r.von_mises[run])
                """);
        assertEquals(0, run.status(), run.describe());
        // Samples at 0.005 s, 0.015 s, ...: the window 0 s to 2 s holds the first 200 of them,
        // and no sample lies on either end.
        double[] mean = new double[3];
        int inWindow = 0;
        for (int i = 0; i < data.n; i++) {
            if (data.t[i] >= 0 && data.t[i] <= 2) {
                double[] s = data.asRead(i);
                for (int a = 0; a < 3; a++) {
                    mean[a] += s[a];
                }
                inWindow++;
            }
        }
        assertEquals(200, inWindow, "the scenario");
        for (int a = 0; a < 3; a++) {
            mean[a] /= inWindow;
        }
        Map<String, double[]> expected = data.members(i -> {
            double[] s = data.asRead(i);
            return new double[] {s[0] - mean[0], s[1] - mean[1], s[2] - mean[2]};
        }, E, NU);
        for (String member : ClosedForm.MEMBERS) {
            data.assertExtremes(run, "run", "r", member, expected.get(member));
        }
        double peak = SeriesResultsTest.max(expected.get("von_mises"));
        assertEquals(peak, run.value("peak"), 1e-9 * peak);
    }

    @Test
    void aZeroBaselineSubtractsTheBaselinesReadingsFromEverySample(@TempDir Path dir) throws Exception {
        SyntheticSeries data = SyntheticSeries.swaying(300, 22, Double.NaN, 0);
        data.write(dir.resolve("data.csv"));
        SeriesRun run = SeriesRun.of(dir, SeriesResultsTest.DECLARATIONS + """
                baseline at_rest {
                  r = 12.5, -7.25, 30 ue
                }
                series run from "data.csv" {
                  time = "t_s" s
                  r    = "g1", "g2", "g3" ue
                  zero = at_rest
                }
                """);
        assertEquals(0, run.status(), run.describe());
        // LANGUAGE.md, step 3: each arm's baseline reading is subtracted from the same arm.
        double[] zero = {12.5e-6, -7.25e-6, 30e-6};
        Map<String, double[]> expected = data.members(i -> {
            double[] s = data.asRead(i);
            return new double[] {s[0] - zero[0], s[1] - zero[1], s[2] - zero[2]};
        }, E, NU);
        for (String member : ClosedForm.MEMBERS) {
            data.assertExtremes(run, "run", "r", member, expected.get(member));
        }
    }

    @Test
    void aZeroWindowWithNoSampleInItIsAnErrorAndWritesNothing(@TempDir Path dir) throws Exception {
        SyntheticSeries data = SyntheticSeries.swaying(300, 23, Double.NaN, 0); // 0.005 s to 2.995 s
        data.write(dir.resolve("data.csv"));
        SeriesRun run = SeriesRun.of(dir, SeriesResultsTest.DECLARATIONS + """
                series run from "data.csv" {
                  time = "t_s" s
                  r    = "g1", "g2", "g3" ue
                  zero = 10 s to 12 s
                }
                let peak = max(r.von_mises[run])
                """);
        assertEquals(2, run.status(), "an error, nothing computed (LANGUAGE.md, Running and results)\n" + run.describe());
        assertTrue(run.err().contains("run.strain:17:10: error: no sample of series run lies in the zero window"), "the error is at the zero window (line 17, column 10):\n" + run.err());
        assertTrue(run.err().contains("error:"), run.err());
        assertTrue(run.wroteNothing(), "no results.json and no output folder");
    }

    @Test
    void aZeroWindowBetweenTwoSamplesIsAnError(@TempDir Path dir) throws Exception {
        SyntheticSeries data = SyntheticSeries.swaying(300, 24, Double.NaN, 0);
        data.write(dir.resolve("data.csv"));
        // 1.000 s to 1.004 s: between the samples at 0.995 s and 1.005 s.
        SeriesRun run = SeriesRun.of(dir, SeriesResultsTest.DECLARATIONS + """
                series run from "data.csv" {
                  time = "t_s" s
                  r    = "g1", "g2", "g3" ue
                  zero = 1000 ms to 1004 ms
                }
                """);
        assertEquals(2, run.status(), run.describe());
        assertTrue(run.err().contains("run.strain:17:10: error: no sample of series run lies in the zero window"), run.err());
        assertTrue(run.wroteNothing());
    }
}
