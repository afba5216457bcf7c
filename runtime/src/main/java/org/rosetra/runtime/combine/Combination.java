package org.rosetra.runtime.combine;

import org.rosetra.runtime.strain.StrainState;

/**
 * A load combination: the strain states of the cases superposed with factors,
 * Σ k_j ε_j, component by component. Stresses and criteria are computed afterwards from the
 * combined state (they are not linear in general, e.g. von Mises), never added.
 */
public final class Combination {

    private Combination() {
    }

    /** Σ factors[j] · states[j]. */
    public static StrainState superpose(double[] factors, StrainState[] states) {
        requireTerms(factors, states == null ? -1 : states.length);
        double x = 0;
        double y = 0;
        double g = 0;
        for (int j = 0; j < factors.length; j++) {
            if (states[j] == null) {
                throw new CombinationException("combination term " + (j + 1)
                        + " has no strain state; every term needs a solved state");
            }
            x += factors[j] * states[j].epsX();
            y += factors[j] * states[j].epsY();
            g += factors[j] * states[j].gammaXY();
        }
        return new StrainState(x, y, g);
    }

    /**
     * Columnar superposition: term j holds columns {@code epsX[j]}, {@code epsY[j]},
     * {@code gammaXY[j]} (e.g. over rosettes or samples); for i < n,
     * {@code outX[i] = Σ_j factors[j] epsX[j][i]}, and likewise for y and the shear.
     * The sum over terms is taken in the same order as the scalar form, so both agree exactly.
     */
    public static void superpose(double[] factors, double[][] epsX, double[][] epsY, double[][] gammaXY,
                                 int n, double[] outX, double[] outY, double[] outGamma) {
        int terms = factors == null ? 0 : factors.length;
        requireTerms(factors, epsX == null ? -1 : epsX.length);
        requireTerms(factors, epsY == null ? -1 : epsY.length);
        requireTerms(factors, gammaXY == null ? -1 : gammaXY.length);
        if (n < 0) {
            throw new CombinationException("combination: n = " + n + " is negative; give n >= 0");
        }
        requireLength("the combined eps_x column", outX, n);
        requireLength("the combined eps_y column", outY, n);
        requireLength("the combined gamma_xy column", outGamma, n);
        for (int j = 0; j < terms; j++) {
            requireLength("eps_x of term " + (j + 1), epsX[j], n);
            requireLength("eps_y of term " + (j + 1), epsY[j], n);
            requireLength("gamma_xy of term " + (j + 1), gammaXY[j], n);
        }
        for (int i = 0; i < n; i++) {
            double x = 0;
            double y = 0;
            double g = 0;
            for (int j = 0; j < terms; j++) {
                double k = factors[j];
                x += k * epsX[j][i];
                y += k * epsY[j][i];
                g += k * gammaXY[j][i];
            }
            if (!(Double.isFinite(x) && Double.isFinite(y) && Double.isFinite(g))) {
                throw new CombinationException("combination: value " + i
                        + " is not a finite number; check the terms' strains at that position");
            }
            outX[i] = x;
            outY[i] = y;
            outGamma[i] = g;
        }
    }

    private static void requireTerms(double[] factors, int stateCount) {
        if (factors == null || factors.length == 0) {
            throw new CombinationException("a combination needs at least one term (factor * case)");
        }
        if (stateCount != factors.length) {
            throw new CombinationException("a combination of " + factors.length + " factors was given "
                    + (stateCount < 0 ? "no" : String.valueOf(stateCount))
                    + " strain states; give one state per factor");
        }
        for (int j = 0; j < factors.length; j++) {
            if (!Double.isFinite(factors[j])) {
                throw new CombinationException("combination factor " + (j + 1) + " is " + factors[j]
                        + "; factors must be finite numbers");
            }
        }
    }

    private static void requireLength(String what, double[] column, int n) {
        if (column == null || column.length < n) {
            throw new CombinationException("combination: " + what + " holds "
                    + (column == null ? "nothing" : column.length + " values") + " but n = " + n
                    + "; give at least n values");
        }
    }
}
