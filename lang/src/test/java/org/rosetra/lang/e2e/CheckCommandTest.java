package org.rosetra.lang.e2e;

import java.nio.file.Path;
import org.junit.jupiter.api.Disabled;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * {@code rosetra check SCRIPT} parses and checks only (DESIGN.md, "Front ends"; LANGUAGE.md,
 * "Quantities and units": dimensions are checked before anything is computed). It must
 * report the same errors as {@code run}, at the same places, with exit status 2; and exit 0
 * for a script with no mistake.
 */
class CheckCommandTest {
    @TempDir
    Path dir;

    private void checkScript(String name) {
        ErrorScripts.ErrorScript script = ErrorScripts.load(name);
        ScriptRun checked = ScriptRun.check(dir, script.text());
        ErrorScripts.assertReportedAt(checked, script);
    }

    @Test
    void syntaxErrorsAreReported() {
        checkScript("unclosed-block");
    }

    @Test
    void aCorrectScriptChecksClean() {
        ScriptRun.check(dir, """
                material m {
                  E  = 200 GPa
                  nu = 0.3
                }
                gauge foil {
                  factor = 2.0
                }
                rosette r {
                  layout   = rectangular
                  gauge    = foil
                  material = m
                }
                case c1 {
                  r = 100, 50, 20 ue
                }
                check "limit": r.von_mises <= 100 MPa
                """).expectStatus(0);
    }

    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {
        "field-dimension", "field-dimension-angle", "unknown-name", "unknown-member", "reading-count",
        "baseline-missing-rosette", "trig-of-number", "unlike-sum", "missing-strength",
        "missing-strength-check", "unused-field-dimension", "missing-baseline", "keyword-as-name",
        "undeclared-rosette", "unknown-gauge", "unlike-comparison",
    })
    void checkerErrorsAreReported(String name) {
        checkScript(name);
    }

    @Test
    void duplicateName() {
        checkScript("duplicate-name");
    }
}
