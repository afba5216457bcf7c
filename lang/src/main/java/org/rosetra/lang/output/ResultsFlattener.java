package org.rosetra.lang.output;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Turns a results.json tree into one entry per number (and per check verdict), labelled the way
 * a reviewer reads them: {@code web_top.sigma_1[proof_60kN]}, {@code allowable},
 * {@code check "web yield margin".utilization}, {@code web_top.von_mises[hoist_run].max}.
 */
public final class ResultsFlattener {
    private ResultsFlattener() {}

    @SuppressWarnings("unchecked")
    public static Map<String, Object> flatten(Object tree) {
        Map<String, Object> out = new LinkedHashMap<>();
        if (!(tree instanceof Map)) {
            return out;
        }
        Map<String, Object> root = (Map<String, Object>) tree;
        out.put("format", root.get("format"));
        out.put("title", root.get("title"));
        out.put("cases", root.get("cases") == null ? null : String.join(", ", ((List<Object>) root.get("cases")).stream().map(String::valueOf).toList()));
        forEachMap(root.get("rosettes"), (rosette, body) ->
                out.put(rosette + ".state", ((Map<String, Object>) body).get("state")));
        forEachMap(root.get("rosettes"), (rosette, body) ->
                forEachMap(((Map<String, Object>) body).get("results"), (kase, members) ->
                        forEachMap(members, (member, value) ->
                                out.put(rosette + "." + member + "[" + kase + "]", value))));
        forEachMap(root.get("states"), (state, members) ->
                forEachMap(members, (member, value) -> out.put(state + "." + member, value)));
        forEachMap(root.get("values"), (name, body) ->
                out.put(name, ((Map<String, Object>) body).get("value")));
        if (root.get("checks") instanceof List) {
            for (Object item : (List<Object>) root.get("checks")) {
                Map<String, Object> check = (Map<String, Object>) item;
                String label = "check \"" + check.get("label") + "\"";
                out.put(label + ".pass", check.get("pass"));
                out.put(label + ".utilization", check.get("utilization"));
                out.put(label + ".governing", check.get("governing"));
                if (check.containsKey("at")) {
                    out.put(label + ".at", check.get("at"));
                }
            }
        }
        forEachMap(root.get("series"), (series, body) -> {
            Map<String, Object> s = (Map<String, Object>) body;
            out.put(series + ".samples", s.get("samples"));
            forEachMap(s.get("rosettes"), (rosette, members) ->
                    forEachMap(members, (member, extremes) ->
                            forEachMap(extremes, (which, value) ->
                                    out.put(rosette + "." + member + "[" + series + "]." + which, value))));
        });
        return out;
    }

    @SuppressWarnings("unchecked")
    private static void forEachMap(Object node, java.util.function.BiConsumer<String, Object> action) {
        if (node instanceof Map) {
            ((Map<String, Object>) node).forEach(action);
        }
    }
}
