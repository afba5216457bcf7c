package org.rosetra.lang.e2e;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.rosetra.lang.e2e.ScriptRun.script;

import java.nio.file.Path;
import java.util.stream.Stream;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealVector;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * What happens to one reading, in order (LANGUAGE.md, "What happens to one reading, in
 * order"): bridge and lead wires, thermal output, baseline, then the solve with transverse
 * sensitivity. Every expectation is the arm correction worked by hand, then the
 * rectangular-rosette relations at 0 deg (textbook): eps_x = e_a, eps_y = e_c,
 * gamma_xy = 2 e_b - e_a - e_c.
 */
class ReadingPipelineTest {
    private static final double STRAIN = 1e-12;

    @TempDir
    Path dir;

    private static final String MATERIAL = """
            material steel {
              E  = 200 GPa
              nu = 0.3
            }
            """;

    private static void assertRectangular(ScriptRun run, String caseName, double a, double b, double c) {
        // Rectangular rosette at 0 deg (textbook): eps_x = e_a, eps_y = e_c, gamma_xy = 2 e_b - e_a - e_c
        assertEquals(a, run.member("r", caseName, "eps_x"), STRAIN, "eps_x = e_a");
        assertEquals(c, run.member("r", caseName, "eps_y"), STRAIN, "eps_y = e_c");
        assertEquals(2 * b - a - c, run.member("r", caseName, "gamma_xy"), STRAIN, "gamma_xy = 2 e_b - e_a - e_c");
    }

    @Test
    void bridgeNoneRescalesByInstrumentOverGaugeFactor() {
        // LANGUAGE.md, step 1: with bridge = none, e = e_ind * F_inst / F
        ScriptRun run = ScriptRun.run(dir, MATERIAL + """
                gauge foil {
                  factor = 2.10
                }
                rosette r {
                  layout = rectangular
                  gauge = foil
                  material = steel
                  bridge = none
                  instrument_factor = 2.00
                }
                case pull {
                  r = 500, 120, -200 ue
                }
                """).ok();
        double k = 2.00 / 2.10;
        assertRectangular(run, "pull", 500e-6 * k, 120e-6 * k, -200e-6 * k);
    }

    static Stream<Arguments> quarterBridges() {
        // bridge, wires per arm in series with the gauge (n), lead resistance, gauge resistance
        return Stream.of(
                Arguments.of("quarter", 2, 0.5, 350.0),
                Arguments.of("quarter_3wire", 1, 0.8, 350.0),
                Arguments.of("quarter", 2, 1.2, 120.0),
                Arguments.of("quarter_3wire", 1, 2.4, 120.0));
    }

    @ParameterizedTest(name = "{0}, lead {2} ohm, gauge {3} ohm")
    @MethodSource("quarterBridges")
    void quarterBridgeUndoesNonLinearityAndLeadDesensitisation(String bridge, int n, double lead, double rGauge) {
        ScriptRun run = ScriptRun.run(dir, MATERIAL + script("""
                gauge foil {
                  factor = 2.05
                  resistance = %s ohm
                }
                rosette r {
                  layout = rectangular
                  gauge = foil
                  material = steel
                  bridge = %s
                  lead = %s ohm
                  instrument_factor = 2.00
                }
                case pull {
                  r = 1500, -400, 900 ue
                }
                """, rGauge, bridge, lead)).ok();
        // LANGUAGE.md, step 1 (common practice for a quarter bridge):
        // Vr = F_inst e_ind / 4, e = 4 Vr / (1 - 2 Vr) * (1 + n R_lead / R_gauge) / F
        double[] e = new double[3];
        double[] ind = {1500e-6, -400e-6, 900e-6};
        for (int i = 0; i < 3; i++) {
            double vr = 2.00 * ind[i] / 4;
            e[i] = 4 * vr / (1 - 2 * vr) * (1 + n * lead / rGauge) / 2.05;
        }
        assertRectangular(run, "pull", e[0], e[1], e[2]);
    }

    static Stream<Arguments> temperatures() {
        // the temperature as written, and the same in degC worked by hand (common practice)
        return Stream.of(
                Arguments.of("30 degC", 30.0),
                Arguments.of("86 degF", (86 - 32) * 5.0 / 9.0),
                Arguments.of("303.15 K", 303.15 - 273.15),
                Arguments.of("-4 degF", (-4 - 32) * 5.0 / 9.0),
                Arguments.of("250 K", 250 - 273.15));
    }

    @ParameterizedTest(name = "temperature = {0}")
    @MethodSource("temperatures")
    void thermalOutputIsSubtractedAtTheTemperatureInDegC(String temperature, double tC) {
        ScriptRun run = ScriptRun.run(dir, MATERIAL + script("""
                gauge foil {
                  factor         = 2.09
                  thermal        = -21.5, 2.10, -0.0430, 0.000155, 0 ue
                  thermal_factor = 2.00
                }
                rosette r {
                  layout = rectangular
                  gauge = foil
                  material = steel
                }
                case warm {
                  temperature = %s
                  r = 300, 100, -50 ue
                }
                """, temperature)).ok();
        // LANGUAGE.md, step 2: subtract TO(T) * thermal_factor / F, TO(T) = a0 + a1 T + a2 T^2 + ...
        double to = (-21.5 + 2.10 * tC - 0.0430 * tC * tC + 0.000155 * tC * tC * tC) * 1e-6;
        double apparent = to * 2.00 / 2.09;
        assertRectangular(run, "warm", 300e-6 - apparent, 100e-6 - apparent, -50e-6 - apparent);
    }

    @Test
    void withoutTemperatureNoThermalOutputIsSubtracted() {
        // LANGUAGE.md, step 2: only where the reading has a temperature
        ScriptRun run = ScriptRun.run(dir, MATERIAL + """
                gauge foil {
                  factor  = 2.00
                  thermal = -21.5, 2.10 ue
                }
                rosette r {
                  layout = rectangular
                  gauge = foil
                  material = steel
                }
                case cold {
                  r = 300, 100, -50 ue
                }
                """).ok();
        assertRectangular(run, "cold", 300e-6, 100e-6, -50e-6);
    }

    @Test
    void baselineReadingCorrectedTheSameWayIsSubtracted() {
        ScriptRun run = ScriptRun.run(dir, MATERIAL + """
                gauge foil {
                  factor     = 2.09
                  resistance = 350 ohm
                  thermal    = -21.5, 2.10, -0.0430 ue
                }
                rosette r {
                  layout = rectangular
                  gauge = foil
                  material = steel
                  bridge = quarter_3wire
                  lead = 0.8 ohm
                  instrument_factor = 2.00
                }
                baseline unloaded {
                  temperature = 21 degC
                  r = 3, -2, 5 ue
                }
                case proof from unloaded {
                  temperature = 23 degC
                  r = 412, -38, -121 ue
                }
                """).ok();
        // LANGUAGE.md, steps 1-3: e = bridge(e_ind) - TO(T) * 2.00 / F, then case minus baseline
        double[] base = {3e-6, -2e-6, 5e-6};
        double[] load = {412e-6, -38e-6, -121e-6};
        double[] e = new double[3];
        for (int i = 0; i < 3; i++) {
            e[i] = corrected(load[i], 23) - corrected(base[i], 21);
        }
        assertRectangular(run, "proof", e[0], e[1], e[2]);
    }

    /** Steps 1-2 for the baseline test: quarter_3wire, 0.8 ohm on 350 ohm, F_inst 2.00, F 2.09. */
    private static double corrected(double indicated, double tC) {
        double vr = 2.00 * indicated / 4;
        double e = 4 * vr / (1 - 2 * vr) * (1 + 1 * 0.8 / 350) / 2.09;
        double to = (-21.5 + 2.10 * tC - 0.0430 * tC * tC) * 1e-6;
        return e - to * 2.00 / 2.09;
    }

    @Test
    void transverseSensitivityIsTakenOutInTheSolve() {
        ScriptRun run = ScriptRun.run(dir, MATERIAL + """
                gauge foil {
                  factor     = 2.00
                  transverse = 2 %
                  nu0        = 0.30
                }
                rosette r {
                  layout = rectangular
                  gauge = foil
                  material = steel
                }
                case pull {
                  r = 800, 250, -300 ue
                }
                """).ok();
        // LANGUAGE.md, step 4: arm reads (e(t) + Kt e(t + 90)) / (1 - nu0 Kt).
        // Worked by hand for arms at 0/45/90 deg (textbook transverse-sensitivity correction):
        //   eps_x + Kt eps_y = A, eps_y + Kt eps_x = C   with A = r_a (1 - nu0 Kt), C = r_c (1 - nu0 Kt)
        //   (1 + Kt) (eps_x + eps_y) / 2 + (1 - Kt) gamma / 2 = B   with B = r_b (1 - nu0 Kt)
        double kt = 0.02;
        double scale = 1 - 0.30 * kt;
        double a = 800e-6 * scale;
        double b = 250e-6 * scale;
        double c = -300e-6 * scale;
        double epsX = (a - kt * c) / (1 - kt * kt);
        double epsY = (c - kt * a) / (1 - kt * kt);
        double gamma = (2 * b - (1 + kt) * (epsX + epsY)) / (1 - kt);
        assertEquals(epsX, run.member("r", "pull", "eps_x"), STRAIN);
        assertEquals(epsY, run.member("r", "pull", "eps_y"), STRAIN);
        assertEquals(gamma, run.member("r", "pull", "gamma_xy"), STRAIN);
    }

    @Test
    void wholeChainOnARotatedRosette() {
        ScriptRun run = ScriptRun.run(dir, MATERIAL + """
                gauge foil {
                  factor         = 2.09
                  transverse     = 0.6 %
                  nu0            = 0.285
                  resistance     = 350 ohm
                  thermal        = -21.5, 2.10, -0.0430 ue
                  thermal_factor = 2.00
                }
                rosette r {
                  layout = rectangular
                  gauge = foil
                  material = steel
                  angle = 15 deg
                  bridge = quarter_3wire
                  lead = 0.8 ohm
                  instrument_factor = 2.00
                }
                baseline unloaded {
                  temperature = 21 degC
                  r = 3, -2, 5 ue
                }
                case proof from unloaded {
                  temperature = 23 degC
                  r = 412, -38, -121 ue
                }
                """).ok();
        // LANGUAGE.md, steps 1-4 in order; the 3x3 arm model solved with Commons Math (LU)
        double[] base = {3e-6, -2e-6, 5e-6};
        double[] load = {412e-6, -38e-6, -121e-6};
        double kt = 0.006;
        double[][] model = new double[3][];
        double[] arms = new double[3];
        for (int i = 0; i < 3; i++) {
            double t = Math.toRadians(15 + 45 * i);
            double u = t + Math.PI / 2;
            model[i] = new double[] {
                (sq(Math.cos(t)) + kt * sq(Math.cos(u))) / (1 - 0.285 * kt),
                (sq(Math.sin(t)) + kt * sq(Math.sin(u))) / (1 - 0.285 * kt),
                (Math.sin(t) * Math.cos(t) + kt * Math.sin(u) * Math.cos(u)) / (1 - 0.285 * kt)};
            arms[i] = corrected(load[i], 23) - corrected(base[i], 21);
        }
        RealVector state = new LUDecomposition(new Array2DRowRealMatrix(model)).getSolver()
                .solve(new ArrayRealVector(arms));
        assertEquals(state.getEntry(0), run.member("r", "proof", "eps_x"), STRAIN);
        assertEquals(state.getEntry(1), run.member("r", "proof", "eps_y"), STRAIN);
        assertEquals(state.getEntry(2), run.member("r", "proof", "gamma_xy"), STRAIN);
    }

    @Test
    void transverseSensitivityInALeastSquaresSolve() {
        ScriptRun run = ScriptRun.run(dir, MATERIAL + """
                gauge embed {
                  factor     = 2.10
                  transverse = 1 %
                }
                rosette r {
                  layout = arms(0 deg, 45 deg, 90 deg, 135 deg)
                  gauge = embed
                  material = steel
                  angle = 90 deg
                }
                case fill {
                  r = -91, -29, 74, 5 ue
                }
                """).ok();
        // LANGUAGE.md, step 4 with nu0 = 0.285 (default): the four-arm model, arms at 90 + t_i in the
        // part's axes, fitted by least squares with Commons Math (QR decomposition)
        double kt = 0.01;
        double[] readings = {-91e-6, -29e-6, 74e-6, 5e-6};
        double[][] model = new double[4][];
        for (int i = 0; i < 4; i++) {
            double t = Math.toRadians(90 + 45 * i);
            double u = t + Math.PI / 2;
            model[i] = new double[] {
                (sq(Math.cos(t)) + kt * sq(Math.cos(u))) / (1 - 0.285 * kt),
                (sq(Math.sin(t)) + kt * sq(Math.sin(u))) / (1 - 0.285 * kt),
                (Math.sin(t) * Math.cos(t) + kt * Math.sin(u) * Math.cos(u)) / (1 - 0.285 * kt)};
        }
        RealVector fit = new org.apache.commons.math3.linear.QRDecomposition(new Array2DRowRealMatrix(model))
                .getSolver().solve(new ArrayRealVector(readings));
        assertEquals(fit.getEntry(0), run.member("r", "fill", "eps_x"), STRAIN);
        assertEquals(fit.getEntry(1), run.member("r", "fill", "eps_y"), STRAIN);
        assertEquals(fit.getEntry(2), run.member("r", "fill", "gamma_xy"), STRAIN);
    }

    static Stream<Arguments> layoutsWithTransverseSensitivity() {
        // layout, arm angles from arm a (deg)
        return Stream.of(
                Arguments.of("rectangular", new double[] {0, 45, 90}),
                Arguments.of("delta", new double[] {0, 60, 120}),
                Arguments.of("arms(0 deg, 30 deg, 100 deg)", new double[] {0, 30, 100}),
                Arguments.of("arms(0 deg, 60 deg, 120 deg, 90 deg)", new double[] {0, 60, 120, 90}));
    }

    @ParameterizedTest(name = "{0} at 25 deg, Kt 2 %")
    @MethodSource("layoutsWithTransverseSensitivity")
    void transverseSensitivityForEveryLayout(String layout, double[] arms) {
        StringBuilder readings = new StringBuilder();
        double[] ue = {420, -75, 180, 260};
        for (int i = 0; i < arms.length; i++) {
            readings.append(i == 0 ? "" : ", ").append(ue[i]);
        }
        ScriptRun run = ScriptRun.run(dir, MATERIAL + script("""
                gauge foil {
                  factor     = 2.00
                  transverse = 2 %%
                  nu0        = 0.30
                }
                rosette r {
                  layout = %s
                  gauge = foil
                  material = steel
                  angle = 25 deg
                }
                case c1 {
                  r = %s ue
                }
                """, layout, readings)).ok();
        // LANGUAGE.md, step 4: arm i at 25 + t_i reads (e(t) + Kt e(t + 90)) / (1 - nu0 Kt);
        // solved by Commons Math (QR: exact for three arms, least squares past three)
        double kt = 0.02;
        double[][] model = new double[arms.length][];
        double[] e = new double[arms.length];
        for (int i = 0; i < arms.length; i++) {
            double t = Math.toRadians(25 + arms[i]);
            double u = t + Math.PI / 2;
            model[i] = new double[] {
                (sq(Math.cos(t)) + kt * sq(Math.cos(u))) / (1 - 0.30 * kt),
                (sq(Math.sin(t)) + kt * sq(Math.sin(u))) / (1 - 0.30 * kt),
                (Math.sin(t) * Math.cos(t) + kt * Math.sin(u) * Math.cos(u)) / (1 - 0.30 * kt)};
            e[i] = ue[i] * 1e-6;
        }
        RealVector fit = new org.apache.commons.math3.linear.QRDecomposition(new Array2DRowRealMatrix(model))
                .getSolver().solve(new ArrayRealVector(e));
        assertEquals(fit.getEntry(0), run.member("r", "c1", "eps_x"), STRAIN);
        assertEquals(fit.getEntry(1), run.member("r", "c1", "eps_y"), STRAIN);
        assertEquals(fit.getEntry(2), run.member("r", "c1", "gamma_xy"), STRAIN);
    }

    @Test
    void transverseSensitivityOnATee() {
        ScriptRun run = ScriptRun.run(dir, MATERIAL + """
                gauge foil {
                  factor     = 2.05
                  transverse = -0.4 %
                }
                rosette r {
                  layout = tee
                  gauge = foil
                  material = steel
                  angle = 30 deg
                }
                case c1 {
                  r = 545, -160 ue
                }
                """).ok();
        // LANGUAGE.md, step 4 with nu0 = 0.285 (default), no shear in the arm axes:
        //   (e_a + Kt e_b) / (1 - nu0 Kt) = r_a, (e_b + Kt e_a) / (1 - nu0 Kt) = r_b
        // so e_a = (A - Kt B) / (1 - Kt^2), A = r_a (1 - nu0 Kt) (textbook two-arm correction);
        // then rotated by 30 deg into the part's axes (strain transformation, textbook)
        double kt = -0.004;
        double a = 545e-6 * (1 - 0.285 * kt);
        double b = -160e-6 * (1 - 0.285 * kt);
        double ea = (a - kt * b) / (1 - kt * kt);
        double eb = (b - kt * a) / (1 - kt * kt);
        double t = Math.toRadians(30);
        assertEquals(ea * sq(Math.cos(t)) + eb * sq(Math.sin(t)), run.member("r", "c1", "eps_x"), STRAIN);
        assertEquals(ea * sq(Math.sin(t)) + eb * sq(Math.cos(t)), run.member("r", "c1", "eps_y"), STRAIN);
        assertEquals(2 * (ea - eb) * Math.sin(t) * Math.cos(t), run.member("r", "c1", "gamma_xy"), STRAIN);
        assertEquals(ea, run.member("r", "c1", "eps_1"), STRAIN);
    }

    @Test
    void temperatureMayBeGivenInTheCaseOnly() {
        ScriptRun run = ScriptRun.run(dir, MATERIAL + """
                gauge foil {
                  factor  = 2.00
                  thermal = -30, 1.5 ue
                }
                rosette r {
                  layout = rectangular
                  gauge = foil
                  material = steel
                }
                baseline cold {
                  r = 10, 10, 10 ue
                }
                case warm from cold {
                  temperature = 40 degC
                  r = 110, 60, 10 ue
                }
                """).ok();
        // LANGUAGE.md, steps 2-3: the case's reading loses TO(40) * 2.00 / 2.00 = (-30 + 60) ue;
        // the baseline has no temperature, so none is taken from it
        double to = (-30 + 1.5 * 40) * 1e-6;
        assertRectangular(run, "warm", 100e-6 - to, 50e-6 - to, 0 - to);
    }

    private static double sq(double x) {
        return x * x;
    }
}
