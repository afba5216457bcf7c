package org.rosetra.lang.kernel;

import java.util.ArrayList;
import java.util.List;
import java.util.TreeSet;
import org.rosetra.lang.check.Builtins;
import org.rosetra.lang.check.BuiltinFunction;
import org.rosetra.lang.check.BuiltinMember;
import org.rosetra.lang.plan.Session;
import org.rosetra.lang.syntax.Declaration;
import org.rosetra.lang.syntax.Statement;
import org.rosetra.runtime.units.Units;

/**
 * What may be typed at a place in a cell: members after a dot, units after a number,
 * otherwise keywords, declared names and functions.
 */
final class CellCompletion {
    static final List<String> KEYWORDS = List.of("title", "material", "gauge", "rosette", "strain", "stress",
            "baseline", "case", "combine", "series", "let", "check", "table", "plot", "report", "use", "display",
            "from", "to");
    private static final List<String> MATERIAL_MEMBERS = List.of("E", "nu", "G", "yield", "yield_c", "ultimate", "ultimate_c");

    private CellCompletion() {}

    static CompletionResult complete(Session session, String code, int cursor) {
        int end = Math.min(Math.max(cursor, 0), code.length());
        int start = end;
        while (start > 0 && isNameChar(code.charAt(start - 1))) {
            start--;
        }
        String prefix = code.substring(start, end);
        TreeSet<String> candidates = new TreeSet<>();
        if (start > 0 && code.charAt(start - 1) == '.') {
            int targetEnd = start - 1;
            int targetStart = targetEnd;
            while (targetStart > 0 && isNameChar(code.charAt(targetStart - 1))) {
                targetStart--;
            }
            String target = code.substring(targetStart, targetEnd);
            Statement s = session.definitionOf(target);
            if (s instanceof Declaration d && d.kind() == Declaration.Kind.MATERIAL) {
                candidates.addAll(MATERIAL_MEMBERS);
            } else {
                Builtins.resultMembers().stream().map(BuiltinMember::name).forEach(candidates::add);
            }
        } else if (afterNumber(code, start)) {
            candidates.addAll(Units.symbols());
        } else {
            candidates.addAll(KEYWORDS);
            candidates.addAll(session.definedNames());
            Builtins.functions().stream().map(BuiltinFunction::name).forEach(candidates::add);
        }
        List<String> matches = new ArrayList<>();
        for (String c : candidates) {
            if (c.startsWith(prefix)) {
                matches.add(c);
            }
        }
        return new CompletionResult(matches, start, end);
    }

    /** The name around {@code cursor}, or "". */
    static String wordAt(String code, int cursor) {
        int at = Math.min(Math.max(cursor, 0), code.length());
        int start = at;
        while (start > 0 && isNameChar(code.charAt(start - 1))) {
            start--;
        }
        int end = at;
        while (end < code.length() && isNameChar(code.charAt(end))) {
            end++;
        }
        return code.substring(start, end);
    }

    /** The text of the statement defining {@code name}, as it was written, or null. */
    static String definitionOf(Session session, String name) {
        Statement s = session.definitionOf(name);
        if (s == null) {
            return null;
        }
        String source = session.sourceOf(s.span().file());
        if (source == null) {
            return null;
        }
        String[] lines = source.split("\n", -1);
        StringBuilder out = new StringBuilder();
        for (int line = s.span().line(); line <= s.span().endLine() && line <= lines.length; line++) {
            out.append(lines[line - 1]).append('\n');
        }
        return out.toString().stripTrailing();
    }

    private static boolean afterNumber(String code, int start) {
        int i = start - 1;
        boolean space = false;
        while (i >= 0 && code.charAt(i) == ' ') {
            i--;
            space = true;
        }
        return space && i >= 0 && Character.isDigit(code.charAt(i));
    }

    private static boolean isNameChar(char c) {
        return Character.isLetterOrDigit(c) || c == '_';
    }
}
