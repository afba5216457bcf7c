package org.rosetra.lang.check;

import static org.junit.jupiter.api.Assertions.*;
import static org.rosetra.lang.check.CheckTestSupport.*;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.rosetra.lang.syntax.Let;
import org.rosetra.lang.syntax.Script;
import org.rosetra.lang.syntax.ScriptParser;
import org.rosetra.lang.syntax.Statement;
import org.rosetra.runtime.units.Dimension;

/** A whole invented survey checks clean, and the result holds what the planner needs. */
class CheckedScriptTest {

    private static String fixture() throws IOException {
        try (InputStream in = CheckedScriptTest.class.getResourceAsStream("/syntax/hoist-beam.strain")) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }

    private static Let let(CheckedScript checked, String name) {
        return (Let) checked.symbols().find(name).orElseThrow().statement();
    }

    @Test
    void theSurveyChecksClean() throws IOException {
        Checked checked = check(fixture());
        checked.noErrors();
        CheckedScript script = checked.script();
        // LANGUAGE.md, section "Running and results": cases then combinations, as written.
        assertEquals(List.of("proof_60kN", "other", "service"), script.caseOrder());
        // LANGUAGE.md, section "Declarations": rectangular 3, tee 2, arms(...) one per angle.
        assertEquals(Map.of("web_top", 3, "web_low", 4, "flange", 2), script.armCounts());
    }

    @Test
    void dimensionsAndColumnsOfValues() throws IOException {
        CheckedScript script = check(fixture()).script();
        // LANGUAGE.md, section "Expressions": s355.yield / 1.5 is a stress, one value.
        Let allowable = let(script, "allowable");
        assertEquals(Dimension.STRESS, script.dimensionOf(allowable.body()));
        assertFalse(script.perCase().contains(allowable.body()));
        // max(x) with one argument reduces over the cases.
        Let peak = let(script, "peak_vm");
        assertEquals(Dimension.STRESS, script.dimensionOf(peak.body()));
        assertFalse(script.perCase().contains(peak.body()));
        // A rosette member is a value per case.
        Let turned = let(script, "turned");
        assertEquals(Dimension.NONE, script.dimensionOf(turned.body()));
        assertTrue(script.perCase().contains(turned.body()));
        // atan2 gives an angle; N/mm^2 and MPa add up.
        assertEquals(Dimension.ANGLE, script.dimensionOf(let(script, "direction").body()));
        assertEquals(Dimension.STRESS, script.dimensionOf(let(script, "pressure").body()));
        assertEquals(Dimension.STRESS, script.dimensionOf(let(script, "swing").body()));
    }

    @Test
    void declarationsMayComeInAnyOrder() {
        // LANGUAGE.md, section "Declarations": order of declarations is free.
        check("""
                let limit = s355.yield / 1.5
                rosette r {
                  layout = tee
                  gauge = g
                  material = s355
                }
                gauge g {
                  factor = 2.0
                }
                material s355 {
                  E = 205 GPa
                  G = 79 GPa
                  yield = 355 MPa
                }
                """).noErrors();
    }

    @Test
    void aSessionRedefinesByName() {
        // Our own design for the REPL and notebook: a redefinition replaces the old one.
        Diagnostics diagnostics = new Diagnostics();
        Script first = ScriptParser.parseCell("cell1", "let a = 2 MPa\nlet b = a * 2\n", diagnostics);
        Script second = ScriptParser.parseCell("cell2", "let a = 3 deg\n", diagnostics);
        Script both = StatementNames.accumulate(first, second);
        assertEquals(List.of("b", "a"), both.statements().stream()
                .map(s -> StatementNames.nameOf(s).text()).toList());
        CheckedScript checked = ScriptChecker.check(both, diagnostics);
        assertFalse(diagnostics.hasErrors());
        Statement b = checked.symbols().find("b").orElseThrow().statement();
        assertEquals(Dimension.ANGLE, checked.dimensionOf(((Let) b).body()));
    }

    @Test
    void userFunctionsAreCheckedAtEachCall() {
        // Our own design: a function's body is checked with the dimensions of each call.
        Checked checked = check("let twice(x) = x + x\nlet a = twice(2 MPa)\nlet b = twice(3 deg) + 1 MPa\n");
        checked.onlyError(3, 9, "cannot add a stress to an angle");
    }

    @Test
    void thirdElasticConstantMustAgree() {
        // LANGUAGE.md, section "Declarations": G = E / (2 (1 + nu)); disagreement over 0.5 % is an error.
        check("material m {\n  E = 200 GPa\n  nu = 0.25\n  G = 80 GPa\n}\n").noErrors();
        check("material m {\n  E = 200 GPa\n  nu = 0.25\n  G = 75 GPa\n}\n")
                .onlyError(4, 7, "disagree by more than 0.5 %");
    }

    @Test
    void aMaterialStrengthThatIsNotGiven() {
        // LANGUAGE.md, section "Declarations": yield_c defaults to yield, ultimate is not implied.
        check(PRELUDE + "let a = s355.yield_c\n").noErrors();
        check(PRELUDE + "let a = s355.ultimate\n").onlyError(PRELUDE_LINES + 1, 14,
                "material s355 does not give 'ultimate'");
    }

    @Test
    void theLanguageReferenceExamplesCheckClean() throws IOException {
        // LANGUAGE.md, every code block; it names web_low without declaring it, so we add one.
        String text;
        try (InputStream in = CheckedScriptTest.class.getResourceAsStream("/syntax/language-examples.strain")) {
            text = new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
        check(text + "\nrosette web_low {\n  layout = delta\n  gauge = foil350\n  material = s355\n}\n")
                .noErrors();
    }

    @Test
    void aCellAsksForOneValue() throws IOException {
        // Our own design for the REPL and notebook: a bare value, checked against the script.
        Checked survey = check(fixture());
        Diagnostics diagnostics = new Diagnostics();
        org.rosetra.lang.syntax.Expr value = ScriptParser.parseExpression("cell",
                "web_top.von_mises[proof_60kN] / allowable", diagnostics);
        CheckedScript checked = ScriptChecker.checkExpression(survey.script(), value, diagnostics);
        assertFalse(diagnostics.hasErrors(), () -> diagnostics.render(f -> null));
        assertEquals(Dimension.NONE, checked.dimensionOf(value));
        org.rosetra.lang.syntax.Expr wrong = ScriptParser.parseExpression("cell", "web_tp.eps_x", diagnostics);
        ScriptChecker.checkExpression(survey.script(), wrong, diagnostics);
        assertEquals("did you mean 'web_top'?", diagnostics.sorted().get(0).hint());
    }

    @Test
    void membersThatNeedAMaterial() {
        // LANGUAGE.md, "Strain and stress states": without a material only the strain (or stress) members exist.
        String states = "strain a {\n  eps_x = 100 ue\n}\nstress b {\n  sigma_x = 10 MPa\n}\n";
        check(states + "let x = a.eps_1 + b.sigma_1 ^ 0 * 0 + a.gamma_max\n").noErrors();
        check(states + "let y = a.sigma_1\n").onlyError(7, 11, "a has no material, so it has no sigma_1");
        check(states + "let z = b.eps_x\n").onlyError(7, 11, "b has no material, so it has no eps_x");
    }
}
