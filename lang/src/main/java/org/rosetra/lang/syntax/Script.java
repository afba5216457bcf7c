package org.rosetra.lang.syntax;

import java.util.List;

/** A whole parsed file (or notebook cell): its statements in the order written. */
public record Script(String file, List<Statement> statements) {
    public Script {
        statements = List.copyOf(statements);
    }
}
