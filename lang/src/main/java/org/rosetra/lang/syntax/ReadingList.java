package org.rosetra.lang.syntax;

import java.util.List;

/**
 * Readings with one trailing unit for every item: {@code 412, -38, -121 ue}.
 * {@code unitText} and {@code unitSpan} are null when the list has no unit.
 */
public record ReadingList(List<Double> values, String unitText, SourceSpan unitSpan, SourceSpan span)
        implements Expr {
    public ReadingList {
        values = List.copyOf(values);
    }
}
