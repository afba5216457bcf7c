package org.rosetra.runtime.results;

import java.util.Optional;

/**
 * The members of a rosette's result, in the order of the table "Results of a rosette" in
 * LANGUAGE.md. Each knows the name a script writes, its kind, whether it needs a material
 * and a one-line description.
 */
public enum RosetteMember {
    EPS_X("eps_x", MemberKind.STRAIN, false, "normal strain along the part's x-axis"),
    EPS_Y("eps_y", MemberKind.STRAIN, false, "normal strain along the part's y-axis"),
    GAMMA_XY("gamma_xy", MemberKind.STRAIN, false,
            "engineering shear strain in the part's axes, positive when the angle between +x and +y closes"),
    EPS_1("eps_1", MemberKind.STRAIN, false, "larger in-plane principal strain"),
    EPS_2("eps_2", MemberKind.STRAIN, false, "smaller in-plane principal strain"),
    THETA_P("theta_p", MemberKind.ANGLE, false,
            "direction of eps_1, counter-clockwise from the x-axis, in (-90, 90] deg; 0 when eps_1 = eps_2"),
    GAMMA_MAX("gamma_max", MemberKind.STRAIN, false, "largest in-plane engineering shear strain, eps_1 - eps_2"),
    EPS_Z("eps_z", MemberKind.STRAIN, true,
            "strain through the thickness: -nu/(1-nu) (eps_x + eps_y) in plane stress, 0 in plane strain"),
    SIGMA_X("sigma_x", MemberKind.STRESS, true, "normal stress along the part's x-axis, by Hooke's law"),
    SIGMA_Y("sigma_y", MemberKind.STRESS, true, "normal stress along the part's y-axis, by Hooke's law"),
    TAU_XY("tau_xy", MemberKind.STRESS, true, "shear stress in the part's axes, G gamma_xy"),
    SIGMA_1("sigma_1", MemberKind.STRESS, true, "larger in-plane principal stress"),
    SIGMA_2("sigma_2", MemberKind.STRESS, true, "smaller in-plane principal stress"),
    SIGMA_Z("sigma_z", MemberKind.STRESS, true,
            "stress through the thickness: 0 in plane stress, nu (sigma_x + sigma_y) in plane strain"),
    TAU_MAX("tau_max", MemberKind.STRESS, true, "largest in-plane shear stress, (sigma_1 - sigma_2) / 2"),
    TAU_ABS("tau_abs", MemberKind.STRESS, true,
            "largest shear stress in any plane, half the spread of sigma_1, sigma_2 and sigma_z"),
    VON_MISES("von_mises", MemberKind.STRESS, true, "von Mises equivalent stress of sigma_1, sigma_2 and sigma_z"),
    TRESCA("tresca", MemberKind.STRESS, true, "Tresca equivalent stress, largest minus smallest of the three");

    private final String scriptName;
    private final MemberKind kind;
    private final boolean needsMaterial;
    private final String description;

    RosetteMember(String scriptName, MemberKind kind, boolean needsMaterial, String description) {
        this.scriptName = scriptName;
        this.kind = kind;
        this.needsMaterial = needsMaterial;
        this.description = description;
    }

    /** The name a script writes after the rosette, e.g. {@code web_top.sigma_1}. */
    public String scriptName() {
        return scriptName;
    }

    public MemberKind kind() {
        return kind;
    }

    /** True when the member exists only for a rosette (or state) with a material. */
    public boolean needsMaterial() {
        return needsMaterial;
    }

    /** One line of plain English for help, completion and inspection. */
    public String description() {
        return description;
    }

    public static Optional<RosetteMember> byScriptName(String name) {
        for (RosetteMember m : values()) {
            if (m.scriptName.equals(name)) {
                return Optional.of(m);
            }
        }
        return Optional.empty();
    }
}
