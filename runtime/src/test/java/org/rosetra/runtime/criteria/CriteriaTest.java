package org.rosetra.runtime.criteria;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.Test;
import org.rosetra.runtime.material.Material;
import org.rosetra.runtime.material.MaterialException;

class CriteriaTest {

    private static final double MPA = 1e6;
    private static final double GPA = 1e9;

    @Test
    void vonMisesAndTrescaClosedForms() {
        double s = 180 * MPA;
        double tau = 70 * MPA;
        // Budynas & Nisbett, Shigley's, distortion-energy theory (from memory): uniaxial -> |sigma|.
        assertEquals(s, VonMises.equivalent(s, 0, 0), 1e-6);
        assertEquals(s, VonMises.equivalent(0, -s, 0), 1e-6);
        // Same source: pure shear sigma_1 = tau, sigma_2 = -tau -> sqrt(3) tau; Tresca 2 tau.
        assertEquals(Math.sqrt(3) * tau, VonMises.equivalent(tau, -tau, 0), 1e-6);
        assertEquals(2 * tau, Tresca.equivalent(tau, 0, -tau), 1e-6);
        // Common practice: a hydrostatic state has no distortion.
        assertEquals(0, VonMises.equivalent(s, s, s), 1e-6);
        // Same source: bending with torsion, sqrt(sigma^2 + 3 tau^2) and sqrt(sigma^2 + 4 tau^2).
        double r = Math.sqrt(s * s / 4 + tau * tau);
        assertEquals(Math.sqrt(s * s + 3 * tau * tau), VonMises.equivalent(s / 2 + r, s / 2 - r, 0), 1e-6);
        assertEquals(Math.sqrt(s * s + 4 * tau * tau), Tresca.equivalent(s / 2 + r, 0, s / 2 - r), 1e-6);
        // Order of the three does not matter.
        assertEquals(VonMises.equivalent(1, 2, 3), VonMises.equivalent(3, 1, 2), 1e-15);
        assertThrows(CriterionException.class, () -> VonMises.equivalent(Double.NaN, 0, 0));
    }

    @Test
    void rankineAndMohrCoulombReachOneAtTheStrengths() {
        double sut = 200 * MPA;
        double suc = 700 * MPA;
        // LANGUAGE.md definitions; Budynas & Nisbett, Shigley's, brittle Coulomb-Mohr
        // sigma_A / S_ut - sigma_B / S_uc = 1 (from memory): uniaxial at a strength gives 1.
        assertEquals(1, Rankine.index(sut, 0, 0, sut, suc), 1e-15);
        assertEquals(1, Rankine.index(0, -suc, 0, sut, suc), 1e-15);
        assertEquals(1, MohrCoulomb.index(sut, 0, 0, sut, suc), 1e-15);
        assertEquals(1, MohrCoulomb.index(0, 0, -suc, sut, suc), 1e-15);
        // Pure shear tau: Rankine tau / S_ut; Coulomb-Mohr tau / S_ut + tau / S_uc.
        double tau = 100 * MPA;
        assertEquals(tau / sut, Rankine.index(tau, -tau, 0, sut, suc), 1e-15);
        assertEquals(tau / sut + tau / suc, MohrCoulomb.index(tau, -tau, 0, sut, suc), 1e-15);
        // With the material: strengths come from it, and a missing one is an error naming it.
        Material iron = Material.of("iron", 100 * GPA, 0.26, null, null, null, sut, suc);
        assertEquals(1, MohrCoulomb.index(0, -suc, 0, iron), 1e-15);
        Material steel = Material.of("s355", 205 * GPA, 0.29, null, 355 * MPA, null, null, null);
        MaterialException e = assertThrows(MaterialException.class, () -> MohrCoulomb.index(1, 0, 0, steel));
        assertTrue(e.getMessage().contains("mohr_coulomb"), e.getMessage());
        assertThrows(CriterionException.class, () -> Rankine.index(1, 0, 0, 0, suc));
    }

    @Test
    void modifiedMohrBranches() {
        double sut = 31e3 * 6894.757; // 31 kpsi in Pa
        double suc = 109e3 * 6894.757;
        // Budynas & Nisbett, Shigley's, modified Mohr eq. (5-32) (from memory):
        // uniaxial tension and compression at the strengths give 1.
        assertEquals(1, ModifiedMohr.index(sut, 0, 0, sut, suc), 1e-12);
        assertEquals(1, ModifiedMohr.index(0, -suc, 0, sut, suc), 1e-12);
        // Tension governs while |sigma_B| <= sigma_A: pure shear tau gives tau / S_ut.
        double tau = 10 * MPA;
        assertEquals(tau / sut, ModifiedMohr.index(tau, -tau, 0, sut, suc), 1e-12);
        // Beyond that: (S_uc - S_ut) sigma_A / (S_uc S_ut) - sigma_B / S_uc.
        double a = 20 * MPA;
        double b = -150 * MPA;
        assertEquals((suc - sut) * a / (suc * sut) - b / suc, ModifiedMohr.index(a, b, 0, sut, suc), 1e-12);
        // All compressive: -sigma_B / S_uc.
        assertEquals(300 * MPA / suc, ModifiedMohr.index(-100 * MPA, -300 * MPA, -50 * MPA, sut, suc), 1e-12);
        // The branches meet continuously (the line sigma_B = -sigma_A).
        double edge = 50 * MPA;
        assertEquals(ModifiedMohr.index(edge, -edge, 0, sut, suc),
                ModifiedMohr.index(edge, -edge * (1 + 1e-12), 0, sut, suc), 1e-9);
    }

    @Test
    void maxPrincipalStrainReachesOneAtYieldInUniaxialStress() {
        double e = 200 * GPA;
        double nu = 0.3;
        double yield = 355 * MPA;
        // Saint-Venant maximum normal strain (Boresi & Schmidt, Advanced Mechanics of Materials, from
        // memory): uniaxial stress at yield gives eps_1 = yield / E, lateral strains -nu yield / E.
        double eps = yield / e;
        assertEquals(1, MaxPrincipalStrain.index(eps, -nu * eps, -nu * eps, e, yield, yield), 1e-12);
        assertEquals(1, MaxPrincipalStrain.index(nu * eps, -eps, nu * eps, e, yield, yield), 1e-12);
        // Same source: biaxial sigma_1 = sigma_2 = s gives eps = (1 - nu) s / E, index (1 - nu) s / yield.
        double s = 200 * MPA;
        double inPlane = (1 - nu) * s / e;
        double through = -2 * nu * s / e;
        assertEquals((1 - nu) * s / yield, MaxPrincipalStrain.index(inPlane, inPlane, through, e, yield, yield), 1e-12);
    }

    @Test
    void columnsAgreeWithTheScalarForms() {
        Random random = new Random(5L);
        int n = 1000;
        double[] a = new double[n];
        double[] b = new double[n];
        double[] c = new double[n];
        for (int i = 0; i < n; i++) {
            a[i] = 300 * MPA * random.nextGaussian();
            b[i] = 300 * MPA * random.nextGaussian();
            c[i] = 300 * MPA * random.nextGaussian();
        }
        double[] vm = new double[n];
        double[] tr = new double[n];
        double[] rk = new double[n];
        double[] mc = new double[n];
        double[] mm = new double[n];
        double[] ms = new double[n];
        VonMises.equivalent(a, b, c, n, vm);
        Tresca.equivalent(a, b, c, n, tr);
        Rankine.index(a, b, c, n, 250 * MPA, 800 * MPA, rk);
        MohrCoulomb.index(a, b, c, n, 250 * MPA, 800 * MPA, mc);
        ModifiedMohr.index(a, b, c, n, 250 * MPA, 800 * MPA, mm);
        MaxPrincipalStrain.index(a, b, c, n, 200 * GPA, 355 * MPA, 400 * MPA, ms);
        for (int i = 0; i < n; i++) {
            assertEquals(VonMises.equivalent(a[i], b[i], c[i]), vm[i], 0);
            assertEquals(Tresca.equivalent(a[i], b[i], c[i]), tr[i], 0);
            assertEquals(Rankine.index(a[i], b[i], c[i], 250 * MPA, 800 * MPA), rk[i], 0);
            assertEquals(MohrCoulomb.index(a[i], b[i], c[i], 250 * MPA, 800 * MPA), mc[i], 0);
            assertEquals(ModifiedMohr.index(a[i], b[i], c[i], 250 * MPA, 800 * MPA), mm[i], 0);
            assertEquals(MaxPrincipalStrain.index(a[i], b[i], c[i], 200 * GPA, 355 * MPA, 400 * MPA), ms[i], 0);
        }
        assertThrows(CriterionException.class, () -> VonMises.equivalent(a, b, new double[3], n, vm));
    }
}
