package org.rosetra.lang.syntax;

import java.util.List;

/** {@code case NAME [from BASELINE] { ... }}: one load case; {@code from} may be null. */
public record Case(Name name, Name from, List<Field> fields, SourceSpan span) implements Statement {
    public Case {
        fields = List.copyOf(fields);
    }
}
