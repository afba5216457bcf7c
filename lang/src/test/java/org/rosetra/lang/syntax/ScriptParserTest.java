package org.rosetra.lang.syntax;

import static org.junit.jupiter.api.Assertions.*;
import static org.rosetra.lang.syntax.ParseTestSupport.*;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.rosetra.lang.check.Diagnostics;

/** Every form of LANGUAGE.md parses to the records it means. */
class ScriptParserTest {

    @Test
    void everyCodeBlockOfTheLanguageReferenceParses() {
        // LANGUAGE.md, every code block except the JSON one, copied into the fixture.
        String text = resource("language-examples.strain");
        Diagnostics diagnostics = new Diagnostics();
        Script script = parse(text, diagnostics);
        assertFalse(diagnostics.hasErrors(), () -> diagnostics.render(f -> text));
        assertEquals(20, script.statements().size());
    }

    @Test
    void materialBlockHoldsItsFields() {
        // LANGUAGE.md, section "Declarations".
        Declaration material = (Declaration) only("""
                material s355 {
                  E        = 205 GPa
                  nu       = 0.29
                  yield    = 355 MPa
                }
                """);
        assertEquals(Declaration.Kind.MATERIAL, material.kind());
        assertEquals("s355", material.name().text());
        assertEquals(List.of("E", "nu", "yield"),
                material.fields().stream().map(f -> f.name().text()).toList());
        QuantityLit e = (QuantityLit) material.fields().get(0).value();
        assertEquals(205, e.value());
        assertEquals("GPa", e.unitText());
        assertEquals(new NumberLit(0.29, new SourceSpan("test.strain", 3, 14, 3, 18)),
                material.fields().get(1).value());
    }

    @Test
    void readingListTakesOneTrailingUnit() {
        // LANGUAGE.md, section "Quantities and units": a list of readings takes one trailing unit.
        Declaration gauge = (Declaration) only("""
                gauge foil350 {
                  factor  = 2.09
                  thermal = -21.5, 2.10, -0.0430, 0.000155, 0 ue
                }
                """);
        ReadingList thermal = (ReadingList) gauge.fields().get(1).value();
        assertEquals(List.of(-21.5, 2.10, -0.0430, 0.000155, 0.0), thermal.values());
        assertEquals("ue", thermal.unitText());
        assertEquals(new SourceSpan("test.strain", 3, 47, 3, 49), thermal.unitSpan());
    }

    @Test
    void readingListMayGoOnAfterAComma() {
        // Our own design: a reading list continues on the next line after a comma.
        Case loadCase = (Case) only("""
                case proof from unloaded {
                  web_top = 412, -38,
                            -121 ue
                }
                """);
        assertEquals("unloaded", loadCase.from().text());
        assertEquals(List.of(412.0, -38.0, -121.0), ((ReadingList) loadCase.fields().get(0).value()).values());
    }

    @Test
    void rosetteFieldsMayBeSpelledLikeKeywords() {
        // LANGUAGE.md, section "Declarations": rosette fields gauge and material.
        Declaration rosette = (Declaration) only("""
                rosette web_top {
                  layout   = arms(0 deg, 30 deg, 90 deg)
                  gauge    = foil350
                  material = s355
                  state    = plane_stress
                }
                """);
        Call layout = (Call) rosette.fields().get(0).value();
        assertEquals("arms", layout.function().text());
        assertEquals(3, layout.args().size());
        assertEquals(new NameRef("foil350", new SourceSpan("test.strain", 3, 14, 3, 21)),
                rosette.fields().get(1).value());
    }

    @Test
    void combineFoldsSignsIntoFactors() {
        // LANGUAGE.md, section "Readings": combine NAME = k1 * CASE1 + k2 * CASE2.
        Combine combine = (Combine) only("combine service = 0.6 * proof_60kN - 1.2 * other + wind");
        assertEquals(List.of(0.6, -1.2, 1.0), combine.terms().stream()
                .map(t -> ((NumberLit) t.factor()).value()).toList());
        assertEquals(List.of("proof_60kN", "other", "wind"),
                combine.terms().stream().map(t -> t.caseName().text()).toList());
    }

    @Test
    void seriesColumnsZeroWindowAndSeparators() {
        // LANGUAGE.md, section "Measured series"; delimiter and decimal are our own fields.
        Series series = (Series) only("""
                series hoist_run from "data/hoist-run.csv" {
                  time        = "t_s" s
                  web_top     = "g1", "g2", "g3" ue
                  temperature = "temp_c" degC
                  zero        = 0 s to 2 s
                  delimiter   = ";"
                  decimal     = ","
                }
                """);
        assertEquals("data/hoist-run.csv", series.path().value());
        StringList time = (StringList) series.fields().get(0).value();
        assertEquals("t_s", time.items().get(0).value());
        assertEquals("s", time.unitText());
        StringList arms = (StringList) series.fields().get(1).value();
        assertEquals(List.of("g1", "g2", "g3"), arms.items().stream().map(StringLit::value).toList());
        assertEquals("ue", arms.unitText());
        Range zero = (Range) series.fields().get(3).value();
        assertEquals("s", ((QuantityLit) zero.to()).unitText());
        assertEquals(";", ((StringLit) series.fields().get(4).value()).value());
    }

    @Test
    void zeroMayNameABaseline() {
        // LANGUAGE.md, section "Measured series": zero is a window or a baseline's name.
        Series series = (Series) only("series s from \"x.csv\" {\n  zero = unloaded\n}");
        assertInstanceOf(NameRef.class, series.fields().get(0).value());
    }

    @Test
    void unitAfterANumberVersusArithmetic() {
        // The grammar's rule on units after a number (Rosetra.g4, header comment).
        assertInstanceOf(Binary.class, expr("2 * x"));
        QuantityLit twoMpa = (QuantityLit) expr("2 MPa");
        assertEquals("MPa", twoMpa.unitText());
        Binary yieldOver = (Binary) expr("s355.yield / 1.5");
        assertInstanceOf(Member.class, yieldOver.left());
        assertInstanceOf(NumberLit.class, yieldOver.right());
        Binary maxOver = (Binary) expr("max(a) / 2 MPa");
        assertInstanceOf(Call.class, maxOver.left());
        assertEquals("MPa", ((QuantityLit) maxOver.right()).unitText());
        Binary times = (Binary) expr("205 GPa * 2");
        assertEquals(BinaryOp.MULTIPLY, times.op());
        assertEquals("GPa", ((QuantityLit) times.left()).unitText());
        assertEquals("N/mm^2", ((QuantityLit) expr("100 N/mm^2")).unitText());
        assertEquals("kN*m", ((QuantityLit) expr("3 kN * m")).unitText());
        assertEquals("ue/degC", ((QuantityLit) expr("2 ue/degC")).unitText());
        assertEquals("%", ((QuantityLit) expr("0.9 %")).unitText());
        Binary perX = (Binary) expr("2 MPa * x");
        assertEquals("MPa", ((QuantityLit) perX.left()).unitText());
        Binary minCall = (Binary) expr("5 MPa * min(x)");
        assertInstanceOf(Call.class, minCall.right());
    }

    @Test
    void microstrainSignInBothSpellings() {
        // LANGUAGE.md, section "Quantities and units": µε; accept U+00B5 and U+03BC.
        assertEquals("\u00B5\u03B5", ((QuantityLit) expr("412 \u00B5\u03B5")).unitText());
        assertEquals("\u03BC\u03B5", ((QuantityLit) expr("412 \u03BC\u03B5")).unitText());
    }

    @Test
    void numbersInEveryWrittenForm() {
        // LANGUAGE.md, section "Lexical rules": 412, -38.5, 2.1e-3.
        assertEquals(412, ((NumberLit) expr("412")).value());
        assertEquals(-38.5, ((NumberLit) expr("-38.5")).value());
        assertEquals(2.1e-3, ((NumberLit) expr("2.1e-3")).value());
    }

    @Test
    void precedenceOfOperators() {
        // LANGUAGE.md, section "Expressions": + - * / ^ and unary minus (usual precedence).
        Binary sum = (Binary) expr("1 + 2 * 3 ^ 2");
        assertEquals(BinaryOp.ADD, sum.op());
        Binary product = (Binary) sum.right();
        assertEquals(BinaryOp.MULTIPLY, product.op());
        assertEquals(BinaryOp.POWER, ((Binary) product.right()).op());
        Negate negate = (Negate) expr("-x ^ 2");
        assertEquals(BinaryOp.POWER, ((Binary) negate.operand()).op());
        Binary power = (Binary) expr("2 ^ 3 ^ 2");
        assertInstanceOf(Binary.class, power.right());
    }

    @Test
    void membersAndIndexes() {
        // LANGUAGE.md, sections "Expressions" and "Measured series".
        Index index = (Index) expr("web_top.von_mises[hoist_run]");
        assertEquals("hoist_run", index.caseName().text());
        Member member = (Member) index.target();
        assertEquals("von_mises", member.member().text());
        Call call = (Call) expr("strain_at(r, 30 deg)");
        assertEquals("strain_at", call.function().text());
    }

    @Test
    void stringEscapes() {
        // LANGUAGE.md, section "Lexical rules": \" and \\ escapes.
        Title title = (Title) only("title \"a \\\"quoted\\\" back\\\\slash\"");
        assertEquals("a \"quoted\" back\\slash", title.text().value());
    }

    @Test
    void functionsAndChecks() {
        // LANGUAGE.md, section "Expressions, values and checks".
        Let ratio = (Let) only("let ratio(a, b) = a / b");
        assertTrue(ratio.isFunction());
        assertEquals(List.of("a", "b"), ratio.params().stream().map(p -> p.name().text()).toList());
        Check check = (Check) only("check \"web yield margin\": web_top.von_mises <= allowable");
        assertEquals("web yield margin", check.label().value());
        assertEquals(ComparisonOp.LESS_OR_EQUAL, check.op());
    }

    @Test
    void javaBodiedFunctionIsKeptRaw() {
        // Our own design: let f(x: stress): stress = java { ... } holds the body raw.
        Let let = (Let) only("let f(x: stress): stress = java { return x * 2; }");
        assertEquals("stress", let.params().get(0).dimension().text());
        assertEquals("stress", let.resultDimension().text());
        assertEquals(" return x * 2; ", ((JavaCode) let.body()).source());
    }

    @Test
    void outputs() {
        // LANGUAGE.md, section "Outputs".
        assertEquals(PlotKind.MOHR, ((Plot) only("plot mohr web_top[proof_60kN]")).kind());
        assertEquals(PlotKind.DIRECTIONS, ((Plot) only("plot directions web_top[proof_60kN]")).kind());
        assertEquals(PlotKind.VALUE, ((Plot) only("plot web_top.von_mises")).kind());
        assertEquals(2, ((Table) only("table web_top, web_low")).items().size());
        assertEquals("hb3-record", ((Report) only("report \"hb3-record\"")).name().value());
    }

    @Test
    void useAndDisplay() {
        // Our own design for use (module or file) and display units.
        assertEquals("steels", ((Use) only("use steels")).module().text());
        assertEquals("mine.strain", ((Use) only("use \"mine.strain\"")).path().value());
        Display us = (Display) only("display us");
        assertTrue(us.isUnitSet());
        Display stress = (Display) only("display stress = ksi");
        assertEquals("stress", stress.subject().text());
        assertEquals("ksi", stress.unitText());
    }

    @Test
    void spansPointAtTheirText() {
        // Round trip: every span's text is the text the record came from.
        String text = "let allowable = s355.yield / 1.5   # a comment\n";
        Let let = (Let) only(text);
        assertEquals("allowable", cut(text, let.name().span()));
        assertEquals("s355.yield / 1.5", cut(text, let.body().span()));
        Binary body = (Binary) let.body();
        assertEquals("s355.yield", cut(text, body.left().span()));
        assertEquals("yield", cut(text, ((Member) body.left()).member().span()));
        assertEquals("let allowable = s355.yield / 1.5", cut(text, let.span()));
    }

    @Test
    void completeness() {
        // Our own design for the REPL: an open block or parenthesis asks for more.
        assertFalse(ScriptParser.isComplete("material s355 {\n  E = 205 GPa\n"));
        assertFalse(ScriptParser.isComplete("let a = max(x,\n"));
        assertFalse(ScriptParser.isComplete("  web_top = 412, -38,"));
        assertTrue(ScriptParser.isComplete("material s355 {\n  E = 205 GPa\n}\n"));
        assertTrue(ScriptParser.isComplete("let a = 2 MPa"));
    }

    @Test
    void aBareValueForACell() {
        // Our own design for the REPL and notebook: a cell may ask to see one value.
        Diagnostics diagnostics = new Diagnostics();
        Expr value = ScriptParser.parseExpression("cell", "web_top.sigma_1[proof_60kN]\n", diagnostics);
        assertInstanceOf(Index.class, value);
        assertFalse(diagnostics.hasErrors());
        assertNull(ScriptParser.parseExpression("cell", "2 *", diagnostics));
        assertTrue(diagnostics.hasErrors());
    }

    /** The text a single-line span covers. */
    static String cut(String text, SourceSpan span) {
        String line = text.split("\n", -1)[span.line() - 1];
        return line.substring(span.column() - 1, span.endColumn() - 1);
    }
}
