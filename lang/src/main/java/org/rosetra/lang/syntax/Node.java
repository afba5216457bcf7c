package org.rosetra.lang.syntax;

/** Anything in a script that has a place in its file. */
public interface Node {
    SourceSpan span();
}
