package org.rosetra.runtime.criteria;

/** Tresca equivalent stress: the largest minus the smallest of three principal stresses. */
public final class Tresca {

    private Tresca() {
    }

    public static double equivalent(double s1, double s2, double s3) {
        CriterionException.requireFinite("tresca", "a principal stress", s1 + s2 + s3);
        return raw(s1, s2, s3);
    }

    /** out[i] = equivalent(s1[i], s2[i], s3[i]) for i < n. */
    public static void equivalent(double[] s1, double[] s2, double[] s3, int n, double[] out) {
        CriterionException.requireColumns("tresca", n, s1, s2, s3, out);
        for (int i = 0; i < n; i++) {
            double v = raw(s1[i], s2[i], s3[i]);
            if (!Double.isFinite(v)) {
                CriterionException.requireFinite("tresca", "value " + i, v);
            }
            out[i] = v;
        }
    }

    /** The formula itself, for loops that have already checked their input. */
    public static double raw(double s1, double s2, double s3) {
        return Math.max(s1, Math.max(s2, s3)) - Math.min(s1, Math.min(s2, s3));
    }
}
