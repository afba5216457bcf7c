package org.rosetra.lang.syntax;

/** The comparisons a check can make. */
public enum ComparisonOp {
    LESS("<"), LESS_OR_EQUAL("<="), GREATER(">"), GREATER_OR_EQUAL(">=");

    private final String symbol;

    ComparisonOp(String symbol) {
        this.symbol = symbol;
    }

    public String symbol() {
        return symbol;
    }

    /** True for {@code <} and {@code <=}: utilization is then LEFT / RIGHT. */
    public boolean isUpperLimit() {
        return this == LESS || this == LESS_OR_EQUAL;
    }
}
