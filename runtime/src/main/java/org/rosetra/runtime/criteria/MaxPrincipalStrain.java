package org.rosetra.runtime.criteria;

import org.rosetra.runtime.material.Material;

/**
 * Saint-Venant maximum normal strain criterion as a failure index: the largest principal
 * strain against the yield strain in tension, and the smallest against the yield strain in
 * compression, max(eMax E / yield, -eMin E / yield_c), over the three principal strains
 * (in-plane eps1, eps2 and out-of-plane eps_z). Failure when a principal strain reaches the
 * strain at yield in a uniaxial test, as in Boresi &amp; Schmidt, Advanced Mechanics of
 * Materials, "maximum principal strain criterion" (from memory). 1 or more means failure.
 */
public final class MaxPrincipalStrain {

    private static final String NAME = "max_principal_strain";

    private MaxPrincipalStrain() {
    }

    public static double index(double e1, double e2, double e3, double modulus,
                               double yield, double yieldC) {
        CriterionException.requireFinite(NAME, "a principal strain", e1 + e2 + e3);
        CriterionException.requirePositive(NAME, "E", modulus);
        CriterionException.requirePositive(NAME, "yield", yield);
        CriterionException.requirePositive(NAME, "yield_c", yieldC);
        return raw(e1, e2, e3, modulus, yield, yieldC);
    }

    /** With E and the yield strengths of {@code material}; an error names what it lacks. */
    public static double index(double e1, double e2, double e3, Material material) {
        return index(e1, e2, e3, material.e(), material.requireYield(NAME), material.requireYieldC(NAME));
    }

    /** out[i] = index(e1[i], e2[i], e3[i], modulus, yield, yieldC) for i < n. */
    public static void index(double[] e1, double[] e2, double[] e3, int n,
                             double modulus, double yield, double yieldC, double[] out) {
        CriterionException.requireColumns(NAME, n, e1, e2, e3, out);
        CriterionException.requirePositive(NAME, "E", modulus);
        CriterionException.requirePositive(NAME, "yield", yield);
        CriterionException.requirePositive(NAME, "yield_c", yieldC);
        for (int i = 0; i < n; i++) {
            double v = raw(e1[i], e2[i], e3[i], modulus, yield, yieldC);
            if (!Double.isFinite(v)) {
                CriterionException.requireFinite(NAME, "value " + i, v);
            }
            out[i] = v;
        }
    }

    private static double raw(double e1, double e2, double e3, double modulus,
                              double yield, double yieldC) {
        double eMax = Math.max(e1, Math.max(e2, e3));
        double eMin = Math.min(e1, Math.min(e2, e3));
        return Math.max(eMax * modulus / yield, -eMin * modulus / yieldC);
    }
}
