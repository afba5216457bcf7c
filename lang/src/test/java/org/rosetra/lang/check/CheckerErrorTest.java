package org.rosetra.lang.check;

import static org.junit.jupiter.api.Assertions.*;
import static org.rosetra.lang.check.CheckTestSupport.*;

import org.junit.jupiter.api.Test;

/** One test per kind of mistake, each at its exact line and column. */
class CheckerErrorTest {

    private static final int L = PRELUDE_LINES + 1; // the first line after the prelude

    @Test
    void wrongDimensionInAField() {
        // LANGUAGE.md, section "Quantities and units": "a field given the wrong dimension (E = 205 ue)".
        Checked checked = check("""
                material s355 {
                  E  = 205 ue
                  nu = 0.29
                }
                """);
        checked.onlyError(2, 8, "field E of material s355 needs a stress, got a dimensionless strain");
    }

    @Test
    void unknownNameWithTheNearestAsHint() {
        // Our own design: unknown names get the nearest declared name as a hint.
        Checked checked = check(PRELUDE + "let peak = max(web_tp.von_mises)\n");
        Diagnostic error = checked.onlyError(L, 16, "unknown name 'web_tp'");
        assertEquals("did you mean 'web_top'?", error.hint());
    }

    @Test
    void wrongNumberOfReadings() {
        // LANGUAGE.md, section "Declarations": a rectangular layout has three arms.
        Checked checked = check(PRELUDE + "case proof {\n  web_top = 412, -38 ue\n}\n");
        checked.onlyError(L + 1, 13, "rosette web_top has 3 arms, but 2 readings are given");
    }

    @Test
    void poissonRatioOutOfRange() {
        // LANGUAGE.md, section "Declarations": nu must lie in (-1, 0.5).
        Checked checked = check("material soft {\n  E = 3 GPa\n  nu = 0.5\n}\n");
        checked.onlyError(3, 8, "field nu of material soft must be in (-1, 0.5), got 0.5");
    }

    @Test
    void missingBaselineReading() {
        // LANGUAGE.md, section "Readings": a rosette read in the case must be read in the baseline.
        Checked checked = check(PRELUDE + """
                baseline unloaded {
                  temperature = 21 degC
                }
                case proof from unloaded {
                  web_top = 412, -38, -121 ue
                }
                """);
        checked.onlyError(L + 4, 3, "missing baseline reading: rosette web_top is read in case proof");
    }

    @Test
    void trigonometryOfANumber() {
        // LANGUAGE.md, section "Quantities and units": a trigonometric function of a non-angle is an error.
        Checked checked = check("let s = sin(2)\n");
        Diagnostic error = checked.onlyError(1, 13, "sin needs an angle, got a dimensionless number");
        assertTrue(error.hint().contains("sin(30 deg)"));
    }

    @Test
    void comparingUnlikeDimensions() {
        // LANGUAGE.md, section "Quantities and units": comparing unlike dimensions is an error.
        Checked checked = check(PRELUDE + "check \"odd\": web_top.von_mises <= 0.5\n");
        checked.onlyError(L, 14, "compares a stress with a dimensionless number");
    }

    @Test
    void addingUnlikeDimensions() {
        // LANGUAGE.md, section "Quantities and units": adding unlike dimensions is an error.
        Checked checked = check("let x = 2 MPa + 3 deg\n");
        checked.onlyError(1, 9, "cannot add an angle to a stress");
    }

    @Test
    void unclosedBlock() {
        // Our own message for a block left open (task: "'}' expected before line 9").
        Checked checked = check("""
                material s355 {
                  E     = 205 GPa
                  nu    = 0.29

                gauge foil350 {
                  factor = 2.09
                }
                """);
        checked.onlyError(1, 15, "block of material s355 is not closed: '}' expected before line 5");
    }

    @Test
    void duplicateName() {
        // Our own design: the error is at the second one, the hint names the line of the first.
        Checked checked = check(PRELUDE + "gauge foil350 {\n  factor = 2.1\n}\n");
        Diagnostic error = checked.onlyError(L, 7, "'foil350' is already declared, as a gauge");
        assertEquals("first declared at line 6", error.hint());
    }

    @Test
    void readingForAnUndeclaredRosette() {
        // LANGUAGE.md, section "Readings": readings belong to declared rosettes.
        Checked checked = check(PRELUDE + "case proof {\n  web_low = 412, -38, -121 ue\n}\n");
        checked.onlyError(L + 1, 3, "reading for an undeclared rosette 'web_low' in case proof");
    }

    @Test
    void criterionWhoseMaterialLacksItsStrength() {
        // LANGUAGE.md, section "Results of a rosette": an error at the line that asks for it.
        Checked checked = check(PRELUDE + "check \"crush\": mohr_coulomb(web_top) < 1\n");
        checked.onlyError(L, 16, "mohr_coulomb(web_top) needs material s355 to give 'ultimate'");
    }

    @Test
    void unknownUnitWithSuggestion() {
        // Our own message over the runtime's unit table.
        Checked checked = check("let p = 3 Mpa\n");
        checked.onlyError(1, 11, "unknown unit 'Mpa'; did you mean 'MPa'?");
    }

    @Test
    void wrongKindOfName() {
        // LANGUAGE.md, section "Declarations": gauge names a declared gauge.
        Checked checked = check(PRELUDE + "rosette web_low {\n  layout = delta\n  gauge = s355\n}\n");
        checked.onlyError(L + 2, 11, "field gauge of rosette web_low names a gauge, but s355 is a material");
    }

    @Test
    void fromMustNameABaseline() {
        // LANGUAGE.md, section "Readings": case NAME from BASELINE.
        Checked checked = check(PRELUDE + "case a {\n  web_top = 1, 2, 3 ue\n}\ncase b from a {\n}\n");
        checked.onlyError(L + 3, 13, "'from' of case b names a baseline, but a is a load case");
    }

    @Test
    void combineNamesCases() {
        // LANGUAGE.md, section "Readings": combine k1 * CASE1 + ...
        Checked checked = check(PRELUDE + "combine c = 0.6 * web_top\n");
        checked.onlyError(L, 19, "combination c names a load case, but web_top is a rosette");
    }

    @Test
    void unknownFieldWithNearestField() {
        // Our own design: unknown fields get the nearest valid field name.
        Checked checked = check("gauge g {\n  factor = 2.1\n  resistence = 350 ohm\n}\n");
        Diagnostic error = checked.onlyError(3, 3, "unknown field 'resistence' in gauge g");
        assertEquals("did you mean 'resistance'?", error.hint());
    }

    @Test
    void requiredFieldMissing() {
        // LANGUAGE.md, section "Declarations": factor is required.
        Checked checked = check("gauge g {\n  transverse = 0.6 %\n}\n");
        checked.onlyError(1, 7, "gauge g needs a 'factor' field");
    }

    @Test
    void everyErrorOfAPassIsReported() {
        // Our own design: a pass reports every error, not only the first.
        Checked checked = check("let a = sin(2)\nlet b = 2 MPa + 1 deg\nlet c = nothing\n");
        assertEquals(3, checked.errors().size());
    }

    @Test
    void readingsWithoutAUnitAreWarnedAbout() {
        // Our own design: a bare 412 is a plain strain fraction, almost surely a missing ue.
        Checked checked = check(PRELUDE + "case proof {\n  web_top = 412, -38, -121\n}\n");
        checked.noErrors();
        Diagnostic warning = checked.diagnostics().sorted().get(0);
        assertEquals(Severity.WARNING, warning.severity());
        assertEquals(L + 1, warning.span().line());
        assertEquals(13, warning.span().column());
    }
}
