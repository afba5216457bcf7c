package org.rosetra.lang.series;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Two rosettes of different materials read in one series, a time column in milliseconds, and a
 * check with {@code >=} (utilization RIGHT / LEFT, LANGUAGE.md "Expressions, values and checks").
 * Invented scenario: a steel lug and an aluminium cover plate on one test article.
 */
class SeriesTwoRosettesTest {

    @Test
    void eachRosetteIsReducedWithItsOwnMaterialAndTimesAreInSeconds(@TempDir Path dir) throws Exception {
        SyntheticSeries lug = SyntheticSeries.swaying(400, 71, Double.NaN, 0);
        SyntheticSeries cover = SyntheticSeries.swaying(400, 72, Double.NaN, 0);
        StringBuilder csv = new StringBuilder("t_ms,a1,a2,a3,b1,b2,b3\n");
        double[] seconds = new double[lug.n];
        for (int i = 0; i < lug.n; i++) {
            long ms = i * 10L + 5;               // 5 ms, 15 ms, ...
            seconds[i] = ms / 1000.0;
            csv.append(ms);
            for (int a = 0; a < 3; a++) {
                csv.append(',').append(lug.arms[a][i]);
            }
            for (int a = 0; a < 3; a++) {
                csv.append(',').append(cover.arms[a][i]);
            }
            csv.append('\n');
        }
        Files.writeString(dir.resolve("data.csv"), csv);
        SeriesRun run = SeriesRun.of(dir, """
                material steel {
                  E     = 200 GPa
                  nu    = 0.3
                  yield = 250 MPa
                }
                material alloy {
                  E     = 70 GPa
                  nu    = 0.33
                  yield = 240 MPa
                }
                gauge g {
                  factor = 2.0
                }
                rosette lug {
                  layout   = rectangular
                  gauge    = g
                  material = steel
                }
                rosette cover {
                  layout   = rectangular
                  gauge    = g
                  material = alloy
                }
                series run from "data.csv" {
                  time  = "t_ms" ms
                  lug   = "a1", "a2", "a3" ue
                  cover = "b1", "b2", "b3" ue
                }
                let cover_peak = max(cover.sigma_1[run])
                check "cover stays loaded": cover.tau_abs >= 0.5 MPa
                """);
        assertEquals(0, run.status(), run.describe());
        Map<String, double[]> lugMembers = lug.members(lug::asRead, 200e9, 0.3);
        Map<String, double[]> coverMembers = cover.members(cover::asRead, 70e9, 0.33);
        for (String member : ClosedForm.MEMBERS) {
            assertMember(run, "lug", member, lugMembers.get(member), seconds);
            assertMember(run, "cover", member, coverMembers.get(member), seconds);
        }
        double[] s1 = coverMembers.get("sigma_1");
        assertEquals(s1[SyntheticSeries.argmax(s1)], run.value("cover_peak"), 1e-9 * Math.abs(s1[SyntheticSeries.argmax(s1)]));

        // >=: utilization RIGHT / LEFT, worst where tau_abs is smallest.
        double[] tau = coverMembers.get("tau_abs");
        int least = 0;
        for (int i = 1; i < tau.length; i++) {
            if (tau[i] < tau[least]) {
                least = i;
            }
        }
        Map<String, Object> check = run.check("cover stays loaded");
        assertEquals(0.5e6 / tau[least], (Double) check.get("utilization"), 1e-9 * (0.5e6 / tau[least]));
        assertEquals(seconds[least], (Double) check.get("at"), 1e-12, "\"at\" in seconds (LANGUAGE.md, Running and results)");
        assertEquals(0.5e6 / tau[least] <= 1, check.get("pass"));
    }

    /** As {@link SyntheticSeries#assertExtremes}, with the times read from milliseconds. */
    private static void assertMember(SeriesRun run, String rosette, String member, double[] expected, double[] seconds)
            throws Exception {
        Map<String, Object> got = run.member("run", rosette, member);
        int hi = 0;
        int lo = 0;
        for (int i = 1; i < expected.length; i++) {
            hi = expected[i] > expected[hi] ? i : hi;
            lo = expected[i] < expected[lo] ? i : lo;
        }
        double scale = Math.max(Math.abs(expected[hi]), Math.abs(expected[lo]));
        double tol = 1e-9 * scale + 1e-18;
        String what = rosette + "." + member;
        assertEquals(expected[hi], (Double) got.get("max"), tol, what + " max");
        assertEquals(expected[lo], (Double) got.get("min"), tol, what + " min");
        if (scale > 0) {
            int iHi = nearest(seconds, (Double) got.get("t_max"));
            int iLo = nearest(seconds, (Double) got.get("t_min"));
            assertEquals(seconds[iHi], (Double) got.get("t_max"), 1e-12, what + " t_max is a sample's time in seconds");
            assertEquals(seconds[iLo], (Double) got.get("t_min"), 1e-12, what + " t_min");
            assertEquals(expected[hi], expected[iHi], tol, String.format(Locale.ROOT, "%s reaches its max at t_max", what));
            assertEquals(expected[lo], expected[iLo], tol, String.format(Locale.ROOT, "%s reaches its min at t_min", what));
        }
    }

    private static int nearest(double[] times, double t) {
        int best = 0;
        for (int i = 1; i < times.length; i++) {
            if (Math.abs(times[i] - t) < Math.abs(times[best] - t)) {
                best = i;
            }
        }
        return best;
    }
}
