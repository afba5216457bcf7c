package org.rosetra.runtime.stress;

import java.util.Objects;
import org.rosetra.runtime.material.Material;

/**
 * The constants of isotropic, linear-elastic Hooke's law in the plane, for one material and
 * one plane condition, worked out once so a loop over many samples only multiplies and adds:
 * <pre>
 *   σx = stiffness11 εx + stiffness12 εy      σy = stiffness12 εx + stiffness11 εy
 *   τxy = shearModulus γxy
 *   εz = epsZPerInPlaneSum (εx + εy)           σz = sigmaZPerInPlaneSum (σx + σy)
 * </pre>
 * Plane stress: stiffness11 = E / (1 - ν²), stiffness12 = ν E / (1 - ν²), εz factor -ν/(1 - ν),
 * σz factor 0. Plane strain: stiffness11 = E (1 - ν) / ((1 + ν)(1 - 2ν)),
 * stiffness12 = E ν / ((1 + ν)(1 - 2ν)), εz factor 0, σz factor ν.
 */
public record ElasticCoefficients(double stiffness11, double stiffness12, double shearModulus,
                                  double epsZPerInPlaneSum, double sigmaZPerInPlaneSum) {

    public static ElasticCoefficients of(Material material, PlaneCondition condition) {
        Objects.requireNonNull(material, "material");
        Objects.requireNonNull(condition, "condition");
        double e = material.e();
        double nu = material.nu();
        return switch (condition) {
            case PLANE_STRESS -> {
                double k = e / (1 - nu * nu);
                yield new ElasticCoefficients(k, nu * k, material.g(), -nu / (1 - nu), 0.0);
            }
            case PLANE_STRAIN -> {
                double k = e / ((1 + nu) * (1 - 2 * nu));
                yield new ElasticCoefficients((1 - nu) * k, nu * k, material.g(), 0.0, nu);
            }
        };
    }
}
