package org.rosetra.runtime.strain;

/**
 * An in-plane strain state in the part's axes, small-strain theory.
 *
 * <p>Strains are plain fractions (1e-6 is one microstrain), tension positive. {@code gammaXY}
 * is the engineering shear strain, positive when the right angle between +x and +y closes.
 * Angles are in radians, counter-clockwise from +x.
 */
public record StrainState(double epsX, double epsY, double gammaXY) {

    public static final StrainState ZERO = new StrainState(0, 0, 0);

    public StrainState {
        StateException.requireFinite("eps_x", epsX);
        StateException.requireFinite("eps_y", epsY);
        StateException.requireFinite("gamma_xy", gammaXY);
    }

    /** Normal strain in the direction θ: εx cos²θ + εy sin²θ + γxy sinθ cosθ. */
    public double normalAt(double theta) {
        StateException.requireFinite("direction theta", theta);
        double c = Math.cos(theta);
        double s = Math.sin(theta);
        return epsX * c * c + epsY * s * s + gammaXY * s * c;
    }

    /**
     * Engineering shear strain between the directions θ and θ + 90°, with the same sign rule
     * as {@code gammaXY} (so {@code shearAt(0) == gammaXY}):
     * -(εx - εy) sin 2θ + γxy cos 2θ.
     */
    public double shearAt(double theta) {
        StateException.requireFinite("direction theta", theta);
        return -(epsX - epsY) * Math.sin(2 * theta) + gammaXY * Math.cos(2 * theta);
    }

    /** The same state, with components in axes turned by θ counter-clockwise. */
    public StrainState rotated(double theta) {
        StateException.requireFinite("rotation theta", theta);
        double c2 = Math.cos(2 * theta);
        double s2 = Math.sin(2 * theta);
        double mean = 0.5 * (epsX + epsY);
        double half = 0.5 * (epsX - epsY);
        double halfShear = 0.5 * gammaXY;
        double dev = half * c2 + halfShear * s2;
        return new StrainState(mean + dev, mean - dev, 2 * (-half * s2 + halfShear * c2));
    }

    /** In-plane principal strains and the direction of the larger one. */
    public PrincipalStrains principal() {
        return PrincipalStrains.of(epsX, epsY, gammaXY);
    }

    /** In-plane maximum engineering shear strain, eps1 - eps2 (never negative). */
    public double maxShear() {
        return 2 * PrincipalDirection.radius(epsX, epsY, 0.5 * gammaXY);
    }

    /** Mohr's circle of strain; the shear ordinate is half the engineering shear strain. */
    public MohrCircle mohr() {
        return MohrCircle.of(epsX, epsY, 0.5 * gammaXY);
    }

    /** This state plus {@code other}, component by component (superposition). */
    public StrainState plus(StrainState other) {
        return new StrainState(epsX + other.epsX, epsY + other.epsY, gammaXY + other.gammaXY);
    }

    /** This state multiplied by {@code factor}. */
    public StrainState times(double factor) {
        StateException.requireFinite("factor", factor);
        return new StrainState(factor * epsX, factor * epsY, factor * gammaXY);
    }
}
