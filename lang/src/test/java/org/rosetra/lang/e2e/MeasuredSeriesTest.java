package org.rosetra.lang.e2e;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A measured series from a CSV file (LANGUAGE.md, "Measured series"): zero window, every
 * sample through the same chain, histories reduced with max() and min(), checks at every
 * sample with the time of the governing one, and the "series" entry of results.json.
 *
 * Invented data: a rectangular rosette at 0 deg, bridge none, F = 2.00. The zero window
 * 0 s to 2 s holds the samples at 0, 0.5 and 1 s, whose per-arm means are 3, 2, 1 ue, so the
 * samples after zeroing are (by hand) -1/-1/-1, 0/0/0, 1/1/1, 100/50/-20, 300/150/-60 and
 * 200/100/-40 ue; the rectangular relations (textbook) give eps_x = e_a, eps_y = e_c,
 * gamma_xy = 2 e_b - e_a - e_c.
 */
class MeasuredSeriesTest {
    @TempDir
    Path dir;

    private static final String CSV = """
            t_s,g1,g2,g3
            0,2,1,0
            0.5,3,2,1
            1,4,3,2
            3,103,52,-19
            4,303,152,-59
            5,203,102,-39
            """;

    private static final String SCRIPT = """
            material m {
              E  = 200 GPa
              nu = 0.3
            }
            gauge foil {
              factor = 2.00
            }
            rosette r {
              layout   = rectangular
              gauge    = foil
              material = m
            }
            series lift from "data/lift.csv" {
              time = "t_s" s
              r    = "g1", "g2", "g3" ue
              zero = 0 s to 2 s
            }
            check "vm": r.von_mises <= 100 MPa
            """;

    private ScriptRun run(String csv, String extra) throws IOException {
        Files.createDirectories(dir.resolve("data"));
        Files.writeString(dir.resolve("data/lift.csv"), csv, StandardCharsets.UTF_8);
        return ScriptRun.run(dir, SCRIPT + extra);
    }

    /** von Mises in plane stress from the strains (Hooke's law and von Mises, textbook). */
    private static double vonMises(double ex, double ey, double g) {
        double sx = 200e9 / (1 - 0.09) * (ex + 0.3 * ey);
        double sy = 200e9 / (1 - 0.09) * (ey + 0.3 * ex);
        double tau = 200e9 / 2.6 * g;
        return Math.sqrt(sx * sx - sx * sy + sy * sy + 3 * tau * tau);
    }

    @Test
    void historiesAreSummarisedAndChecksTestedAtEverySample() throws IOException {
        ScriptRun run = run(CSV, "").ok();
        Map<String, Object> lift = ScriptRun.map(ScriptRun.map(run.results.get("series"), "series").get("lift"), "lift");
        assertEquals(6.0, lift.get("samples"));
        Map<String, Object> r = ScriptRun.map(ScriptRun.map(lift.get("rosettes"), "rosettes").get("r"), "r");
        Map<String, Object> vm = ScriptRun.map(r.get("von_mises"), "von_mises");
        // the largest at 4 s: 300, -60 ue, gamma 2*150 - 300 + 60 = 60 ue; the smallest, zero, at 0.5 s
        double peak = vonMises(300e-6, -60e-6, 60e-6);
        assertEquals(peak, (Double) vm.get("max"), 1e-3);
        assertEquals(4.0, vm.get("t_max"));
        assertEquals(0.0, (Double) vm.get("min"), 1e-3);
        assertEquals(0.5, vm.get("t_min"));
        Map<String, Object> ex = ScriptRun.map(r.get("eps_x"), "eps_x");
        assertEquals(300e-6, (Double) ex.get("max"), 1e-12);
        assertEquals(-1e-6, (Double) ex.get("min"), 1e-12);
        assertEquals(0.0, ex.get("t_min"));
        // LANGUAGE.md: a check governed by a sample names the series and adds "at", in seconds
        Map<String, Object> check = run.check("vm");
        assertEquals(peak / 100e6, (Double) check.get("utilization"), 1e-12);
        assertEquals("lift", check.get("governing"));
        assertEquals(4.0, check.get("at"));
    }

    @Test
    void historiesReducedWithMaxAndMin() throws IOException {
        ScriptRun run = run(CSV, """
                let peak = max(r.von_mises[lift])
                let low  = min(r.eps_y[lift])
                """).ok();
        assertEquals(vonMises(300e-6, -60e-6, 60e-6), run.number("peak"), 1e-3);
        assertEquals(-60e-6, run.number("low"), 1e-12);
    }

    @Test
    void aFailingSampleFailsTheCheck() throws IOException {
        // 3000 ue on arm a at 4 s: far past 100 MPa
        ScriptRun run = run(CSV.replace("4,303,152,-59", "4,3003,152,-59"), "").expectStatus(1);
        assertEquals(false, run.check("vm").get("pass"));
        assertEquals(4.0, run.check("vm").get("at"));
    }

    @Test
    void aValueThatIsNotANumberIsAnErrorNamingTheFileLineAndColumn() throws IOException {
        ScriptRun run = run(CSV.replace("3,103,52,-19", "3,103,abc,-19"), "").expectStatus(2);
        // the bad value is on line 5 of the file, in column g2
        assertTrue(run.err.contains("lift.csv"), run.err);
        assertTrue(run.err.contains("5"), run.err);
        assertTrue(run.err.contains("g2"), run.err);
        assertFalse(Files.exists(run.json), "nothing written");
    }

    @Test
    void aTimeThatDoesNotIncreaseIsAnError() throws IOException {
        ScriptRun run = run(CSV.replace("4,303,152,-59", "2.5,303,152,-59"), "").expectStatus(2);
        // 2.5 s after 3 s, on line 6 of the file
        assertTrue(run.err.contains("lift.csv") && run.err.contains("6"), run.err);
    }

    @Test
    void aMissingColumnIsAnError() throws IOException {
        ScriptRun run = run(CSV.replace("t_s,g1,g2,g3", "t_s,g1,g2,g4"), "").expectStatus(2);
        assertTrue(run.err.contains("lift.csv") && run.err.contains("g3"), run.err);
    }
}
