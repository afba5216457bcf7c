package org.rosetra.runtime.material;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;

/**
 * An isotropic, linear-elastic material with optional strengths, all in SI (Pa).
 *
 * <p>{@code e}, {@code nu}, {@code g} always hold all three elastic constants, consistent with
 * G = E / (2 (1 + ν)) within {@link #CONSISTENCY_TOLERANCE}. Strengths are
 * {@link OptionalDouble}: empty means "not given". {@code yieldC} is the compressive yield
 * strength and defaults to {@code yield}; {@code ultimateC} defaults to {@code ultimate}; all
 * strengths are positive magnitudes.
 *
 * <p>Use {@link #of} to build one from what a script gives (any two of E, ν, G).
 */
public record Material(String name, double e, double nu, double g,
                       OptionalDouble yield, OptionalDouble yieldC,
                       OptionalDouble ultimate, OptionalDouble ultimateC) {

    /** Largest relative difference between a given G and E / (2 (1 + ν)): 0.5 %. */
    public static final double CONSISTENCY_TOLERANCE = 0.005;

    public Material {
        if (name == null || name.isBlank()) {
            throw new MaterialException("a material needs a name; give it one");
        }
        requirePositive(name, "E", e);
        requirePositive(name, "G", g);
        requirePoisson(name, nu, "nu = " + fmt(nu));
        requireConsistent(name, e, nu, g);
        yield = orEmpty(yield);
        ultimate = orEmpty(ultimate);
        yieldC = orEmpty(yieldC).isPresent() ? yieldC : yield;
        ultimateC = orEmpty(ultimateC).isPresent() ? ultimateC : ultimate;
        requireStrength(name, "yield", yield);
        requireStrength(name, "yield_c", yieldC);
        requireStrength(name, "ultimate", ultimate);
        requireStrength(name, "ultimate_c", ultimateC);
    }

    /**
     * A material from the fields a script gives, {@code null} meaning "not given". Any two of
     * {@code e}, {@code nu}, {@code g} fix the third by G = E / (2 (1 + ν)); all three must agree
     * within 0.5 %. Stresses in Pa.
     *
     * @throws MaterialException when fewer than two elastic constants are given, a value is out
     *     of range, or the three disagree
     */
    public static Material of(String name, Double e, Double nu, Double g,
                              Double yield, Double yieldC, Double ultimate, Double ultimateC) {
        String label = name == null || name.isBlank() ? "(unnamed)" : name;
        List<String> missing = new ArrayList<>();
        if (e == null) {
            missing.add("E");
        }
        if (nu == null) {
            missing.add("nu");
        }
        if (g == null) {
            missing.add("G");
        }
        if (missing.size() > 1) {
            throw new MaterialException("material " + label + " needs two of E, nu and G but "
                    + String.join(" and ", missing) + " are missing; give "
                    + (missing.size() == 3 ? "two of them" : "one of " + String.join(" or ", missing)));
        }
        if (e != null) {
            requirePositive(label, "E", e);
        }
        if (g != null) {
            requirePositive(label, "G", g);
        }
        if (nu != null) {
            requirePoisson(label, nu, "nu = " + fmt(nu));
        }
        double ee;
        double nn;
        double gg;
        if (e == null) {
            nn = nu;
            gg = g;
            ee = 2 * gg * (1 + nn);
        } else if (nu == null) {
            ee = e;
            gg = g;
            nn = ee / (2 * gg) - 1;
            requirePoisson(label, nn, "E = " + stress(ee) + " and G = " + stress(gg)
                    + " give nu = E / (2 G) - 1 = " + fmt(nn));
        } else if (g == null) {
            ee = e;
            nn = nu;
            gg = ee / (2 * (1 + nn));
        } else {
            ee = e;
            nn = nu;
            gg = g;
        }
        return new Material(label, ee, nn, gg, opt(yield), opt(yieldC), opt(ultimate), opt(ultimateC));
    }

    /** Tensile yield strength, or an error saying the material lacks it for {@code forWhat}. */
    public double requireYield(String forWhat) {
        return require(yield, "yield", null, forWhat);
    }

    /** Compressive yield strength (defaults to yield), or an error naming what is missing. */
    public double requireYieldC(String forWhat) {
        return require(yieldC, "yield_c", "yield", forWhat);
    }

    /** Tensile ultimate strength, or an error saying the material lacks it for {@code forWhat}. */
    public double requireUltimate(String forWhat) {
        return require(ultimate, "ultimate", null, forWhat);
    }

    /** Compressive ultimate strength (defaults to ultimate), or an error naming what is missing. */
    public double requireUltimateC(String forWhat) {
        return require(ultimateC, "ultimate_c", "ultimate", forWhat);
    }

    private double require(OptionalDouble value, String field, String defaultsFrom, String forWhat) {
        if (value.isPresent()) {
            return value.getAsDouble();
        }
        String purpose = forWhat == null || forWhat.isBlank() ? "" : " to use " + forWhat;
        if (defaultsFrom == null) {
            throw new MaterialException("material " + name + " has no '" + field + "'; give "
                    + field + " = ..." + purpose);
        }
        throw new MaterialException("material " + name + " has no '" + field + "' (nor '"
                + defaultsFrom + "', its default); give " + field + " = ... or " + defaultsFrom
                + " = ..." + purpose);
    }

    private static void requirePositive(String name, String field, double value) {
        if (!(Double.isFinite(value) && value > 0)) {
            throw new MaterialException("material " + name + ": " + field + " = " + stress(value)
                    + " must be a positive, finite stress; give " + field + " > 0");
        }
    }

    private static void requirePoisson(String name, double nu, String what) {
        if (!(Double.isFinite(nu) && nu > -1 && nu < 0.5)) {
            throw new MaterialException("material " + name + ": " + what
                    + " lies outside (-1, 0.5), the range of Poisson's ratio for a stable isotropic"
                    + " material; check the value (a fraction, not a percentage)");
        }
    }

    private static void requireConsistent(String name, double e, double nu, double g) {
        double expected = e / (2 * (1 + nu));
        double difference = Math.abs(g - expected) / expected;
        if (!(difference <= CONSISTENCY_TOLERANCE)) {
            throw new MaterialException(String.format(Locale.ROOT,
                    "material %s: E = %s, nu = %s and G = %s do not satisfy G = E / (2 (1 + nu)),"
                            + " which gives G = %s, %.2f %% away from the given G (more than 0.5 %%);"
                            + " give only two of E, nu and G, or correct one",
                    name, stress(e), fmt(nu), stress(g), stress(expected), 100 * difference));
        }
    }

    private static void requireStrength(String name, String field, OptionalDouble value) {
        if (value.isPresent()) {
            double v = value.getAsDouble();
            if (!(Double.isFinite(v) && v > 0)) {
                throw new MaterialException("material " + name + ": " + field + " = " + stress(v)
                        + " must be a positive, finite stress (a compressive strength is given as"
                        + " its magnitude); give " + field + " > 0");
            }
        }
    }

    private static OptionalDouble orEmpty(OptionalDouble value) {
        return value == null ? OptionalDouble.empty() : value;
    }

    private static OptionalDouble opt(Double value) {
        return value == null ? OptionalDouble.empty() : OptionalDouble.of(value);
    }

    private static String fmt(double value) {
        return String.format(Locale.ROOT, "%.6g", value);
    }

    /** A stress for a message, in MPa (the unit engineers read most easily). */
    private static String stress(double pa) {
        return String.format(Locale.ROOT, "%.6g MPa", pa / 1e6);
    }
}
