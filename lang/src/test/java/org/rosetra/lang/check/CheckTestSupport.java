package org.rosetra.lang.check;

import static org.junit.jupiter.api.Assertions.*;

import java.util.List;
import org.rosetra.lang.syntax.Script;
import org.rosetra.lang.syntax.ScriptParser;

/** Parses and checks a script; assertions on its diagnostics. */
final class CheckTestSupport {

    /** A material, gauge and rosette that a test's own lines can lean on (lines 1 to 13). */
    static final String PRELUDE = """
            material s355 {
              E     = 205 GPa
              nu    = 0.29
              yield = 355 MPa
            }
            gauge foil350 {
              factor = 2.09
            }
            rosette web_top {
              layout = rectangular
              gauge = foil350
              material = s355
            }
            """;

    /** PRELUDE has this many lines; a test's own text starts on the next. */
    static final int PRELUDE_LINES = 13;

    private CheckTestSupport() {
    }

    static Checked check(String text) {
        Diagnostics diagnostics = new Diagnostics();
        Script script = ScriptParser.parse("test.strain", text, diagnostics);
        CheckedScript checked = ScriptChecker.check(script, diagnostics);
        return new Checked(text, checked, diagnostics);
    }

    record Checked(String text, CheckedScript script, Diagnostics diagnostics) {

        List<Diagnostic> errors() {
            return diagnostics.sorted().stream().filter(d -> d.severity() == Severity.ERROR).toList();
        }

        /** Exactly one error, at this line and column, whose message contains this text. */
        Diagnostic onlyError(int line, int column, String message) {
            List<Diagnostic> errors = errors();
            assertEquals(1, errors.size(), () -> "expected one error, got:\n" + diagnostics.render(f -> text));
            Diagnostic error = errors.get(0);
            assertEquals(line, error.span().line(), () -> diagnostics.render(f -> text));
            assertEquals(column, error.span().column(), () -> diagnostics.render(f -> text));
            assertTrue(error.message().contains(message),
                    () -> "message '" + error.message() + "' lacks '" + message + "'");
            return error;
        }

        void noErrors() {
            assertFalse(diagnostics.hasErrors(), () -> diagnostics.render(f -> text));
        }
    }
}
