package org.rosetra.lang.syntax;

/** A parameter of a function, with its optional dimension ({@code x: stress}; else null). */
public record Param(Name name, Name dimension, SourceSpan span) implements Node {
}
