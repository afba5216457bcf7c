package org.rosetra.lang.syntax;

import static org.junit.jupiter.api.Assertions.*;
import static org.rosetra.lang.syntax.ParseTestSupport.parse;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.rosetra.lang.check.Diagnostic;
import org.rosetra.lang.check.Diagnostics;

/** Syntax errors: a sentence at the right line and column, and the rest still parsed. */
class SyntaxErrorTest {

    private static List<Diagnostic> errors(String text) {
        Diagnostics diagnostics = new Diagnostics();
        parse(text, diagnostics);
        return diagnostics.sorted();
    }

    private static void assertAt(Diagnostic d, int line, int column, String message) {
        assertEquals(line, d.span().line(), d::toString);
        assertEquals(column, d.span().column(), d::toString);
        assertTrue(d.message().contains(message), () -> d.message() + " lacks " + message);
    }

    @Test
    void unclosedBlockIsClosedBeforeTheNextStatement() {
        // Our own message (task: "block of material s355 is not closed: '}' expected before line 9").
        String text = "material s355 {\n  E = 205 GPa\n  nu = 0.29\n\ngauge foil350 {\n  factor = 2.09\n}\n";
        Diagnostics diagnostics = new Diagnostics();
        Script script = parse(text, diagnostics);
        List<Diagnostic> errors = diagnostics.sorted();
        assertEquals(1, errors.size());
        assertAt(errors.get(0), 1, 15, "block of material s355 is not closed: '}' expected before line 5");
        assertEquals(2, script.statements().size(), "both blocks survive the repair");
    }

    @Test
    void unclosedBlockAtTheEndOfTheFile() {
        List<Diagnostic> errors = errors("material s {\n  E = 205 GPa\n");
        assertEquals(1, errors.size());
        assertAt(errors.get(0), 1, 12, "'}' expected before the end of the file");
    }

    @Test
    void oneStatementPerLine() {
        // LANGUAGE.md, section "Lexical rules": one statement per line.
        List<Diagnostic> errors = errors("title \"x\" material s355 {\n}\n");
        assertEquals(1, errors.size());
        assertAt(errors.get(0), 1, 11, "expected one statement per line");
    }

    @Test
    void oneFieldPerLine() {
        // LANGUAGE.md, section "Lexical rules": a block holds one field per line.
        List<Diagnostic> errors = errors("material s {\n  E = 205 GPa nu = 0.3\n}\n");
        assertEquals(1, errors.size());
        assertAt(errors.get(0), 2, 15, "expected one field per line");
    }

    @Test
    void readingListTakesOneUnitAtItsEnd() {
        // LANGUAGE.md, section "Quantities and units": one trailing unit for every item.
        List<Diagnostic> errors = errors("case a {\n  web_top = 412 ue, -38, -121 ue\n}\n");
        assertEquals(1, errors.size());
        assertAt(errors.get(0), 2, 17, "a reading list takes one unit at its end");
    }

    @Test
    void checkNeedsAComparison() {
        // LANGUAGE.md, section "Expressions, values and checks": comparisons < <= > >=.
        List<Diagnostic> errors = errors("check \"x\": a = b\n");
        assertEquals(1, errors.size());
        assertAt(errors.get(0), 1, 14, "a check compares with <, <=, > or >=");
    }

    @Test
    void aLineThatIsNoStatement() {
        // Our own design: a hint towards let.
        List<Diagnostic> errors = errors("foo = 3\n");
        assertEquals(1, errors.size());
        assertAt(errors.get(0), 1, 1, "expected a statement, found 'foo'");
        assertEquals("a value is named with let: let foo = ...", errors.get(0).hint());
    }

    @Test
    void everyBadLineIsReportedOnceAndTheGoodOnesSurvive() {
        // Our own design: every error of the pass, one per line, no ANTLR token dump.
        String text = "let a = 2 *\nlet b = (3\n}\nlet c = 3 @ 4\nlet d = \"abc\nlet e = 5 MPa\n";
        Diagnostics diagnostics = new Diagnostics();
        Script script = parse(text, diagnostics);
        List<Diagnostic> errors = diagnostics.sorted();
        assertEquals(List.of(1, 2, 3, 4, 5), errors.stream().map(d -> d.span().line()).toList(),
                () -> diagnostics.render(f -> text));
        assertAt(errors.get(0), 1, 12, "the line ends before the statement is complete: expected a value");
        assertAt(errors.get(1), 2, 9, "'(' is not closed on its line");
        assertAt(errors.get(2), 3, 1, "'}' has no block to close");
        assertAt(errors.get(3), 4, 11, "unexpected character '@'");
        assertAt(errors.get(4), 5, 9, "string is not closed");
        assertTrue(errors.stream().noneMatch(d -> d.message().contains("mismatched")
                || d.message().contains("extraneous") || d.message().contains("viable")));
        assertTrue(script.statements().stream().anyMatch(s -> s instanceof Let l && l.name().text().equals("e")));
    }

    @Test
    void unknownPlotKindGetsTheNearest() {
        // Our own design: plot mohr / plot directions, with a hint for a typo.
        List<Diagnostic> errors = errors("plot mohx web_top[a]\n");
        assertEquals(1, errors.size());
        assertAt(errors.get(0), 1, 6, "unknown kind of plot 'mohx'");
        assertEquals("did you mean 'mohr'?", errors.get(0).hint());
    }

    @Test
    void renderedLikeACompiler() {
        // LANGUAGE.md, section "Running and results": FILE:LINE:COL: error: message, the line, a caret.
        Diagnostics diagnostics = new Diagnostics();
        String text = "title \"x\" report \"y\"\n";
        parse(text, diagnostics);
        assertEquals("""
                test.strain:1:11: error: expected one statement per line, found 'report'
                title "x" report "y"
                          ^^^^^^
                  hint: start a new line for the next statement
                """, diagnostics.render(f -> text));
    }
}
