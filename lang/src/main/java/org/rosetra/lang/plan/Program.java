package org.rosetra.lang.plan;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.rosetra.lang.syntax.Baseline;
import org.rosetra.lang.syntax.Case;
import org.rosetra.lang.syntax.Check;
import org.rosetra.lang.syntax.Combine;
import org.rosetra.lang.syntax.Declaration;
import org.rosetra.lang.syntax.Display;
import org.rosetra.lang.syntax.Let;
import org.rosetra.lang.syntax.Plot;
import org.rosetra.lang.syntax.Report;
import org.rosetra.lang.syntax.Series;
import org.rosetra.lang.syntax.Statement;
import org.rosetra.lang.syntax.Table;
import org.rosetra.lang.syntax.Title;
import org.rosetra.lang.syntax.Use;

/**
 * A checked script's statements sorted by what they are, each kind in the order written: the
 * planner's view of a script. Later definitions of a name replace earlier ones (a session
 * redefines). Names are unique across kinds once the checker has passed.
 */
public final class Program {
    final Map<String, Declaration> declarations = new LinkedHashMap<>();
    final Map<String, Baseline> baselines = new LinkedHashMap<>();
    final Map<String, Case> cases = new LinkedHashMap<>();
    final Map<String, Combine> combinations = new LinkedHashMap<>();
    final Map<String, Series> series = new LinkedHashMap<>();
    final Map<String, Let> lets = new LinkedHashMap<>();
    final List<Check> checks = new ArrayList<>();
    /** Tables and plots, in script order. */
    final List<Statement> outputs = new ArrayList<>();
    final List<Display> displays = new ArrayList<>();
    Title title;
    Report report;

    public static Program of(List<Statement> statements) {
        Program p = new Program();
        for (Statement s : statements) {
            p.add(s);
        }
        return p;
    }

    private void add(Statement s) {
        if (s instanceof Declaration d) {
            declarations.put(d.name().text(), d);
        } else if (s instanceof Baseline b) {
            baselines.put(b.name().text(), b);
        } else if (s instanceof Case c) {
            cases.put(c.name().text(), c);
        } else if (s instanceof Combine c) {
            combinations.put(c.name().text(), c);
        } else if (s instanceof Series x) {
            series.put(x.name().text(), x);
        } else if (s instanceof Let l) {
            lets.put(l.name().text(), l);
        } else if (s instanceof Check c) {
            checks.add(c);
        } else if (s instanceof Table || s instanceof Plot) {
            outputs.add(s);
        } else if (s instanceof Display d) {
            displays.add(d);
        } else if (s instanceof Title t) {
            title = t;
        } else if (s instanceof Report r) {
            report = r;
        } else if (s instanceof Use) {
            // Modules are loaded by the session before the program is built.
        }
    }

    /** Load cases then combinations, in the order written: the case axis. */
    public List<String> caseAxis() {
        List<String> axis = new ArrayList<>(cases.keySet());
        axis.addAll(combinations.keySet());
        return axis;
    }

    public Declaration declaration(String name, Declaration.Kind kind) {
        Declaration d = declarations.get(name);
        return d != null && d.kind() == kind ? d : null;
    }

    public List<Declaration> declarations(Declaration.Kind kind) {
        return declarations.values().stream().filter(d -> d.kind() == kind).toList();
    }

    public String title() {
        return title == null ? null : title.text().value();
    }

    public String reportName() {
        return report == null ? null : report.name().value();
    }

    public List<Check> checks() {
        return List.copyOf(checks);
    }

    public List<Statement> outputs() {
        return List.copyOf(outputs);
    }

    public Map<String, Series> series() {
        return Map.copyOf(series);
    }

    public List<Display> displays() {
        return List.copyOf(displays);
    }
}
