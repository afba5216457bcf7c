package org.rosetra.runtime.material;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class MaterialTest {

    private static final double MPA = 1e6;
    private static final double GPA = 1e9;

    @Test
    void anyTwoElasticConstantsFixTheThird() {
        // Source: isotropic elasticity, G = E / (2 (1 + nu)) (Gere & Goodno, Mechanics of Materials,
        // eq. for the shear modulus; common practice). E = 200 GPa, nu = 0.3 -> G = 76.923 GPa.
        Material fromENu = Material.of("s1", 200 * GPA, 0.3, null, null, null, null, null);
        assertEquals(200 * GPA / 2.6, fromENu.g(), 1e-3);
        Material fromEG = Material.of("s2", 200 * GPA, null, 80 * GPA, null, null, null, null);
        assertEquals(0.25, fromEG.nu(), 1e-15); // 200 / (2 * 80) - 1
        Material fromNuG = Material.of("s3", null, 0.25, 80 * GPA, null, null, null, null);
        assertEquals(200 * GPA, fromNuG.e(), 1e-3); // 2 * 80 * 1.25
    }

    @Test
    void allThreeMustAgreeWithinHalfAPercent() {
        // 76.923 GPa is the consistent G; 0.4 % off is accepted, 0.6 % off is refused (LANGUAGE.md).
        double consistent = 200 * GPA / 2.6;
        Material ok = Material.of("ok", 200 * GPA, 0.3, consistent * 1.004, null, null, null, null);
        assertEquals(consistent * 1.004, ok.g(), 1e-3);
        MaterialException e = assertThrows(MaterialException.class,
                () -> Material.of("bad", 200 * GPA, 0.3, consistent * 1.006, null, null, null, null));
        assertTrue(e.getMessage().contains("bad"), e.getMessage());
        assertTrue(e.getMessage().contains("G = E / (2 (1 + nu))"), e.getMessage());
        assertTrue(e.getMessage().contains("200000 MPa"), e.getMessage());
        assertTrue(e.getMessage().contains("0.60 %"), e.getMessage());
    }

    @Test
    void fewerThanTwoElasticConstantsNamesWhatIsMissing() {
        MaterialException e = assertThrows(MaterialException.class,
                () -> Material.of("s355", 205 * GPA, null, null, 355 * MPA, null, null, null));
        assertTrue(e.getMessage().contains("nu and G are missing"), e.getMessage());
        assertTrue(e.getMessage().contains("s355"), e.getMessage());
        assertThrows(MaterialException.class, () -> Material.of("x", null, null, null, null, null, null, null));
    }

    @Test
    void poissonsRatioAndModuliRanges() {
        // Common practice: for a stable isotropic material -1 < nu < 0.5.
        assertThrows(MaterialException.class, () -> Material.of("m", 200 * GPA, 0.5, null, null, null, null, null));
        assertThrows(MaterialException.class, () -> Material.of("m", 200 * GPA, -1.0, null, null, null, null, null));
        MaterialException pct = assertThrows(MaterialException.class,
                () -> Material.of("m", 200 * GPA, 29.0, null, null, null, null, null));
        assertTrue(pct.getMessage().contains("nu = 29"), pct.getMessage());
        // E and G that imply nu = 200 / (2 * 50) - 1 = 1: out of range, and the message says so.
        MaterialException implied = assertThrows(MaterialException.class,
                () -> Material.of("m", 200 * GPA, null, 50 * GPA, null, null, null, null));
        assertTrue(implied.getMessage().contains("give nu = E / (2 G) - 1 = 1"), implied.getMessage());
        assertThrows(MaterialException.class, () -> Material.of("m", -200 * GPA, 0.3, null, null, null, null, null));
        assertThrows(MaterialException.class, () -> Material.of("m", 200 * GPA, null, 0.0, null, null, null, null));
        assertThrows(MaterialException.class, () -> Material.of("m", Double.NaN, 0.3, 70 * GPA, null, null, null, null));
        assertThrows(MaterialException.class, () -> Material.of("m", 200 * GPA, 0.3, null, -355 * MPA, null, null, null));
        // Slightly negative and nearly incompressible values are accepted.
        assertEquals(-0.2, Material.of("foam", 1 * GPA, -0.2, null, null, null, null, null).nu(), 0);
        assertEquals(0.499, Material.of("rubber", 0.01 * GPA, 0.499, null, null, null, null, null).nu(), 0);
    }

    @Test
    void compressiveStrengthsDefaultToTheTensileOnes() {
        Material m = Material.of("s355", 205 * GPA, 0.29, null, 355 * MPA, null, 510 * MPA, null);
        assertEquals(355 * MPA, m.requireYieldC("tresca"), 0);
        assertEquals(510 * MPA, m.requireUltimateC("rankine"), 0);
        Material iron = Material.of("iron", 100 * GPA, 0.26, null, null, null, 200 * MPA, 700 * MPA);
        assertEquals(700 * MPA, iron.requireUltimateC("rankine"), 0);
        assertFalse(iron.yield().isPresent());
    }

    @Test
    void aMissingStrengthSaysWhatToGive() {
        Material m = Material.of("s355", 205 * GPA, 0.29, null, 355 * MPA, null, null, null);
        MaterialException e = assertThrows(MaterialException.class, () -> m.requireUltimate("mohr_coulomb"));
        assertEquals("material s355 has no 'ultimate'; give ultimate = ... to use mohr_coulomb", e.getMessage());
        MaterialException c = assertThrows(MaterialException.class, () -> m.requireUltimateC("rankine"));
        assertTrue(c.getMessage().contains("'ultimate_c'") && c.getMessage().contains("rankine"), c.getMessage());
    }
}
