package org.rosetra.lang.syntax;

import java.util.List;

/**
 * Column names of a series with their unit: {@code "g1", "g2", "g3" ue} or
 * {@code "t_s" s}. Also any list of two or more strings; {@code unitText} is then null.
 */
public record StringList(List<StringLit> items, String unitText, SourceSpan unitSpan, SourceSpan span)
        implements Expr {
    public StringList {
        items = List.copyOf(items);
    }
}
