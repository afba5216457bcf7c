package org.rosetra.lang.e2e;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Declarations may come in any order (LANGUAGE.md, "rosette fields": gauge and material are
 * names declared earlier or later), with comments anywhere a line ends and names that start
 * with an underscore (LANGUAGE.md, "Lexical rules").
 */
class DeclarationOrderTest {
    @TempDir
    Path dir;

    @Test
    void aRosetteMayNameAGaugeAndMaterialDeclaredAfterIt() {
        ScriptRun run = ScriptRun.run(dir, """
                # readings first, declarations after: the order of declarations is free
                rosette r {
                  layout   = rectangular   # arms at 0, 45, 90 deg
                  gauge    = foil
                  material = m
                }
                case c1 {
                  r = 100, 50, 20 ue
                }
                let _peak = max(r.sigma_1)
                gauge foil {
                  factor = 2.0
                }
                material m {
                  E  = 200 GPa
                  nu = 0.3
                }
                """).ok();
        // eps_x 100, eps_y 20, gamma 2*50 - 100 - 20 = -20 ue (rectangular, textbook);
        // plane stress Hooke (textbook), sigma_1 by Mohr's circle
        double sx = 200e9 / 0.91 * (100e-6 + 0.3 * 20e-6);
        double sy = 200e9 / 0.91 * (20e-6 + 0.3 * 100e-6);
        double tau = 200e9 / 2.6 * -20e-6;
        assertEquals((sx + sy) / 2 + Math.hypot((sx - sy) / 2, tau), run.number("_peak"), 1e-3);
    }
}
