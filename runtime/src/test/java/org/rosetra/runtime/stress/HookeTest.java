package org.rosetra.runtime.stress;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.junit.jupiter.api.Test;
import org.rosetra.runtime.material.Material;
import org.rosetra.runtime.strain.StrainState;

class HookeTest {

    private static final double MPA = 1e6;
    private static final double GPA = 1e9;
    private static final Material STEEL = Material.of("steel", 200 * GPA, 0.3, null, 355 * MPA, null, null, null);

    @Test
    void thinWalledCylinderUnderInternalPressure() {
        // Source: thin-walled cylinder, hoop p r / t and axial p r / (2 t) (Roark's Formulas for
        // Stress and Strain, thin-walled pressure vessels; Gere & Goodno sec. 8.3), from memory.
        double p = 1.5 * MPA;
        double r = 0.400;
        double t = 0.008;
        double hoop = p * r / t;        // 75 MPa
        double axial = p * r / (2 * t); // 37.5 MPa
        StressState applied = new StressState(axial, hoop, 0); // x along the axis, y around
        StrainState strain = Hooke.strain(applied, STEEL, PlaneCondition.PLANE_STRESS);
        // Source: Hooke's law for biaxial stress, eps = (s1 - nu s2) / E (Gere & Goodno sec. 7.5).
        assertEquals((axial - 0.3 * hoop) / (200 * GPA), strain.epsX(), 1e-18);
        assertEquals((hoop - 0.3 * axial) / (200 * GPA), strain.epsY(), 1e-18);
        StressState back = Hooke.stress(strain, STEEL, PlaneCondition.PLANE_STRESS);
        assertEquals(axial, back.sigmaX(), 1e-6);
        assertEquals(hoop, back.sigmaY(), 1e-6);
        assertEquals(0, back.tauXY(), 1e-6);
        PrincipalStresses principal = back.principal();
        assertEquals(hoop, principal.sigma1(), 1e-6);
        assertEquals(axial, principal.sigma2(), 1e-6);
        assertEquals(Math.PI / 2, principal.theta1(), 1e-12);
        // A gauge set 30 deg off the axis sees rotated strains; its principal values are the same
        // and its principal direction is 30 deg less.
        StrainState turned = strain.rotated(Math.toRadians(30));
        PrincipalStresses fromTurned = Hooke.stress(turned, STEEL, PlaneCondition.PLANE_STRESS).principal();
        assertEquals(hoop, fromTurned.sigma1(), 1e-6);
        assertEquals(axial, fromTurned.sigma2(), 1e-6);
        assertEquals(Math.toRadians(60), fromTurned.theta1(), 1e-12);
        // Thin-walled cylinder: through-thickness strain -nu (hoop + axial) / E (generalised Hooke).
        assertEquals(-0.3 * (hoop + axial) / (200 * GPA),
                Hooke.outOfPlaneStrain(strain, STEEL, PlaneCondition.PLANE_STRESS), 1e-18);
    }

    @Test
    void solidShaftInBendingAndTorsionAtTheSurface() {
        // Source: Budynas & Nisbett, Shigley's Mechanical Engineering Design, combined bending and
        // torsion of a round shaft: sigma = 32 M / (pi d^3), tau = 16 T / (pi d^3) (from memory).
        double d = 0.040;
        double m = 600;
        double torque = 900;
        double sigma = 32 * m / (Math.PI * d * d * d);
        double tau = 16 * torque / (Math.PI * d * d * d);
        StrainState strain = Hooke.strain(new StressState(sigma, 0, tau), STEEL, PlaneCondition.PLANE_STRESS);
        StressState back = Hooke.stress(strain, STEEL, PlaneCondition.PLANE_STRESS);
        PrincipalStresses p = back.principal();
        // Same source: sigma_1,2 = sigma / 2 +- sqrt((sigma / 2)^2 + tau^2).
        double radius = Math.sqrt(sigma * sigma / 4 + tau * tau);
        assertEquals(sigma / 2 + radius, p.sigma1(), 1e-6);
        assertEquals(sigma / 2 - radius, p.sigma2(), 1e-6);
        assertEquals(radius, back.maxShear(), 1e-6);
        // tan 2 theta_p = 2 tau / sigma.
        assertEquals(0.5 * Math.atan(2 * tau / sigma), p.theta1(), 1e-12);
    }

    @Test
    void rectangularBeamInBending() {
        // Source: flexure formula sigma = M c / I, I = b h^3 / 12 (Gere & Goodno, Mechanics of
        // Materials, ch. 5, from memory): at the top fibre a uniaxial stress.
        double b = 0.030;
        double h = 0.060;
        double moment = 2000;
        double sigma = moment * (h / 2) / (b * h * h * h / 12);
        assertEquals(6 * moment / (b * h * h), sigma, 1e-6);
        StrainState strain = new StrainState(sigma / STEEL.e(), -STEEL.nu() * sigma / STEEL.e(), 0);
        StressState s = Hooke.stress(strain, STEEL, PlaneCondition.PLANE_STRESS);
        assertEquals(sigma, s.sigmaX(), 1e-6);
        assertEquals(0, s.sigmaY(), 1e-6);
        // Generalised Hooke's law: the thickness strain of a uniaxial stress is -nu sigma / E.
        assertEquals(-STEEL.nu() * sigma / STEEL.e(),
                Hooke.outOfPlaneStrain(strain, STEEL, PlaneCondition.PLANE_STRESS), 1e-18);
        assertEquals(0, Hooke.outOfPlaneStress(s, STEEL, PlaneCondition.PLANE_STRESS), 0);
    }

    @Test
    void bothConditionsAgreeWithThreeDimensionalHookesLaw() {
        // Source: generalised Hooke's law for an isotropic solid, eps_i = (s_i - nu (s_j + s_k)) / E
        // (Gere & Goodno sec. 7.6; Timoshenko & Goodier, Theory of Elasticity), solved with
        // Commons Math LUDecomposition for the out-of-plane condition.
        Material m = Material.of("alloy", 70 * GPA, 0.33, null, null, null, null, null);
        double e = m.e();
        double nu = m.nu();
        RealMatrix compliance = new Array2DRowRealMatrix(new double[][] {
                {1 / e, -nu / e, -nu / e}, {-nu / e, 1 / e, -nu / e}, {-nu / e, -nu / e, 1 / e}});
        Random random = new Random(11L);
        for (int k = 0; k < 500; k++) {
            StrainState strain = new StrainState(1e-3 * random.nextGaussian(), 1e-3 * random.nextGaussian(),
                    1e-3 * random.nextGaussian());
            // Plane strain: eps_z = 0, solve the 3 x 3 compliance for (sx, sy, sz).
            RealVector sol = new LUDecomposition(compliance, 1e-40).getSolver()
                    .solve(new ArrayRealVector(new double[] {strain.epsX(), strain.epsY(), 0}));
            StressState ps = Hooke.stress(strain, m, PlaneCondition.PLANE_STRAIN);
            assertEquals(sol.getEntry(0), ps.sigmaX(), 1e-3);
            assertEquals(sol.getEntry(1), ps.sigmaY(), 1e-3);
            assertEquals(sol.getEntry(2), Hooke.outOfPlaneStress(ps, m, PlaneCondition.PLANE_STRAIN), 1e-3);
            assertEquals(0, Hooke.outOfPlaneStrain(strain, m, PlaneCondition.PLANE_STRAIN), 0);
            // Plane stress: s_z = 0, so (sx, sy) solve the upper 2 x 2 block, and eps_z follows.
            RealVector sol2 = new LUDecomposition(compliance.getSubMatrix(0, 1, 0, 1), 1e-40).getSolver()
                    .solve(new ArrayRealVector(new double[] {strain.epsX(), strain.epsY()}));
            StressState pst = Hooke.stress(strain, m, PlaneCondition.PLANE_STRESS);
            assertEquals(sol2.getEntry(0), pst.sigmaX(), 1e-3);
            assertEquals(sol2.getEntry(1), pst.sigmaY(), 1e-3);
            assertEquals(compliance.getRowVector(2).dotProduct(
                            new ArrayRealVector(new double[] {pst.sigmaX(), pst.sigmaY(), 0})),
                    Hooke.outOfPlaneStrain(strain, m, PlaneCondition.PLANE_STRESS), 1e-15);
            // Shear: tau = G gamma with G = E / (2 (1 + nu)) (common practice).
            assertEquals(e / (2 * (1 + nu)) * strain.gammaXY(), pst.tauXY(), 1e-3);
            assertEquals(pst.tauXY(), ps.tauXY(), 0);
            // Round trip through the inverse law, both conditions.
            for (PlaneCondition c : PlaneCondition.values()) {
                StrainState again = Hooke.strain(Hooke.stress(strain, m, c), m, c);
                assertEquals(strain.epsX(), again.epsX(), 1e-17);
                assertEquals(strain.epsY(), again.epsY(), 1e-17);
                assertEquals(strain.gammaXY(), again.gammaXY(), 1e-17);
            }
        }
    }

    @Test
    void planeStrainOutOfPlaneStress() {
        // Source: plane strain, sigma_z = nu (sigma_x + sigma_y) (Timoshenko & Goodier, Theory of
        // Elasticity, plane strain, from memory).
        StressState s = new StressState(120 * MPA, -40 * MPA, 35 * MPA);
        assertEquals(0.3 * 80 * MPA, Hooke.outOfPlaneStress(s, STEEL, PlaneCondition.PLANE_STRAIN), 1e-6);
        // Plane stress: no stress through the thickness (definition).
        assertEquals(0, Hooke.outOfPlaneStress(s, STEEL, PlaneCondition.PLANE_STRESS), 0);
    }
}
