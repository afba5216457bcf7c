package org.rosetra.lang.syntax;

import java.util.List;

/** {@code f(a, b)}: a built-in, a function a script defined, or {@code arms(...)}. */
public record Call(Name function, List<Expr> args, SourceSpan span) implements Expr {
    public Call {
        args = List.copyOf(args);
    }
}
