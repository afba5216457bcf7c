package org.rosetra.runtime.combine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Random;
import org.junit.jupiter.api.Test;
import org.rosetra.runtime.material.Material;
import org.rosetra.runtime.strain.StrainState;
import org.rosetra.runtime.stress.Hooke;
import org.rosetra.runtime.stress.PlaneCondition;
import org.rosetra.runtime.stress.StressState;

class CombinationTest {

    @Test
    void superposedStrainGivesTheSuperposedStressOfALinearMaterial() {
        // Common practice: linear elasticity obeys superposition, so Hooke's law of the combined
        // strains equals the same combination of the cases' stresses.
        Material m = Material.of("steel", 200e9, 0.3, null, null, null, null, null);
        StrainState a = new StrainState(412e-6, -38e-6, -121e-6);
        StrainState b = new StrainState(-50e-6, 220e-6, 75e-6);
        double[] k = {0.6, 1.35};
        StrainState c = Combination.superpose(k, new StrainState[] {a, b});
        assertEquals(0.6 * 412e-6 + 1.35 * -50e-6, c.epsX(), 1e-20);
        for (PlaneCondition pc : PlaneCondition.values()) {
            StressState sa = Hooke.stress(a, m, pc);
            StressState sb = Hooke.stress(b, m, pc);
            StressState sc = Hooke.stress(c, m, pc);
            assertEquals(0.6 * sa.sigmaX() + 1.35 * sb.sigmaX(), sc.sigmaX(), 1e-6);
            assertEquals(0.6 * sa.sigmaY() + 1.35 * sb.sigmaY(), sc.sigmaY(), 1e-6);
            assertEquals(0.6 * sa.tauXY() + 1.35 * sb.tauXY(), sc.tauXY(), 1e-6);
        }
    }

    @Test
    void columnsAgreeWithTheScalarForm() {
        Random random = new Random(1L);
        int terms = 3;
        int n = 200;
        double[] k = {0.6, -1.0, 1.5};
        double[][] x = new double[terms][n];
        double[][] y = new double[terms][n];
        double[][] g = new double[terms][n];
        for (int j = 0; j < terms; j++) {
            for (int i = 0; i < n; i++) {
                x[j][i] = 1e-3 * random.nextGaussian();
                y[j][i] = 1e-3 * random.nextGaussian();
                g[j][i] = 1e-3 * random.nextGaussian();
            }
        }
        double[] ox = new double[n];
        double[] oy = new double[n];
        double[] og = new double[n];
        Combination.superpose(k, x, y, g, n, ox, oy, og);
        for (int i = 0; i < n; i++) {
            StrainState[] states = new StrainState[terms];
            for (int j = 0; j < terms; j++) {
                states[j] = new StrainState(x[j][i], y[j][i], g[j][i]);
            }
            StrainState s = Combination.superpose(k, states);
            assertEquals(s.epsX(), ox[i], 0);
            assertEquals(s.epsY(), oy[i], 0);
            assertEquals(s.gammaXY(), og[i], 0);
        }
    }

    @Test
    void refusesTermsThatDoNotFit() {
        StrainState a = new StrainState(1e-4, 0, 0);
        assertThrows(CombinationException.class, () -> Combination.superpose(new double[0], new StrainState[0]));
        assertThrows(CombinationException.class, () -> Combination.superpose(new double[] {1, 2}, new StrainState[] {a}));
        assertThrows(CombinationException.class, () -> Combination.superpose(new double[] {Double.NaN}, new StrainState[] {a}));
    }
}
