package org.rosetra.runtime.stress;

import java.util.Objects;
import org.rosetra.runtime.material.Material;
import org.rosetra.runtime.strain.StrainState;

/**
 * Hooke's law for an isotropic, linear-elastic material in plane stress or plane strain.
 * The shear relation is τ = G γ with the material's own G.
 */
public final class Hooke {

    private Hooke() {
    }

    /** Stresses in the part's axes from the in-plane strains. */
    public static StressState stress(StrainState strain, Material material, PlaneCondition condition) {
        Objects.requireNonNull(strain, "strain");
        ElasticCoefficients k = ElasticCoefficients.of(material, condition);
        return new StressState(
                k.stiffness11() * strain.epsX() + k.stiffness12() * strain.epsY(),
                k.stiffness12() * strain.epsX() + k.stiffness11() * strain.epsY(),
                k.shearModulus() * strain.gammaXY());
    }

    /**
     * In-plane strains from the in-plane stresses. Plane stress: εx = (σx - ν σy) / E.
     * Plane strain (σz = ν (σx + σy)): εx = (1 + ν) / E ((1 - ν) σx - ν σy). Both: γ = τ / G.
     */
    public static StrainState strain(StressState stress, Material material, PlaneCondition condition) {
        Objects.requireNonNull(stress, "stress");
        Objects.requireNonNull(material, "material");
        Objects.requireNonNull(condition, "condition");
        double e = material.e();
        double nu = material.nu();
        double gamma = stress.tauXY() / material.g();
        return switch (condition) {
            case PLANE_STRESS -> new StrainState(
                    (stress.sigmaX() - nu * stress.sigmaY()) / e,
                    (stress.sigmaY() - nu * stress.sigmaX()) / e,
                    gamma);
            case PLANE_STRAIN -> new StrainState(
                    (1 + nu) / e * ((1 - nu) * stress.sigmaX() - nu * stress.sigmaY()),
                    (1 + nu) / e * ((1 - nu) * stress.sigmaY() - nu * stress.sigmaX()),
                    gamma);
        };
    }

    /** εz: -ν/(1 - ν) (εx + εy) in plane stress, 0 in plane strain. */
    public static double outOfPlaneStrain(StrainState strain, Material material, PlaneCondition condition) {
        Objects.requireNonNull(strain, "strain");
        return ElasticCoefficients.of(material, condition).epsZPerInPlaneSum()
                * (strain.epsX() + strain.epsY()) + 0.0;
    }

    /** σz: 0 in plane stress, ν (σx + σy) in plane strain. */
    public static double outOfPlaneStress(StressState stress, Material material, PlaneCondition condition) {
        Objects.requireNonNull(stress, "stress");
        return ElasticCoefficients.of(material, condition).sigmaZPerInPlaneSum()
                * (stress.sigmaX() + stress.sigmaY()) + 0.0;
    }
}
