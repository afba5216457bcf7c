package org.rosetra.lang.syntax;

import java.util.List;

/** {@code material|gauge|rosette|strain|stress NAME { field = value ... }}. */
public record Declaration(Kind kind, Name name, List<Field> fields, SourceSpan span)
        implements Statement {

    public Declaration {
        fields = List.copyOf(fields);
    }

    /** What a declaration declares; {@link #keyword()} is how a script spells it. */
    public enum Kind {
        MATERIAL, GAUGE, ROSETTE, STRAIN, STRESS;

        public String keyword() {
            return name().toLowerCase(java.util.Locale.ROOT);
        }
    }
}
