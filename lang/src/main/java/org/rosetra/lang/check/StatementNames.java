package org.rosetra.lang.check;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.rosetra.lang.syntax.*;

/**
 * The name a statement declares, and how a session adds a cell's statements to what it
 * has: a statement that declares a name already declared replaces the old one.
 */
public final class StatementNames {

    private StatementNames() {
    }

    /** The declared name, or null for a statement that declares nothing (check, table...). */
    public static Name nameOf(Statement statement) {
        if (statement instanceof Declaration d) {
            return d.name();
        } else if (statement instanceof Baseline b) {
            return b.name();
        } else if (statement instanceof Case c) {
            return c.name();
        } else if (statement instanceof Combine c) {
            return c.name();
        } else if (statement instanceof Series s) {
            return s.name();
        } else if (statement instanceof Let l) {
            return l.name();
        }
        return null;
    }

    /**
     * The statements of {@code before} without those the cell redefines (by name, and a
     * title or report replaces the earlier one), then the cell's statements. The file of
     * the result is the cell's.
     */
    public static Script accumulate(Script before, Script cell) {
        Set<String> redefined = new HashSet<>();
        boolean newTitle = false;
        boolean newReport = false;
        for (Statement statement : cell.statements()) {
            Name name = nameOf(statement);
            if (name != null) {
                redefined.add(name.text());
            }
            newTitle |= statement instanceof Title;
            newReport |= statement instanceof Report;
        }
        List<Statement> kept = new ArrayList<>();
        for (Statement statement : before.statements()) {
            Name name = nameOf(statement);
            boolean replaced = name != null && redefined.contains(name.text())
                    || newTitle && statement instanceof Title
                    || newReport && statement instanceof Report;
            if (!replaced) {
                kept.add(statement);
            }
        }
        kept.addAll(cell.statements());
        return new Script(cell.file(), kept);
    }
}
