package org.rosetra.lang.syntax;

import static org.rosetra.lang.syntax.RosetraParser.*;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.antlr.v4.runtime.BaseErrorListener;
import org.antlr.v4.runtime.Parser;
import org.antlr.v4.runtime.RecognitionException;
import org.antlr.v4.runtime.Recognizer;
import org.antlr.v4.runtime.RuleContext;
import org.antlr.v4.runtime.Token;
import org.antlr.v4.runtime.misc.IntervalSet;
import org.rosetra.lang.check.Diagnostics;

/**
 * Turns ANTLR's syntax errors into sentences about the script. Reports at most one error
 * per line: after the first, the rest of a line is usually the same mistake seen again.
 */
final class SyntaxErrorListener extends BaseErrorListener {

    private static final String STATEMENTS =
            "title, material, gauge, rosette, strain, stress, baseline, case, combine, series, "
                    + "let, check, table, plot, report, use or display";

    private final String file;
    private final Diagnostics diagnostics;
    private final Set<Integer> linesReported;

    /** @param linesReported lines already given an error (by BracketBalancer); updated */
    SyntaxErrorListener(String file, Diagnostics diagnostics, Set<Integer> linesReported) {
        this.file = file;
        this.diagnostics = diagnostics;
        this.linesReported = linesReported;
    }

    @Override
    public void syntaxError(Recognizer<?, ?> recognizer, Object offendingSymbol, int line,
            int charPositionInLine, String antlrMessage, RecognitionException e) {
        Parser parser = (Parser) recognizer;
        Token found = (Token) offendingSymbol;
        Token previous = found.getTokenIndex() > 0
                ? parser.getInputStream().get(found.getTokenIndex() - 1) : null;
        if (linesReported.contains(found.getLine())
                || previous != null && linesReported.contains(previous.getLine())) {
            return;
        }
        linesReported.add(found.getLine());
        IntervalSet expected = e != null && e.getExpectedTokens() != null
                ? e.getExpectedTokens() : parser.getExpectedTokens();
        RuleContext context = e != null && e.getCtx() != null ? e.getCtx() : parser.getContext();
        boolean atLineStart = previous == null || previous.getType() == NL;
        Explained explained = explain(found, expected, context, atLineStart);
        diagnostics.error(Spans.of(file, found), explained.message(), explained.hint());
    }

    private record Explained(String message, String hint) {
    }

    private Explained explain(Token found, IntervalSet expected, RuleContext context, boolean atLineStart) {
        int type = found.getType();
        boolean endOfLine = type == NL || type == Token.EOF;
        boolean inField = within(context, RULE_field);
        boolean inBlock = within(context, RULE_block);
        if (!endOfLine && atLineStart && context.getRuleIndex() == RULE_script) {
            String hint = type == NAME ? "a value is named with let: let " + found.getText() + " = ..."
                    : "a statement starts with " + STATEMENTS;
            return new Explained("expected a statement, found " + describe(found), hint);
        }
        if (!endOfLine && atLineStart && inBlock && !inField) {
            return new Explained("expected a field (name = value) or '}', found " + describe(found), null);
        }
        if (expected.contains(LESS) && expected.contains(GREATER_EQUAL) && !expected.contains(NL)) {
            return new Explained("a check compares with <, <=, > or >=, found " + describe(found),
                    type == ASSIGN ? "there is no equality check: write <= or >=" : null);
        }
        if (within(context, RULE_unitPower)) {
            return new Explained("a unit's power must be a number, found " + describe(found),
                    "write mm^2 or s^-1");
        }
        if (!endOfLine && expected.contains(NL)) {
            if (type == COMMA && !inBlock) {
                return new Explained("a list of values belongs in a field of a block",
                        "readings go in a case or baseline: web_top = 412, -38, -121 ue");
            }
            if (type == RBRACE) {
                return new Explained("'}' must stand on its own line, or after the last field", null);
            }
            return inBlock
                    ? new Explained("expected one field per line, found " + describe(found), null)
                    : new Explained("expected one statement per line, found " + describe(found),
                            "start a new line for the next statement");
        }
        if (expected.size() == 1 && expected.contains(ASSIGN)) {
            return new Explained("expected '=' after the name, found " + describe(found), null);
        }
        if (endOfLine) {
            return new Explained((type == NL ? "the line ends" : "the file ends")
                    + " before the " + (inField ? "field" : "statement") + " is complete: expected "
                    + describe(expected), null);
        }
        return new Explained("expected " + describe(expected) + ", found " + describe(found), null);
    }

    /** An expression is complete and could only go on with an operator: likely two on a line. */
    private static boolean isAfterCompleteValue(RuleContext context) {
        return within(context, RULE_expr) || within(context, RULE_fieldValue);
    }

    private static boolean within(RuleContext context, int ruleIndex) {
        for (RuleContext c = context; c != null; c = c.parent) {
            if (c.getRuleIndex() == ruleIndex) {
                return true;
            }
        }
        return false;
    }

    private static String describe(Token token) {
        return switch (token.getType()) {
            case Token.EOF -> "the end of the file";
            case NL -> "the end of the line";
            case STRING -> "the string " + token.getText();
            case NUMBER -> "the number " + token.getText();
            case NAME -> "'" + token.getText() + "'";
            default -> "'" + token.getText() + "'";
        };
    }

    /** The expected tokens in words: "a name", "'='", "a value". */
    private static String describe(IntervalSet expected) {
        if (expected.contains(NUMBER) && expected.contains(NAME) && expected.contains(LPAREN)) {
            return "a value";
        }
        List<String> words = new ArrayList<>();
        for (int type : expected.toArray()) {
            String word = switch (type) {
                case NAME -> "a name";
                case NUMBER -> "a number";
                case STRING -> "a string";
                case NL -> "the end of the line";
                case Token.EOF -> "the end of the file";
                default -> VOCABULARY.getLiteralName(type);
            };
            if (word != null && !words.contains(word)) {
                words.add(word);
            }
        }
        if (words.isEmpty()) {
            return "something else";
        }
        if (words.size() > 5) {
            return String.join(", ", words.subList(0, 5)) + " or another token";
        }
        return words.size() == 1 ? words.get(0)
                : String.join(", ", words.subList(0, words.size() - 1)) + " or " + words.get(words.size() - 1);
    }
}
