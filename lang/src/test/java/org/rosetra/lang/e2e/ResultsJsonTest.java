package org.rosetra.lang.e2e;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The shape of results.json (LANGUAGE.md, "Running and results"): "format", "title",
 * "cases" (cases then combinations, in order written), "rosettes" with "state" and
 * "results", "states", "values" with "dimension", "checks" with label, pass, utilization
 * and governing. Same bytes on every run (DESIGN.md, "Outputs": deterministic).
 */
class ResultsJsonTest {
    @TempDir
    Path dir;

    private static final String SURVEY = """
            title "Bracket \\"B-2\\", C:\\\\tests"   # escapes in a string
            material steel {
              E     = 200 GPa   # a comment after a field
              nu    = 0.3
              yield = 300 MPa
            }
            gauge foil {
              factor = 2.00
            }
            rosette top {
              layout   = rectangular
              gauge    = foil
              material = steel
              state    = plane_strain
            }
            rosette side {
              layout   = delta
              gauge    = foil
              material = steel
            }
            case up {
              top  = 100, 100, 100 ue
              side = 50, 50, 50 ue
            }
            combine both = 2 * up + 1 * down
            case down {
              top = -100, -100, -100 ue
            }
            strain model {
              eps_x    = 10 ue
              eps_y    = 10 ue
              gamma_xy = 0 ue
            }
            let limit    = steel.yield / 2
            let peak     = max(top.von_mises)
            let count    = 3
            let per_case = top.sigma_1 / limit
            let scaled(x) = 2 * x
            check "top": top.von_mises <= limit
            """;

    @Test
    void documentShape() {
        ScriptRun run = ScriptRun.run(dir, SURVEY).ok();
        Map<String, Object> json = run.results;
        List<String> keys = List.copyOf(json.keySet());
        assertEquals(List.of("format", "title", "cases", "rosettes"), keys.subList(0, 4));
        assertTrue(keys.containsAll(List.of("states", "values", "checks")), keys::toString);
        assertEquals("rosetra-results/1", json.get("format"));
        assertEquals("Bracket \"B-2\", C:\\tests", json.get("title"));
        // cases then combinations in the order they are written
        assertEquals(List.of("up", "down", "both"), run.cases());
        assertEquals("plane_strain", run.stateOf("top"));
        assertEquals("plane_stress", run.stateOf("side"));
        assertEquals(List.of("up", "down", "both"), List.copyOf(ScriptRun.map(
                ScriptRun.map(run.rosettes().get("top"), "top").get("results"), "results").keySet()));
        // side was not read in down, so it has no result in down nor in both
        assertEquals(List.of("up"), List.copyOf(ScriptRun.map(
                ScriptRun.map(run.rosettes().get("side"), "side").get("results"), "results").keySet()));
        assertEquals(10e-6, run.stateMember("model", "eps_x"), 1e-15);
    }

    @Test
    void valuesAreTheLetNumbersAndQuantities() {
        ScriptRun run = ScriptRun.run(dir, SURVEY).ok();
        Map<String, Object> values = ScriptRun.map(run.results.get("values"), "values");
        // LANGUAGE.md: not functions, not per-case values
        assertEquals(List.of("limit", "peak", "count"), List.copyOf(values.keySet()));
        assertEquals(150e6, run.number("limit"), 1e-6);
        assertEquals("stress", run.value("limit").get("dimension"));
        assertEquals(3.0, run.number("count"), 0);
        assertEquals("none", run.value("count").get("dimension"));
        // plane strain, equal biaxial strain e = 100 ue (Hooke, textbook):
        // sigma_x = sigma_y = E e / (1 - 2 nu) / (1 + nu) * ((1 - nu) + nu) = E e / ((1 + nu)(1 - 2 nu))
        double s = 200e9 * 100e-6 / ((1 + 0.3) * (1 - 2 * 0.3));
        double sz = 0.3 * 2 * s;
        // von Mises of (s, s, sz) from principal stresses (textbook): |s - sz|
        // combination both = 2 up + 1 down = +100 ue, the same state as up
        assertEquals(Math.abs(s - sz), run.number("peak"), 1e-3);
    }

    @Test
    void checkEntries() {
        ScriptRun run = ScriptRun.run(dir, SURVEY).ok();
        Map<String, Object> check = run.check("top");
        assertEquals(List.of("label", "pass", "utilization", "governing"), List.copyOf(check.keySet()));
        assertEquals(true, check.get("pass"));
        double s = 200e9 * 100e-6 / ((1 + 0.3) * (1 - 2 * 0.3));
        // up, down and both all have |s - sz|; up is the first of equal utilization
        assertEquals(Math.abs(s - 0.6 * s) / 150e6, (Double) check.get("utilization"), 1e-12);
    }

    @Test
    void theJsonFileAndTheOutputFolderAgreeAndRunsAreRepeatable() throws IOException {
        ScriptRun first = ScriptRun.run(dir, SURVEY).ok();
        byte[] json = Files.readAllBytes(first.json);
        assertArrayEquals(json, Files.readAllBytes(first.outDir.resolve("results.json")));
        ScriptRun second = ScriptRun.run(dir, SURVEY).ok();
        assertArrayEquals(json, Files.readAllBytes(second.json), "byte-identical on a second run");
        String text = new String(json, java.nio.charset.StandardCharsets.UTF_8);
        assertFalse(text.contains("NaN"), "no NaN in JSON");
    }
}
