package org.rosetra.runtime.stress;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.junit.jupiter.api.Test;
import org.rosetra.runtime.strain.MohrCircle;
import org.rosetra.runtime.strain.StateException;
import org.rosetra.runtime.strain.StrainAngles;

class StressStateTest {

    private static final double MPA = 1e6;

    @Test
    void principalStressesAgreeWithEigenDecompositionOfTheStressTensor() {
        Random random = new Random(99L);
        for (int k = 0; k < 5000; k++) {
            double scale = Math.pow(10, 4 + 5 * random.nextDouble());
            StressState s = new StressState(scale * random.nextGaussian(), scale * random.nextGaussian(),
                    scale * random.nextGaussian());
            PrincipalStresses p = s.principal();
            // Source: Commons Math 3.6.1 EigenDecomposition of [[sigma_x, tau], [tau, sigma_y]].
            EigenDecomposition eig = new EigenDecomposition(new Array2DRowRealMatrix(new double[][] {
                    {s.sigmaX(), s.tauXY()}, {s.tauXY(), s.sigmaY()}}));
            double[] values = eig.getRealEigenvalues();
            int big = values[0] >= values[1] ? 0 : 1;
            assertEquals(values[big], p.sigma1(), 1e-11 * scale);
            assertEquals(values[1 - big], p.sigma2(), 1e-11 * scale);
            assertTrue(p.theta1() > -Math.PI / 2 && p.theta1() <= Math.PI / 2);
            if (p.sigma1() - p.sigma2() > 1e-6 * scale) {
                RealVector v = eig.getEigenvector(big);
                assertEquals(0, StrainAngles.differenceModPi(Math.atan2(v.getEntry(1), v.getEntry(0)),
                        p.theta1()), 1e-8);
            }
            assertEquals(0.5 * (p.sigma1() - p.sigma2()), s.maxShear(), 1e-11 * scale);
        }
    }

    @Test
    void tractionOnAFaceAgreesWithCauchysFormula() {
        Random random = new Random(3L);
        for (int k = 0; k < 2000; k++) {
            StressState s = new StressState(100 * MPA * random.nextGaussian(),
                    100 * MPA * random.nextGaussian(), 100 * MPA * random.nextGaussian());
            double theta = Math.PI * (2 * random.nextDouble() - 1);
            RealMatrix t = new Array2DRowRealMatrix(new double[][] {
                    {s.sigmaX(), s.tauXY()}, {s.tauXY(), s.sigmaY()}});
            RealVector n = new ArrayRealVector(new double[] {Math.cos(theta), Math.sin(theta)});
            RealVector m = new ArrayRealVector(new double[] {-Math.sin(theta), Math.cos(theta)});
            // Source: Cauchy's formula, traction = S n; normal n . S n, shear m . S n (common practice).
            assertEquals(n.dotProduct(t.operate(n)), s.normalAt(theta), 1e-6);
            assertEquals(m.dotProduct(t.operate(n)), s.shearAt(theta), 1e-6);
            StressState r = s.rotated(theta);
            assertEquals(s.normalAt(theta), r.sigmaX(), 1e-6);
            assertEquals(s.normalAt(theta + Math.PI / 2), r.sigmaY(), 1e-6);
            assertEquals(s.shearAt(theta), r.tauXY(), 1e-6);
            // Common practice: sigma_x + sigma_y and the Mohr radius do not depend on the axes.
            assertEquals(s.sigmaX() + s.sigmaY(), r.sigmaX() + r.sigmaY(), 1e-6);
            assertEquals(s.mohr().radius(), r.mohr().radius(), 1e-6);
            assertEquals(s.principal().sigma1(), r.principal().sigma1(), 1e-6);
            if (s.maxShear() > 1 * MPA) {
                assertEquals(0, StrainAngles.differenceModPi(r.principal().theta1(),
                        s.principal().theta1() - theta), 1e-12);
            }
        }
        // Definition: shearAt(0) is tau_xy.
        StressState s = new StressState(120 * MPA, -40 * MPA, 35 * MPA);
        assertEquals(s.tauXY(), s.shearAt(0), 0);
    }

    @Test
    void mohrCircleOfStress() {
        StressState s = new StressState(120 * MPA, -40 * MPA, 35 * MPA);
        MohrCircle m = s.mohr();
        // Closed form (Gere & Goodno, Mechanics of Materials, Mohr's circle for plane stress, from
        // memory): centre (sx + sy) / 2 = 40 MPa, radius sqrt(80^2 + 35^2) MPa = 87.3212 MPa.
        assertEquals(40 * MPA, m.centre(), 1e-6);
        assertEquals(Math.sqrt(80 * 80 + 35 * 35) * MPA, m.radius(), 1e-6);
        assertEquals(120 * MPA, m.xNormal(), 0);
        assertEquals(35 * MPA, m.xShear(), 0);
        assertEquals(-40 * MPA, m.yNormal(), 0);
        assertEquals(-35 * MPA, m.yShear(), 0);
        // tan 2 theta_p = 2 tau / (sx - sy) = 70 / 160 (same source).
        assertEquals(Math.atan(70.0 / 160.0), m.twoThetaP(), 1e-15);
    }

    @Test
    void principalDirectionOnTheEdges() {
        // Common practice: sigma_y > sigma_x with no shear puts sigma_1 along y, +90 deg here.
        assertEquals(Math.PI / 2, new StressState(-10 * MPA, 50 * MPA, -0.0).principal().theta1(), 0);
        // LANGUAGE.md: 0 when the principal values are equal (hydrostatic in the plane).
        assertEquals(0.0, new StressState(30 * MPA, 30 * MPA, 0).principal().theta1(), 0);
        assertThrows(StateException.class, () -> new StressState(0, 0, Double.NaN));
    }
}
