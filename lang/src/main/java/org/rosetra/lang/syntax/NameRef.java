package org.rosetra.lang.syntax;

/** A use of a name in a value: {@code web_top}, {@code rectangular}, {@code allowable}. */
public record NameRef(String name, SourceSpan span) implements Expr {
}
