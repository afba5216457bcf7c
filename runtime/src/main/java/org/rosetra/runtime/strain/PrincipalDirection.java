package org.rosetra.runtime.strain;

/**
 * The principal values of a symmetric 2 x 2 tensor [[a, h], [h, b]] and the direction of the
 * larger one, shared by strain (h = γxy / 2) and stress (h = τxy), written so the scalar
 * and the columnar paths call the very same arithmetic.
 *
 * <p>"Equal" principal values: when the circle's radius is at most {@link #EQUAL_RELATIVE}
 * times the size of the tensor (|a| + |b| + 2|h|), the direction is undefined and is
 * reported as exactly 0. At 1e-12 this is far below any measurement yet above the rounding
 * noise (about 1e-16 relative) of the arithmetic that produces the radius.
 */
public final class PrincipalDirection {

    /** Radius relative to the tensor's size under which both principal values count as equal. */
    public static final double EQUAL_RELATIVE = 1e-12;

    private PrincipalDirection() {
    }

    /**
     * Radius of Mohr's circle: sqrt(((a - b) / 2)² + h²). Plain sqrt rather than Math.hypot,
     * which is several times slower; strains and stresses in SI are nowhere near the squares'
     * overflow (1e154) or underflow (1e-154).
     */
    public static double radius(double a, double b, double h) {
        double d = 0.5 * (a - b);
        return Math.sqrt(d * d + h * h);
    }

    /**
     * Angle from +x to the direction of the larger principal value, counter-clockwise, in
     * (-π/2, π/2]; exactly 0 when the principal values are equal (see the class comment).
     */
    public static double theta1(double a, double b, double h) {
        double radius = radius(a, b, h);
        if (radius <= EQUAL_RELATIVE * (Math.abs(a) + Math.abs(b) + 2 * Math.abs(h))) {
            return 0.0;
        }
        double theta = 0.5 * Math.atan2(2 * h, a - b);
        // atan2 returns -π for (-0.0, negative): that direction is the same as +π/2.
        if (theta <= -0.5 * Math.PI) {
            theta += Math.PI;
        }
        return theta + 0.0; // turns -0.0 into 0.0
    }
}
