package org.rosetra.runtime.results;

import java.util.EnumMap;
import java.util.Objects;
import org.rosetra.runtime.material.Material;
import org.rosetra.runtime.strain.PrincipalDirection;
import org.rosetra.runtime.stress.ElasticCoefficients;
import org.rosetra.runtime.stress.PlaneCondition;

/**
 * Every member of "Results of a rosette" (LANGUAGE.md) over columns of strain states (cases
 * or samples): the columnar twin of {@link RosetteResult}, written as one plain loop with the
 * same arithmetic, no allocation and no boxing inside it.
 */
public final class ResultColumns {

    private ResultColumns() {
    }

    /**
     * Fills {@code out[member][0..n)} for every member that is a key of {@code out}; members
     * not in the map are skipped (so a caller pays only for what it asks). Without a material
     * ({@code materialOrNull == null}) only the strain members other than {@code eps_z} are
     * filled and arrays under the other keys are left untouched. Theta in radians, stresses
     * in Pa.
     *
     * @throws ResultException when a column is shorter than n, or a strain is not finite
     *     (naming the position)
     */
    public static void compute(double[] epsX, double[] epsY, double[] gammaXY, int n,
                               Material materialOrNull, PlaneCondition condition,
                               EnumMap<RosetteMember, double[]> out) {
        Objects.requireNonNull(out, "out");
        if (n < 0) {
            throw new ResultException("result columns: n = " + n + " is negative; give n >= 0");
        }
        requireLength("eps_x", epsX, n);
        requireLength("eps_y", epsY, n);
        requireLength("gamma_xy", gammaXY, n);
        for (var entry : out.entrySet()) {
            if (entry.getValue() != null) {
                requireLength("the output for " + entry.getKey().scriptName(), entry.getValue(), n);
            }
        }
        double[] oEpsX = out.get(RosetteMember.EPS_X);
        double[] oEpsY = out.get(RosetteMember.EPS_Y);
        double[] oGamma = out.get(RosetteMember.GAMMA_XY);
        double[] oEps1 = out.get(RosetteMember.EPS_1);
        double[] oEps2 = out.get(RosetteMember.EPS_2);
        double[] oTheta = out.get(RosetteMember.THETA_P);
        double[] oGammaMax = out.get(RosetteMember.GAMMA_MAX);
        boolean stresses = materialOrNull != null;
        if (stresses && condition == null) {
            throw new ResultException("a rosette with material " + materialOrNull.name()
                    + " needs a plane condition; give state = plane_stress or plane_strain");
        }
        ElasticCoefficients k = stresses ? ElasticCoefficients.of(materialOrNull, condition) : null;
        double c11 = stresses ? k.stiffness11() : 0;
        double c12 = stresses ? k.stiffness12() : 0;
        double shearModulus = stresses ? k.shearModulus() : 0;
        double epsZFactor = stresses ? k.epsZPerInPlaneSum() : 0;
        double sigmaZFactor = stresses ? k.sigmaZPerInPlaneSum() : 0;
        double[] oEpsZ = stresses ? out.get(RosetteMember.EPS_Z) : null;
        double[] oSigmaX = stresses ? out.get(RosetteMember.SIGMA_X) : null;
        double[] oSigmaY = stresses ? out.get(RosetteMember.SIGMA_Y) : null;
        double[] oTau = stresses ? out.get(RosetteMember.TAU_XY) : null;
        double[] oSigma1 = stresses ? out.get(RosetteMember.SIGMA_1) : null;
        double[] oSigma2 = stresses ? out.get(RosetteMember.SIGMA_2) : null;
        double[] oSigmaZ = stresses ? out.get(RosetteMember.SIGMA_Z) : null;
        double[] oTauMax = stresses ? out.get(RosetteMember.TAU_MAX) : null;
        double[] oTauAbs = stresses ? out.get(RosetteMember.TAU_ABS) : null;
        double[] oVonMises = stresses ? out.get(RosetteMember.VON_MISES) : null;
        double[] oTresca = stresses ? out.get(RosetteMember.TRESCA) : null;

        for (int i = 0; i < n; i++) {
            double ex = epsX[i];
            double ey = epsY[i];
            double g = gammaXY[i];
            if (!(Double.isFinite(ex) && Double.isFinite(ey) && Double.isFinite(g))) {
                throw new ResultException("result columns: the strain state at position " + i
                        + " is (" + ex + ", " + ey + ", " + g + "); every strain must be a finite number");
            }
            double halfG = 0.5 * g;
            double centre = 0.5 * (ex + ey);
            double radius = PrincipalDirection.radius(ex, ey, halfG);
            double eps1 = centre + radius;
            double eps2 = centre - radius;
            if (oEpsX != null) {
                oEpsX[i] = ex;
            }
            if (oEpsY != null) {
                oEpsY[i] = ey;
            }
            if (oGamma != null) {
                oGamma[i] = g;
            }
            if (oEps1 != null) {
                oEps1[i] = eps1;
            }
            if (oEps2 != null) {
                oEps2[i] = eps2;
            }
            if (oTheta != null) {
                oTheta[i] = PrincipalDirection.theta1(ex, ey, halfG);
            }
            if (oGammaMax != null) {
                oGammaMax[i] = eps1 - eps2;
            }
            if (!stresses) {
                continue;
            }
            double sx = c11 * ex + c12 * ey;
            double sy = c12 * ex + c11 * ey;
            double tau = shearModulus * g;
            double sCentre = 0.5 * (sx + sy);
            double sRadius = PrincipalDirection.radius(sx, sy, tau);
            double s1 = sCentre + sRadius;
            double s2 = sCentre - sRadius;
            double sz = sigmaZFactor * (sx + sy) + 0.0;
            double sMax = Math.max(s1, Math.max(s2, sz));
            double sMin = Math.min(s1, Math.min(s2, sz));
            if (oEpsZ != null) {
                oEpsZ[i] = epsZFactor * (ex + ey) + 0.0;
            }
            if (oSigmaX != null) {
                oSigmaX[i] = sx;
            }
            if (oSigmaY != null) {
                oSigmaY[i] = sy;
            }
            if (oTau != null) {
                oTau[i] = tau;
            }
            if (oSigma1 != null) {
                oSigma1[i] = s1;
            }
            if (oSigma2 != null) {
                oSigma2[i] = s2;
            }
            if (oSigmaZ != null) {
                oSigmaZ[i] = sz;
            }
            if (oTauMax != null) {
                oTauMax[i] = 0.5 * (s1 - s2);
            }
            if (oTauAbs != null) {
                oTauAbs[i] = 0.5 * (sMax - sMin);
            }
            if (oVonMises != null) {
                double a = s1 - s2;
                double b = s2 - sz;
                double c = sz - s1;
                oVonMises[i] = Math.sqrt(0.5 * (a * a + b * b + c * c));
            }
            if (oTresca != null) {
                oTresca[i] = sMax - sMin;
            }
        }
    }

    /**
     * Allocating form: a new column of length n for every member that exists (all of them with
     * a material; the strain members other than {@code eps_z} without).
     */
    public static EnumMap<RosetteMember, double[]> compute(double[] epsX, double[] epsY, double[] gammaXY,
                                                           int n, Material materialOrNull,
                                                           PlaneCondition condition) {
        if (n < 0) {
            throw new ResultException("result columns: n = " + n + " is negative; give n >= 0");
        }
        EnumMap<RosetteMember, double[]> out = new EnumMap<>(RosetteMember.class);
        for (RosetteMember m : RosetteMember.values()) {
            if (materialOrNull != null || !m.needsMaterial()) {
                out.put(m, new double[n]);
            }
        }
        compute(epsX, epsY, gammaXY, n, materialOrNull, condition, out);
        return out;
    }

    private static void requireLength(String what, double[] column, int n) {
        if (column == null || column.length < n) {
            throw new ResultException("result columns: " + what + " holds "
                    + (column == null ? "nothing" : column.length + " values") + " but n = " + n
                    + "; give at least n values");
        }
    }
}
