package org.rosetra.runtime.rosette;

import java.util.Locale;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.SingularValueDecomposition;
import org.rosetra.runtime.strain.StrainState;

/**
 * Step 4 of LANGUAGE.md, "What happens to one reading, in order": corrected arm readings to
 * (eps_x, eps_y, gamma_xy) in the part's axes, with transverse sensitivity. Arm i, at θi in
 * the part's axes, reads {@code (e(θi) + Kt e(θi + 90°)) / (1 - ν0 Kt)}. The matrix taking the
 * readings to the state (a least-squares pseudo-inverse past three arms) is built once here.
 */
public final class RosetteSolver {

    /** Below this, 1 - ν0 Kt makes the transverse-sensitivity model meaningless. */
    static final double MIN_CALIBRATION_DENOMINATOR = 1e-3;

    private final RosetteLayout layout;
    private final double rotation;
    private final double kt;
    private final double nu0;
    private final int arms;
    /** readings -> state, 3 x arms, row-major. */
    private final double[] toState;
    /** state -> predicted readings, arms x 3, row-major; null for a tee (no redundancy). */
    private final double[] toReadings;

    /**
     * @param layout   the arm directions
     * @param rotation direction of arm a from the part's x-axis, counter-clockwise, radians
     * @param kt       the gauges' transverse sensitivity coefficient, a fraction
     * @param nu0      Poisson's ratio of the beam on which the gauge factor and kt were measured
     */
    public RosetteSolver(RosetteLayout layout, double rotation, double kt, double nu0) {
        if (layout == null) {
            throw new RosetteException("rosette layout must be given: rectangular, delta, tee or arms(...)");
        }
        if (!Double.isFinite(rotation)) {
            throw new RosetteException("rosette angle must be finite, got " + rotation
                    + "; give the direction of arm a from the part's x-axis");
        }
        if (!(Math.abs(kt) < 1)) {
            throw new RosetteException("transverse sensitivity Kt must be a fraction between -1 and 1, got " + kt
                    + "; give it as a fraction or in %, e.g. 0.6 % for 0.006");
        }
        if (!Double.isFinite(nu0)) {
            throw new RosetteException("nu0 must be finite, got " + nu0 + "; leave it out to use 0.285");
        }
        double denominator = 1 - nu0 * kt;
        if (!(Math.abs(denominator) >= MIN_CALIBRATION_DENOMINATOR)) {
            throw new RosetteException("1 - nu0 * Kt = " + denominator + " (nu0 = " + nu0 + ", Kt = " + kt
                    + ") is near zero, so the transverse-sensitivity correction has no meaning; check that"
                    + " Kt is a fraction (0.6 % is 0.006) and nu0 the calibration beam's Poisson's ratio");
        }
        this.layout = layout;
        this.rotation = rotation;
        this.kt = kt;
        this.nu0 = nu0;
        this.arms = layout.armCount();
        if (layout.kind() == RosetteLayout.Kind.TEE) {
            this.toState = teeToState(rotation, kt, denominator);
            this.toReadings = null;
        } else {
            double[][] design = new double[arms][];
            for (int i = 0; i < arms; i++) {
                double theta = rotation + layout.angle(i);
                double c = Math.cos(theta);
                double s = Math.sin(theta);
                // e(θ) = [c², s², sc]·state; e(θ + 90°) = [s², c², -sc]·state.
                design[i] = new double[] {
                    (c * c + kt * s * s) / denominator,
                    (s * s + kt * c * c) / denominator,
                    (1 - kt) * s * c / denominator};
            }
            RealMatrix a = new Array2DRowRealMatrix(design, false);
            SingularValueDecomposition svd = new SingularValueDecomposition(a);
            double condition = svd.getConditionNumber();
            if (!(condition <= RosetteLayout.MAX_CONDITION)) {
                throw new RosetteException(String.format(Locale.ROOT,
                        "the rosette %s with Kt = %s cannot separate the strains (condition number %.3g, more"
                                + " than %.0f); check Kt, or spread the arms over 180 deg", layout, kt, condition,
                        RosetteLayout.MAX_CONDITION));
            }
            this.toState = flatten(svd.getSolver().getInverse());
            this.toReadings = flatten(a);
        }
    }

    /** A tee's readings a, b give the arm-axis strains, then the part's axes by rotation. */
    private static double[] teeToState(double rotation, double kt, double denominator) {
        // a = (ea + Kt eb) / d, b = (eb + Kt ea) / d, solved in closed form.
        double k = denominator / (1 - kt * kt);
        double c = Math.cos(rotation);
        double s = Math.sin(rotation);
        double c2 = c * c;
        double s2 = s * s;
        double sc2 = 2 * s * c;
        // ea = k (a - Kt b), eb = k (b - Kt a); eps_x = ea c² + eb s², eps_y = ea s² + eb c²,
        // gamma_xy = 2 (ea - eb) s c.
        return new double[] {
            k * (c2 - kt * s2), k * (s2 - kt * c2),
            k * (s2 - kt * c2), k * (c2 - kt * s2),
            k * (1 + kt) * sc2, -k * (1 + kt) * sc2};
    }

    private static double[] flatten(RealMatrix m) {
        int rows = m.getRowDimension();
        int cols = m.getColumnDimension();
        double[] flat = new double[rows * cols];
        for (int r = 0; r < rows; r++) {
            for (int c = 0; c < cols; c++) {
                flat[r * cols + c] = m.getEntry(r, c);
            }
        }
        return flat;
    }

    public RosetteLayout layout() {
        return layout;
    }

    public double rotation() {
        return rotation;
    }

    public double kt() {
        return kt;
    }

    public double nu0() {
        return nu0;
    }

    public int armCount() {
        return arms;
    }

    /** True when there are more arms than unknowns, so residuals say something. */
    public boolean isRedundant() {
        return toReadings != null && arms > 3;
    }

    /** The arm readings (corrected strains, in arm order) to the state and its residuals. */
    public RosetteSolution solve(double... readings) {
        if (readings == null || readings.length != arms) {
            throw new RosetteException("the " + layout + " rosette has " + arms + " arms but "
                    + (readings == null ? 0 : readings.length) + " readings were given; list one reading per arm,"
                    + " in arm order");
        }
        for (int i = 0; i < arms; i++) {
            if (!Double.isFinite(readings[i])) {
                throw new RosetteException("reading of arm " + RosetteLayout.armName(i) + " must be a finite strain, got "
                        + readings[i] + "; check that arm's reading");
            }
        }
        double ex = 0;
        double ey = 0;
        double g = 0;
        for (int i = 0; i < arms; i++) {
            ex += toState[i] * readings[i];
            ey += toState[arms + i] * readings[i];
            g += toState[2 * arms + i] * readings[i];
        }
        StrainState state = new StrainState(ex, ey, g);
        double[] residuals = new double[arms];
        double sum = 0;
        if (toReadings != null) {
            for (int i = 0; i < arms; i++) {
                double predicted = toReadings[3 * i] * ex + toReadings[3 * i + 1] * ey + toReadings[3 * i + 2] * g;
                residuals[i] = readings[i] - predicted;
                sum += residuals[i] * residuals[i];
            }
        }
        return new RosetteSolution(state, residuals, Math.sqrt(sum / arms));
    }

    /** Columns of arm readings to columns of the state. Allocates nothing. */
    public void solve(double[][] armColumns, int n, double[] epsX, double[] epsY, double[] gammaXY) {
        solve(armColumns, n, epsX, epsY, gammaXY, null);
    }

    /**
     * Columns of arm readings to columns of the state and, when {@code residualRmsOrNull} is
     * given, the residuals' root mean square per sample. Allocates nothing.
     */
    public void solve(double[][] armColumns, int n, double[] epsX, double[] epsY, double[] gammaXY,
                      double[] residualRmsOrNull) {
        requireColumns(armColumns, n, epsX, epsY, gammaXY, residualRmsOrNull);
        final double[] p = toState;
        if (arms == 3) {
            final double[] a = armColumns[0];
            final double[] b = armColumns[1];
            final double[] c = armColumns[2];
            final double p00 = p[0], p01 = p[1], p02 = p[2];
            final double p10 = p[3], p11 = p[4], p12 = p[5];
            final double p20 = p[6], p21 = p[7], p22 = p[8];
            for (int i = 0; i < n; i++) {
                double ra = a[i];
                double rb = b[i];
                double rc = c[i];
                double ex = p00 * ra + p01 * rb + p02 * rc;
                double ey = p10 * ra + p11 * rb + p12 * rc;
                double g = p20 * ra + p21 * rb + p22 * rc;
                if (!(Math.abs(ex + ey + g) <= Double.MAX_VALUE)) {
                    throw badSample(armColumns, i);
                }
                epsX[i] = ex;
                epsY[i] = ey;
                gammaXY[i] = g;
            }
        } else if (arms == 2) {
            final double[] a = armColumns[0];
            final double[] b = armColumns[1];
            final double p00 = p[0], p01 = p[1], p10 = p[2], p11 = p[3], p20 = p[4], p21 = p[5];
            for (int i = 0; i < n; i++) {
                double ra = a[i];
                double rb = b[i];
                double ex = p00 * ra + p01 * rb;
                double ey = p10 * ra + p11 * rb;
                double g = p20 * ra + p21 * rb;
                if (!(Math.abs(ex + ey + g) <= Double.MAX_VALUE)) {
                    throw badSample(armColumns, i);
                }
                epsX[i] = ex;
                epsY[i] = ey;
                gammaXY[i] = g;
            }
        } else {
            for (int i = 0; i < n; i++) {
                double ex = 0;
                double ey = 0;
                double g = 0;
                for (int k = 0; k < arms; k++) {
                    double r = armColumns[k][i];
                    ex += p[k] * r;
                    ey += p[arms + k] * r;
                    g += p[2 * arms + k] * r;
                }
                if (!(Math.abs(ex + ey + g) <= Double.MAX_VALUE)) {
                    throw badSample(armColumns, i);
                }
                epsX[i] = ex;
                epsY[i] = ey;
                gammaXY[i] = g;
            }
        }
        if (residualRmsOrNull != null) {
            residualRms(armColumns, n, epsX, epsY, gammaXY, residualRmsOrNull);
        }
    }

    private void residualRms(double[][] armColumns, int n, double[] epsX, double[] epsY, double[] gammaXY,
                             double[] out) {
        final double[] d = toReadings;
        if (d == null) {
            for (int i = 0; i < n; i++) {
                out[i] = 0;
            }
            return;
        }
        final double inverseArms = 1.0 / arms;
        for (int i = 0; i < n; i++) {
            double ex = epsX[i];
            double ey = epsY[i];
            double g = gammaXY[i];
            double sum = 0;
            for (int k = 0; k < arms; k++) {
                double r = armColumns[k][i] - (d[3 * k] * ex + d[3 * k + 1] * ey + d[3 * k + 2] * g);
                sum += r * r;
            }
            out[i] = Math.sqrt(sum * inverseArms);
        }
    }

    private RosetteException badSample(double[][] armColumns, int i) {
        StringBuilder values = new StringBuilder();
        for (int k = 0; k < arms; k++) {
            values.append(k == 0 ? "" : ", ").append(RosetteLayout.armName(k)).append(" = ").append(armColumns[k][i]);
        }
        return new RosetteException("sample " + i + " has a reading that is not a finite strain (" + values
                + "); check the arm readings of that sample");
    }

    private void requireColumns(double[][] armColumns, int n, double[] epsX, double[] epsY, double[] gammaXY,
                                double[] rms) {
        if (armColumns == null || armColumns.length != arms) {
            throw new RosetteException("the " + layout + " rosette has " + arms + " arms but "
                    + (armColumns == null ? 0 : armColumns.length) + " reading columns were given;"
                    + " give one column per arm, in arm order");
        }
        if (epsX == null || epsY == null || gammaXY == null) {
            throw new RosetteException("eps_x, eps_y and gamma_xy output columns must be given");
        }
        boolean fits = n >= 0 && n <= epsX.length && n <= epsY.length && n <= gammaXY.length
                && (rms == null || n <= rms.length);
        for (double[] column : armColumns) {
            fits &= column != null && n <= column.length;
        }
        if (!fits) {
            throw new RosetteException("sample count " + n + " does not fit the given columns;"
                    + " pass a count no larger than the shortest column");
        }
    }
}
