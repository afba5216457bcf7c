package org.rosetra.lang.syntax;

/**
 * A number with its unit: {@code 205 GPa}, {@code 2 N/mm^2}. {@code unitText} is the unit
 * with the spaces taken out ("N/mm^2"), ready for the unit parser; {@code unitSpan} is where
 * it was written.
 */
public record QuantityLit(double value, String unitText, SourceSpan unitSpan, SourceSpan span)
        implements Expr {
}
