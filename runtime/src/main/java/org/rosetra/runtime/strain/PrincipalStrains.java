package org.rosetra.runtime.strain;

/**
 * In-plane principal strains, {@code eps1 >= eps2}, and {@code theta1}, the direction of
 * {@code eps1} from +x, counter-clockwise, in radians in (-π/2, π/2]; exactly 0 when the two
 * are equal (within {@link PrincipalDirection#EQUAL_RELATIVE}).
 */
public record PrincipalStrains(double eps1, double eps2, double theta1) {

    public PrincipalStrains {
        StateException.requireFinite("eps1", eps1);
        StateException.requireFinite("eps2", eps2);
        StateException.requireFinite("theta1", theta1);
        if (eps1 < eps2) {
            throw new StateException("eps1 = " + eps1 + " is smaller than eps2 = " + eps2
                    + "; principal strains must be given largest first");
        }
    }

    /** Principal strains of (εx, εy, γxy). */
    public static PrincipalStrains of(double epsX, double epsY, double gammaXY) {
        double centre = 0.5 * (epsX + epsY);
        double radius = PrincipalDirection.radius(epsX, epsY, 0.5 * gammaXY);
        return new PrincipalStrains(centre + radius, centre - radius,
                PrincipalDirection.theta1(epsX, epsY, 0.5 * gammaXY));
    }

    /** In-plane maximum engineering shear strain, eps1 - eps2. */
    public double maxShear() {
        return eps1 - eps2;
    }
}
