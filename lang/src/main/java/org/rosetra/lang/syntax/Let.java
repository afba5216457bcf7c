package org.rosetra.lang.syntax;

import java.util.List;

/**
 * {@code let NAME = EXPR} (no parameters) or {@code let NAME(p, q) = EXPR} (a function).
 * {@code resultDimension} is the optional {@code : stress} after the parameters (null when
 * absent); a Java-bodied function has a {@link JavaCode} body.
 */
public record Let(Name name, List<Param> params, Expr body, Name resultDimension, SourceSpan span)
        implements Statement {

    public Let {
        params = List.copyOf(params);
    }

    public boolean isFunction() {
        return !params.isEmpty() || body instanceof JavaCode;
    }
}
