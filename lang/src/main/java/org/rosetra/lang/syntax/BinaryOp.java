package org.rosetra.lang.syntax;

/** The arithmetic operators. */
public enum BinaryOp {
    ADD("+"), SUBTRACT("-"), MULTIPLY("*"), DIVIDE("/"), POWER("^");

    private final String symbol;

    BinaryOp(String symbol) {
        this.symbol = symbol;
    }

    public String symbol() {
        return symbol;
    }
}
