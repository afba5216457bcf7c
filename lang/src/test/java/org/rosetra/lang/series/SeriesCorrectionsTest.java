package org.rosetra.lang.series;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Every sample of a series goes through the same steps as a hand reading (LANGUAGE.md, "What
 * happens to one reading, in order"): here a three-wire quarter bridge with lead resistance read
 * at another instrument factor (step 1), and transverse sensitivity in the solve (step 4).
 */
class SeriesCorrectionsTest {
    static final double F = 2.10;
    static final double F_INST = 2.00;
    static final double KT = 0.015;
    static final double NU0 = 0.285;
    static final double R_GAUGE = 350;
    static final double R_LEAD = 0.8;

    /** Step 1, quarter_3wire (n = 1): Vr = F_inst e_ind / 4, e = 4 Vr / (1 - 2 Vr) (1 + R_lead / R_gauge) / F. */
    static double bridge(double indicated) {
        double vr = F_INST * indicated / 4;
        return 4 * vr / (1 - 2 * vr) * (1 + 1 * R_LEAD / R_GAUGE) / F;
    }

    /**
     * Step 4 for arms at 0, 45, 90 deg: each arm reads (e(t) + Kt e(t + 90)) / (1 - nu0 Kt); solved
     * in closed form (derived in the test from LANGUAGE.md's equation), returned as the arm strains a
     * perfect rectangular rosette would read, so {@link ClosedForm} can take it from there.
     */
    static double[] withoutTransverse(double ra, double rb, double rc) {
        double d = 1 - NU0 * KT;
        double ex = d * (ra - KT * rc) / (1 - KT * KT);
        double ey = d * (rc - KT * ra) / (1 - KT * KT);
        double gxy = (2 * d * rb - (1 + KT) * (ex + ey)) / (1 - KT);
        return new double[] {ex, (gxy + ex + ey) / 2, ey};
    }

    @Test
    void aQuarterBridgeWithLeadsAndTransverseSensitivityIsCorrectedAtEverySample(@TempDir Path dir) throws Exception {
        SyntheticSeries data = SyntheticSeries.swaying(400, 101, Double.NaN, 0);
        data.write(dir.resolve("data.csv"));
        SeriesRun run = SeriesRun.of(dir, """
                material steel {
                  E     = 200 GPa
                  nu    = 0.3
                  yield = 250 MPa
                }
                gauge foil {
                  factor     = 2.10
                  transverse = 1.5 %
                  nu0        = 0.285
                  resistance = 350 ohm
                }
                rosette r {
                  layout            = rectangular
                  gauge             = foil
                  material          = steel
                  bridge            = quarter_3wire
                  lead              = 0.8 ohm
                  instrument_factor = 2.00
                }
                series run from "data.csv" {
                  time = "t_s" s
                  r    = "g1", "g2", "g3" ue
                }
                let peak = max(r.von_mises[run])
                """);
        assertEquals(0, run.status(), run.describe());
        Map<String, double[]> expected = data.members(i -> {
            double[] s = data.asRead(i);
            return withoutTransverse(bridge(s[0]), bridge(s[1]), bridge(s[2]));
        }, SeriesResultsTest.E, SeriesResultsTest.NU);
        for (String member : ClosedForm.MEMBERS) {
            data.assertExtremes(run, "run", "r", member, expected.get(member));
        }
        double peak = SeriesResultsTest.max(expected.get("von_mises"));
        assertEquals(peak, run.value("peak"), 1e-9 * peak);
    }

    /**
     * Step 4 with arm a at {@code angle} from the part's x-axis: arm i at angle + {0, 45, 90} deg
     * reads e(t) = eps_x cos^2 t + eps_y sin^2 t + gamma_xy sin t cos t (LANGUAGE.md); the three
     * equations are solved here by Cramer's rule, and returned as the arm strains a rosette at 0 deg
     * would read (eps_x, (gamma_xy + eps_x + eps_y) / 2, eps_y) for {@link ClosedForm}.
     */
    static double[] inPartAxes(double[] reads, double angleDeg) {
        double[][] m = new double[3][];
        for (int i = 0; i < 3; i++) {
            double t = Math.toRadians(angleDeg + 45 * i);
            m[i] = new double[] {Math.cos(t) * Math.cos(t), Math.sin(t) * Math.sin(t), Math.sin(t) * Math.cos(t)};
        }
        double det = det(m[0], m[1], m[2]);
        double[] x = new double[3];
        for (int k = 0; k < 3; k++) {
            double[][] c = {m[0].clone(), m[1].clone(), m[2].clone()};
            for (int i = 0; i < 3; i++) {
                c[i][k] = reads[i];
            }
            x[k] = det(c[0], c[1], c[2]) / det;
        }
        return new double[] {x[0], (x[2] + x[0] + x[1]) / 2, x[1]};
    }

    private static double det(double[] a, double[] b, double[] c) {
        return a[0] * (b[1] * c[2] - b[2] * c[1]) - a[1] * (b[0] * c[2] - b[2] * c[0]) + a[2] * (b[0] * c[1] - b[1] * c[0]);
    }

    @Test
    void aRosetteTurnedOnThePartGivesEveryResultInThePartsAxes(@TempDir Path dir) throws Exception {
        SyntheticSeries data = SyntheticSeries.swaying(400, 102, Double.NaN, 0);
        data.write(dir.resolve("data.csv"));
        SeriesRun run = SeriesRun.of(dir, """
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
                  angle    = 30 deg
                }
                series run from "data.csv" {
                  time = "t_s" s
                  r    = "g1", "g2", "g3" ue
                }
                """);
        assertEquals(0, run.status(), run.describe());
        Map<String, double[]> expected = data.members(i -> inPartAxes(data.asRead(i), 30),
                SeriesResultsTest.E, SeriesResultsTest.NU);
        for (String member : ClosedForm.MEMBERS) {
            data.assertExtremes(run, "run", "r", member, expected.get(member));
        }
    }

    @Test
    void planeStrainGivesSigmaZAndAThreeDimensionalVonMisesAtEverySample(@TempDir Path dir) throws Exception {
        SyntheticSeries data = SyntheticSeries.swaying(400, 103, Double.NaN, 0);
        data.write(dir.resolve("data.csv"));
        SeriesRun run = SeriesRun.of(dir, """
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
                  state    = plane_strain
                }
                series run from "data.csv" {
                  time = "t_s" s
                  r    = "g1", "g2", "g3" ue
                }
                check "embedded gauge margin": r.von_mises <= 200 MPa
                """);
        assertEquals(0, run.status(), run.describe());
        Map<String, double[]> expected = data.members(data::asRead, SeriesResultsTest.E, SeriesResultsTest.NU, true);
        for (String member : ClosedForm.MEMBERS) {
            data.assertExtremes(run, "run", "r", member, expected.get(member));
        }
        double[] vm = expected.get("von_mises");
        int worst = SyntheticSeries.argmax(vm);
        assertEquals(vm[worst] / 200e6, (Double) run.check("embedded gauge margin").get("utilization"), 1e-9);
        assertEquals(data.t[worst], (Double) run.check("embedded gauge margin").get("at"), 0.0);
    }
}
