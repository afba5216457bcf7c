package org.rosetra.lang.syntax;

/**
 * The body of a Java-bodied function, {@code java { ... }}: the text between the braces,
 * kept raw for the Java bridge.
 */
public record JavaCode(String source, SourceSpan span) implements Expr {
}
