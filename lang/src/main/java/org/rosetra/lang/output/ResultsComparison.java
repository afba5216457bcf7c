package org.rosetra.lang.output;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;

/**
 * Compares two results.json trees number by number: how a reviewer re-runs a colleague's
 * calculation. Two numbers agree when they are equal or differ by at most {@code rtol} times the
 * larger magnitude; verdicts, names and texts must be equal.
 */
public final class ResultsComparison {
    private ResultsComparison() {}

    /** One disagreement, printed as {@code label: committed → now}. */
    public record Difference(String label, Object committed, Object now) {
        @Override
        public String toString() {
            return label + ": " + show(committed) + " \u2192 " + show(now);
        }
    }

    public static List<Difference> compare(Object committedTree, Object nowTree, double rtol) {
        Map<String, Object> committed = ResultsFlattener.flatten(committedTree);
        Map<String, Object> now = ResultsFlattener.flatten(nowTree);
        List<Difference> out = new ArrayList<>();
        for (var e : committed.entrySet()) {
            if (!now.containsKey(e.getKey())) {
                out.add(new Difference(e.getKey(), e.getValue(), "(missing)"));
            } else if (!agree(e.getValue(), now.get(e.getKey()), rtol)) {
                out.add(new Difference(e.getKey(), e.getValue(), now.get(e.getKey())));
            }
        }
        for (var e : now.entrySet()) {
            if (!committed.containsKey(e.getKey())) {
                out.add(new Difference(e.getKey(), "(missing)", e.getValue()));
            }
        }
        return out;
    }

    static boolean agree(Object a, Object b, double rtol) {
        if (a instanceof Double x && b instanceof Double y) {
            return x.equals(y) || Math.abs(x - y) <= rtol * Math.max(Math.abs(x), Math.abs(y));
        }
        return Objects.equals(a, b);
    }

    private static String show(Object v) {
        if (v instanceof Double d) {
            return String.format(Locale.ROOT, "%.10g", d);
        }
        return String.valueOf(v);
    }
}
