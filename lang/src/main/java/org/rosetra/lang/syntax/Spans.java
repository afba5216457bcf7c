package org.rosetra.lang.syntax;

import org.antlr.v4.runtime.ParserRuleContext;
import org.antlr.v4.runtime.Token;

/** Source spans of ANTLR tokens and contexts; used only inside this package. */
final class Spans {

    private Spans() {
    }

    static SourceSpan of(String file, Token token) {
        int line = token.getLine();
        int column = token.getCharPositionInLine() + 1;
        String text = token.getType() == Token.EOF ? "" : token.getText();
        int endLine = line;
        int endColumn = column + text.codePointCount(0, text.length());
        int lastBreak = text.lastIndexOf('\n');
        if (lastBreak >= 0 && token.getType() != RosetraLexer.NL) {
            endLine = line + (int) text.chars().filter(c -> c == '\n').count();
            endColumn = text.codePointCount(lastBreak + 1, text.length()) + 1;
        }
        if (token.getType() == RosetraLexer.NL || token.getType() == Token.EOF) {
            endColumn = column + 1;
        }
        return new SourceSpan(file, line, column, endLine, endColumn);
    }

    static SourceSpan of(String file, ParserRuleContext context) {
        SourceSpan first = of(file, context.getStart());
        Token stop = context.getStop();
        if (stop == null || stop.getTokenIndex() < context.getStart().getTokenIndex()) {
            return first;
        }
        return first.to(of(file, stop));
    }

    static SourceSpan between(String file, Token start, Token stop) {
        return of(file, start).to(of(file, stop));
    }
}
