package org.rosetra.lang.repl;

import java.util.List;
import java.util.Locale;
import org.rosetra.lang.check.BlockKind;
import org.rosetra.lang.check.BuiltinFunction;
import org.rosetra.lang.check.BuiltinMember;
import org.rosetra.lang.check.Builtins;
import org.rosetra.lang.check.FieldSpec;

/**
 * The language's fixed words, for telling statements from expressions and for completion.
 * Functions, members and fields come from the checker's registry, so they never drift apart.
 */
final class Vocabulary {
    private Vocabulary() {
    }

    /** Words that begin a statement (LANGUAGE.md). */
    static final List<String> STATEMENT_KEYWORDS = List.of(
            "title", "material", "gauge", "rosette", "strain", "stress", "baseline", "case", "combine",
            "series", "let", "check", "table", "plot", "report", "use", "display");

    /** Words that stand as field values or after a keyword. */
    static final List<String> WORDS = List.of(
            "rectangular", "delta", "tee", "arms", "plane_stress", "plane_strain",
            "none", "quarter", "quarter_3wire", "from", "to", "mohr", "directions", "java");

    /** The properties of a material, as members after a dot. */
    static final List<String> MATERIAL_MEMBERS = List.of(
            "E", "nu", "G", "yield", "yield_c", "ultimate", "ultimate_c");

    static boolean isStatementKeyword(String word) {
        return STATEMENT_KEYWORDS.contains(word);
    }

    /** Functions every script can call. */
    static List<String> functions() {
        return Builtins.functions().stream().map(BuiltinFunction::name).toList();
    }

    /** The members of a rosette's (or a state's) result. */
    static List<String> resultMembers() {
        return Builtins.resultMembers().stream().map(BuiltinMember::name).toList();
    }

    /** The fields of a block opened by {@code keyword}; none for a word that opens no block. */
    static List<String> fields(String keyword) {
        try {
            BlockKind kind = BlockKind.valueOf(keyword.toUpperCase(Locale.ROOT));
            return Builtins.fields(kind).stream().map(FieldSpec::name).toList();
        } catch (IllegalArgumentException notABlock) {
            return List.of();
        }
    }
}
