package org.rosetra.lang.check;

import org.rosetra.lang.syntax.Name;
import org.rosetra.lang.syntax.Statement;

/** A declared name: what it is and the statement that declares it. */
public record Symbol(Name name, SymbolKind kind, Statement statement) {

    public String text() {
        return name.text();
    }
}
