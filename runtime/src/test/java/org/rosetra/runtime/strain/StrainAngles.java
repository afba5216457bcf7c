package org.rosetra.runtime.strain;

/** Test helpers for comparing directions. */
public final class StrainAngles {

    private StrainAngles() {
    }

    /** a - b reduced into (-π/2, π/2]: the difference of two undirected lines. */
    public static double differenceModPi(double a, double b) {
        double d = Math.IEEEremainder(a - b, Math.PI);
        return d;
    }

    /** a - b reduced into [-π, π]. */
    public static double differenceMod2Pi(double a, double b) {
        return Math.IEEEremainder(a - b, 2 * Math.PI);
    }
}
