package org.rosetra.runtime.criteria;

import org.rosetra.runtime.material.Material;

/**
 * Rankine (maximum normal stress) failure index, as LANGUAGE.md defines {@code rankine}:
 * max(sA / ultimate, -sB / ultimate_c), with sA and sB the largest and smallest of the three
 * principal stresses. 1 or more means failure.
 */
public final class Rankine {

    private static final String NAME = "rankine";

    private Rankine() {
    }

    public static double index(double s1, double s2, double s3, double ultimate, double ultimateC) {
        return StrengthIndex.index(NAME, Rankine::of, s1, s2, s3, ultimate, ultimateC);
    }

    /** With the strengths of {@code material}; an error names the strength it lacks. */
    public static double index(double s1, double s2, double s3, Material material) {
        return index(s1, s2, s3, material.requireUltimate(NAME), material.requireUltimateC(NAME));
    }

    /** out[i] = index(s1[i], s2[i], s3[i], ultimate, ultimateC) for i < n. */
    public static void index(double[] s1, double[] s2, double[] s3, int n,
                             double ultimate, double ultimateC, double[] out) {
        StrengthIndex.index(NAME, Rankine::of, s1, s2, s3, n, ultimate, ultimateC, out);
    }

    /** The index for sA and sB, the largest and smallest of the three principal stresses. */
    static double of(double sA, double sB, double ultimate, double ultimateC) {
        return Math.max(sA / ultimate, -sB / ultimateC);
    }
}
