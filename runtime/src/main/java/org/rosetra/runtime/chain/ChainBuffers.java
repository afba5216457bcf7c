package org.rosetra.runtime.chain;

import java.util.EnumMap;
import java.util.Set;
import org.rosetra.runtime.results.RosetteMember;

/**
 * The caller's reusable columns for one rosette's chunk: the corrected arm readings, the
 * solved strains, the residual RMS and the requested result members. Allocated once, then
 * filled by {@link ReductionChain#run} chunk after chunk. Mutable on purpose; one per thread.
 */
public final class ChainBuffers {

    private final int capacity;
    private final double[][] corrected;
    private final double[] epsX;
    private final double[] epsY;
    private final double[] gammaXY;
    private final double[] residualRms;
    private final EnumMap<RosetteMember, double[]> members;

    /**
     * @param armCount    the rosette's number of arms
     * @param capacity    largest chunk, in samples
     * @param members     the result members wanted (may be empty)
     * @param residualRms whether to keep each sample's residual RMS (meaningful past three arms)
     */
    public ChainBuffers(int armCount, int capacity, Set<RosetteMember> members, boolean residualRms) {
        if (armCount < 2) {
            throw new ChainException("arm count must be 2 or more, got " + armCount);
        }
        if (capacity < 1) {
            throw new ChainException("chunk capacity must be at least 1 sample, got " + capacity);
        }
        if (members == null) {
            throw new ChainException("members must be given; pass an empty set for strains only");
        }
        this.capacity = capacity;
        this.corrected = new double[armCount][capacity];
        this.epsX = new double[capacity];
        this.epsY = new double[capacity];
        this.gammaXY = new double[capacity];
        this.residualRms = residualRms ? new double[capacity] : null;
        this.members = new EnumMap<>(RosetteMember.class);
        for (RosetteMember m : members) {
            this.members.put(m, new double[capacity]);
        }
    }

    public int capacity() {
        return capacity;
    }

    public int armCount() {
        return corrected.length;
    }

    /** Arm k's readings after corrections and zero, the solve's input. */
    public double[] corrected(int arm) {
        return corrected[arm];
    }

    double[][] correctedColumns() {
        return corrected;
    }

    public double[] epsX() {
        return epsX;
    }

    public double[] epsY() {
        return epsY;
    }

    public double[] gammaXY() {
        return gammaXY;
    }

    /** Null when not asked for. */
    public double[] residualRms() {
        return residualRms;
    }

    public boolean has(RosetteMember member) {
        return members.containsKey(member);
    }

    /** The column of a requested member. */
    public double[] member(RosetteMember member) {
        double[] column = members.get(member);
        if (column == null) {
            throw new ChainException("member " + member.scriptName() + " was not requested;"
                    + " list it when the buffers are made");
        }
        return column;
    }

    EnumMap<RosetteMember, double[]> memberColumns() {
        return members;
    }
}
