package org.rosetra.runtime.criteria;

/**
 * Von Mises equivalent stress of three principal stresses (any order):
 * sqrt(((s1 - s2)² + (s2 - s3)² + (s3 - s1)²) / 2).
 */
public final class VonMises {

    private VonMises() {
    }

    public static double equivalent(double s1, double s2, double s3) {
        CriterionException.requireFinite("von_mises", "a principal stress", s1 + s2 + s3);
        return raw(s1, s2, s3);
    }

    /** out[i] = equivalent(s1[i], s2[i], s3[i]) for i < n. */
    public static void equivalent(double[] s1, double[] s2, double[] s3, int n, double[] out) {
        CriterionException.requireColumns("von_mises", n, s1, s2, s3, out);
        for (int i = 0; i < n; i++) {
            double v = raw(s1[i], s2[i], s3[i]);
            if (!Double.isFinite(v)) {
                CriterionException.requireFinite("von_mises", "value " + i, v);
            }
            out[i] = v;
        }
    }

    /** The formula itself, for loops that have already checked their input. */
    public static double raw(double s1, double s2, double s3) {
        double a = s1 - s2;
        double b = s2 - s3;
        double c = s3 - s1;
        return Math.sqrt(0.5 * (a * a + b * b + c * c));
    }
}
