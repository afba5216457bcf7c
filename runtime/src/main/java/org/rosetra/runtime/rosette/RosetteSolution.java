package org.rosetra.runtime.rosette;

import java.util.Arrays;
import org.rosetra.runtime.strain.StrainState;

/**
 * One rosette solve: the strain state in the part's axes, each arm's residual (its reading
 * less the reading the solved state predicts, as strain) and their root mean square.
 * With three arms (or a tee) the residuals are zero to rounding; past three they show how
 * well the arms agree.
 */
public record RosetteSolution(StrainState state, double[] residuals, double rms) {

    public RosetteSolution {
        if (state == null || residuals == null) {
            throw new RosetteException("a rosette solution needs a state and its residuals");
        }
        residuals = residuals.clone();
    }

    /** A copy, so the record stays immutable. */
    @Override
    public double[] residuals() {
        return residuals.clone();
    }

    public double residual(int arm) {
        return residuals[arm];
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof RosetteSolution s && state.equals(s.state) && Arrays.equals(residuals, s.residuals)
                && Double.compare(rms, s.rms) == 0;
    }

    @Override
    public int hashCode() {
        return 31 * (31 * state.hashCode() + Arrays.hashCode(residuals)) + Double.hashCode(rms);
    }

    @Override
    public String toString() {
        return "RosetteSolution[state=" + state + ", residuals=" + Arrays.toString(residuals) + ", rms=" + rms + "]";
    }
}
