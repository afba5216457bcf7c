package org.rosetra.runtime.stress;

import org.rosetra.runtime.strain.PrincipalDirection;
import org.rosetra.runtime.strain.StateException;

/**
 * In-plane principal stresses, {@code sigma1 >= sigma2}, and {@code theta1}, the direction of
 * {@code sigma1} from +x, counter-clockwise, in radians in (-π/2, π/2]; exactly 0 when the
 * two are equal (within {@link PrincipalDirection#EQUAL_RELATIVE}).
 */
public record PrincipalStresses(double sigma1, double sigma2, double theta1) {

    public PrincipalStresses {
        StateException.requireFinite("sigma1", sigma1);
        StateException.requireFinite("sigma2", sigma2);
        StateException.requireFinite("theta1", theta1);
        if (sigma1 < sigma2) {
            throw new StateException("sigma1 = " + sigma1 + " is smaller than sigma2 = " + sigma2
                    + "; principal stresses must be given largest first");
        }
    }

    /** Principal stresses of (σx, σy, τxy). */
    public static PrincipalStresses of(double sigmaX, double sigmaY, double tauXY) {
        double centre = 0.5 * (sigmaX + sigmaY);
        double radius = PrincipalDirection.radius(sigmaX, sigmaY, tauXY);
        return new PrincipalStresses(centre + radius, centre - radius,
                PrincipalDirection.theta1(sigmaX, sigmaY, tauXY));
    }

    /** In-plane maximum shear stress, (σ1 - σ2) / 2. */
    public double maxShear() {
        return 0.5 * (sigma1 - sigma2);
    }
}
