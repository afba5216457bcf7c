package org.rosetra.lang.series;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A measured series reduced by the tool against the test's own reduction of the same file
 * ({@link ClosedForm}): the extremes of every member and their times, the number of samples,
 * {@code max}/{@code min} of a history as a value, and checks tested at every sample.
 * The scenario is invented: a bracket on a shaker table, one rectangular rosette, 100 Hz.
 */
class SeriesResultsTest {
    static final double E = 200e9;
    static final double NU = 0.3;

    static final String DECLARATIONS = """
            material steel {
              E     = 200 GPa
              nu    = 0.3
              yield = 250 MPa
            }
            gauge g {
              factor = 2.0
            }
            rosette r {
              layout   = rectangular
              gauge    = g
              material = steel
            }
            """;

    static final String SERIES = """
            series run from "data.csv" {
              time = "t_s" s
              r    = "g1", "g2", "g3" ue
            }
            """;

    @Test
    void everyMemberHasTheLargestAndSmallestValueAndTheirTimes(@TempDir Path dir) throws Exception {
        SyntheticSeries data = SyntheticSeries.swaying(400, 11, Double.NaN, 0);
        data.write(dir.resolve("data.csv"));
        SeriesRun run = SeriesRun.of(dir, DECLARATIONS + SERIES + """
                let peak = max(r.von_mises[run])
                let lowest_principal = min(r.sigma_2[run])
                """);
        assertEquals(0, run.status(), run.describe());
        // Gauge factor 2.0 read at the instrument's factor (the gauge's own): e = e_ind
        // (LANGUAGE.md, "What happens to one reading", step 1).
        Map<String, double[]> expected = data.members(data::asRead, E, NU);
        assertEquals(400, run.samples("run"), "one sample per data row (LANGUAGE.md, Measured series)");
        for (String member : ClosedForm.MEMBERS) {
            data.assertExtremes(run, "run", "r", member, expected.get(member));
        }
        double peak = max(expected.get("von_mises"));
        double lowest = min(expected.get("sigma_2"));
        assertEquals(peak, run.value("peak"), 1e-9 * peak, "max(x[series]) in values (LANGUAGE.md, Running and results)");
        assertEquals(lowest, run.value("lowest_principal"), 1e-9 * Math.abs(lowest), "min(x[series]) in values");
    }

    @Test
    void aCheckThatHoldsAtEverySampleGivesItsWorstUtilizationAndTime(@TempDir Path dir) throws Exception {
        SyntheticSeries data = SyntheticSeries.swaying(300, 12, Double.NaN, 0);
        data.write(dir.resolve("data.csv"));
        SeriesRun run = SeriesRun.of(dir, DECLARATIONS + SERIES + """
                check "bracket margin": r.von_mises <= 200 MPa
                """);
        assertEquals(0, run.status(), run.describe());
        double[] vm = data.members(data::asRead, E, NU).get("von_mises");
        int worst = SyntheticSeries.argmax(vm);
        Map<String, Object> check = run.check("bracket margin");
        assertEquals(Boolean.TRUE, check.get("pass"));
        // Utilization LEFT / RIGHT for <=, highest over the samples (LANGUAGE.md, checks).
        assertEquals(vm[worst] / 200e6, (Double) check.get("utilization"), 1e-9, "utilization of the worst sample");
        assertEquals("run", check.get("governing"), "a sample governs: the series is named (LANGUAGE.md, Running and results)");
        assertEquals(data.t[worst], (Double) check.get("at"), 0.0, "\"at\" is the time of the worst sample");
        assertTrue(run.out().contains("pass  check \"bracket margin\""), run.out());
    }

    @Test
    void aCheckThatFailsAtSomeSampleExitsOneAndStillWritesEveryOutput(@TempDir Path dir) throws Exception {
        SyntheticSeries data = SyntheticSeries.swaying(300, 13, Double.NaN, 0);
        data.write(dir.resolve("data.csv"));
        double[] vm = data.members(data::asRead, E, NU).get("von_mises");
        int worst = SyntheticSeries.argmax(vm);
        // A limit some way under the peak, so a few samples break it.
        double limitMpa = Math.floor(vm[worst] / 1e6) - 5;
        SeriesRun run = SeriesRun.of(dir, DECLARATIONS + SERIES + String.format(Locale.ROOT, """
                let allowable = %.1f MPa
                check "bracket margin": r.von_mises <= allowable
                check "shear margin": r.tau_abs <= 0.5 * steel.yield
                """, limitMpa));
        assertEquals(1, run.status(), "exit 1 when a check failed (LANGUAGE.md, Running and results)\n" + run.describe());
        Map<String, Object> check = run.check("bracket margin");
        assertEquals(Boolean.FALSE, check.get("pass"));
        assertEquals(vm[worst] / (limitMpa * 1e6), (Double) check.get("utilization"), 1e-9);
        assertEquals("run", check.get("governing"));
        assertEquals(data.t[worst], (Double) check.get("at"), 0.0);
        double[] tauAbs = data.members(data::asRead, E, NU).get("tau_abs");
        int worstShear = SyntheticSeries.argmax(tauAbs);
        Map<String, Object> shear = run.check("shear margin");
        assertEquals(Boolean.TRUE, shear.get("pass"));
        assertEquals(tauAbs[worstShear] / 125e6, (Double) shear.get("utilization"), 1e-9);
        assertEquals(data.t[worstShear], (Double) shear.get("at"), 0.0);
        assertTrue(Files.isRegularFile(run.outDir().resolve("results.json")), "outputs are written on exit 1");
        assertTrue(Files.isRegularFile(run.outDir().resolve("record.md")));
        assertTrue(run.out().contains("FAIL  check \"bracket margin\""), run.out());
    }

    @Test
    void aCheckOverCasesAndASeriesIsGovernedByTheWorseOfThem(@TempDir Path dir) throws Exception {
        SyntheticSeries data = SyntheticSeries.swaying(300, 14, Double.NaN, 0);
        data.write(dir.resolve("data.csv"));
        double[] vm = data.members(data::asRead, E, NU).get("von_mises");
        int worst = SyntheticSeries.argmax(vm);

        // A hand reading far above anything in the series: the case governs.
        double big = ClosedForm.rectangularPlaneStress(900e-6, 300e-6, -400e-6, E, NU).get("von_mises");
        assertTrue(big > vm[worst], "the scenario: the case is worse");
        SeriesRun caseWorse = SeriesRun.of(dir, DECLARATIONS + SERIES + """
                case overload {
                  r = 900, 300, -400 ue
                }
                check "bracket margin": r.von_mises <= 240 MPa
                """);
        assertEquals(0, caseWorse.status(), caseWorse.describe());
        Map<String, Object> c1 = caseWorse.check("bracket margin");
        assertEquals("overload", c1.get("governing"), "the governing case is the one of highest utilization");
        assertEquals(big / 240e6, (Double) c1.get("utilization"), 1e-9);
        assertNull(c1.get("at"), "a case, not a sample, governs: no time");

        // A small hand reading: the worst sample of the series governs.
        double small = ClosedForm.rectangularPlaneStress(50e-6, 20e-6, -10e-6, E, NU).get("von_mises");
        assertTrue(small < vm[worst], "the scenario: the series is worse");
        Path second = Files.createDirectory(dir.resolve("second"));
        data.write(second.resolve("data.csv"));
        SeriesRun seriesWorse = SeriesRun.of(second, DECLARATIONS + SERIES + """
                case settle {
                  r = 50, 20, -10 ue
                }
                check "bracket margin": r.von_mises <= 240 MPa
                """);
        assertEquals(0, seriesWorse.status(), seriesWorse.describe());
        Map<String, Object> c2 = seriesWorse.check("bracket margin");
        assertEquals("run", c2.get("governing"));
        assertEquals(vm[worst] / 240e6, (Double) c2.get("utilization"), 1e-9);
        assertEquals(data.t[worst], (Double) c2.get("at"), 0.0);
        assertFalse(((java.util.List<?>) seriesWorse.results().get("cases")).isEmpty(), "the case is listed");
    }

    static double max(double[] v) {
        double m = Double.NEGATIVE_INFINITY;
        for (double x : v) {
            m = Math.max(m, x);
        }
        return m;
    }

    static double min(double[] v) {
        double m = Double.POSITIVE_INFINITY;
        for (double x : v) {
            m = Math.min(m, x);
        }
        return m;
    }
}
