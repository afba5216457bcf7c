package org.rosetra.runtime.results;

import java.util.EnumMap;
import java.util.EnumSet;
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
 * members other than {@code eps_z} exist (or, for a state given by its stresses, only the
 * stress members). Angles in radians, stresses in Pa.
 */
public final class RosetteResult {

    private final double[] values;
    private final EnumSet<RosetteMember> present;

    private RosetteResult(double[] values, EnumSet<RosetteMember> present) {
        this.values = values;
        this.present = present;
    }

    /**
     * The result of {@code strain}; {@code material} may be null (then {@code condition} is not
     * used and may be null too).
     */
    public static RosetteResult of(StrainState strain, Material material, PlaneCondition condition) {
        Objects.requireNonNull(strain, "strain");
        double[] v = new double[RosetteMember.values().length];
        EnumSet<RosetteMember> present = EnumSet.noneOf(RosetteMember.class);
        putStrains(v, present, strain);
        if (material == null) {
            return new RosetteResult(v, present);
        }
        requireCondition(material, condition);
        StressState stress = Hooke.stress(strain, material, condition);
        put(v, present, RosetteMember.EPS_Z, Hooke.outOfPlaneStrain(strain, material, condition));
        putStresses(v, present, stress, Hooke.outOfPlaneStress(stress, material, condition));
        return new RosetteResult(v, present);
    }

    /**
     * The result of a state given by its stresses (a {@code stress} block of LANGUAGE.md). The
     * stress members come from {@code stress} itself; with a material the strains follow from
     * Hooke's law for {@code condition}. Without one ({@code material == null}) only the stress
     * members exist, and in plane strain not even sigma_z and what depends on it (tau_abs,
     * von_mises, tresca), since sigma_z needs Poisson's ratio.
     */
    public static RosetteResult ofStress(StressState stress, Material material, PlaneCondition condition) {
        Objects.requireNonNull(stress, "stress");
        if (condition == null) {
            throw new ResultException("a state given by its stresses needs a plane condition;"
                    + " give state = plane_stress or plane_strain");
        }
        double[] v = new double[RosetteMember.values().length];
        EnumSet<RosetteMember> present = EnumSet.noneOf(RosetteMember.class);
        if (material == null) {
            if (condition == PlaneCondition.PLANE_STRESS) {
                putStresses(v, present, stress, 0.0);
            } else {
                PrincipalStresses ps = stress.principal();
                put(v, present, RosetteMember.SIGMA_X, stress.sigmaX());
                put(v, present, RosetteMember.SIGMA_Y, stress.sigmaY());
                put(v, present, RosetteMember.TAU_XY, stress.tauXY());
                put(v, present, RosetteMember.SIGMA_1, ps.sigma1());
                put(v, present, RosetteMember.SIGMA_2, ps.sigma2());
                put(v, present, RosetteMember.TAU_MAX, ps.maxShear());
            }
            return new RosetteResult(v, present);
        }
        StrainState strain = Hooke.strain(stress, material, condition);
        putStrains(v, present, strain);
        put(v, present, RosetteMember.EPS_Z, Hooke.outOfPlaneStrain(strain, material, condition));
        putStresses(v, present, stress, Hooke.outOfPlaneStress(stress, material, condition));
        return new RosetteResult(v, present);
    }

    private static void putStrains(double[] v, EnumSet<RosetteMember> present, StrainState strain) {
        PrincipalStrains pe = strain.principal();
        put(v, present, RosetteMember.EPS_X, strain.epsX());
        put(v, present, RosetteMember.EPS_Y, strain.epsY());
        put(v, present, RosetteMember.GAMMA_XY, strain.gammaXY());
        put(v, present, RosetteMember.EPS_1, pe.eps1());
        put(v, present, RosetteMember.EPS_2, pe.eps2());
        put(v, present, RosetteMember.THETA_P, pe.theta1());
        put(v, present, RosetteMember.GAMMA_MAX, pe.maxShear());
    }

    private static void putStresses(double[] v, EnumSet<RosetteMember> present, StressState stress,
                                    double sigmaZ) {
        PrincipalStresses ps = stress.principal();
        put(v, present, RosetteMember.SIGMA_X, stress.sigmaX());
        put(v, present, RosetteMember.SIGMA_Y, stress.sigmaY());
        put(v, present, RosetteMember.TAU_XY, stress.tauXY());
        put(v, present, RosetteMember.SIGMA_1, ps.sigma1());
        put(v, present, RosetteMember.SIGMA_2, ps.sigma2());
        put(v, present, RosetteMember.SIGMA_Z, sigmaZ);
        put(v, present, RosetteMember.TAU_MAX, ps.maxShear());
        put(v, present, RosetteMember.TAU_ABS, 0.5 * Tresca.equivalent(ps.sigma1(), ps.sigma2(), sigmaZ));
        put(v, present, RosetteMember.VON_MISES, VonMises.equivalent(ps.sigma1(), ps.sigma2(), sigmaZ));
        put(v, present, RosetteMember.TRESCA, Tresca.equivalent(ps.sigma1(), ps.sigma2(), sigmaZ));
    }

    private static void put(double[] v, EnumSet<RosetteMember> present, RosetteMember m, double value) {
        v[m.ordinal()] = value;
        present.add(m);
    }

    private static void requireCondition(Material material, PlaneCondition condition) {
        if (condition == null) {
            throw new ResultException("a rosette with material " + material.name()
                    + " needs a plane condition; give state = plane_stress or plane_strain");
        }
    }

    /** Whether {@code member} exists here (see the factories for which exist without a material). */
    public boolean has(RosetteMember member) {
        return present.contains(member);
    }

    /** The value of {@code member}; an error when it needs a material this result lacks. */
    public double get(RosetteMember member) {
        if (!has(member)) {
            throw new ResultException(member.scriptName() + " needs a material (Young's modulus and"
                    + " Poisson's ratio) here; give the rosette or state material = ...");
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
        for (RosetteMember m : present) {
            map.put(m, values[m.ordinal()]);
        }
        return map;
    }

    @Override
    public String toString() {
        return "RosetteResult" + asMap();
    }
}
