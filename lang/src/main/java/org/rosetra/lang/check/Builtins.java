package org.rosetra.lang.check;

import static org.rosetra.lang.check.FieldKind.*;

import java.util.ArrayList;
import java.util.Collections;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalInt;
import org.rosetra.runtime.units.Dimension;

/**
 * The one registry of what a script can name without declaring it: functions, the members
 * of a rosette's result, the fields of every block, the layouts. The checker, the
 * evaluator, completion and inspection all read it, so each entry carries its dimensions
 * and a one-line description.
 */
public final class Builtins {

    private static final Dimension NONE = Dimension.NONE;
    private static final Dimension STRESS = Dimension.STRESS;
    private static final Dimension ANGLE = Dimension.ANGLE;

    private static final Map<String, BuiltinFunction> FUNCTIONS = functions(
            new BuiltinFunction("sqrt", "sqrt(x) -> x^(1/2)", FunctionShape.SQUARE_ROOT, List.of(),
                    "square root; halves the powers of the dimension"),
            new BuiltinFunction("abs", "abs(x) -> x", FunctionShape.SAME, List.of(),
                    "magnitude, the sign dropped"),
            new BuiltinFunction("sin", "sin(angle) -> none", FunctionShape.TRIGONOMETRIC, List.of(),
                    "sine of an angle"),
            new BuiltinFunction("cos", "cos(angle) -> none", FunctionShape.TRIGONOMETRIC, List.of(),
                    "cosine of an angle"),
            new BuiltinFunction("tan", "tan(angle) -> none", FunctionShape.TRIGONOMETRIC, List.of(),
                    "tangent of an angle"),
            new BuiltinFunction("atan2", "atan2(y, x) -> angle", FunctionShape.ANGLE_OF_PAIR, List.of(),
                    "direction of the point (x, y), counter-clockwise from the x-axis; y and x alike"),
            new BuiltinFunction("min", "min(x) or min(a, b, ...) -> x", FunctionShape.EXTREME, List.of(),
                    "with one argument the smallest over the cases (or samples); with several, the smallest of them"),
            new BuiltinFunction("max", "max(x) or max(a, b, ...) -> x", FunctionShape.EXTREME, List.of(),
                    "with one argument the largest over the cases (or samples); with several, the largest of them"),
            new BuiltinFunction("strain_at", "strain_at(rosette, angle) -> none",
                    FunctionShape.STRAIN_IN_DIRECTION, List.of(),
                    "normal strain in a direction counter-clockwise from the part's x-axis"),
            new BuiltinFunction("shear_at", "shear_at(rosette, angle) -> none",
                    FunctionShape.STRAIN_IN_DIRECTION, List.of(),
                    "engineering shear strain between a direction and the direction 90 deg on"),
            new BuiltinFunction("stress_at", "stress_at(rosette, angle) -> stress",
                    FunctionShape.STRESS_IN_DIRECTION, List.of(),
                    "normal stress in a direction counter-clockwise from the part's x-axis"),
            new BuiltinFunction("shear_stress_at", "shear_stress_at(rosette, angle) -> stress",
                    FunctionShape.STRESS_IN_DIRECTION, List.of(),
                    "shear stress on the plane whose normal points in the direction"),
            new BuiltinFunction("mohr_coulomb", "mohr_coulomb(rosette) -> none", FunctionShape.FAILURE_INDEX,
                    List.of("ultimate"),
                    "Mohr-Coulomb failure index from the material's tensile and compressive strengths; 1 or more fails"),
            new BuiltinFunction("rankine", "rankine(rosette) -> none", FunctionShape.FAILURE_INDEX,
                    List.of("ultimate"),
                    "largest principal stress over its strength (tension or compression); 1 or more fails"),
            new BuiltinFunction("arms", "arms(angle, angle, angle, ...)", FunctionShape.LAYOUT, List.of(),
                    "a rosette layout with arms at the given angles from arm a, three or more"));

    private static final Map<String, BuiltinMember> RESULT_MEMBERS = members(
            strain("eps_x", "normal strain along the part's x-axis"),
            strain("eps_y", "normal strain along the part's y-axis"),
            strain("gamma_xy", "engineering shear strain in the part's axes"),
            strain("eps_1", "larger in-plane principal strain"),
            strain("eps_2", "smaller in-plane principal strain"),
            new BuiltinMember("theta_p", "angle", ANGLE, false,
                    "direction of eps_1 from the part's x-axis, counter-clockwise, in (-90, 90] deg"),
            strain("gamma_max", "largest in-plane shear strain, eps_1 - eps_2"),
            new BuiltinMember("eps_z", "strain", NONE, true,
                    "through-thickness strain (plane stress), 0 in plane strain"),
            stress("sigma_x", "normal stress along the part's x-axis"),
            stress("sigma_y", "normal stress along the part's y-axis"),
            stress("tau_xy", "shear stress in the part's axes"),
            stress("sigma_1", "larger in-plane principal stress"),
            stress("sigma_2", "smaller in-plane principal stress"),
            stress("sigma_z", "through-thickness stress: 0 in plane stress, nu (sigma_x + sigma_y) in plane strain"),
            stress("tau_max", "largest in-plane shear stress, (sigma_1 - sigma_2) / 2"),
            stress("tau_abs", "largest shear stress on any plane, over sigma_1, sigma_2 and sigma_z"),
            stress("von_mises", "von Mises equivalent stress"),
            stress("tresca", "Tresca equivalent stress, largest minus smallest principal stress"));

    private static final Map<String, Integer> LAYOUT_ARMS = layouts();

    private static final List<String> STATES = List.of("plane_stress", "plane_strain");
    private static final List<String> BRIDGES = List.of("none", "quarter", "quarter_3wire");

    private static final Map<BlockKind, Map<String, FieldSpec>> FIELDS = fields();

    /** Names of display unit sets: {@code display us}, {@code display si}. */
    public static final List<String> DISPLAY_SETS = List.of("si", "us");

    private Builtins() {
    }

    public static Optional<BuiltinFunction> function(String name) {
        return Optional.ofNullable(FUNCTIONS.get(name));
    }

    public static List<BuiltinFunction> functions() {
        return List.copyOf(FUNCTIONS.values());
    }

    public static Optional<BuiltinMember> resultMember(String name) {
        return Optional.ofNullable(RESULT_MEMBERS.get(name));
    }

    /** The members of a rosette's result, in the order of LANGUAGE.md's table. */
    public static List<BuiltinMember> resultMembers() {
        return List.copyOf(RESULT_MEMBERS.values());
    }

    /** The fields a block of this kind may hold (reading blocks: besides their rosettes). */
    public static List<FieldSpec> fields(BlockKind kind) {
        return List.copyOf(FIELDS.get(kind).values());
    }

    public static Optional<FieldSpec> field(BlockKind kind, String name) {
        return Optional.ofNullable(FIELDS.get(kind).get(name));
    }

    /** The number of arms of a named layout (rectangular, delta, tee). */
    public static OptionalInt layoutArms(String layout) {
        Integer arms = LAYOUT_ARMS.get(layout);
        return arms == null ? OptionalInt.empty() : OptionalInt.of(arms);
    }

    public static List<String> layoutNames() {
        return List.copyOf(LAYOUT_ARMS.keySet());
    }

    /**
     * A dimension as a script names it in {@code x: stress} or {@code display stress = ksi}:
     * the runtime's stable names, plus "strain" for a plain number.
     */
    public static Optional<Dimension> dimensionNamed(String name) {
        return name.equals("strain") ? Optional.of(NONE) : Dimension.named(name);
    }

    public static List<String> dimensionNames() {
        List<String> names = new ArrayList<>(Dimension.namedDimensions().keySet());
        names.add("strain");
        return names;
    }

    private static Map<BlockKind, Map<String, FieldSpec>> fields() {
        Map<BlockKind, Map<String, FieldSpec>> all = new EnumMap<>(BlockKind.class);
        all.put(BlockKind.MATERIAL, byName(
                FieldSpec.quantity("E", STRESS, Limits.POSITIVE, "Young's modulus"),
                FieldSpec.quantity("nu", NONE, Limits.POISSON, "Poisson's ratio, in (-1, 0.5)"),
                FieldSpec.quantity("G", STRESS, Limits.POSITIVE, "shear modulus"),
                FieldSpec.quantity("yield", STRESS, Limits.POSITIVE, "yield strength in tension"),
                FieldSpec.quantity("yield_c", STRESS, Limits.POSITIVE, "yield strength in compression (default: yield)"),
                FieldSpec.quantity("ultimate", STRESS, Limits.POSITIVE, "ultimate strength in tension"),
                FieldSpec.quantity("ultimate_c", STRESS, Limits.POSITIVE,
                        "ultimate strength in compression (default: ultimate)"),
                FieldSpec.of("source", FieldKind.TEXT, null,
                        "where the values come from (standard, certificate, test), shown in the record")));
        all.put(BlockKind.GAUGE, byName(
                FieldSpec.quantity("factor", NONE, Limits.POSITIVE, "gauge factor").asRequired(),
                FieldSpec.quantity("transverse", NONE, null, "transverse sensitivity coefficient Kt (default 0)"),
                FieldSpec.quantity("nu0", NONE, Limits.POISSON,
                        "Poisson's ratio of the beam the gauge factor was measured on (default 0.285)"),
                FieldSpec.quantity("resistance", Dimension.RESISTANCE, Limits.POSITIVE,
                        "gauge resistance (default 120 ohm)"),
                FieldSpec.of("thermal", READINGS, NONE,
                        "thermal-output polynomial a0, a1, ... in the temperature in degC, as apparent strain"),
                FieldSpec.quantity("thermal_factor", NONE, Limits.POSITIVE,
                        "gauge factor at which the thermal output was recorded (default 2.00)")));
        all.put(BlockKind.ROSETTE, byName(
                new FieldSpec("layout", LAYOUT, null, List.copyOf(LAYOUT_ARMS.keySet()), null, null, true,
                        "arm directions: rectangular, delta, tee or arms(...)"),
                FieldSpec.reference("gauge", SymbolKind.GAUGE, "the gauge of every arm").asRequired(),
                FieldSpec.reference("material", SymbolKind.MATERIAL, "the material under the rosette"),
                FieldSpec.choice("state", STATES, "plane_stress (default) or plane_strain"),
                FieldSpec.quantity("angle", ANGLE, null,
                        "direction of arm a, counter-clockwise from the part's x-axis (default 0 deg)"),
                FieldSpec.choice("bridge", BRIDGES, "none (default), quarter or quarter_3wire"),
                FieldSpec.quantity("lead", Dimension.RESISTANCE, Limits.NOT_NEGATIVE,
                        "resistance of one lead wire (default 0 ohm)"),
                FieldSpec.quantity("instrument_factor", NONE, Limits.POSITIVE,
                        "gauge factor set on the instrument (default: the gauge's)")));
        all.put(BlockKind.STRAIN, byName(
                FieldSpec.quantity("eps_x", NONE, null, "normal strain along x (default 0)"),
                FieldSpec.quantity("eps_y", NONE, null, "normal strain along y (default 0)"),
                FieldSpec.quantity("gamma_xy", NONE, null, "engineering shear strain (default 0)"),
                FieldSpec.reference("material", SymbolKind.MATERIAL, "the material, for the stresses"),
                FieldSpec.choice("state", STATES, "plane_stress (default) or plane_strain")));
        all.put(BlockKind.STRESS, byName(
                FieldSpec.quantity("sigma_x", STRESS, null, "normal stress along x (default 0)"),
                FieldSpec.quantity("sigma_y", STRESS, null, "normal stress along y (default 0)"),
                FieldSpec.quantity("tau_xy", STRESS, null, "shear stress (default 0)"),
                FieldSpec.reference("material", SymbolKind.MATERIAL, "the material, for the strains"),
                FieldSpec.choice("state", STATES, "plane_stress (default) or plane_strain")));
        Map<String, FieldSpec> readings = byName(
                FieldSpec.quantity("temperature", Dimension.TEMPERATURE, null, "temperature of the readings"));
        all.put(BlockKind.BASELINE, readings);
        all.put(BlockKind.CASE, readings);
        all.put(BlockKind.SERIES, byName(
                FieldSpec.of("time", COLUMN, Dimension.TIME, "the time column and its unit").asRequired(),
                FieldSpec.of("temperature", COLUMN, Dimension.TEMPERATURE, "the temperature column and its unit"),
                FieldSpec.of("zero", WINDOW_OR_BASELINE, Dimension.TIME,
                        "zero readings: a time window T0 to T1, or a baseline"),
                FieldSpec.of("delimiter", TEXT, null, "the character between values (default \",\")"),
                FieldSpec.of("decimal", TEXT, null, "the decimal mark, \".\" (default) or \",\"")));
        return Collections.unmodifiableMap(all);
    }

    private static Map<String, Integer> layouts() {
        Map<String, Integer> layouts = new LinkedHashMap<>();
        layouts.put("rectangular", 3);
        layouts.put("delta", 3);
        layouts.put("tee", 2);
        return Collections.unmodifiableMap(layouts);
    }

    private static BuiltinMember strain(String name, String doc) {
        return new BuiltinMember(name, "strain", NONE, false, doc);
    }

    private static BuiltinMember stress(String name, String doc) {
        return new BuiltinMember(name, "stress", STRESS, true, doc);
    }

    private static Map<String, FieldSpec> byName(FieldSpec... specs) {
        Map<String, FieldSpec> map = new LinkedHashMap<>();
        for (FieldSpec spec : specs) {
            map.put(spec.name(), spec);
        }
        return Collections.unmodifiableMap(map);
    }

    private static Map<String, BuiltinFunction> functions(BuiltinFunction... functions) {
        Map<String, BuiltinFunction> map = new LinkedHashMap<>();
        for (BuiltinFunction function : functions) {
            map.put(function.name(), function);
        }
        return Collections.unmodifiableMap(map);
    }

    private static Map<String, BuiltinMember> members(BuiltinMember... members) {
        Map<String, BuiltinMember> map = new LinkedHashMap<>();
        for (BuiltinMember member : members) {
            map.put(member.name(), member);
        }
        return Collections.unmodifiableMap(map);
    }
}
