package org.rosetra.runtime.chain;

import java.util.Arrays;
import java.util.Set;
import org.rosetra.runtime.gauge.ArmCorrection;
import org.rosetra.runtime.gauge.Bridge;
import org.rosetra.runtime.gauge.Gauge;
import org.rosetra.runtime.material.Material;
import org.rosetra.runtime.results.ResultColumns;
import org.rosetra.runtime.results.RosetteMember;
import org.rosetra.runtime.rosette.RosetteLayout;
import org.rosetra.runtime.rosette.RosetteSolver;
import org.rosetra.runtime.stress.PlaneCondition;

/**
 * One rosette's whole reduction over a chunk of samples, LANGUAGE.md "What happens to one
 * reading, in order", steps 1 to 4, then the result members: per-arm corrections (with an
 * optional temperature column), the optional per-arm zero, the rosette solve and
 * {@link ResultColumns}. Immutable; the caller's {@link ChainBuffers} hold every column, so a
 * chunk allocates no column.
 */
public final class ReductionChain {

    /** Cached: {@code values()} copies its array on every call. */
    private static final RosetteMember[] MEMBERS = RosetteMember.values();

    private final ArmCorrection[] arms;
    private final RosetteSolver solver;
    private final Material material;
    private final PlaneCondition condition;
    /** Corrected zero reading per arm; null for none. */
    private final double[] zero;

    /**
     * @param arms           one correction per arm, in arm order
     * @param solver         the rosette's solve; its Kt and nu0 must be the arms' gauges'
     * @param materialOrNull the material, or null for the strain members only
     * @param condition      plane stress or plane strain (needed with a material)
     */
    public ReductionChain(ArmCorrection[] arms, RosetteSolver solver, Material materialOrNull,
                          PlaneCondition condition) {
        this(check(arms, solver, materialOrNull, condition), solver, materialOrNull, condition, null);
    }

    private ReductionChain(ArmCorrection[] arms, RosetteSolver solver, Material material,
                           PlaneCondition condition, double[] zero) {
        this.arms = arms;
        this.solver = solver;
        this.material = material;
        this.condition = condition;
        this.zero = zero;
    }

    /** Every arm of the same gauge, bridge, lead and instrument factor (the usual rosette). */
    public static ReductionChain of(Gauge gauge, Bridge bridge, double leadOhm, double instrumentFactor,
                                    RosetteLayout layout, double rotation, Material materialOrNull,
                                    PlaneCondition condition) {
        if (gauge == null || layout == null) {
            throw new ChainException("a reduction chain needs the rosette's gauge and layout");
        }
        ArmCorrection arm = new ArmCorrection(gauge, bridge, leadOhm, instrumentFactor);
        ArmCorrection[] arms = new ArmCorrection[layout.armCount()];
        Arrays.fill(arms, arm);
        RosetteSolver solver = new RosetteSolver(layout, rotation, gauge.transverse(), gauge.nu0());
        return new ReductionChain(arms, solver, materialOrNull, condition);
    }

    private static ArmCorrection[] check(ArmCorrection[] arms, RosetteSolver solver, Material material,
                                         PlaneCondition condition) {
        if (arms == null || solver == null) {
            throw new ChainException("a reduction chain needs one arm correction per arm and the rosette's solver");
        }
        if (arms.length != solver.armCount()) {
            throw new ChainException("the rosette " + solver.layout() + " has " + solver.armCount() + " arms but "
                    + arms.length + " arm corrections were given; give one per arm, in arm order");
        }
        for (int k = 0; k < arms.length; k++) {
            if (arms[k] == null) {
                throw new ChainException("arm correction " + k + " is missing; give one per arm");
            }
            Gauge g = arms[k].gauge();
            // The solve's transverse model must be the gauges' own, or the strains are silently wrong.
            if (g.transverse() != solver.kt() || g.nu0() != solver.nu0()) {
                throw new ChainException("arm " + k + "'s gauge has Kt = " + g.transverse() + ", nu0 = " + g.nu0()
                        + " but the solve uses Kt = " + solver.kt() + ", nu0 = " + solver.nu0()
                        + "; build the solver from the arms' gauge");
            }
        }
        if (material != null && condition == null) {
            throw new ChainException("a rosette with material " + material.name()
                    + " needs a plane condition; give state = plane_stress or plane_strain");
        }
        return arms.clone();
    }

    /**
     * The same chain with each arm's corrected zero reading (a baseline's, or the mean over a
     * zero window, both after steps 1 and 2) subtracted before the solve: step 3.
     */
    public ReductionChain withZero(double... correctedZeroPerArm) {
        if (correctedZeroPerArm == null || correctedZeroPerArm.length != arms.length) {
            throw new ChainException("a zero needs one corrected reading per arm (" + arms.length + "), got "
                    + (correctedZeroPerArm == null ? 0 : correctedZeroPerArm.length));
        }
        for (int k = 0; k < arms.length; k++) {
            if (!Double.isFinite(correctedZeroPerArm[k])) {
                throw new ChainException("zero reading of arm " + k + " must be a finite strain, got "
                        + correctedZeroPerArm[k] + "; check the baseline or the zero window");
            }
        }
        return new ReductionChain(arms, solver, material, condition, correctedZeroPerArm.clone());
    }

    /** Corrected (steps 1 and 2) readings of one baseline: the argument to {@link #withZero}. */
    public double[] correctedBaseline(double[] indicated, Double temperatureCOrNull) {
        if (indicated == null || indicated.length != arms.length) {
            throw new ChainException("a baseline needs one reading per arm (" + arms.length + "), got "
                    + (indicated == null ? 0 : indicated.length));
        }
        double[] out = new double[arms.length];
        for (int k = 0; k < arms.length; k++) {
            out[k] = temperatureCOrNull == null ? arms[k].correct(indicated[k])
                    : arms[k].correct(indicated[k], temperatureCOrNull);
        }
        return out;
    }

    public RosetteSolver solver() {
        return solver;
    }

    public int armCount() {
        return arms.length;
    }

    /** A buffer set that fits this chain. */
    public ChainBuffers buffers(int capacity, Set<RosetteMember> members,
                                boolean residualRms) {
        return new ChainBuffers(arms.length, capacity, members, residualRms);
    }

    /**
     * Steps 1 and 2 only, into {@code buffers.corrected(k)}: for a zero window, whose per-arm
     * mean of corrected readings then goes to {@link #withZero}. Ignores this chain's zero.
     */
    public void correctOnly(double[][] indicated, double[] temperatureCOrNull, int n, ChainBuffers buffers) {
        requireChunk(indicated, n, buffers);
        double[][] corrected = buffers.correctedColumns();
        for (int k = 0; k < arms.length; k++) {
            arms[k].correct(indicated[k], temperatureCOrNull, corrected[k], n);
        }
    }

    /**
     * Steps 1 to 4 and the result members over {@code n} samples: {@code indicated[k][i]} is
     * arm k's indication at sample i, {@code temperatureCOrNull[i]} its temperature in degC.
     */
    public void run(double[][] indicated, double[] temperatureCOrNull, int n, ChainBuffers buffers) {
        requireChunk(indicated, n, buffers);
        if (material == null) {
            // Without a material the stress columns would keep stale values: refuse instead.
            for (RosetteMember m : MEMBERS) {
                if (m.needsMaterial() && buffers.has(m)) {
                    throw new ChainException("member " + m.scriptName() + " needs the rosette's material, which"
                            + " was not given; give the rosette a material, or ask for strain members only");
                }
            }
        }
        double[][] corrected = buffers.correctedColumns();
        for (int k = 0; k < arms.length; k++) {
            arms[k].correct(indicated[k], temperatureCOrNull, zero == null ? 0.0 : zero[k], corrected[k], n);
        }
        solver.solve(corrected, n, buffers.epsX(), buffers.epsY(), buffers.gammaXY(), buffers.residualRms());
        if (!buffers.memberColumns().isEmpty()) {
            ResultColumns.compute(buffers.epsX(), buffers.epsY(), buffers.gammaXY(), n, material, condition,
                    buffers.memberColumns());
        }
    }

    private void requireChunk(double[][] indicated, int n, ChainBuffers buffers) {
        if (buffers == null || buffers.armCount() != arms.length) {
            throw new ChainException("buffers must be made for this chain's " + arms.length + " arms");
        }
        if (n < 0 || n > buffers.capacity()) {
            throw new ChainException("chunk of " + n + " samples does not fit buffers of " + buffers.capacity()
                    + "; make the buffers as large as the largest chunk");
        }
        if (indicated == null || indicated.length != arms.length) {
            throw new ChainException("give one reading column per arm (" + arms.length + "), got "
                    + (indicated == null ? 0 : indicated.length));
        }
    }
}
