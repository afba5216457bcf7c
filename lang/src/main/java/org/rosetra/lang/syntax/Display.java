package org.rosetra.lang.syntax;

/**
 * Display units for the record. {@code display us} / {@code display si} pick a whole set
 * ({@code unitText} null); {@code display stress = ksi} picks the unit of one dimension
 * ({@code subject} is the dimension's name).
 */
public record Display(Name subject, String unitText, SourceSpan unitSpan, SourceSpan span)
        implements Statement {

    public boolean isUnitSet() {
        return unitText == null;
    }
}
