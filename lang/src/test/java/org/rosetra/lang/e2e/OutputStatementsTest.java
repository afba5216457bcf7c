package org.rosetra.lang.e2e;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The output statements (LANGUAGE.md, "Outputs": table, plot mohr, plot directions, plot of
 * a member, report) parse, run, and add their tables and figures to the output folder
 * (DESIGN.md, "Outputs": tables/*.csv, plots/*.svg and *.png, record.md and record.html).
 */
class OutputStatementsTest {
    @TempDir
    Path dir;

    private static final String SURVEY = """
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
            case c1 {
              r = 100, 50, 20 ue
            }
            case c2 {
              r = 200, 50, 20 ue
            }
            stress hand {
              sigma_x  = 80 MPa
              sigma_y  = 20 MPa
              tau_xy   = 40 MPa
              material = m
            }
            table r
            table r.sigma_1, r.von_mises
            plot mohr r[c1]
            plot directions r[c2]
            plot r.von_mises
            plot mohr hand
            plot directions hand
            report "bracket-record"
            """;

    private static List<String> files(Path folder) throws IOException {
        if (!Files.isDirectory(folder)) {
            return List.of();
        }
        try (Stream<Path> s = Files.list(folder)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    @Test
    void everyOutputFormRunsAndTablesAreWritten() throws IOException {
        ScriptRun run = ScriptRun.run(dir, SURVEY).ok();
        Path folder = run.outDir.resolve("tables");
        List<List<String>> tables = new java.util.ArrayList<>();
        for (String name : files(folder)) {
            tables.add(Files.readAllLines(folder.resolve(name), StandardCharsets.UTF_8));
        }
        // the standard table of r: every member of "Results of a rosette", one row per case
        String headers = String.join(",", tables.stream().map(t -> t.get(0)).toList());
        for (String m : List.of("eps_x", "eps_y", "gamma_xy", "eps_1", "eps_2", "theta_p", "gamma_max", "eps_z",
                "sigma_x", "sigma_y", "tau_xy", "sigma_1", "sigma_2", "sigma_z", "tau_max", "tau_abs", "von_mises",
                "tresca")) {
            assertTrue(headers.contains(m + " ["), () -> m + " in a table header: " + headers);
        }
        // the chosen columns, one row per case, in display units (MPa)
        List<String> rows = tables.stream().filter(t -> t.get(0).contains("r.sigma_1")).findFirst()
                .orElseThrow(() -> new AssertionError("a table of r.sigma_1: " + headers));
        assertEquals(3, rows.size(), rows::toString);
        assertTrue(rows.get(0).contains("r.von_mises"), rows.get(0));
        // c1: eps_x 100, eps_y 20, gamma 2*50 - 100 - 20 = -20 ue (rectangular, textbook);
        // plane stress Hooke (textbook), principal stress by Mohr's circle
        double ex = 100e-6;
        double ey = 20e-6;
        double g = -20e-6;
        double sx = 200e9 / 0.91 * (ex + 0.3 * ey);
        double sy = 200e9 / 0.91 * (ey + 0.3 * ex);
        double tau = 200e9 / 2.6 * g;
        double s1 = (sx + sy) / 2 + Math.hypot((sx - sy) / 2, tau);
        String[] c1 = rows.get(1).split(",");
        assertEquals("c1", c1[0]);
        assertEquals(s1 / 1e6, Double.parseDouble(c1[1]), 0.01, "sigma_1 in MPa, rounded for display");
    }

    @Test
    void plotsAreWritten() throws IOException {
        ScriptRun run = ScriptRun.run(dir, SURVEY).ok();
        List<String> plots = files(run.outDir.resolve("plots"));
        // five plot statements, each as SVG and PNG
        assertEquals(5, plots.stream().filter(p -> p.endsWith(".svg")).count(), plots::toString);
        assertEquals(5, plots.stream().filter(p -> p.endsWith(".png")).count(), plots::toString);
    }

    @Test
    void theRecordIsWritten() throws IOException {
        ScriptRun run = ScriptRun.run(dir, SURVEY).ok();
        List<String> top = files(run.outDir);
        assertTrue(top.contains("record.md") && top.contains("record.html"), top::toString);
        String record = Files.readString(run.outDir.resolve("record.md"), StandardCharsets.UTF_8);
        assertTrue(record.contains("bracket-record"), "the record carries its report name");
    }
}
