package org.rosetra.runtime.results;

import java.util.EnumMap;
import java.util.Map;
import java.util.Objects;
import java.util.OptionalDouble;
import org.rosetra.runtime.criteria.Tresca;
import org.rosetra.runtime.criteria.VonMises;
import org.rosetra.runtime.material.Material;
import org.rosetra.runtime.strain.PrincipalStrains;
import org.rosetra.runtime.strain.StrainState;
import org.rosetra.runtime.stress.Hooke;
import org.rosetra.runtime.stress.PlaneCondition;
import org.rosetra.runtime.stress.PrincipalStresses;
import org.rosetra.runtime.stress.StressState;

/**
 * Every member of "Results of a rosette" (LANGUAGE.md) for one strain state: the scalar path,
 * built from the state records, Hooke's law and the criteria. {@link ResultColumns} computes
 * the same over columns; tests hold the two together. Without a material only the strain
 * members other than {@code eps_z} exist. Angles in radians, stresses in Pa.
 */
public final class RosetteResult {

    private final double[] values;
    private final boolean withMaterial;

    private RosetteResult(double[] values, boolean withMaterial) {
        this.values = values;
        this.withMaterial = withMaterial;
    }

    /**
     * The result of {@code strain}; {@code material} may be null (then {@code condition} is not
     * used and may be null too).
     */
    public static RosetteResult of(StrainState strain, Material material, PlaneCondition condition) {
        Objects.requireNonNull(strain, "strain");
        double[] v = new double[RosetteMember.values().length];
        PrincipalStrains pe = strain.principal();
        v[RosetteMember.EPS_X.ordinal()] = strain.epsX();
        v[RosetteMember.EPS_Y.ordinal()] = strain.epsY();
        v[RosetteMember.GAMMA_XY.ordinal()] = strain.gammaXY();
        v[RosetteMember.EPS_1.ordinal()] = pe.eps1();
        v[RosetteMember.EPS_2.ordinal()] = pe.eps2();
        v[RosetteMember.THETA_P.ordinal()] = pe.theta1();
        v[RosetteMember.GAMMA_MAX.ordinal()] = pe.maxShear();
        if (material == null) {
            return new RosetteResult(v, false);
        }
        if (condition == null) {
            throw new ResultException("a rosette with material " + material.name()
                    + " needs a plane condition; give state = plane_stress or plane_strain");
        }
        StressState stress = Hooke.stress(strain, material, condition);
        PrincipalStresses ps = stress.principal();
        double sigmaZ = Hooke.outOfPlaneStress(stress, material, condition);
        v[RosetteMember.EPS_Z.ordinal()] = Hooke.outOfPlaneStrain(strain, material, condition);
        v[RosetteMember.SIGMA_X.ordinal()] = stress.sigmaX();
        v[RosetteMember.SIGMA_Y.ordinal()] = stress.sigmaY();
        v[RosetteMember.TAU_XY.ordinal()] = stress.tauXY();
        v[RosetteMember.SIGMA_1.ordinal()] = ps.sigma1();
        v[RosetteMember.SIGMA_2.ordinal()] = ps.sigma2();
        v[RosetteMember.SIGMA_Z.ordinal()] = sigmaZ;
        v[RosetteMember.TAU_MAX.ordinal()] = ps.maxShear();
        v[RosetteMember.TAU_ABS.ordinal()] = 0.5 * Tresca.equivalent(ps.sigma1(), ps.sigma2(), sigmaZ);
        v[RosetteMember.VON_MISES.ordinal()] = VonMises.equivalent(ps.sigma1(), ps.sigma2(), sigmaZ);
        v[RosetteMember.TRESCA.ordinal()] = Tresca.equivalent(ps.sigma1(), ps.sigma2(), sigmaZ);
        return new RosetteResult(v, true);
    }

    /** Whether {@code member} exists here (members that need a material exist only with one). */
    public boolean has(RosetteMember member) {
        return withMaterial || !member.needsMaterial();
    }

    /** The value of {@code member}; an error when it needs a material this result lacks. */
    public double get(RosetteMember member) {
        if (!has(member)) {
            throw new ResultException(member.scriptName() + " needs a material (Young's modulus and"
                    + " Poisson's ratio); give the rosette or state material = ...");
        }
        return values[member.ordinal()];
    }

    /** The value of {@code member}, or empty when it needs a material this result lacks. */
    public OptionalDouble find(RosetteMember member) {
        return has(member) ? OptionalDouble.of(values[member.ordinal()]) : OptionalDouble.empty();
    }

    /** Every member that exists here, in the table's order. */
    public Map<RosetteMember, Double> asMap() {
        Map<RosetteMember, Double> map = new EnumMap<>(RosetteMember.class);
        for (RosetteMember m : RosetteMember.values()) {
            if (has(m)) {
                map.put(m, values[m.ordinal()]);
            }
        }
        return map;
    }

    @Override
    public String toString() {
        return "RosetteResult" + asMap();
    }
}
