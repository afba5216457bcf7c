package org.rosetra.lang.e2e;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.rosetra.lang.e2e.ScriptRun.script;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * A material's elastic constants and strengths (LANGUAGE.md, "Declarations", material): any
 * two of E, nu, G with the third from G = E / (2 (1 + nu)); all three inconsistent by more
 * than 0.5 % is an error; nu in (-1, 0.5); yield_c defaults to yield. The constants are seen
 * through a given stress state: sigma_x = 100 MPa, tau_xy = 30 MPa, plane stress, so
 * eps_x = sigma_x / E, eps_y = -nu sigma_x / E, gamma_xy = tau / G (Hooke's law, textbook).
 */
class MaterialConstantsTest {
    @TempDir
    Path dir;

    private ScriptRun run(String fields) {
        return ScriptRun.run(dir, """
                material m {
                %s
                  yield = 300 MPa
                }
                stress s {
                  sigma_x  = 100 MPa
                  tau_xy   = 30 MPa
                  material = m
                }
                let e_of_m  = m.E
                let nu_of_m = m.nu
                let g_of_m  = m.G
                """.formatted(fields));
    }

    static Stream<Arguments> pairs() {
        // the two constants given, and E, nu, G worked by hand from G = E / (2 (1 + nu))
        return Stream.of(
                Arguments.of("  E = 200 GPa\n  nu = 0.3", 200e9, 0.3, 200e9 / 2.6),
                Arguments.of("  E = 200 GPa\n  G = 80 GPa", 200e9, 200.0 / (2 * 80) - 1, 80e9),
                Arguments.of("  nu = 0.25\n  G = 80 GPa", 2 * 80e9 * 1.25, 0.25, 80e9),
                Arguments.of("  G = 26 GPa\n  E = 70 GPa", 70e9, 70.0 / (2 * 26) - 1, 26e9));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("pairs")
    void anyTwoConstantsGiveTheThird(String fields, double e, double nu, double g) {
        ScriptRun run = run(fields).ok();
        assertEquals(100e6 / e, run.stateMember("s", "eps_x"), 1e-13);
        assertEquals(-nu * 100e6 / e, run.stateMember("s", "eps_y"), 1e-13);
        assertEquals(30e6 / g, run.stateMember("s", "gamma_xy"), 1e-13);
        assertEquals(e, run.number("e_of_m"), e * 1e-12);
        assertEquals(nu, run.number("nu_of_m"), 1e-12);
        assertEquals(g, run.number("g_of_m"), g * 1e-12);
    }

    @Test
    void allThreeConsistentWithinHalfAPercentAreAccepted() {
        // 200 / (2 * 1.3) = 76.92 GPa; 77.2 GPa is 0.36 % off
        run("  E = 200 GPa\n  nu = 0.3\n  G = 77.2 GPa").ok();
    }

    @Test
    void allThreeInconsistentAreAnError() {
        // 200 / (2 * 1.3) = 76.92 GPa; 80 GPa is 4 % off (LANGUAGE.md: more than 0.5 % is an error)
        ScriptRun run = run("  E = 200 GPa\n  nu = 0.3\n  G = 80 GPa").expectStatus(2);
        String prefix = run.script + ":";
        assertTrue(run.firstErrorLine().startsWith(prefix), run.err);
        int line = Integer.parseInt(run.firstErrorLine().substring(prefix.length()).split(":")[0]);
        assertTrue(line >= 1 && line <= 6, () -> "error on the material's lines 1-6: " + run.err);
        assertTrue(!Files.exists(run.json), "nothing written");
    }

    @ParameterizedTest(name = "nu = {0}")
    @ValueSource(strings = {"0.5", "0.7", "-1", "-1.5"})
    void poissonsRatioOutsideItsRangeIsAnError(String nu) {
        ScriptRun run = run("  E = 200 GPa\n  nu = " + nu).expectStatus(2);
        // LANGUAGE.md: nu must lie in (-1, 0.5); exit status 2 and nothing written
        assertTrue(run.firstErrorLine().startsWith(run.script + ":"), run.err);
        assertTrue(run.firstErrorLine().contains(": error: "), run.err);
        assertTrue(!Files.exists(run.json), "nothing written");
    }

    @ParameterizedTest(name = "nu = {0}")
    @ValueSource(strings = {"0.5", "0.7", "-1", "-1.5"})
    void poissonsRatioOutsideItsRangeIsAnErrorAtTheValue(String nu) {
        ScriptRun run = run("  E = 200 GPa\n  nu = " + nu).expectStatus(2);
        // LANGUAGE.md: nu must lie in (-1, 0.5); the error is at the value, line 3, column 8
        assertTrue(run.firstErrorLine().startsWith(run.script + ":3:8: error: "), run.err);
    }

    @Test
    void poissonsRatioOutOfRangeIsAnErrorEvenInAnUnusedMaterial() {
        String text = """
                material spare {
                  E  = 200 GPa
                  nu = 0.5
                }
                """;
        // LANGUAGE.md: nu must lie in (-1, 0.5); checked before anything is computed
        ScriptRun checked = ScriptRun.check(dir, text).expectStatus(2);
        assertTrue(checked.firstErrorLine().startsWith(checked.script + ":3:8: error: "), checked.err);
        ScriptRun run = ScriptRun.run(dir, text).expectStatus(2);
        assertTrue(run.firstErrorLine().startsWith(run.script + ":3:8: error: "), run.err);
    }

    @ParameterizedTest(name = "nu = {0}")
    @ValueSource(strings = {"0.49", "0", "-0.5"})
    void poissonsRatioInsideItsRangeIsAccepted(String nu) {
        run("  E = 200 GPa\n  nu = " + nu).ok();
    }

    @Test
    void compressiveStrengthsDefaultToTheTensileOnes() {
        ScriptRun run = ScriptRun.run(dir, script("""
                material m {
                  E        = 200 GPa
                  nu       = 0.3
                  yield    = 355 MPa
                  ultimate = 490 MPa
                }
                material n {
                  E          = 200 GPa
                  nu         = 0.3
                  yield      = 355 MPa
                  yield_c    = 300 MPa
                  ultimate   = 490 MPa
                  ultimate_c = 450 MPa
                }
                let yc_m = m.yield_c
                let uc_m = m.ultimate_c
                let yc_n = n.yield_c
                let uc_n = n.ultimate_c
                """)).ok();
        // LANGUAGE.md: yield_c defaults to yield, ultimate_c to ultimate
        assertEquals(355e6, run.number("yc_m"), 1e-6);
        assertEquals(490e6, run.number("uc_m"), 1e-6);
        assertEquals(300e6, run.number("yc_n"), 1e-6);
        assertEquals(450e6, run.number("uc_n"), 1e-6);
    }
}
