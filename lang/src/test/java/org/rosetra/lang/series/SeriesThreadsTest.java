package org.rosetra.lang.series;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.rosetra.lang.check.Diagnostics;
import org.rosetra.lang.output.ResultsJson;
import org.rosetra.lang.plan.Outcome;
import org.rosetra.lang.plan.Session;
import org.rosetra.runtime.series.ReadOptions;

/**
 * The results of a series do not depend on how it is read (DESIGN.md, "Outputs":
 * deterministic, byte-identical files): one thread or several, large or tiny chunks and read
 * buffers, give byte-identical results.json; and a file large enough for the command line to
 * split it (two parts of at least 4 MiB each) agrees with one pass and with the test's own
 * reduction.
 */
class SeriesThreadsTest {
    static final String SCRIPT = SeriesTemperatureTest.DECLARATIONS + """
            series run from "data.csv" {
              time        = "t_s" s
              r           = "g1", "g2", "g3" ue
              temperature = "temp_c" degC
              zero        = 0 s to 2 s
            }
            let peak = max(r.von_mises[run])
            let lowest = min(r.sigma_2[run])
            check "bracket margin": r.von_mises <= 200 MPa
            check "shear margin": r.tau_abs >= 0.1 MPa
            plot r.von_mises[run]
            """;

    /** results.json as the session writes it when the series is read with these options. */
    static byte[] resultsWith(Path dir, ReadOptions options) throws Exception {
        Session session = new Session(dir);
        session.readOptions(options);
        Diagnostics diagnostics = new Diagnostics();
        session.submit("script", "run.strain", SCRIPT, diagnostics);
        Outcome outcome = session.evaluate(diagnostics);
        assertTrue(!diagnostics.hasErrors(), () -> diagnostics.render(session::sourceOf));
        return ResultsJson.write(outcome.results());
    }

    @Test
    void oneThreadOrManyAndAnyChunkOrBufferSizeGiveByteIdenticalResults(@TempDir Path dir) throws Exception {
        SyntheticSeries data = SyntheticSeries.swaying(3000, 61, 18, 27);
        data.write(dir.resolve("data.csv"));
        ReadOptions one = ReadOptions.defaults().withThreads(1);
        byte[] reference = resultsWith(dir, one);
        assertTrue(new String(reference, StandardCharsets.UTF_8).contains("\"series\""));
        ReadOptions[] others = {
            one.withChunkRows(7),
            one.withChunkRows(1).withBufferBytes(16),
            ReadOptions.defaults().withThreads(2).withMinBytesPerPart(1024).withChunkRows(7),
            ReadOptions.defaults().withThreads(3).withMinBytesPerPart(512).withChunkRows(100).withBufferBytes(64),
            ReadOptions.defaults().withThreads(8).withMinBytesPerPart(100).withChunkRows(1),
        };
        for (ReadOptions o : others) {
            assertArrayEquals(reference, resultsWith(dir, o), "results.json read with " + o);
        }
        Files.writeString(dir.resolve("run.strain"), SCRIPT);
        SeriesRun cli = SeriesRun.run(dir.resolve("run.strain"), dir.resolve("cli.json"), dir.resolve("run.out"));
        assertEquals(0, cli.status(), cli.describe());
        assertArrayEquals(reference, Files.readAllBytes(cli.json()), "the command line's results.json");
    }

    @Test
    void aFileLargeEnoughToSplitAgreesWithOnePassAndWithTheTestsOwnReduction(@TempDir Path dir) throws Exception {
        int n = 300_000;
        SyntheticSeries data = SyntheticSeries.swaying(n, 62, 18, 27);
        data.write(dir.resolve("data.csv"));
        long size = Files.size(dir.resolve("data.csv"));
        assertTrue(size > 8L << 20, "the scenario: two parts of 4 MiB at least (ReadOptions.defaults), " + size);
        Files.writeString(dir.resolve("run.strain"), SCRIPT);
        SeriesRun first = SeriesRun.run(dir.resolve("run.strain"), dir.resolve("first.json"), dir.resolve("first.out"));
        SeriesRun second = SeriesRun.run(dir.resolve("run.strain"), dir.resolve("second.json"), dir.resolve("second.out"));
        assertEquals(0, first.status(), first.describe());
        byte[] json = Files.readAllBytes(first.json());
        assertArrayEquals(json, Files.readAllBytes(second.json()), "two runs give byte-identical results.json");
        assertArrayEquals(json, resultsWith(dir, ReadOptions.defaults().withThreads(1)),
                "the default read (up to two threads) gives what one pass gives, byte for byte");
        assertArrayEquals(Files.readAllBytes(first.outDir().resolve("record.md")),
                Files.readAllBytes(second.outDir().resolve("record.md")), "record.md is deterministic too");

        assertEquals(n, first.samples("run"));
        double[] mean = new double[3];
        int count = 0;
        for (int i = 0; i < n && data.t[i] <= 2; i++) {
            for (int a = 0; a < 3; a++) {
                mean[a] += SeriesTemperatureTest.corrected(data.microstrain[a][i], data.temp[i]);
            }
            count++;
        }
        for (int a = 0; a < 3; a++) {
            mean[a] /= count;
        }
        Map<String, double[]> expected = data.members(i -> new double[] {
            SeriesTemperatureTest.corrected(data.microstrain[0][i], data.temp[i]) - mean[0],
            SeriesTemperatureTest.corrected(data.microstrain[1][i], data.temp[i]) - mean[1],
            SeriesTemperatureTest.corrected(data.microstrain[2][i], data.temp[i]) - mean[2]},
                SeriesTemperatureTest.E, SeriesTemperatureTest.NU);
        for (String member : ClosedForm.MEMBERS) {
            data.assertExtremes(first, "run", "r", member, expected.get(member));
        }
        double[] vm = expected.get("von_mises");
        int worst = SyntheticSeries.argmax(vm);
        Map<String, Object> check = first.check("bracket margin");
        assertEquals(vm[worst] / 200e6, (Double) check.get("utilization"), 1e-9, "LEFT / RIGHT at the worst sample");
        assertEquals(data.t[worst], (Double) check.get("at"), 0.0);
    }

    @Test
    void badDataInTheLaterPartOfASplitFileIsReportedAtItsExactLine(@TempDir Path dir) throws Exception {
        int n = 300_000;
        SyntheticSeries data = SyntheticSeries.swaying(n, 63, 18, 27)
                .withReading(2, 250_000, "12..5");   // file line 250,002 (header on line 1)
        data.write(dir.resolve("data.csv"));
        Files.writeString(dir.resolve("run.strain"), SCRIPT);
        SeriesRun run = SeriesRun.run(dir.resolve("run.strain"), dir.resolve("r.json"), dir.resolve("run.out"));
        assertEquals(2, run.status(), run.describe());
        assertTrue(run.err().contains("data.csv:250002: error: column \"g3\": \"12..5\" is not a number"), run.err());
        assertTrue(run.wroteNothing());
    }

    @Test
    void ofTwoFaultsInDifferentPartsTheFirstInFileOrderIsReported(@TempDir Path dir) throws Exception {
        int n = 300_000;
        SyntheticSeries data = SyntheticSeries.swaying(n, 64, 18, 27)
                .withReading(0, 260_000, "")         // line 260,002: missing, in the later part
                .withReading(1, 100_000, "x");       // line 100,002: not a number, in the earlier part
        data.write(dir.resolve("data.csv"));
        Files.writeString(dir.resolve("run.strain"), SCRIPT);
        SeriesRun run = SeriesRun.run(dir.resolve("run.strain"), dir.resolve("r.json"), dir.resolve("run.out"));
        assertEquals(2, run.status(), run.describe());
        assertTrue(run.err().contains("data.csv:100002: error: column \"g2\""), run.err());
        assertTrue(!run.err().contains("260002"), "only the first fault: " + run.err());
        assertTrue(run.wroteNothing());
    }
}
