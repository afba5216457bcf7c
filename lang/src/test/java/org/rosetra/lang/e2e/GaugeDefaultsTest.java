package org.rosetra.lang.e2e;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The defaults of a gauge and of a rosette's bridge (LANGUAGE.md, "Declarations"): nu0 0.285,
 * resistance 120 ohm, thermal_factor 2.00, instrument_factor the gauge's own factor, bridge
 * none, lead 0 ohm. Each test leaves one field out and works the reading by hand with the
 * default. Rectangular rosette at 0 deg (textbook): eps_x = e_a, eps_y = e_c.
 */
class GaugeDefaultsTest {
    private static final double STRAIN = 1e-12;

    @TempDir
    Path dir;

    private ScriptRun run(String gauge, String rosetteExtra, String caseBody) {
        return ScriptRun.run(dir, """
                material steel {
                  E  = 200 GPa
                  nu = 0.3
                }
                gauge foil {
                %s
                }
                rosette r {
                  layout = rectangular
                  gauge = foil
                  material = steel
                %s
                }
                case c1 {
                %s
                }
                """.formatted(gauge, rosetteExtra, caseBody)).ok();
    }

    @Test
    void nu0DefaultsTo0285() {
        ScriptRun run = run("  factor = 2.00\n  transverse = 3 %", "", "  r = 600, 100, -200 ue");
        // LANGUAGE.md, step 4, with nu0 = 0.285 (default); textbook transverse correction for
        // two perpendicular arms: eps_x = (A - Kt C) / (1 - Kt^2), A = r_a (1 - nu0 Kt)
        double kt = 0.03;
        double a = 600e-6 * (1 - 0.285 * kt);
        double c = -200e-6 * (1 - 0.285 * kt);
        assertEquals((a - kt * c) / (1 - kt * kt), run.member("r", "c1", "eps_x"), STRAIN);
        assertEquals((c - kt * a) / (1 - kt * kt), run.member("r", "c1", "eps_y"), STRAIN);
    }

    @Test
    void transverseDefaultsToZero() {
        ScriptRun run = run("  factor = 2.00\n  nu0 = 0.3", "", "  r = 600, 100, -200 ue");
        // LANGUAGE.md: Kt defaults to 0, so the arms read the strain itself
        assertEquals(600e-6, run.member("r", "c1", "eps_x"), STRAIN);
        assertEquals(-200e-6, run.member("r", "c1", "eps_y"), STRAIN);
    }

    @Test
    void resistanceDefaultsTo120Ohm() {
        ScriptRun run = run("  factor = 2.00", "  bridge = quarter\n  lead = 1.5 ohm", "  r = 1000, 0, -1000 ue");
        // LANGUAGE.md, step 1 with R_gauge = 120 ohm (default), n = 2, F_inst = F = 2.00
        double[] e = new double[2];
        double[] ind = {1000e-6, -1000e-6};
        for (int i = 0; i < 2; i++) {
            double vr = 2.00 * ind[i] / 4;
            e[i] = 4 * vr / (1 - 2 * vr) * (1 + 2 * 1.5 / 120) / 2.00;
        }
        assertEquals(e[0], run.member("r", "c1", "eps_x"), STRAIN);
        assertEquals(e[1], run.member("r", "c1", "eps_y"), STRAIN);
    }

    @Test
    void instrumentFactorDefaultsToTheGaugeFactor() {
        ScriptRun run = run("  factor = 2.13", "  bridge = quarter", "  r = 2000, 0, -2000 ue");
        // LANGUAGE.md, step 1 with F_inst = F = 2.13 and no lead: e = 4 Vr / (1 - 2 Vr) / F
        double vrA = 2.13 * 2000e-6 / 4;
        double vrC = 2.13 * -2000e-6 / 4;
        assertEquals(4 * vrA / (1 - 2 * vrA) / 2.13, run.member("r", "c1", "eps_x"), STRAIN);
        assertEquals(4 * vrC / (1 - 2 * vrC) / 2.13, run.member("r", "c1", "eps_y"), STRAIN);
    }

    @Test
    void bridgeDefaultsToNoneWithTheGaugesOwnFactor() {
        ScriptRun run = run("  factor = 2.13", "", "  r = 2000, 0, -2000 ue");
        // LANGUAGE.md, step 1: bridge = none and F_inst = F, so e = e_ind
        assertEquals(2000e-6, run.member("r", "c1", "eps_x"), STRAIN);
        assertEquals(-2000e-6, run.member("r", "c1", "eps_y"), STRAIN);
    }

    @Test
    void thermalFactorDefaultsTo200() {
        ScriptRun run = run("  factor = 2.10\n  thermal = -30, 1.5 ue", "",
                "  temperature = 40 degC\n  r = 100, 0, 100 ue");
        // LANGUAGE.md, step 2 with thermal_factor = 2.00 (default): TO = -30 + 1.5 * 40 ue
        double apparent = (-30 + 1.5 * 40) * 1e-6 * 2.00 / 2.10;
        assertEquals(100e-6 - apparent, run.member("r", "c1", "eps_x"), STRAIN);
        assertEquals(100e-6 - apparent, run.member("r", "c1", "eps_y"), STRAIN);
    }
}
