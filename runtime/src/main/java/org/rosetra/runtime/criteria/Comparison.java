package org.rosetra.runtime.criteria;

import java.util.Optional;

/** The comparison of a check {@code LEFT op RIGHT}. */
public enum Comparison {
    LESS("<"), LESS_OR_EQUAL("<="), GREATER(">"), GREATER_OR_EQUAL(">=");

    private final String symbol;

    Comparison(String symbol) {
        this.symbol = symbol;
    }

    /** As written in a script: {@code <}, {@code <=}, {@code >}, {@code >=}. */
    public String symbol() {
        return symbol;
    }

    /** Whether {@code left op right} holds. */
    public boolean holds(double left, double right) {
        return switch (this) {
            case LESS -> left < right;
            case LESS_OR_EQUAL -> left <= right;
            case GREATER -> left > right;
            case GREATER_OR_EQUAL -> left >= right;
        };
    }

    /** True for {@code <} and {@code <=}, whose utilization is LEFT / RIGHT. */
    public boolean leftIsDemand() {
        return this == LESS || this == LESS_OR_EQUAL;
    }

    public static Optional<Comparison> bySymbol(String symbol) {
        for (Comparison c : values()) {
            if (c.symbol.equals(symbol)) {
                return Optional.of(c);
            }
        }
        return Optional.empty();
    }
}
