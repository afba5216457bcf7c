package org.rosetra.lang.check;

import static org.junit.jupiter.api.Assertions.*;

import org.junit.jupiter.api.Test;
import org.rosetra.lang.syntax.Script;
import org.rosetra.lang.syntax.ScriptParser;

/** A generated 5,000-line script parses and checks; the time is printed, never asserted. */
class LargeScriptTest {

    static String generate(int rosettes) {
        StringBuilder text = new StringBuilder("title \"Generated survey\"\n");
        text.append("material s355 {\n  E = 205 GPa\n  nu = 0.29\n  yield = 355 MPa\n  ultimate = 490 MPa\n}\n");
        text.append("gauge foil {\n  factor = 2.09\n  transverse = 0.6 %\n}\n");
        text.append("baseline zero {\n");
        for (int r = 0; r < rosettes; r++) {
            text.append("  r").append(r).append(" = 1, -2, 3 ue\n");
        }
        text.append("}\n");
        for (int r = 0; r < rosettes; r++) {
            text.append("rosette r").append(r).append(" {\n  layout = rectangular\n  gauge = foil\n")
                    .append("  material = s355\n  angle = ").append(r % 90).append(" deg\n}\n");
            text.append("let limit_").append(r).append(" = s355.yield / 1.5 + ").append(r).append(" MPa\n");
            text.append("check \"r").append(r).append(" margin\": r").append(r)
                    .append(".von_mises <= limit_").append(r).append("\n");
        }
        text.append("case load from zero {\n");
        for (int r = 0; r < rosettes; r++) {
            text.append("  r").append(r).append(" = ").append(400 + r).append(", -38, -121 ue\n");
        }
        text.append("}\n");
        return text.toString();
    }

    @Test
    void fiveThousandLines() {
        String text = generate(500);
        int lines = text.split("\n").length;
        assertTrue(lines >= 5000, "generated " + lines + " lines");
        for (int round = 1; round <= 3; round++) {
            long start = System.nanoTime();
            Diagnostics diagnostics = new Diagnostics();
            Script script = ScriptParser.parse("generated.strain", text, diagnostics);
            long parsed = System.nanoTime();
            ScriptChecker.check(script, diagnostics);
            long checked = System.nanoTime();
            assertFalse(diagnostics.hasErrors(), () -> diagnostics.render(f -> text));
            System.out.printf("LargeScriptTest round %d: %d lines, parse %.1f ms, check %.1f ms%n", round, lines,
                    (parsed - start) / 1e6, (checked - parsed) / 1e6);
        }
    }
}
