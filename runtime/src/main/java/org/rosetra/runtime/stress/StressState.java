package org.rosetra.runtime.stress;

import org.rosetra.runtime.strain.MohrCircle;
import org.rosetra.runtime.strain.PrincipalDirection;
import org.rosetra.runtime.strain.StateException;

/**
 * An in-plane stress state in the part's axes, in Pa, tension positive. {@code tauXY} is the
 * shear stress on the +x face in the +y direction. Angles in radians, counter-clockwise from +x.
 */
public record StressState(double sigmaX, double sigmaY, double tauXY) {

    public static final StressState ZERO = new StressState(0, 0, 0);

    public StressState {
        StateException.requireFinite("sigma_x", sigmaX);
        StateException.requireFinite("sigma_y", sigmaY);
        StateException.requireFinite("tau_xy", tauXY);
    }

    /** Normal stress on the face whose normal is at θ: σx cos²θ + σy sin²θ + 2 τxy sinθ cosθ. */
    public double normalAt(double theta) {
        StateException.requireFinite("direction theta", theta);
        double c = Math.cos(theta);
        double s = Math.sin(theta);
        return sigmaX * c * c + sigmaY * s * s + 2 * tauXY * s * c;
    }

    /**
     * Shear stress on the face whose normal is at θ, in the direction θ + 90°
     * (so {@code shearAt(0) == tauXY}): -(σx - σy)/2 sin 2θ + τxy cos 2θ.
     */
    public double shearAt(double theta) {
        StateException.requireFinite("direction theta", theta);
        return -0.5 * (sigmaX - sigmaY) * Math.sin(2 * theta) + tauXY * Math.cos(2 * theta);
    }

    /** The same state, with components in axes turned by θ counter-clockwise. */
    public StressState rotated(double theta) {
        StateException.requireFinite("rotation theta", theta);
        double c2 = Math.cos(2 * theta);
        double s2 = Math.sin(2 * theta);
        double mean = 0.5 * (sigmaX + sigmaY);
        double half = 0.5 * (sigmaX - sigmaY);
        double dev = half * c2 + tauXY * s2;
        return new StressState(mean + dev, mean - dev, -half * s2 + tauXY * c2);
    }

    /** In-plane principal stresses and the direction of the larger one. */
    public PrincipalStresses principal() {
        return PrincipalStresses.of(sigmaX, sigmaY, tauXY);
    }

    /** In-plane maximum shear stress, (σ1 - σ2) / 2 (never negative). */
    public double maxShear() {
        return PrincipalDirection.radius(sigmaX, sigmaY, tauXY);
    }

    /** Mohr's circle of stress; the shear ordinate is τ. */
    public MohrCircle mohr() {
        return MohrCircle.of(sigmaX, sigmaY, tauXY);
    }
}
