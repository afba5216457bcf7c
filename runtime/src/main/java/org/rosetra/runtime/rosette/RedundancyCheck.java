package org.rosetra.runtime.rosette;

import java.util.Arrays;

/**
 * Flags the arms of a rosette with more than three arms whose residual exceeds a threshold:
 * a likely faulty gauge. With four arms a single bad arm spreads its error over every arm
 * (one redundant reading can show that the arms disagree, not always which one is at fault);
 * five or more arms usually single it out.
 */
public final class RedundancyCheck {

    private final int arms;
    private final double threshold;

    /**
     * @param solver    a solver of more than three arms
     * @param threshold largest residual, as strain, that is still taken as agreement
     */
    public RedundancyCheck(RosetteSolver solver, double threshold) {
        if (solver == null) {
            throw new RosetteException("a redundancy check needs the rosette's solver");
        }
        if (!solver.isRedundant()) {
            throw new RosetteException("the " + solver.layout() + " rosette has no redundant arm, so its residuals"
                    + " are zero and say nothing about a faulty gauge; a redundancy check needs four or more arms");
        }
        if (!(threshold > 0) || !Double.isFinite(threshold)) {
            throw new RosetteException("redundancy threshold must be a positive finite strain, got " + threshold
                    + "; give the largest disagreement you accept, e.g. 20 ue");
        }
        this.arms = solver.armCount();
        this.threshold = threshold;
    }

    public double threshold() {
        return threshold;
    }

    /** Indices (0 is arm a) of the arms whose residual magnitude exceeds the threshold. */
    public int[] suspectArms(RosetteSolution solution) {
        double[] r = solution.residuals();
        if (r.length != arms) {
            throw new RosetteException("the solution has " + r.length + " residuals but the rosette has " + arms
                    + " arms; check it with the redundancy check of its own rosette");
        }
        return java.util.stream.IntStream.range(0, arms).filter(i -> Math.abs(r[i]) > threshold).toArray();
    }

    /** True when every arm agrees with the solved state within the threshold. */
    public boolean agrees(RosetteSolution solution) {
        return suspectArms(solution).length == 0;
    }

    @Override
    public String toString() {
        return "RedundancyCheck[arms=" + arms + ", threshold=" + threshold + "]";
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof RedundancyCheck c && c.arms == arms && Double.compare(c.threshold, threshold) == 0;
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(new double[] {arms, threshold});
    }
}
