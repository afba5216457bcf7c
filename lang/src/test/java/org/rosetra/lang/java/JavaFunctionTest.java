package org.rosetra.lang.java;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.rosetra.lang.check.Diagnostic;
import org.rosetra.lang.check.Diagnostics;
import org.rosetra.lang.plan.Outcome;
import org.rosetra.lang.plan.Session;
import org.rosetra.lang.plan.Value;
import org.rosetra.runtime.units.Dimension;

class JavaFunctionTest {
    @TempDir
    Path folder;

    /** An invented bracket with one rectangular rosette read in two load cases. */
    private static final String BRACKET = """
            material steel { 
              E  = 200 GPa
              nu = 0.3
            }
            gauge foil { 
              factor = 2.0
            }
            rosette arm_top {
              layout   = rectangular
              gauge    = foil
              material = steel
            }
            case light {
              arm_top = 300, 100, -100 ue
            }
            case heavy {
              arm_top = 600, 250, -180 ue
            }
            """;

    private Outcome run(String text, boolean allowJava) {
        Session session = new Session(folder);
        session.allowJava(allowJava);
        Diagnostics diagnostics = new Diagnostics();
        session.submit("script", "bracket.strain", text, diagnostics);
        return session.evaluate(diagnostics);
    }

    private static double number(Outcome outcome, String name) {
        assertTrue(outcome.ok(), () -> outcome.diagnostics().render(f -> null));
        return assertInstanceOf(Value.Number.class, outcome.evaluation().let(name)).si();
    }

    private static Diagnostic onlyError(Outcome outcome) {
        assertFalse(outcome.ok());
        return outcome.diagnostics().sorted().get(0);
    }

    @Test
    void aJavaFunctionAgreesWithTheSameFormulaInTheLanguage() {
        // Source: the formula itself, p1 * 2 + p2, written once in Java and once in the language.
        Outcome outcome = run("""
                let twice_plus(p1: stress, p2: none): stress = java { return p1 * 2 + p2; }
                let same_formula(p1, p2) = p1 * 2 + p2 * 1 Pa
                let by_java = twice_plus(120 MPa, 7)
                let by_language = same_formula(120 MPa, 7)
                """, true);
        assertEquals(number(outcome, "by_language"), number(outcome, "by_java"), 1e-6);
        assertEquals(240_000_007.0, number(outcome, "by_java"), 1e-6);
        assertEquals(Dimension.STRESS, ((Value.Number) outcome.evaluation().let("by_java")).dimension());
    }

    @Test
    void anExpressionBodyWithMathFunctionsNeedsNoReturn() {
        // Source: 3-4-5 right triangle, from memory.
        Outcome outcome = run("""
                let hypotenuse(a: length, b: length): length = java { sqrt(a * a + b * b) }
                let c = hypotenuse(3 m, 4 m)
                """, true);
        assertEquals(5.0, number(outcome, "c"), 1e-12);
    }

    @Test
    void aJavaFunctionRunsOverEveryCaseOfAColumn() {
        // Source: von Mises in plane stress, sqrt(s1^2 - s1 s2 + s2^2) (common practice),
        // compared with the language's own von_mises member in each case.
        Outcome outcome = run(BRACKET + """
                let plane_von_mises(s1: stress, s2: stress): stress = java {
                  double sum = s1 * s1 - s1 * s2 + s2 * s2;
                  return Math.sqrt(sum);
                }
                let by_java = plane_von_mises(arm_top.sigma_1, arm_top.sigma_2)
                let by_member = arm_top.von_mises
                """, true);
        assertTrue(outcome.ok(), () -> outcome.diagnostics().render(f -> null));
        double[] java = assertInstanceOf(Value.Column.class, outcome.evaluation().let("by_java")).values();
        double[] member = ((Value.Column) outcome.evaluation().let("by_member")).values();
        assertEquals(2, java.length);
        for (int i = 0; i < java.length; i++) {
            assertEquals(member[i], java[i], 1e-6 * Math.abs(member[i]));
        }
    }

    @Test
    void withoutPermissionTheScriptSaysHowToAllowJava() {
        Outcome outcome = run("""
                let doubled(x: stress): stress = java { return 2 * x; }
                let y = doubled(3 MPa)
                """, false);
        Diagnostic error = onlyError(outcome);
        assertEquals("this script defines a function in Java (line 1); run with --allow-java to allow it,"
                + " only for scripts you trust", error.message());
        assertEquals(1, error.span().line());
        assertEquals(34, error.span().column()); // where "java {" begins
    }

    @Test
    void aCompileErrorPointsAtTheLineOfTheJavaBody() {
        Outcome outcome = run("""
                let broken(x: stress): stress = java {
                  double y = x * 2;
                  return y * "two";
                }
                let z = broken(1 MPa)
                """, true);
        Diagnostic error = onlyError(outcome);
        assertEquals(3, error.span().line());
        assertTrue(error.message().startsWith("the Java body of function broken does not compile: bad operand types"),
                error.message());
    }

    @Test
    void anUnknownNameInTheJavaBodyIsNamedAtItsLine() {
        Outcome outcome = run("""
                let unknown(x: stress): stress = java {
                  return x * factor;
                }
                let z = unknown(1 MPa)
                """, true);
        Diagnostic error = onlyError(outcome);
        assertEquals(2, error.span().line());
        assertEquals(14, error.span().column());
        assertTrue(error.message().contains("factor"), error.message());
    }

    @Test
    void aThrownExceptionNamesTheFunctionAndTheCase() {
        Outcome outcome = run(BRACKET + """
                let fussy(s: stress): stress = java {
                  if (s > 100e6) throw new IllegalStateException("too high");
                  return s;
                }
                let checked = fussy(arm_top.sigma_1)
                """, true);
        Diagnostic error = onlyError(outcome);
        assertEquals("the Java function fussy threw IllegalStateException: too high in case heavy", error.message());
    }

    @Test
    void aNanResultNamesTheFunctionAndTheArguments() {
        Outcome outcome = run("""
                let root(x: none): none = java { return Math.sqrt(x); }
                let r = root(-4)
                """, true);
        Diagnostic error = onlyError(outcome);
        assertEquals("the Java function root gave NaN for arguments (-4.0) in SI", error.message());
        assertEquals(2, error.span().line());
    }

    @Test
    void anArgumentOfTheWrongDimensionIsAnError() {
        Outcome outcome = run("""
                let doubled(x: stress): stress = java { return 2 * x; }
                let y = doubled(3 deg)
                """, true);
        // The checker sees it before anything runs.
        assertEquals("parameter x of doubled needs a stress, got an angle", onlyError(outcome).message());
    }

    @Test
    void aJavaFunctionRunsOverEverySampleOfASeries() throws Exception {
        // An invented four-sample log of the bracket's rosette.
        java.nio.file.Files.writeString(folder.resolve("log.csv"),
                "t_s,g1,g2,g3\n0,100,20,-40\n1,200,40,-80\n2,300,60,-120\n3,150,30,-60\n");
        // Source: the formula itself, 2 * sigma_1, in Java and in the language.
        Outcome outcome = run(BRACKET.replaceAll("(?s)case light.*", "") + """
                series log from "log.csv" {
                  time    = "t_s" s
                  arm_top = "g1", "g2", "g3" ue
                }
                let twice(s: stress): stress = java { return 2 * s; }
                let by_java = max(twice(arm_top.sigma_1[log]))
                let by_language = 2 * max(arm_top.sigma_1[log])
                """, true);
        assertEquals(number(outcome, "by_language"), number(outcome, "by_java"), 1e-6);
    }

    @Test
    void strainIsADimensionNameAJavaFunctionMayUse() {
        // Source: 500 ue = 500e-6, the definition of microstrain (common practice).
        Outcome outcome = run("""
                let halved(e: strain): strain = java { e / 2 }
                let h = halved(1000 ue)
                """, true);
        assertEquals(500e-6, number(outcome, "h"), 1e-15);
    }
}
