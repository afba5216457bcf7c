package org.rosetra.lang.repl;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.rosetra.lang.plan.Session;

class ReplTest {
    @TempDir
    Path folder;
    private Repl repl;

    @BeforeEach
    void start() {
        repl = new Repl(new Session(folder));
    }

    /** Feeds lines one by one, as a plain terminal would, and returns the last reply's text. */
    private String enter(String... lines) {
        Reply reply = null;
        for (String line : lines) {
            reply = repl.accept(line);
        }
        assertFalse(reply.continues(), "the entry should be complete");
        return reply.text();
    }

    /** An invented bracket: one rectangular rosette in plane stress, read in two load cases. */
    private void defineBracket() {
        enter("material steel {", "  E = 200 GPa", "  nu = 0.3", "  yield = 350 MPa", "}");
        enter("gauge foil {", "  factor = 2.0", "}");
        enter("rosette arm_top {", "  layout = rectangular", "  gauge = foil", "  material = steel", "}");
        enter("case light {", "  arm_top = 300, 100, -100 ue", "}");
        enter("case heavy {", "  arm_top = 600, 250, -180 ue", "}");
    }

    @Test
    void aBareExpressionPrintsItsValueInDisplayUnits() {
        // Source: arithmetic, 2 * 3 MPa = 6 MPa.
        assertEquals("6.000 MPa", enter("2 * 3 MPa"));
        // Source: 1 rad = 180/pi deg, from memory.
        assertEquals("57.30 deg", enter("1 rad"));
    }

    @Test
    void aBlockGoesOnUntilItCloses() {
        assertTrue(repl.accept("material steel {").continues());
        assertTrue(repl.accept("  E = 200 GPa").continues());
        assertTrue(repl.accept("  nu = 0.3").continues());
        assertEquals("", repl.accept("}").text());
        assertEquals("200000 MPa", enter("steel.E"));
    }

    @Test
    void aWholeEntryOfSeveralLinesMayComeAtOnce() {
        assertEquals("", enter("gauge foil {\n  factor = 2.1\n}"));
        assertEquals("two = 2.000", enter("let two = 2"));
    }

    @Test
    void aLetPrintsItsValue() {
        enter("material steel {", "  E = 200 GPa", "  nu = 0.3", "  yield = 360 MPa", "}");
        // Source: 360 MPa / 1.5 = 240 MPa, arithmetic.
        assertEquals("allowable = 240.0 MPa", enter("let allowable = steel.yield / 1.5"));
    }

    @Test
    void aMemberInOneCaseIsShownAndAStrainInMicrostrain() {
        defineBracket();
        // Source: a rectangular rosette with arm a on x reads eps_x directly (common practice).
        assertEquals("300.0 \u03BC\u03B5", enter("arm_top.eps_x[light]"));
        String perCase = enter("arm_top.eps_x");
        assertTrue(perCase.contains("light") && perCase.contains("heavy") && perCase.contains("600.0"), perCase);
    }

    @Test
    void aRosetteTypedAloneShowsItsTable() {
        defineBracket();
        String shown = enter("arm_top");
        assertTrue(shown.startsWith("Rosette arm_top"), shown);
        assertTrue(shown.contains("heavy"), shown);
    }

    @Test
    void tablesAndVerdictsOfAnEntryArePrinted() {
        defineBracket();
        String table = enter("table arm_top");
        assertTrue(table.startsWith("Rosette arm_top"), table);
        String verdict = enter("check \"arm yield\": arm_top.von_mises <= steel.yield");
        assertTrue(verdict.startsWith("pass  check \"arm yield\"  utilization "), verdict);
        assertTrue(verdict.endsWith("governing heavy"), verdict);
    }

    @Test
    void anErrorIsShownWithItsEntryLineAndCaretAndTheEntryIsNotKept() {
        String shown = enter("let a = 2 MPa + 3 nope");
        assertTrue(shown.startsWith("<entry 1>:1:"), shown);
        assertTrue(shown.contains("^"), shown);
        assertEquals("b = 1.000", enter("let b = 1"));
        String names = repl.accept(":names").text();
        assertFalse(names.contains(" a"), names);
    }

    @Test
    void anExpressionErrorPointsAtTheColumnTheUserTyped() {
        String shown = enter("3 MPa + nothing_here");
        assertTrue(shown.startsWith("<entry 1>:1:9: error:"), shown);
        assertTrue(shown.contains("3 MPa + nothing_here\n        ^"), shown);
    }

    @Test
    void aFailedRedefinitionKeepsTheOlderDefinition() {
        assertEquals("limit = 100.0 MPa", enter("let limit = 100 MPa"));
        enter("let limit = nothing_here * 2");
        assertEquals("100.0 MPa", enter("limit"));
    }

    @Test
    void resetForgetsEverything() {
        enter("let limit = 100 MPa");
        assertEquals("(the session is empty)", repl.accept(":reset").text());
        assertTrue(enter("limit").contains("error"));
    }

    @Test
    void quitHelpAndUnknownCommands() {
        assertTrue(repl.accept(":quit").quits());
        assertTrue(repl.accept(":help").text().contains(":reset"));
        assertTrue(repl.accept(":frobnicate").text().contains(":help lists the commands"));
    }

    @Test
    void twoBlankLinesEndAnEntryThatCannotBeFinished() {
        assertTrue(repl.accept("material steel {").continues());
        assertTrue(repl.accept("").continues());
        Reply reply = repl.accept("");
        assertFalse(reply.continues());
    }

    @Test
    void aScriptLoadedFirstIsInTheSession() throws Exception {
        Path script = folder.resolve("bracket.strain");
        Files.writeString(script, "let limit = 250 MPa\n");
        repl.load(script);
        assertEquals("250.0 MPa", enter("limit"));
    }

    @Test
    void aJavaFunctionIsFlaggedAtOnceWhenJavaIsNotAllowed() {
        String shown = enter("let doubled(x: stress): stress = java { return 2 * x; }");
        assertEquals("note: function doubled is written in Java; it runs only in a REPL started with --allow-java",
                shown);
        assertTrue(enter("doubled(2 MPa)").contains("run with --allow-java to allow it"));
    }

    @Test
    void aJavaFunctionRunsWhenTheSessionAllowsIt() {
        Session allowed = new Session(folder);
        allowed.allowJava(true);
        repl = new Repl(allowed);
        enter("let doubled(x: stress): stress = java { return 2 * x; }");
        // Source: the formula itself, 2 * 2 MPa.
        assertEquals("4.000 MPa", enter("doubled(2 MPa)"));
    }

    @Test
    void anAssignmentWithoutLetGetsAHintAndTheWrapperStaysHidden() {
        String shown = enter("x = 3");
        assertTrue(shown.contains("hint: to name a value, write let x = 3"), shown);
        assertFalse(shown.contains("')'"), shown);
        assertFalse(shown.contains("_value_of_entry"), shown);
        assertTrue(enter("foo bar").contains("expected the end of the expression, found 'bar'"));
    }
}
