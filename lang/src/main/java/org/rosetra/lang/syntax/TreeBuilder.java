package org.rosetra.lang.syntax;

import static org.rosetra.lang.syntax.RosetraParser.*;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.antlr.v4.runtime.ParserRuleContext;
import org.antlr.v4.runtime.Token;
import org.antlr.v4.runtime.tree.ErrorNode;
import org.antlr.v4.runtime.tree.ParseTree;
import org.antlr.v4.runtime.tree.TerminalNode;
import org.rosetra.lang.check.Diagnostics;
import org.rosetra.lang.check.NearestName;

/**
 * Turns ANTLR's parse tree into the syntax records. The only class that sees ANTLR's
 * contexts. A statement (or a field) that the parser could not read whole is left out:
 * its error is already reported, and the later passes see only complete records.
 */
final class TreeBuilder {

    private static final String READING_LIST_HINT =
            "write the unit once, after the last reading: 412, -38, -121 ue";

    private final String file;
    private final Diagnostics diagnostics;

    TreeBuilder(String file, Diagnostics diagnostics) {
        this.file = file;
        this.diagnostics = diagnostics;
    }

    Script script(ScriptContext context) {
        List<Statement> statements = new ArrayList<>();
        for (StatementContext statement : context.statement()) {
            if (isWhole(statement, true)) {
                Statement built = statement(statement);
                if (built != null) {
                    statements.add(built);
                }
            }
        }
        return new Script(file, statements);
    }

    /** The value of an expression cell, or null when it could not be read whole. */
    Expr expression(ExpressionCellContext context) {
        return isWhole(context, false) ? expr(context.expr()) : null;
    }

    private Statement statement(StatementContext context) {
        SourceSpan span = span(context);
        if (context instanceof TitleStatementContext title) {
            return new Title(string(title.STRING().getSymbol()), span);
        }
        if (context instanceof DeclarationStatementContext declaration) {
            Declaration.Kind kind = Declaration.Kind.valueOf(
                    declaration.kind.getText().toUpperCase(Locale.ROOT));
            return new Declaration(kind, name(declaration.NAME()), fields(declaration.block()), span);
        }
        if (context instanceof BaselineStatementContext baseline) {
            return new Baseline(name(baseline.NAME()), fields(baseline.block()), span);
        }
        if (context instanceof CaseStatementContext loadCase) {
            Name from = loadCase.from == null ? null : name(loadCase.from);
            return new Case(name(loadCase.NAME(0)), from, fields(loadCase.block()), span);
        }
        if (context instanceof CombineStatementContext combine) {
            return combine(combine, span);
        }
        if (context instanceof SeriesStatementContext series) {
            return new Series(name(series.NAME()), string(series.STRING().getSymbol()),
                    fields(series.block()), span);
        }
        if (context instanceof LetStatementContext let) {
            return let(let, span);
        }
        if (context instanceof CheckStatementContext check) {
            return new Check(string(check.STRING().getSymbol()), expr(check.expr(0)),
                    comparison(check.comparison()), expr(check.expr(1)), span);
        }
        if (context instanceof TableStatementContext table) {
            return new Table(table.expr().stream().map(this::expr).toList(), span);
        }
        if (context instanceof PlotStatementContext plot) {
            return plot(plot, span);
        }
        if (context instanceof ReportStatementContext report) {
            return new Report(string(report.STRING().getSymbol()), span);
        }
        if (context instanceof UseStatementContext use) {
            return use.NAME() != null
                    ? new Use(name(use.NAME()), null, span)
                    : new Use(null, string(use.STRING().getSymbol()), span);
        }
        if (context instanceof DisplayStatementContext display) {
            UnitContext unit = display.unit();
            return new Display(anyName(display.anyName()), unit == null ? null : unit.getText(),
                    unit == null ? null : span(unit), span);
        }
        throw new IllegalStateException("no record for " + context.getClass().getSimpleName());
    }

    private Combine combine(CombineStatementContext context, SourceSpan span) {
        List<Term> terms = new ArrayList<>();
        for (int i = 0; i < context.combineTerm().size(); i++) {
            CombineTermContext term = context.combineTerm(i);
            double sign = term.MINUS() != null ? -1 : 1;
            if (i > 0 && context.combineSign(i - 1).MINUS() != null) {
                sign = -sign;
            }
            double factor = term.NUMBER() == null ? 1 : Double.parseDouble(term.NUMBER().getText());
            SourceSpan termSpan = span(term);
            terms.add(new Term(new NumberLit(sign * factor, termSpan), name(term.NAME()), termSpan));
        }
        return new Combine(name(context.NAME()), terms, span);
    }

    private Let let(LetStatementContext context, SourceSpan span) {
        List<Param> params = new ArrayList<>();
        for (ParamContext param : context.param()) {
            Name dimension = param.anyName() == null ? null : anyName(param.anyName());
            params.add(new Param(name(param.NAME()), dimension, span(param)));
        }
        Expr body;
        if (context.JAVA_BLOCK() != null) {
            String text = context.JAVA_BLOCK().getText();
            String inside = text.substring(text.indexOf('{') + 1, text.length() - 1);
            body = new JavaCode(inside, span(context.JAVA_BLOCK().getSymbol()));
        } else {
            body = expr(context.expr());
        }
        Name result = context.result == null ? null : anyName(context.result);
        return new Let(name(context.NAME()), params, body, result, span);
    }

    private Plot plot(PlotStatementContext context, SourceSpan span) {
        Expr target = expr(context.expr());
        if (context.kind == null) {
            return new Plot(PlotKind.VALUE, target, span);
        }
        String kind = context.kind.getText();
        return switch (kind) {
            case "mohr" -> new Plot(PlotKind.MOHR, target, span);
            case "directions" -> new Plot(PlotKind.DIRECTIONS, target, span);
            default -> {
                String hint = NearestName.hint(kind, List.of("mohr", "directions"));
                diagnostics.error(span(context.kind), "unknown kind of plot '" + kind + "'",
                        hint != null ? hint : "write plot mohr X, plot directions X, or plot VALUE");
                yield new Plot(PlotKind.VALUE, target, span);
            }
        };
    }

    private List<Field> fields(BlockContext block) {
        List<Field> fields = new ArrayList<>();
        for (FieldContext field : block.field()) {
            if (isWhole(field, false)) {
                fields.add(new Field(anyName(field.anyName()), fieldValue(field.fieldValue()), span(field)));
            }
        }
        return fields;
    }

    private Expr fieldValue(FieldValueContext context) {
        List<Expr> items = context.expr().stream().map(this::expr).toList();
        if (context.TO() != null) {
            return new Range(items.get(0), items.get(1), span(context));
        }
        if (items.size() == 1) {
            return items.get(0);
        }
        SourceSpan span = span(context);
        if (items.stream().allMatch(item -> item instanceof StringLit || item instanceof StringList)) {
            return stringList(items, span);
        }
        return readingList(items, span);
    }

    private ReadingList readingList(List<Expr> items, SourceSpan span) {
        List<Double> values = new ArrayList<>();
        String unitText = null;
        SourceSpan unitSpan = null;
        for (int i = 0; i < items.size(); i++) {
            Expr item = items.get(i);
            boolean last = i == items.size() - 1;
            if (item instanceof NumberLit number) {
                values.add(number.value());
            } else if (item instanceof QuantityLit quantity) {
                values.add(quantity.value());
                if (last) {
                    unitText = quantity.unitText();
                    unitSpan = quantity.unitSpan();
                } else {
                    diagnostics.error(quantity.unitSpan(), "a reading list takes one unit at its end",
                            READING_LIST_HINT);
                }
            } else {
                diagnostics.error(item.span(), "a list of readings holds numbers only",
                        "name a value with let, or write the reading itself");
            }
        }
        return new ReadingList(values, unitText, unitSpan, span);
    }

    private StringList stringList(List<Expr> items, SourceSpan span) {
        List<StringLit> strings = new ArrayList<>();
        String unitText = null;
        SourceSpan unitSpan = null;
        for (int i = 0; i < items.size(); i++) {
            Expr item = items.get(i);
            if (item instanceof StringLit string) {
                strings.add(string);
            } else if (item instanceof StringList withUnit) {
                strings.addAll(withUnit.items());
                if (i == items.size() - 1) {
                    unitText = withUnit.unitText();
                    unitSpan = withUnit.unitSpan();
                } else {
                    diagnostics.error(withUnit.unitSpan(), "a list of columns takes one unit at its end",
                            "write the unit once, after the last column: \"g1\", \"g2\", \"g3\" ue");
                }
            }
        }
        return new StringList(strings, unitText, unitSpan, span);
    }

    private Expr expr(ExprContext context) {
        SourceSpan span = span(context);
        if (context instanceof NumberExprContext number) {
            double value = Double.parseDouble(number.NUMBER().getText());
            UnitContext unit = number.unit();
            return unit == null ? new NumberLit(value, span)
                    : new QuantityLit(value, unit.getText(), span(unit), span);
        }
        if (context instanceof StringExprContext string) {
            StringLit text = string(string.STRING().getSymbol());
            UnitContext unit = string.unit();
            return unit == null ? text : new StringList(List.of(text), unit.getText(), span(unit), span);
        }
        if (context instanceof NameExprContext name) {
            return new NameRef(name.NAME().getText(), span);
        }
        if (context instanceof CallExprContext call) {
            return new Call(name(call.NAME()), call.expr().stream().map(this::expr).toList(), span);
        }
        if (context instanceof ParenExprContext paren) {
            return expr(paren.expr());
        }
        if (context instanceof MemberExprContext member) {
            return new Member(expr(member.expr()), anyName(member.anyName()), span);
        }
        if (context instanceof IndexExprContext index) {
            return new Index(expr(index.expr()), name(index.NAME()), span);
        }
        if (context instanceof NegateExprContext negate) {
            Expr operand = expr(negate.expr());
            if (operand instanceof NumberLit number) {
                return new NumberLit(-number.value(), span);
            }
            if (operand instanceof QuantityLit quantity) {
                return new QuantityLit(-quantity.value(), quantity.unitText(), quantity.unitSpan(), span);
            }
            return new Negate(operand, span);
        }
        if (context instanceof PowerExprContext power) {
            return new Binary(BinaryOp.POWER, expr(power.expr(0)), expr(power.expr(1)), span);
        }
        if (context instanceof ProductExprContext product) {
            BinaryOp op = product.op.getType() == STAR ? BinaryOp.MULTIPLY : BinaryOp.DIVIDE;
            return new Binary(op, expr(product.expr(0)), expr(product.expr(1)), span);
        }
        if (context instanceof SumExprContext sum) {
            BinaryOp op = sum.op.getType() == PLUS ? BinaryOp.ADD : BinaryOp.SUBTRACT;
            return new Binary(op, expr(sum.expr(0)), expr(sum.expr(1)), span);
        }
        throw new IllegalStateException("no record for " + context.getClass().getSimpleName());
    }

    private static ComparisonOp comparison(ComparisonContext context) {
        return switch (context.getStart().getType()) {
            case LESS -> ComparisonOp.LESS;
            case LESS_EQUAL -> ComparisonOp.LESS_OR_EQUAL;
            case GREATER -> ComparisonOp.GREATER;
            default -> ComparisonOp.GREATER_OR_EQUAL;
        };
    }

    private StringLit string(Token token) {
        String text = token.getText();
        String inside = text.substring(1, Math.max(1, text.length() - 1));
        StringBuilder value = new StringBuilder(inside.length());
        for (int i = 0; i < inside.length(); i++) {
            char c = inside.charAt(i);
            if (c == '\\' && i + 1 < inside.length()) {
                char escaped = inside.charAt(++i);
                value.append(switch (escaped) {
                    case 'n' -> '\n';
                    case 't' -> '\t';
                    default -> escaped;
                });
            } else {
                value.append(c);
            }
        }
        return new StringLit(value.toString(), span(token));
    }

    private Name name(TerminalNode node) {
        return name(node.getSymbol());
    }

    private Name name(Token token) {
        return new Name(token.getText(), span(token));
    }

    private Name anyName(AnyNameContext context) {
        return name(context.getStart());
    }

    private SourceSpan span(Token token) {
        return Spans.of(file, token);
    }

    private SourceSpan span(ParserRuleContext context) {
        return Spans.of(file, context);
    }

    /**
     * True when the parser read this subtree without an error or a repair. With
     * {@code skipBlocks} the fields of a block are left to be judged one by one, so one bad
     * field does not lose its whole declaration.
     */
    private static boolean isWhole(ParseTree tree, boolean skipBlocks) {
        if (tree instanceof ErrorNode) {
            return false;
        }
        if (skipBlocks && tree instanceof BlockContext) {
            return true;
        }
        if (tree instanceof ParserRuleContext context) {
            if (context.exception != null) {
                return false;
            }
            for (int i = 0; i < context.getChildCount(); i++) {
                if (!isWhole(context.getChild(i), skipBlocks)) {
                    return false;
                }
            }
        }
        return true;
    }
}
