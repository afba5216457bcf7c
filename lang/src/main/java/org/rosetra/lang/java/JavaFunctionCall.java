package org.rosetra.lang.java;

import java.util.ArrayList;
import java.util.List;
import org.rosetra.lang.plan.EvaluationException;
import org.rosetra.lang.plan.Value;
import org.rosetra.lang.syntax.JavaCode;
import org.rosetra.lang.syntax.Let;
import org.rosetra.lang.syntax.Param;
import org.rosetra.lang.syntax.SourceSpan;
import org.rosetra.runtime.units.Dimension;

/**
 * A call of a function whose body is Java, from the evaluator. Arguments arrive in SI as
 * doubles; the result is a double in SI of the declared result dimension (none when no
 * dimension is declared). A column of cases (or a series' samples) is one call per case; a case
 * where an argument has no result has no result.
 */
public final class JavaFunctionCall {

    private JavaFunctionCall() {
    }

    /**
     * Calls {@code definition} (whose body is a {@link JavaCode}) with {@code arguments}.
     *
     * @param cases   the case axis, to name a case in a message
     * @param allowed whether the user allowed Java to run (never by surprise)
     */
    public static Value call(Let definition, List<Value> arguments, SourceSpan callSite, List<String> cases,
                             boolean allowed) {
        JavaCode code = (JavaCode) definition.body();
        if (!allowed) {
            throw notAllowed(code);
        }
        String name = definition.name().text();
        Dimension result = DeclaredDimension.of(definition.resultDimension(), Dimension.NONE);
        List<String> parameters = new ArrayList<>();
        for (int i = 0; i < definition.params().size(); i++) {
            Param p = definition.params().get(i);
            parameters.add(p.name().text());
            checkArgument(name, i, p, arguments.get(i), callSite);
        }
        CompiledFunction function = JavaEngine.shared().compile(name, parameters, code);
        return new CaseLoop(function, callSite, cases).apply(arguments, result);
    }

    /** The error for a Java function when the user has not allowed Java. */
    public static EvaluationException notAllowed(JavaCode code) {
        return new EvaluationException(code.span(), "this script defines a function in Java (line "
                + code.span().line() + "); run with --allow-java to allow it, only for scripts you trust",
                "in a notebook, the kernel allows it when started with ROSETRA_ALLOW_JAVA=1 (the env of its kernel.json)");
    }

    private static void checkArgument(String function, int index, Param p, Value argument, SourceSpan callSite) {
        Dimension actual = argument.dimensionOrNull();
        if (actual == null) {
            throw new EvaluationException(callSite, "argument " + (index + 1) + " of " + function
                    + " must be a number for Java, got " + org.rosetra.lang.plan.Expressions.kindOf(argument),
                    argument instanceof Value.Rosette ? "pick a member, such as .von_mises" : null);
        }
        Dimension declared = DeclaredDimension.of(p.dimension(), null);
        if (declared != null && !declared.equals(actual)) {
            throw new EvaluationException(callSite, "argument " + (index + 1) + " of " + function + " ("
                    + p.name().text() + ") must be " + declared + ", got " + actual);
        }
    }
}
