package org.rosetra.lang.repl;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import org.rosetra.lang.syntax.Baseline;
import org.rosetra.lang.syntax.Case;
import org.rosetra.lang.syntax.Combine;
import org.rosetra.lang.syntax.Declaration;
import org.rosetra.lang.syntax.Let;
import org.rosetra.lang.syntax.Series;
import org.rosetra.lang.syntax.Statement;

/** The names a session's statements define, sorted by what they name. */
record SessionNames(Set<String> rosettes, Set<String> states, Set<String> materials, Set<String> gauges,
                    Set<String> cases, Set<String> baselines, Set<String> series, Set<String> values) {

    static SessionNames of(List<Statement> statements) {
        SessionNames n = new SessionNames(new LinkedHashSet<>(), new LinkedHashSet<>(), new LinkedHashSet<>(),
                new LinkedHashSet<>(), new LinkedHashSet<>(), new LinkedHashSet<>(), new LinkedHashSet<>(),
                new LinkedHashSet<>());
        for (Statement s : statements) {
            if (s instanceof Declaration d) {
                String name = d.name().text();
                switch (d.kind()) {
                    case ROSETTE -> n.rosettes.add(name);
                    case MATERIAL -> n.materials.add(name);
                    case GAUGE -> n.gauges.add(name);
                    default -> n.states.add(name);
                }
            } else if (s instanceof Case c) {
                n.cases.add(c.name().text());
            } else if (s instanceof Combine c) {
                n.cases.add(c.name().text());
            } else if (s instanceof Baseline b) {
                n.baselines.add(b.name().text());
            } else if (s instanceof Series x) {
                n.series.add(x.name().text());
            } else if (s instanceof Let l) {
                n.values.add(l.name().text());
            }
        }
        return n;
    }

    /** Every name, in a fixed order: declarations, readings, then values and functions. */
    List<String> all() {
        List<String> all = new ArrayList<>();
        all.addAll(materials);
        all.addAll(gauges);
        all.addAll(rosettes);
        all.addAll(states);
        all.addAll(baselines);
        all.addAll(cases);
        all.addAll(series);
        all.addAll(values);
        return all;
    }
}
