package org.rosetra.lang.syntax;

import java.util.List;

/** {@code series NAME from "file.csv" { ... }}: a measured series read from a CSV file. */
public record Series(Name name, StringLit path, List<Field> fields, SourceSpan span)
        implements Statement {
    public Series {
        fields = List.copyOf(fields);
    }
}
