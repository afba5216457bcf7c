package org.rosetra.lang.repl;

import java.util.List;
import java.util.Map;

/** The language's fixed words, for telling statements from expressions and for completion. */
final class Vocabulary {
    private Vocabulary() {
    }

    /** Words that begin a statement (LANGUAGE.md). */
    static final List<String> STATEMENT_KEYWORDS = List.of(
            "title", "material", "gauge", "rosette", "strain", "stress", "baseline", "case", "combine",
            "series", "let", "check", "table", "plot", "report", "use", "display");

    /** Functions every script can call. */
    static final List<String> FUNCTIONS = List.of(
            "sqrt", "abs", "sin", "cos", "tan", "atan2", "min", "max",
            "strain_at", "shear_at", "stress_at", "shear_stress_at", "mohr_coulomb", "rankine");

    /** Words that stand as field values or after a keyword. */
    static final List<String> WORDS = List.of(
            "rectangular", "delta", "tee", "arms", "plane_stress", "plane_strain",
            "none", "quarter", "quarter_3wire", "from", "to", "mohr", "directions", "java");

    /** The properties of a material, as members after a dot. */
    static final List<String> MATERIAL_MEMBERS = List.of(
            "E", "nu", "G", "yield", "yield_c", "ultimate", "ultimate_c");

    /** The fields each kind of block takes; reading blocks also take one line per rosette. */
    static final Map<String, List<String>> FIELDS = Map.of(
            "material", MATERIAL_MEMBERS,
            "gauge", List.of("factor", "transverse", "nu0", "resistance", "thermal", "thermal_factor"),
            "rosette", List.of("layout", "gauge", "material", "state", "angle", "bridge", "lead",
                    "instrument_factor"),
            "strain", List.of("eps_x", "eps_y", "gamma_xy", "material", "state"),
            "stress", List.of("sigma_x", "sigma_y", "tau_xy", "material", "state"),
            "baseline", List.of("temperature"),
            "case", List.of("temperature"),
            "series", List.of("time", "temperature", "zero"));

    static boolean isStatementKeyword(String word) {
        return STATEMENT_KEYWORDS.contains(word);
    }
}
