package org.rosetra.runtime.strain;

/**
 * The geometry of Mohr's circle for plotting, for strain or for stress.
 *
 * <p>Abscissa: normal strain (or normal stress). Ordinate ("shear"): half the engineering
 * shear strain γ/2 (or the shear stress τ). The point of the face whose normal is at θ is
 * (normal at θ, shear at θ) with the signs of the transformation: the x-face is
 * ({@code xNormal}, {@code xShear}) = (εx, γxy/2), the y-face is (εy, -γxy/2).
 *
 * <p>Plotting convention: draw the shear ordinate <em>positive downward</em>. Then turning the
 * face by θ counter-clockwise on the part moves its point by 2θ counter-clockwise on the
 * circle, and {@code twoThetaP} is measured counter-clockwise from the x-face point to the
 * principal point {@code p1}. This is the form of Mohr's circle used by Gere &amp; Goodno,
 * Mechanics of Materials, section 7.4 (from memory).
 */
public record MohrCircle(double centre, double radius,
                         double xNormal, double xShear,
                         double yNormal, double yShear,
                         double p1, double p2,
                         double twoThetaP) {

    /** Circle of the tensor [[a, h], [h, b]]: h = γxy / 2 for strain, τxy for stress. */
    public static MohrCircle of(double a, double b, double h) {
        double centre = 0.5 * (a + b);
        double radius = PrincipalDirection.radius(a, b, h);
        return new MohrCircle(centre, radius, a, h, b, -h, centre + radius, centre - radius,
                2 * PrincipalDirection.theta1(a, b, h));
    }

    /** Largest shear ordinate on the circle (the top and bottom points are (centre, ±radius)). */
    public double maxShearOrdinate() {
        return radius;
    }
}
