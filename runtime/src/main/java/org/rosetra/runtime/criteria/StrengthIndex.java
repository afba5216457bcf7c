package org.rosetra.runtime.criteria;

/**
 * A failure index of the largest and smallest principal stress against the tensile and
 * compressive ultimate strengths (Rankine, Mohr–Coulomb, modified Mohr): the checks of its
 * inputs and the loop over columns, written once for all of them.
 */
@FunctionalInterface
interface StrengthIndex {

    /** The index for sA, sB (largest and smallest principal stress) and the two strengths. */
    double of(double sA, double sB, double ultimate, double ultimateC);

    static double index(String name, StrengthIndex f, double s1, double s2, double s3,
                        double ultimate, double ultimateC) {
        CriterionException.requireFinite(name, "a principal stress", s1 + s2 + s3);
        CriterionException.requirePositive(name, "ultimate", ultimate);
        CriterionException.requirePositive(name, "ultimate_c", ultimateC);
        return f.of(Math.max(s1, Math.max(s2, s3)), Math.min(s1, Math.min(s2, s3)), ultimate, ultimateC);
    }

    static void index(String name, StrengthIndex f, double[] s1, double[] s2, double[] s3, int n,
                      double ultimate, double ultimateC, double[] out) {
        CriterionException.requireColumns(name, n, s1, s2, s3, out);
        CriterionException.requirePositive(name, "ultimate", ultimate);
        CriterionException.requirePositive(name, "ultimate_c", ultimateC);
        for (int i = 0; i < n; i++) {
            double a = Math.max(s1[i], Math.max(s2[i], s3[i]));
            double b = Math.min(s1[i], Math.min(s2[i], s3[i]));
            double v = f.of(a, b, ultimate, ultimateC);
            if (!Double.isFinite(v)) {
                CriterionException.requireFinite(name, "value " + i, v);
            }
            out[i] = v;
        }
    }
}
