package org.rosetra.runtime.rosette;

import java.util.Arrays;
import java.util.Locale;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.SingularValueDecomposition;

/**
 * The directions of a rosette's arms, counter-clockwise from arm a, in radians.
 * Arm a is always at 0: angles given to {@link #arms} are taken relative to the first.
 */
public final class RosetteLayout {

    /** What kind of layout; a tee is solved differently (its arms lie on the principal axes). */
    public enum Kind { RECTANGULAR, DELTA, TEE, ARMS }

    /**
     * Largest condition number of the arm-to-strain matrix that is accepted: beyond it a
     * reading's error is amplified more than a hundredfold in the strains (0, 10, 20 deg
     * gives about 69; rectangular about 3.2; delta 2).
     */
    public static final double MAX_CONDITION = 100.0;

    /** Two directions closer than this (modulo 180 deg) are the same gauge direction. */
    static final double SAME_DIRECTION_RAD = 1e-6;

    private static final RosetteLayout RECTANGULAR_LAYOUT =
            new RosetteLayout(Kind.RECTANGULAR, new double[] {0, Math.PI / 4, Math.PI / 2});
    private static final RosetteLayout DELTA_LAYOUT =
            new RosetteLayout(Kind.DELTA, new double[] {0, Math.PI / 3, 2 * Math.PI / 3});
    private static final RosetteLayout TEE_LAYOUT =
            new RosetteLayout(Kind.TEE, new double[] {0, Math.PI / 2});

    private final Kind kind;
    private final double[] angles;

    private RosetteLayout(Kind kind, double[] angles) {
        this.kind = kind;
        this.angles = angles;
    }

    /** Arms at 0, 45 and 90 deg. */
    public static RosetteLayout rectangular() {
        return RECTANGULAR_LAYOUT;
    }

    /** Arms at 0, 60 and 120 deg. */
    public static RosetteLayout delta() {
        return DELTA_LAYOUT;
    }

    /** Arms at 0 and 90 deg, taken to lie on the principal axes. */
    public static RosetteLayout tee() {
        return TEE_LAYOUT;
    }

    /**
     * Three or more arms at the given angles in radians (least squares past three).
     *
     * @throws RosetteException for fewer than three arms, a non-finite angle, two arms along
     *         the same or opposite direction, or a layout too ill-conditioned to solve
     */
    public static RosetteLayout arms(double... anglesRad) {
        if (anglesRad == null || anglesRad.length < 3) {
            throw new RosetteException("a rosette of arms(...) needs three or more arm angles, got "
                    + (anglesRad == null ? 0 : anglesRad.length) + degrees(anglesRad)
                    + "; three arms fix eps_x, eps_y and gamma_xy; use tee for two arms on the principal axes");
        }
        double[] relative = new double[anglesRad.length];
        for (int i = 0; i < anglesRad.length; i++) {
            if (!Double.isFinite(anglesRad[i])) {
                throw new RosetteException("arm " + armName(i) + " angle must be finite, got " + anglesRad[i]
                        + "; give every arm angle in deg or rad");
            }
            relative[i] = anglesRad[i] - anglesRad[0];
        }
        for (int i = 0; i < relative.length; i++) {
            for (int j = i + 1; j < relative.length; j++) {
                if (sameDirection(relative[i], relative[j])) {
                    throw new RosetteException("arms " + armName(i) + " and " + armName(j) + " of" + degrees(anglesRad)
                            + " lie along the same gauge direction (angles equal or 180 deg apart)"
                            + " and measure the same strain; give each arm its own direction");
                }
            }
        }
        double condition = condition(relative);
        if (!(condition <= MAX_CONDITION)) {
            throw new RosetteException(String.format(Locale.ROOT,
                    "the arms%s are too close in direction to separate the strains (condition number %.3g, more"
                            + " than %.0f): reading errors would be amplified that much; spread the arms over"
                            + " 180 deg, e.g. 0, 45, 90 deg or 0, 60, 120 deg", degrees(anglesRad), condition,
                    MAX_CONDITION));
        }
        return new RosetteLayout(Kind.ARMS, relative);
    }

    /** Three or more arms at the given angles in degrees. */
    public static RosetteLayout armsDegrees(double... anglesDeg) {
        if (anglesDeg == null) {
            return arms((double[]) null);
        }
        double[] rad = new double[anglesDeg.length];
        for (int i = 0; i < rad.length; i++) {
            rad[i] = Math.toRadians(anglesDeg[i]);
        }
        return arms(rad);
    }

    public Kind kind() {
        return kind;
    }

    public int armCount() {
        return angles.length;
    }

    /** Arm i's direction from arm a, radians. */
    public double angle(int arm) {
        return angles[arm];
    }

    /** A copy of the arm angles, radians. */
    public double[] angles() {
        return angles.clone();
    }

    /** Condition number of the matrix taking (eps_x, eps_y, gamma_xy) to the arms' strains. */
    static double condition(double[] anglesRad) {
        double[][] rows = new double[anglesRad.length][];
        for (int i = 0; i < anglesRad.length; i++) {
            double c = Math.cos(anglesRad[i]);
            double s = Math.sin(anglesRad[i]);
            rows[i] = new double[] {c * c, s * s, s * c};
        }
        return new SingularValueDecomposition(new Array2DRowRealMatrix(rows, false)).getConditionNumber();
    }

    private static boolean sameDirection(double a, double b) {
        double d = Math.IEEEremainder(a - b, Math.PI);
        return Math.abs(d) < SAME_DIRECTION_RAD;
    }

    static String armName(int i) {
        return i < 26 ? String.valueOf((char) ('a' + i)) : String.valueOf(i + 1);
    }

    static String degrees(double[] anglesRad) {
        if (anglesRad == null || anglesRad.length == 0) {
            return "";
        }
        StringBuilder b = new StringBuilder(" (");
        for (int i = 0; i < anglesRad.length; i++) {
            b.append(i == 0 ? "" : ", ").append(String.format(Locale.ROOT, "%.6g", Math.toDegrees(anglesRad[i])));
        }
        return b.append(" deg)").toString();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof RosetteLayout l && kind == l.kind && Arrays.equals(angles, l.angles);
    }

    @Override
    public int hashCode() {
        return 31 * kind.hashCode() + Arrays.hashCode(angles);
    }

    @Override
    public String toString() {
        return kind.name().toLowerCase(Locale.ROOT) + degrees(angles);
    }
}
