package org.rosetra.lang.syntax;

import static org.rosetra.lang.syntax.RosetraLexer.*;

import java.util.List;
import java.util.function.Function;
import java.util.function.Predicate;
import org.antlr.v4.runtime.BailErrorStrategy;
import org.antlr.v4.runtime.CharStreams;
import org.antlr.v4.runtime.CommonTokenStream;
import org.antlr.v4.runtime.DefaultErrorStrategy;
import org.antlr.v4.runtime.ListTokenSource;
import org.antlr.v4.runtime.Token;
import org.antlr.v4.runtime.atn.PredictionMode;
import org.antlr.v4.runtime.misc.ParseCancellationException;
import org.rosetra.lang.check.Diagnostics;

/**
 * The front door of the syntax package: text in, {@link Script} out, every syntax error in
 * the {@link Diagnostics}. Stateless; safe to call from several threads.
 */
public final class ScriptParser {

    private ScriptParser() {
    }

    /** Parses a whole file; on errors the script holds every statement that could be read. */
    public static Script parse(String fileName, String text, Diagnostics diagnostics) {
        return parse(fileName, text, diagnostics, UnitSymbols.core());
    }

    /** As {@link #parse(String, String, Diagnostics)}, with the unit table to consult. */
    public static Script parse(String fileName, String text, Diagnostics diagnostics,
            Predicate<String> unitSymbols) {
        return new TreeBuilder(fileName, diagnostics)
                .script(run(fileName, text, diagnostics, unitSymbols, RosetraParser::script));
    }

    /**
     * Parses a bare value such as {@code web_top.sigma_1[proof]}, for a REPL or notebook cell
     * that asks to see one; null when it has a syntax error (reported).
     */
    public static Expr parseExpression(String cellName, String text, Diagnostics diagnostics) {
        return new TreeBuilder(cellName, diagnostics)
                .expression(run(cellName, text, diagnostics, UnitSymbols.core(), RosetraParser::expressionCell));
    }

    private static <T> T run(String fileName, String text, Diagnostics diagnostics,
            Predicate<String> unitSymbols, Function<RosetraParser, T> rule) {
        RosetraLexer lexer = new RosetraLexer(CharStreams.fromString(text, fileName));
        lexer.removeErrorListeners();
        List<? extends Token> raw = lexer.getAllTokens();
        BracketBalancer balancer = new BracketBalancer(fileName, diagnostics);
        List<Token> tokens = balancer.balance(raw);
        CommonTokenStream stream = new CommonTokenStream(new ListTokenSource(tokens, fileName));
        RosetraParser parser = new RosetraParser(stream);
        parser.unitSymbols = unitSymbols;
        parser.removeErrorListeners();
        // SLL is fast and right for nearly every script; only when it fails do we pay for
        // full LL, which also gives the exact error.
        parser.getInterpreter().setPredictionMode(PredictionMode.SLL);
        parser.setErrorHandler(new BailErrorStrategy());
        try {
            return rule.apply(parser);
        } catch (ParseCancellationException sllFailed) {
            stream.seek(0);
            parser.reset();
            parser.getInterpreter().setPredictionMode(PredictionMode.LL);
            parser.setErrorHandler(new DefaultErrorStrategy());
            parser.addErrorListener(new SyntaxErrorListener(fileName, diagnostics, balancer.linesReported()));
            return rule.apply(parser);
        }
    }

    /**
     * Parses one notebook or REPL cell; line numbers count from the cell's first line and
     * spans name {@code cellName} as their file.
     */
    public static Script parseCell(String cellName, String text, Diagnostics diagnostics) {
        return parse(cellName, text, diagnostics);
    }

    /**
     * False while the text leaves a block, a parenthesis or a bracket open, or ends with a
     * comma or an operator (a reading list or a sum that goes on): the REPL then asks for
     * another line. Syntax errors do not make a text incomplete.
     */
    public static boolean isComplete(String text) {
        RosetraLexer lexer = new RosetraLexer(CharStreams.fromString(text));
        lexer.removeErrorListeners();
        int depth = 0;
        int lastType = NL;
        for (Token token : lexer.getAllTokens()) {
            switch (token.getType()) {
                case LBRACE, LPAREN, LBRACKET -> depth++;
                case RBRACE, RPAREN, RBRACKET -> depth = Math.max(0, depth - 1);
                default -> { }
            }
            if (token.getType() != NL) {
                lastType = token.getType();
            }
        }
        boolean continues = lastType == COMMA || lastType == PLUS || lastType == MINUS
                || lastType == STAR || lastType == SLASH || lastType == CARET || lastType == ASSIGN;
        return depth == 0 && !continues;
    }
}
