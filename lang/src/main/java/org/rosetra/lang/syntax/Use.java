package org.rosetra.lang.syntax;

/**
 * {@code use NAME} (a standard-library module) or {@code use "file.strain"} (a file next to
 * the script). Exactly one of {@code module} and {@code path} is non-null.
 */
public record Use(Name module, StringLit path, SourceSpan span) implements Statement {
}
