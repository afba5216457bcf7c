package org.rosetra.lang.series;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The test's own reduction of one rectangular rosette sample, written out from the closed forms
 * and kept apart from the tool's code, so the tool is compared with something it did not compute.
 *
 * <ul>
 *   <li>rectangular rosette with arm a on the x-axis: eps_x = e_a, eps_y = e_c,
 *       gamma_xy = 2 e_b - e_a - e_c (common practice; any strain-gauge handbook);</li>
 *   <li>principal strains and their direction from Mohr's circle of strain, theta_p =
 *       atan2(gamma_xy, eps_x - eps_y) / 2 (common practice);</li>
 *   <li>plane-stress Hooke's law: sigma_x = E/(1-nu^2) (eps_x + nu eps_y), tau_xy = G gamma_xy,
 *       G = E / (2 (1 + nu)), eps_z = -nu/(1-nu) (eps_x + eps_y) (textbook, e.g. any mechanics
 *       of materials text);</li>
 *   <li>von Mises from the three principal stresses, sqrt(((s1-s2)^2 + (s2-s3)^2 + (s3-s1)^2)/2);
 *       Tresca largest minus smallest; tau_abs half of it (textbook).</li>
 * </ul>
 * Units as in results.json (LANGUAGE.md, "Running and results"): strain as a fraction, stress in
 * Pa, angles in degrees.
 */
final class ClosedForm {
    /** Every member of a rosette's result, in the order of LANGUAGE.md's table. */
    static final List<String> MEMBERS = List.of("eps_x", "eps_y", "gamma_xy", "eps_1", "eps_2", "theta_p",
            "gamma_max", "eps_z", "sigma_x", "sigma_y", "tau_xy", "sigma_1", "sigma_2", "sigma_z", "tau_max",
            "tau_abs", "von_mises", "tresca");

    private ClosedForm() {}

    /** All members for arm strains (plain fractions) of a rectangular rosette in plane stress. */
    static Map<String, Double> rectangularPlaneStress(double ea, double eb, double ec, double e, double nu) {
        return rectangular(ea, eb, ec, e, nu, false);
    }

    /**
     * As above; in plane strain (textbook Hooke's law with eps_z = 0): sigma_x = E / ((1 + nu)
     * (1 - 2 nu)) ((1 - nu) eps_x + nu eps_y), sigma_z = nu (sigma_x + sigma_y), eps_z = 0.
     */
    static Map<String, Double> rectangular(double ea, double eb, double ec, double e, double nu, boolean planeStrain) {
        double ex = ea;
        double ey = ec;
        double gxy = 2 * eb - ea - ec;
        double centre = (ex + ey) / 2;
        double radius = Math.sqrt(Math.pow((ex - ey) / 2, 2) + Math.pow(gxy / 2, 2));
        double e1 = centre + radius;
        double e2 = centre - radius;
        double theta = radius == 0 ? 0 : Math.toDegrees(0.5 * Math.atan2(gxy, ex - ey));
        double g = e / (2 * (1 + nu));
        double sx;
        double sy;
        if (planeStrain) {
            double l = e / ((1 + nu) * (1 - 2 * nu));
            sx = l * ((1 - nu) * ex + nu * ey);
            sy = l * ((1 - nu) * ey + nu * ex);
        } else {
            double k = e / (1 - nu * nu);
            sx = k * (ex + nu * ey);
            sy = k * (ey + nu * ex);
        }
        double txy = g * gxy;
        double sc = (sx + sy) / 2;
        double sr = Math.sqrt(Math.pow((sx - sy) / 2, 2) + txy * txy);
        double s1 = sc + sr;
        double s2 = sc - sr;
        double s3 = planeStrain ? nu * (sx + sy) : 0;
        double hi = Math.max(s1, Math.max(s2, s3));
        double lo = Math.min(s1, Math.min(s2, s3));
        Map<String, Double> m = new LinkedHashMap<>();
        m.put("eps_x", ex);
        m.put("eps_y", ey);
        m.put("gamma_xy", gxy);
        m.put("eps_1", e1);
        m.put("eps_2", e2);
        m.put("theta_p", theta);
        m.put("gamma_max", e1 - e2);
        m.put("eps_z", planeStrain ? 0 : -nu / (1 - nu) * (ex + ey));
        m.put("sigma_x", sx);
        m.put("sigma_y", sy);
        m.put("tau_xy", txy);
        m.put("sigma_1", s1);
        m.put("sigma_2", s2);
        m.put("sigma_z", s3);
        m.put("tau_max", (s1 - s2) / 2);
        m.put("tau_abs", (hi - lo) / 2);
        m.put("von_mises", Math.sqrt((Math.pow(s1 - s2, 2) + Math.pow(s2 - s3, 2) + Math.pow(s3 - s1, 2)) / 2));
        m.put("tresca", hi - lo);
        return m;
    }
}
