package org.rosetra.lang.series;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Disabled;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The functions of a rosette (LANGUAGE.md, "Results of a rosette": strain_at, stress_at, rankine,
 * ...) over the samples of a series, and checks of them tested at every sample ("Measured series":
 * checks are tested at every sample). Expected values from the closed forms, in the test:
 * normal strain e(t) = eps_x cos^2 t + eps_y sin^2 t + gamma_xy sin t cos t (LANGUAGE.md, step 4);
 * normal stress s(t) = sigma_x cos^2 t + sigma_y sin^2 t + 2 tau_xy sin t cos t (textbook);
 * rankine = max(sA / ultimate, -sB / ultimate_c) over sigma_1, sigma_2, sigma_z (LANGUAGE.md).
 */
class SeriesRosetteFunctionsTest {
    static final String DECLARATIONS = """
            material steel {
              E        = 200 GPa
              nu       = 0.3
              yield    = 250 MPa
              ultimate = 400 MPa
            }
            gauge g {
              factor = 2.0
            }
            rosette r {
              layout   = rectangular
              gauge    = g
              material = steel
            }
            series run from "data.csv" {
              time = "t_s" s
              r    = "g1", "g2", "g3" ue
            }
            """;

    private static double[] strainAt(SyntheticSeries data, double degrees) {
        double t = Math.toRadians(degrees);
        double[] out = new double[data.n];
        for (int i = 0; i < data.n; i++) {
            double[] s = data.asRead(i);
            double ex = s[0];
            double ey = s[2];
            double g = 2 * s[1] - s[0] - s[2];
            out[i] = ex * Math.cos(t) * Math.cos(t) + ey * Math.sin(t) * Math.sin(t) + g * Math.sin(t) * Math.cos(t);
        }
        return out;
    }

    @Test
    void aCheckOfStrainAtADirectionIsTestedAtEverySample(@TempDir Path dir) throws Exception {
        SyntheticSeries data = SyntheticSeries.swaying(300, 91, Double.NaN, 0);
        data.write(dir.resolve("data.csv"));
        SeriesRun run = SeriesRun.of(dir, DECLARATIONS + """
                check "diagonal strain": strain_at(r, 30 deg) <= 600 ue
                """);
        double[] e30 = strainAt(data, 30);
        int worst = SyntheticSeries.argmax(e30);
        Map<String, Object> check = run.check("diagonal strain");
        assertEquals("run", check.get("governing"), run.describe());
        assertEquals(e30[worst] / 600e-6, (Double) check.get("utilization"), 1e-9);
        assertEquals(data.t[worst], (Double) check.get("at"), 0.0);
    }

    @Test
    void theLargestStressInADirectionOverASeries(@TempDir Path dir) throws Exception {
        SyntheticSeries data = SyntheticSeries.swaying(300, 92, Double.NaN, 0);
        data.write(dir.resolve("data.csv"));
        SeriesRun run = SeriesRun.of(dir, DECLARATIONS + """
                let peak60 = max(stress_at(r, 60 deg)[run])
                """);
        assertEquals(0, run.status(), run.describe());
        Map<String, double[]> m = data.members(data::asRead, SeriesResultsTest.E, SeriesResultsTest.NU);
        double t = Math.toRadians(60);
        double best = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < data.n; i++) {
            double s = m.get("sigma_x")[i] * Math.cos(t) * Math.cos(t) + m.get("sigma_y")[i] * Math.sin(t) * Math.sin(t)
                    + 2 * m.get("tau_xy")[i] * Math.sin(t) * Math.cos(t);
            best = Math.max(best, s);
        }
        assertEquals(best, run.value("peak60"), 1e-9 * Math.abs(best));
    }

    @Test
    void aCriterionCheckIsTestedAtEverySample(@TempDir Path dir) throws Exception {
        SyntheticSeries data = SyntheticSeries.swaying(300, 93, Double.NaN, 0);
        data.write(dir.resolve("data.csv"));
        SeriesRun run = SeriesRun.of(dir, DECLARATIONS + """
                check "brittle index": rankine(r) <= 1
                """);
        Map<String, double[]> m = data.members(data::asRead, SeriesResultsTest.E, SeriesResultsTest.NU);
        double[] index = new double[data.n];
        for (int i = 0; i < data.n; i++) {
            double s1 = m.get("sigma_1")[i];
            double s2 = m.get("sigma_2")[i];
            double sA = Math.max(s1, Math.max(s2, 0));
            double sB = Math.min(s1, Math.min(s2, 0));
            index[i] = Math.max(sA / 400e6, -sB / 400e6); // ultimate_c defaults to ultimate
        }
        int worst = SyntheticSeries.argmax(index);
        Map<String, Object> check = run.check("brittle index");
        assertEquals("run", check.get("governing"), run.describe());
        assertEquals(index[worst], (Double) check.get("utilization"), 1e-9);
        assertEquals(data.t[worst], (Double) check.get("at"), 0.0);
    }

    @Test
    void aFunctionOfARosetteOverASeriesIsNeverAnErrorWithoutALine(@TempDir Path dir) throws Exception {
        SyntheticSeries data = SyntheticSeries.swaying(100, 94, Double.NaN, 0);
        data.write(dir.resolve("data.csv"));
        SeriesRun run = SeriesRun.of(dir, DECLARATIONS + """
                let worst_index = max(rankine(r)[run])
                """);
        // Either computed (exit 0) or a user error at its line and column (DEVELOPERS.md:
        // "a user's mistake gets a message with file, line and column").
        boolean located = run.err().contains("run.strain:") && run.err().contains(": error: ");
        assertEquals(true, run.status() == 0 || (run.status() == 2 && located), run.describe());
    }
}
