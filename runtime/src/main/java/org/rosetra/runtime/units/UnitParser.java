package org.rosetra.runtime.units;

import java.util.function.Supplier;

/**
 * Reads a unit expression such as {@code N/mm^2}, {@code kN*m} or {@code ue/degC}.
 * <pre>
 *   unit     := factor (('*' | '/') factor)*          evaluated left to right
 *   factor   := primary ('^' exponent)?
 *   primary  := SYMBOL | '1' | '(' unit ')'
 *   exponent := '-'? INT | '(' '-'? INT ('/' INT)? ')'
 * </pre>
 * So {@code N/mm/mm} is N·mm⁻², and {@code m^(1/2)} is a rational power. Spaces between
 * tokens are ignored. A lone {@code degC} or {@code degF} is an absolute temperature; in
 * any compound it is a temperature difference (see {@link Unit}).
 */
public final class UnitParser {

    private static final String SUPERSCRIPTS = "\u2070\u00B9\u00B2\u00B3\u2074\u2075\u2076\u2077\u2078\u2079\u207B";

    private final String text;
    private int position;

    private UnitParser(String text) {
        this.text = text;
    }

    /**
     * @throws UnitException if the text is not a unit expression over known symbols; it
     *                       tells where in the text the problem lies
     */
    public static Unit parse(String text) {
        if (text == null || text.isBlank()) {
            throw new UnitException("the unit is empty; write a unit such as MPa, ue or N/mm^2",
                    text == null ? "" : text, 0, text == null ? 0 : text.length(), null);
        }
        UnitParser parser = new UnitParser(text);
        Unit unit = parser.unit();
        parser.skipSpaces();
        if (!parser.atEnd() && parser.peek() == ')') {
            throw new UnitException("this ')' in the unit '" + text + "' has no matching '('; "
                    + "remove it or add a '(' before it", text, parser.position, 1, null);
        }
        if (!parser.atEnd()) {
            throw parser.unexpected("expected '*', '/' or the end of the unit");
        }
        return unit.isAffine() ? unit : unit.withSymbol(text.replaceAll("\\s+", ""));
    }

    private Unit unit() {
        int start = position;
        Unit result = factor();
        while (true) {
            skipSpaces();
            if (atEnd() || peek() == ')') {
                return result;
            }
            char operator = peek();
            if (operator != '*' && operator != '/') {
                throw unexpected(Character.isDigit(operator)
                        ? "expected '*', '/' or '^' here; write a power with '^', like mm^2"
                        : "expected '*' or '/' between units");
            }
            int operatorAt = position++;
            skipSpaces();
            if (atEnd()) {
                throw new UnitException("'" + operator + "' at the end of the unit '" + text
                        + "' has nothing after it; write a unit after it, or remove it",
                        text, operatorAt, 1, null);
            }
            Unit left = result;
            Unit right = factor();
            result = withinRange(start, () -> operator == '*' ? left.times(right) : left.over(right));
        }
    }

    private Unit factor() {
        skipSpaces();
        int start = position;
        Unit base = primary();
        skipSpaces();
        if (atEnd() || peek() != '^') {
            return base;
        }
        position++;
        skipSpaces();
        Rational power = exponent();
        return withinRange(start, () -> base.pow(power));
    }

    /** A power like GPa^100 overflows a double (or an exponent an int): say so, and where. */
    private Unit withinRange(int start, Supplier<Unit> combination) {
        try {
            return combination.get();
        } catch (ArithmeticException | IllegalArgumentException outOfRange) {
            String part = text.substring(start, position);
            throw new UnitException("the unit '" + part + "' in '" + text + "' is too large or too small "
                    + "to represent; use smaller powers", text, start, part.length(), null);
        }
    }

    private Unit primary() {
        skipSpaces();
        if (atEnd()) {
            throw new UnitException("the unit '" + text + "' ends where a unit symbol was expected; "
                    + "write a unit symbol", text, text.length(), 0, null);
        }
        char c = peek();
        if (c == '(') {
            int openAt = position++;
            Unit inner = unit();
            skipSpaces();
            if (atEnd()) {
                throw new UnitException("the '(' in the unit '" + text + "' is never closed; add a ')'",
                        text, openAt, 1, null);
            }
            position++; // the ')'
            return inner;
        }
        if (c == '%') {
            position++;
            return Units.PERCENT;
        }
        if (Character.isDigit(c)) {
            int start = position;
            while (!atEnd() && Character.isDigit(peek())) {
                position++;
            }
            String digits = text.substring(start, position);
            if (digits.equals("1")) {
                return Unit.ONE;
            }
            String hint = followsIntegerPower(start)
                    ? "; write a fractional power in parentheses, like m^(1/2)"
                    : "; only '1' may stand in a unit, as in 1/s";
            throw new UnitException("the number '" + digits + "' cannot stand in the unit '" + text
                    + "'" + hint, text, start, digits.length(), null);
        }
        if (!Character.isLetter(c)) {
            throw unexpected("expected a unit symbol");
        }
        int start = position;
        while (!atEnd() && Character.isLetter(peek())) {
            position++;
        }
        String symbol = text.substring(start, position);
        return Units.find(symbol).orElseThrow(() -> new UnitException(
                "unknown unit '" + symbol + "' in '" + text + "'; write one of the known units "
                        + "(such as MPa, ue, deg, degC, mm, kN)",
                text, start, symbol.length(), NearestSymbol.to(symbol, Units.symbols()).orElse(null)));
    }

    /** True at the '2' of "m^1/2", which was probably meant as a fractional power. */
    private boolean followsIntegerPower(int index) {
        return text.substring(0, index).matches("(?s).*\\^\\s*-?\\d+\\s*/\\s*");
    }

    private Rational exponent() {
        if (!atEnd() && peek() == '(') {
            position++;
            int numerator = integer(true);
            int denominator = 1;
            skipSpaces();
            if (!atEnd() && peek() == '/') {
                position++;
                denominator = integer(false);
                if (denominator == 0) {
                    throw new UnitException("the power in the unit '" + text + "' divides by zero; "
                            + "give a non-zero denominator", text, position - 1, 1, null);
                }
            }
            skipSpaces();
            if (atEnd() || peek() != ')') {
                throw unexpected("expected ')' to close the power");
            }
            position++;
            return Rational.of(numerator, denominator);
        }
        return Rational.of(integer(true));
    }

    private int integer(boolean signed) {
        skipSpaces();
        int start = position;
        if (signed && !atEnd() && peek() == '-') {
            position++;
        }
        int digitsStart = position;
        while (!atEnd() && Character.isDigit(peek())) {
            position++;
        }
        if (position == digitsStart) {
            position = start;
            throw unexpected("expected a whole-number power after '^', like mm^2 or s^-1");
        }
        String written = text.substring(start, position);
        try {
            return Integer.parseInt(written);
        } catch (NumberFormatException tooLarge) {
            throw new UnitException("the power " + written + " in the unit '" + text
                    + "' is too large; use a power between -2147483648 and 2147483647",
                    text, start, written.length(), null);
        }
    }

    private UnitException unexpected(String expectation) {
        if (atEnd()) {
            return new UnitException(expectation + ", but the unit '" + text + "' ends there",
                    text, text.length(), 0, null);
        }
        return new UnitException(expectation + ", found '" + peek() + "' in the unit '" + text + "'"
                + hintFor(peek()), text, position, 1, null);
    }

    /** The two characters people paste from documents: superscript powers and the degree sign. */
    private static String hintFor(char found) {
        if (SUPERSCRIPTS.indexOf(found) >= 0) {
            return "; write powers with '^', like mm^2 or s^-1";
        }
        if (found == '\u00B0') {
            return "; write degC for \u00B0C, degF for \u00B0F and deg for an angle in degrees";
        }
        return "";
    }

    private void skipSpaces() {
        while (!atEnd() && Character.isWhitespace(peek())) {
            position++;
        }
    }

    private boolean atEnd() {
        return position >= text.length();
    }

    private char peek() {
        return text.charAt(position);
    }
}
