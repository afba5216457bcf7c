package org.rosetra.runtime.criteria;

import org.rosetra.runtime.material.Material;

/**
 * Mohr-Coulomb failure index, as LANGUAGE.md defines {@code mohr_coulomb}:
 * max(sA, 0) / ultimate + max(-sB, 0) / ultimate_c, with sA and sB the largest and smallest
 * of the three principal stresses. 1 or more means failure.
 */
public final class MohrCoulomb {

    private static final String NAME = "mohr_coulomb";

    private MohrCoulomb() {
    }

    public static double index(double s1, double s2, double s3, double ultimate, double ultimateC) {
        return StrengthIndex.index(NAME, MohrCoulomb::of, s1, s2, s3, ultimate, ultimateC);
    }

    /** With the strengths of {@code material}; an error names the strength it lacks. */
    public static double index(double s1, double s2, double s3, Material material) {
        return index(s1, s2, s3, material.requireUltimate(NAME), material.requireUltimateC(NAME));
    }

    /** out[i] = index(s1[i], s2[i], s3[i], ultimate, ultimateC) for i < n. */
    public static void index(double[] s1, double[] s2, double[] s3, int n,
                             double ultimate, double ultimateC, double[] out) {
        StrengthIndex.index(NAME, MohrCoulomb::of, s1, s2, s3, n, ultimate, ultimateC, out);
    }

    /** The index for sA and sB, the largest and smallest of the three principal stresses. */
    static double of(double sA, double sB, double ultimate, double ultimateC) {
        return Math.max(sA, 0) / ultimate + Math.max(-sB, 0) / ultimateC;
    }
}
