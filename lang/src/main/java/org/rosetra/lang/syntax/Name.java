package org.rosetra.lang.syntax;

/** A name as written: a declaration's name, a field's name, a member, a case. */
public record Name(String text, SourceSpan span) implements Node {
    @Override
    public String toString() {
        return text;
    }
}
