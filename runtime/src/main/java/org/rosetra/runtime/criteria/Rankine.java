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
        CriterionException.requireFinite(NAME, "a principal stress", s1 + s2 + s3);
        CriterionException.requirePositive(NAME, "ultimate", ultimate);
        CriterionException.requirePositive(NAME, "ultimate_c", ultimateC);
        return raw(s1, s2, s3, ultimate, ultimateC);
    }

    /** With the strengths of {@code material}; an error names the strength it lacks. */
    public static double index(double s1, double s2, double s3, Material material) {
        return index(s1, s2, s3, material.requireUltimate(NAME), material.requireUltimateC(NAME));
    }

    /** out[i] = index(s1[i], s2[i], s3[i], ultimate, ultimateC) for i < n. */
    public static void index(double[] s1, double[] s2, double[] s3, int n,
                             double ultimate, double ultimateC, double[] out) {
        CriterionException.requireColumns(NAME, n, s1, s2, s3, out);
        CriterionException.requirePositive(NAME, "ultimate", ultimate);
        CriterionException.requirePositive(NAME, "ultimate_c", ultimateC);
        for (int i = 0; i < n; i++) {
            double v = raw(s1[i], s2[i], s3[i], ultimate, ultimateC);
            if (!Double.isFinite(v)) {
                CriterionException.requireFinite(NAME, "value " + i, v);
            }
            out[i] = v;
        }
    }

    private static double raw(double s1, double s2, double s3, double ultimate, double ultimateC) {
        double sA = Math.max(s1, Math.max(s2, s3));
        double sB = Math.min(s1, Math.min(s2, s3));
        return Math.max(sA / ultimate, -sB / ultimateC);
    }
}
