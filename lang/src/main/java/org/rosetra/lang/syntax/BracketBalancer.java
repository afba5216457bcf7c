package org.rosetra.lang.syntax;

import static org.rosetra.lang.syntax.RosetraLexer.*;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.antlr.v4.runtime.CommonToken;
import org.antlr.v4.runtime.Token;
import org.rosetra.lang.check.Diagnostics;

/**
 * Shapes the lexer's tokens into lines before the parser sees them, so that one slip gives
 * one clear message instead of a cascade:
 * <ul>
 * <li>newlines inside {@code ( )} and {@code [ ]} are dropped (a call may span lines);</li>
 * <li>a block still open when the next statement starts (a keyword at the start of a line
 *     not followed by {@code =}) is reported and closed there;</li>
 * <li>a {@code }} with no block to close, and characters the lexer could not use, are
 *     reported and dropped; an unclosed string is reported and closed.</li>
 * </ul>
 */
final class BracketBalancer {

    private static final Set<Integer> STATEMENT_KEYWORDS = Set.of(TITLE, MATERIAL, GAUGE, ROSETTE,
            STRAIN, STRESS, BASELINE, CASE, COMBINE, SERIES, LET, CHECK, TABLE, PLOT, REPORT, USE,
            DISPLAY);

    private record OpenBlock(Token brace, String owner) {
    }

    private final String file;
    private final Diagnostics diagnostics;
    private final Set<Integer> linesReported = new HashSet<>();

    BracketBalancer(String file, Diagnostics diagnostics) {
        this.file = file;
        this.diagnostics = diagnostics;
    }

    List<Token> balance(List<? extends Token> tokens) {
        List<Token> out = new ArrayList<>(tokens.size() + 8);
        Deque<OpenBlock> blocks = new ArrayDeque<>();
        Deque<Token> brackets = new ArrayDeque<>();
        int lineStart = 0; // index in `out` of the first token of the current line
        for (int i = 0; i < tokens.size(); i++) {
            Token token = tokens.get(i);
            boolean atLineStart = out.isEmpty() || out.get(out.size() - 1).getType() == NL;
            if (atLineStart) {
                lineStart = out.size();
            }
            switch (token.getType()) {
                case STRAY -> {
                    error(Spans.of(file, token),
                            "unexpected character '" + token.getText() + "'", strayHint(token.getText()));
                    continue;
                }
                case UNCLOSED_STRING -> {
                    error(Spans.of(file, token), "string is not closed before the end of the line",
                            "add the closing '\"'");
                    CommonToken closed = new CommonToken(token);
                    closed.setType(STRING);
                    closed.setText(token.getText() + "\"");
                    out.add(closed);
                    continue;
                }
                case NL -> {
                    if (!brackets.isEmpty()) {
                        if (!startsStatement(tokens, i + 1)) {
                            continue;
                        }
                        Token open = brackets.peekLast();
                        error(Spans.of(file, open), "'" + open.getText() + "' is not closed on its line",
                                "add the closing '" + closing(open) + "'");
                        brackets.clear();
                    }
                    out.add(token);
                    continue;
                }
                case LPAREN, LBRACKET -> brackets.addLast(token);
                case RPAREN, RBRACKET -> {
                    if (!brackets.isEmpty()) {
                        brackets.removeLast();
                    }
                }
                case LBRACE -> blocks.push(new OpenBlock(token, owner(out, lineStart)));
                case RBRACE -> {
                    if (blocks.isEmpty()) {
                        error(Spans.of(file, token), "'}' has no block to close");
                        continue;
                    }
                    blocks.pop();
                }
                default -> {
                    if (atLineStart && !blocks.isEmpty() && startsStatement(tokens, i)) {
                        while (!blocks.isEmpty()) {
                            OpenBlock open = blocks.pop();
                            error(Spans.of(file, open.brace()), open.owner()
                                    + " is not closed: '}' expected before line " + token.getLine());
                            out.add(synthetic(RBRACE, "}", token));
                            out.add(synthetic(NL, "\n", token));
                        }
                    }
                }
            }
            out.add(token);
        }
        Token last = tokens.isEmpty() ? null : tokens.get(tokens.size() - 1);
        while (!blocks.isEmpty()) {
            OpenBlock open = blocks.pop();
            error(Spans.of(file, open.brace()),
                    open.owner() + " is not closed: '}' expected before the end of the file");
            out.add(synthetic(NL, "\n", last));
            out.add(synthetic(RBRACE, "}", last));
        }
        if (!brackets.isEmpty()) {
            Token open = brackets.peekLast();
            error(Spans.of(file, open), "'" + open.getText() + "' is not closed",
                    "add the closing '" + closing(open) + "'");
        }
        return out;
    }

    /** The lines given an error here, so that the parser does not report them again. */
    Set<Integer> linesReported() {
        return linesReported;
    }

    private void error(SourceSpan span, String message) {
        error(span, message, null);
    }

    private void error(SourceSpan span, String message, String hint) {
        linesReported.add(span.line());
        diagnostics.error(span, message, hint);
    }

    /** A statement keyword at index i, not used as a field name ({@code gauge = foil350}). */
    private static boolean startsStatement(List<? extends Token> tokens, int i) {
        while (i < tokens.size() && tokens.get(i).getType() == NL) {
            i++;
        }
        if (i >= tokens.size() || !STATEMENT_KEYWORDS.contains(tokens.get(i).getType())) {
            return false;
        }
        return i + 1 >= tokens.size() || tokens.get(i + 1).getType() != ASSIGN;
    }

    /** "block of material s355", from the tokens before the brace on its line. */
    private static String owner(List<Token> out, int lineStart) {
        if (lineStart < out.size() && lineStart + 1 < out.size()
                && STATEMENT_KEYWORDS.contains(out.get(lineStart).getType())) {
            return "block of " + out.get(lineStart).getText() + " " + out.get(lineStart + 1).getText();
        }
        return "block";
    }

    private static String closing(Token open) {
        return open.getType() == LPAREN ? ")" : "]";
    }

    private static String strayHint(String character) {
        return switch (character) {
            case "!" -> "checks compare with <, <=, > or >=";
            case ";" -> "put each statement on a line of its own";
            case "'" -> "strings are written in double quotes";
            default -> null;
        };
    }

    private static Token synthetic(int type, String text, Token near) {
        CommonToken token = new CommonToken(type, text);
        if (near != null) {
            token.setLine(near.getLine());
            token.setCharPositionInLine(near.getCharPositionInLine());
        } else {
            token.setLine(1);
            token.setCharPositionInLine(0);
        }
        return token;
    }
}
