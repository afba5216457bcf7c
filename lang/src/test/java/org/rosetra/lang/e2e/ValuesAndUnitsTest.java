package org.rosetra.lang.e2e;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.rosetra.lang.e2e.ScriptRun.script;

import java.nio.file.Path;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * let values and functions, x[CASE], max(x) and min(x) over the cases, arithmetic and units
 * (LANGUAGE.md, "Quantities and units", "Expressions, values and checks"). Values in JSON
 * are SI. Unit factors: 1 psi = 6894.757293168 Pa, 1 lbf = 4.4482216152605 N, 1 in =
 * 0.0254 m (exact by definition, common practice), 1 degF step = 5/9 K.
 */
class ValuesAndUnitsTest {
    private static final double PSI = 6894.757293168;

    @TempDir
    Path dir;

    static Stream<Arguments> quantities() {
        // expression, SI value worked by hand, dimension name as LANGUAGE.md's unit table names it
        return Stream.of(
                Arguments.of("12 N/mm^2", 12e6, "stress"),
                Arguments.of("205 GPa", 205e9, "stress"),
                Arguments.of("350 kPa", 350e3, "stress"),
                Arguments.of("36 ksi", 36e3 * PSI, "stress"),
                Arguments.of("1500 psi", 1500 * PSI, "stress"),
                Arguments.of("29 Msi", 29e6 * PSI, "stress"),
                Arguments.of("2 kip / 1 in^2", 2000 * 4.4482216152605 / (0.0254 * 0.0254), "stress"),
                Arguments.of("412 ue", 412e-6, "none"),
                Arguments.of("412 µε", 412e-6, "none"),
                Arguments.of("0.9 %", 0.009, "none"),
                Arguments.of("2.1e-3", 2.1e-3, "none"),
                Arguments.of("-38.5", -38.5, "none"),
                Arguments.of("15 deg", 15.0, "angle"),             // JSON angles in degrees
                Arguments.of("0.5 rad", Math.toDegrees(0.5), "angle"),
                Arguments.of("350 ohm", 350.0, "resistance"),
                Arguments.of("3 ft", 3 * 0.3048, "length"),
                Arguments.of("250 mm", 0.25, "length"),
                Arguments.of("2 kN", 2000.0, "force"),
                Arguments.of("10 lbf", 10 * 4.4482216152605, "force"),
                Arguments.of("1.5 h", 5400.0, "time"),
                Arguments.of("2 min + 30 s", 150.0, "time"),
                Arguments.of("250 ms", 0.25, "time"));
    }

    @ParameterizedTest(name = "let q = {0}")
    @MethodSource("quantities")
    void quantityIsStoredInSi(String expression, double si, String dimension) {
        ScriptRun run = ScriptRun.run(dir, "let q = " + expression + "\n").ok();
        assertEquals(si, run.number("q"), Math.abs(si) * 1e-12);
        assertEquals(dimension, run.value("q").get("dimension"));
    }

    @Test
    void strainPerDegree() {
        ScriptRun run = ScriptRun.run(dir, "let slope = 11 ue/degC\n").ok();
        // LANGUAGE.md: units combine with /; a step of 1 degC is a step of 1 K (common practice)
        assertEquals(11e-6, run.number("slope"), 1e-18);
    }

    @Test
    void momentInKiloNewtonMetres() {
        ScriptRun run = ScriptRun.run(dir, """
                let m = 3 kN*m
                let w = 250 mm
                let f = m / w
                """).ok();
        assertEquals(3000.0, run.number("m"), 1e-9);
        // 3 kN m over 0.25 m is 12 kN (arithmetic)
        assertEquals(12000.0, run.number("f"), 1e-9);
        assertEquals("force", run.value("f").get("dimension"));
    }

    @Test
    void thinWalledCylinderHoopStress() {
        ScriptRun run = ScriptRun.run(dir, """
                let p      = 2 MPa
                let radius = 500 mm
                let wall   = 10 mm
                let hoop   = p * radius / wall
                let axial  = hoop / 2
                """).ok();
        // thin-walled cylinder (handbook): sigma_hoop = p r / t, sigma_axial = p r / (2 t)
        assertEquals(2e6 * 0.5 / 0.01, run.number("hoop"), 1e-6);
        assertEquals(2e6 * 0.5 / 0.02, run.number("axial"), 1e-6);
        assertEquals("stress", run.value("hoop").get("dimension"));
    }

    @Test
    void builtInFunctionsAndPowers() {
        ScriptRun run = ScriptRun.run(dir, """
                let root  = sqrt(9 MPa^2)
                let mag   = abs(-3 kN)
                let s     = sin(30 deg)
                let c     = cos(60 deg)
                let t     = tan(45 deg)
                let dir2  = atan2(1, 1)
                let small = min(3 MPa, 2 MPa)
                let big   = max(3 MPa, 2 MPa)
                let cube  = (2 mm)^3
                let neg   = -(4 - 6) * 2
                """).ok();
        // arithmetic and trigonometry worked by hand (textbook values)
        assertEquals(3e6, run.number("root"), 1e-6);
        assertEquals(3000.0, run.number("mag"), 1e-9);
        assertEquals(0.5, run.number("s"), 1e-12);
        assertEquals(0.5, run.number("c"), 1e-12);
        assertEquals(1.0, run.number("t"), 1e-12);
        assertEquals(45.0, run.number("dir2"), 1e-9);     // an angle, JSON in degrees
        assertEquals("angle", run.value("dir2").get("dimension"));
        assertEquals(2e6, run.number("small"), 1e-6);
        assertEquals(3e6, run.number("big"), 1e-6);
        assertEquals(8e-9, run.number("cube"), 1e-21);
        assertEquals(4.0, run.number("neg"), 1e-12);
    }

    @Test
    void perCaseValuesFunctionsAndReductionsOverTheCases() {
        ScriptRun run = ScriptRun.run(dir, """
                material steel {
                  E     = 200 GPa
                  nu    = 0.3
                  yield = 300 MPa
                }
                gauge foil {
                  factor = 2.00
                }
                rosette r {
                  layout   = rectangular
                  gauge    = foil
                  material = steel
                }
                case light {
                  r = 100, 100, 100 µε
                }
                case heavy {
                  r = 600, 600, 600 µε
                }
                case reverse {
                  r = -400, -400, -400 µε
                }
                let allowable = steel.yield / 1.5
                let usage(x)  = x / allowable
                let sum_s     = r.sigma_x + r.sigma_y
                let peak      = max(r.sigma_1)
                let lowest    = min(r.sigma_2)
                let heavy_s1  = r.sigma_1[heavy]
                let sum_heavy = sum_s[heavy]
                let worst     = max(usage(r.von_mises))
                """).ok();
        // equal biaxial strain e, all three arms alike (gamma = 2 e_b - e_a - e_c = 0): plane stress Hooke (textbook)
        // sigma_1 = sigma_2 = E e / (1 - nu); von Mises of equal biaxial stress equals that stress
        double k = 200e9 / (1 - 0.3);
        assertEquals(300e6 / 1.5, run.number("allowable"), 1e-6);
        assertEquals(k * 600e-6, run.number("peak"), 1e-3);
        assertEquals(k * -400e-6, run.number("lowest"), 1e-3);
        assertEquals(k * 600e-6, run.number("heavy_s1"), 1e-3);
        assertEquals(2 * k * 600e-6, run.number("sum_heavy"), 1e-3);
        assertEquals(k * 600e-6 / 200e6, run.number("worst"), 1e-12);
        // LANGUAGE.md: values holds let numbers and quantities, not functions, not per-case values
        var values = ScriptRun.map(run.results.get("values"), "values");
        assertEquals(java.util.List.of("allowable", "peak", "lowest", "heavy_s1", "sum_heavy", "worst"),
                java.util.List.copyOf(values.keySet()));
    }

    @Test
    void readingsInPercentAndMicrostrainSigns() {
        ScriptRun run = ScriptRun.run(dir, script("""
                material steel {
                  E  = 200 GPa
                  nu = 0.3
                }
                gauge foil {
                  factor = 2.00
                }
                rosette r {
                  layout   = rectangular
                  gauge    = foil
                  material = steel
                }
                case c1 {
                  r = 0.05, 0.02, -0.01 %%
                }
                """)).ok();
        // LANGUAGE.md: one trailing unit for every item; % is 0.01
        assertEquals(0.0005, run.member("r", "c1", "eps_x"), 1e-15);
        assertEquals(-0.0001, run.member("r", "c1", "eps_y"), 1e-15);
    }
}
