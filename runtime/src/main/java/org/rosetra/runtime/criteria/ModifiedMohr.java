package org.rosetra.runtime.criteria;

import org.rosetra.runtime.material.Material;

/**
 * Modified Mohr failure index for brittle materials, the reciprocal of the factor of safety
 * n of Budynas &amp; Nisbett, Shigley's Mechanical Engineering Design, section "Failure of
 * Brittle Materials", eq. (5-32) (from memory). With sA and sB the largest and smallest of the
 * three principal stresses, Sut = ultimate and Suc = ultimate_c (magnitude):
 * <ul>
 *   <li>sA >= 0 and sB >= -sA (tension governs): sA / Sut</li>
 *   <li>sA >= 0 and sB < -sA: (Suc - Sut) sA / (Suc Sut) - sB / Suc</li>
 *   <li>sA < 0 (all compressive): -sB / Suc</li>
 * </ul>
 * The branches meet continuously. 1 or more means failure.
 */
public final class ModifiedMohr {

    private static final String NAME = "modified_mohr";

    private ModifiedMohr() {
    }

    public static double index(double s1, double s2, double s3, double ultimate, double ultimateC) {
        return StrengthIndex.index(NAME, ModifiedMohr::of, s1, s2, s3, ultimate, ultimateC);
    }

    /** With the strengths of {@code material}; an error names the strength it lacks. */
    public static double index(double s1, double s2, double s3, Material material) {
        return index(s1, s2, s3, material.requireUltimate(NAME), material.requireUltimateC(NAME));
    }

    /** out[i] = index(s1[i], s2[i], s3[i], ultimate, ultimateC) for i < n. */
    public static void index(double[] s1, double[] s2, double[] s3, int n,
                             double ultimate, double ultimateC, double[] out) {
        StrengthIndex.index(NAME, ModifiedMohr::of, s1, s2, s3, n, ultimate, ultimateC, out);
    }

    /** The index for sA and sB, the largest and smallest of the three principal stresses. */
    static double of(double sA, double sB, double ultimate, double ultimateC) {
        if (sA < 0) {
            return -sB / ultimateC;
        }
        if (sB >= -sA) {
            return sA / ultimate;
        }
        return (ultimateC - ultimate) * sA / (ultimateC * ultimate) - sB / ultimateC;
    }
}
