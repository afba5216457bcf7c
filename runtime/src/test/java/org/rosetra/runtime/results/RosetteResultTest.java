package org.rosetra.runtime.results;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.rosetra.runtime.material.Material;
import org.rosetra.runtime.strain.StrainState;
import org.rosetra.runtime.stress.Hooke;
import org.rosetra.runtime.stress.PlaneCondition;
import org.rosetra.runtime.stress.StressState;

class RosetteResultTest {

    private static final double MPA = 1e6;
    private static final Material STEEL = Material.of("steel", 200e9, 0.3, null, 355 * MPA, null, null, null);

    @Test
    void membersFollowTheTableOfLanguageMd() {
        // Source: LANGUAGE.md, "Results of a rosette", in the table's order.
        List<String> table = List.of("eps_x", "eps_y", "gamma_xy", "eps_1", "eps_2", "theta_p", "gamma_max",
                "eps_z", "sigma_x", "sigma_y", "tau_xy", "sigma_1", "sigma_2", "sigma_z", "tau_max", "tau_abs",
                "von_mises", "tresca");
        List<String> names = new ArrayList<>();
        for (RosetteMember m : RosetteMember.values()) {
            names.add(m.scriptName());
            assertEquals(m, RosetteMember.byScriptName(m.scriptName()).orElseThrow());
            assertFalse(m.description().isBlank());
            assertEquals(m.kind() == MemberKind.STRESS || m == RosetteMember.EPS_Z, m.needsMaterial());
        }
        assertEquals(table, names);
        assertEquals(MemberKind.ANGLE, RosetteMember.THETA_P.kind());
        assertTrue(RosetteMember.byScriptName("sigma_3").isEmpty());
    }

    @Test
    void shaftInBendingAndTorsion() {
        // Source: Budynas & Nisbett, Shigley's, round shaft at the surface: sigma = 32 M / (pi d^3),
        // tau = 16 T / (pi d^3); von Mises sqrt(sigma^2 + 3 tau^2), Tresca sqrt(sigma^2 + 4 tau^2)
        // (from memory).
        double d = 0.050;
        double sigma = 32 * 1200 / (Math.PI * d * d * d);
        double tau = 16 * 1500 / (Math.PI * d * d * d);
        StrainState strain = Hooke.strain(new StressState(sigma, 0, tau), STEEL, PlaneCondition.PLANE_STRESS);
        RosetteResult r = RosetteResult.of(strain, STEEL, PlaneCondition.PLANE_STRESS);
        assertEquals(Math.sqrt(sigma * sigma + 3 * tau * tau), r.get(RosetteMember.VON_MISES), 1e-5);
        assertEquals(Math.sqrt(sigma * sigma + 4 * tau * tau), r.get(RosetteMember.TRESCA), 1e-5);
        // In plane stress with sigma_1 > 0 > sigma_2 the absolute and in-plane maxima agree.
        assertEquals(Math.sqrt(sigma * sigma / 4 + tau * tau), r.get(RosetteMember.TAU_ABS), 1e-5);
        assertEquals(Math.sqrt(sigma * sigma / 4 + tau * tau), r.get(RosetteMember.TAU_MAX), 1e-5);
        assertEquals(0, r.get(RosetteMember.SIGMA_Z), 0);
    }

    @Test
    void cylinderAbsoluteMaximumShearUsesTheFreeSurface() {
        // Source: thin-walled cylinder (Gere & Goodno sec. 8.3, from memory): at the outer surface
        // sigma_z = 0, so tau_abs = hoop / 2 = p r / (2 t), while tau_max in the plane = p r / (4 t).
        double p = 2 * MPA;
        double r = 0.5;
        double t = 0.01;
        StrainState strain = Hooke.strain(new StressState(p * r / (2 * t), p * r / t, 0), STEEL,
                PlaneCondition.PLANE_STRESS);
        RosetteResult res = RosetteResult.of(strain, STEEL, PlaneCondition.PLANE_STRESS);
        assertEquals(p * r / (2 * t), res.get(RosetteMember.TAU_ABS), 1e-5);
        assertEquals(p * r / (4 * t), res.get(RosetteMember.TAU_MAX), 1e-5);
        assertEquals(Math.PI / 2, res.get(RosetteMember.THETA_P), 1e-12);
        // Von Mises of a biaxial state: sqrt(s1^2 - s1 s2 + s2^2) = (sqrt(3) / 2) p r / t here.
        assertEquals(Math.sqrt(3) / 2 * p * r / t, res.get(RosetteMember.VON_MISES), 1e-5);
    }

    @Test
    void planeStrainCarriesTheOutOfPlaneStress() {
        // Source: plane strain sigma_z = nu (sigma_x + sigma_y) (Timoshenko & Goodier, from memory).
        StrainState strain = new StrainState(600e-6, 400e-6, 0);
        RosetteResult r = RosetteResult.of(strain, STEEL, PlaneCondition.PLANE_STRAIN);
        double sx = r.get(RosetteMember.SIGMA_X);
        double sy = r.get(RosetteMember.SIGMA_Y);
        assertEquals(0.3 * (sx + sy), r.get(RosetteMember.SIGMA_Z), 1e-5);
        assertEquals(0, r.get(RosetteMember.EPS_Z), 0);
        // All three principal stresses are tensile here: tau_abs is half of sigma_1 - sigma_z.
        double s1 = r.get(RosetteMember.SIGMA_1);
        double sz = r.get(RosetteMember.SIGMA_Z);
        assertTrue(sz < r.get(RosetteMember.SIGMA_2));
        assertEquals(0.5 * (s1 - sz), r.get(RosetteMember.TAU_ABS), 1e-5);
        assertEquals(s1 - sz, r.get(RosetteMember.TRESCA), 1e-5);
    }

    @Test
    void withoutAMaterialOnlyTheStrainMembersExist() {
        RosetteResult r = RosetteResult.of(new StrainState(420e-6, -135e-6, 260e-6), null, null);
        assertTrue(r.has(RosetteMember.EPS_1));
        assertFalse(r.has(RosetteMember.EPS_Z));
        assertFalse(r.has(RosetteMember.VON_MISES));
        ResultException e = assertThrows(ResultException.class, () -> r.get(RosetteMember.SIGMA_1));
        assertTrue(e.getMessage().contains("sigma_1 needs a material"), e.getMessage());
        assertEquals(7, r.asMap().size());
    }

    @Test
    void columnsAgreeWithTheScalarPathInBothConditions() {
        Random random = new Random(42L);
        int n = 3000;
        double[] x = new double[n];
        double[] y = new double[n];
        double[] g = new double[n];
        for (int i = 0; i < n; i++) {
            double scale = Math.pow(10, -6 + 3 * random.nextDouble());
            x[i] = scale * random.nextGaussian();
            y[i] = i % 50 == 0 ? x[i] : scale * random.nextGaussian(); // some with equal principal strains
            g[i] = i % 50 == 0 ? 0 : scale * random.nextGaussian();
        }
        for (PlaneCondition c : PlaneCondition.values()) {
            EnumMap<RosetteMember, double[]> cols = ResultColumns.compute(x, y, g, n, STEEL, c);
            assertEquals(RosetteMember.values().length, cols.size());
            for (int i = 0; i < n; i++) {
                RosetteResult r = RosetteResult.of(new StrainState(x[i], y[i], g[i]), STEEL, c);
                for (RosetteMember m : RosetteMember.values()) {
                    double scalar = r.get(m);
                    assertEquals(scalar, cols.get(m)[i], 1e-13 * Math.abs(scalar), m + " at " + i + " " + c);
                }
            }
        }
        EnumMap<RosetteMember, double[]> bare = ResultColumns.compute(x, y, g, n, null, null);
        assertEquals(7, bare.size());
        for (int i = 0; i < n; i++) {
            RosetteResult r = RosetteResult.of(new StrainState(x[i], y[i], g[i]), null, null);
            assertEquals(r.get(RosetteMember.THETA_P), bare.get(RosetteMember.THETA_P)[i], 0);
            assertEquals(r.get(RosetteMember.EPS_2), bare.get(RosetteMember.EPS_2)[i], 0);
        }
    }

    @Test
    void columnsFillOnlyWhatIsAskedAndRefuseBadInput() {
        EnumMap<RosetteMember, double[]> out = new EnumMap<>(RosetteMember.class);
        double[] vm = new double[2];
        out.put(RosetteMember.VON_MISES, vm);
        double[] x = {500e-6, 0};
        double[] y = {-150e-6, 0};
        double[] g = {0, 0};
        ResultColumns.compute(x, y, g, 2, STEEL, PlaneCondition.PLANE_STRESS, out);
        // Uniaxial check (common practice): eps_x = s / E, eps_y = -nu s / E gives von Mises = s.
        assertEquals(100 * MPA, vm[0], 1e-5);
        assertEquals(0, vm[1], 0);
        double[] bad = {Double.NaN, 0};
        ResultException e = assertThrows(ResultException.class,
                () -> ResultColumns.compute(bad, y, g, 2, STEEL, PlaneCondition.PLANE_STRESS, out));
        assertTrue(e.getMessage().contains("position 0"), e.getMessage());
        assertThrows(ResultException.class,
                () -> ResultColumns.compute(x, y, new double[1], 2, STEEL, PlaneCondition.PLANE_STRESS, out));
        assertThrows(ResultException.class,
                () -> ResultColumns.compute(x, y, g, 2, STEEL, null, out));
    }

    @Test
    void aStateGivenByItsStresses() {
        StressState given = new StressState(120 * MPA, -40 * MPA, 35 * MPA);
        // Closed form (Gere & Goodno, plane stress principal stresses, from memory):
        // (sx + sy) / 2 +- sqrt(((sx - sy) / 2)^2 + tau^2) = 40 +- 87.3212 MPa; von Mises of a
        // plane state sqrt(s1^2 - s1 s2 + s2^2) (Budynas & Nisbett, Shigley's, from memory).
        double r = Math.sqrt(80 * 80 + 35 * 35) * MPA;
        double s1 = 40 * MPA + r;
        double s2 = 40 * MPA - r;
        RosetteResult bare = RosetteResult.ofStress(given, null, PlaneCondition.PLANE_STRESS);
        assertEquals(s1, bare.get(RosetteMember.SIGMA_1), 1e-6);
        assertEquals(s2, bare.get(RosetteMember.SIGMA_2), 1e-6);
        assertEquals(Math.sqrt(s1 * s1 - s1 * s2 + s2 * s2), bare.get(RosetteMember.VON_MISES), 1e-6);
        assertFalse(bare.has(RosetteMember.EPS_X));
        RosetteResult bareStrain = RosetteResult.ofStress(given, null, PlaneCondition.PLANE_STRAIN);
        assertFalse(bareStrain.has(RosetteMember.SIGMA_Z));
        assertFalse(bareStrain.has(RosetteMember.VON_MISES));
        assertTrue(bareStrain.has(RosetteMember.TAU_MAX));
        // With a material the strains follow by Hooke's law, and turning them back gives the
        // same result as the strain path.
        for (PlaneCondition c : PlaneCondition.values()) {
            RosetteResult full = RosetteResult.ofStress(given, STEEL, c);
            RosetteResult again = RosetteResult.of(Hooke.strain(given, STEEL, c), STEEL, c);
            assertEquals(RosetteMember.values().length, full.asMap().size());
            for (RosetteMember m : RosetteMember.values()) {
                assertEquals(again.get(m), full.get(m), 1e-9 * Math.max(1, Math.abs(again.get(m))), m.scriptName());
            }
        }
    }
}
