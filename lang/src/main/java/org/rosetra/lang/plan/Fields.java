package org.rosetra.lang.plan;

import java.util.Map;
import org.rosetra.lang.syntax.Declaration;
import org.rosetra.lang.syntax.Field;
import org.rosetra.lang.syntax.NameRef;
import org.rosetra.runtime.units.Dimension;

/** The fields of one declaration block, read as SI numbers, names and lists. */
final class Fields {
    private final Declaration declaration;
    private final Expressions expressions;

    Fields(Declaration declaration, Expressions expressions) {
        this.declaration = declaration;
        this.expressions = expressions;
    }

    Field field(String name) {
        for (Field f : declaration.fields()) {
            if (f.name().text().equals(name)) {
                return f;
            }
        }
        return null;
    }

    Double optional(String name, Dimension dimension) {
        Field f = field(name);
        if (f == null) {
            return null;
        }
        return expressions.number(f.value(), dimension, Map.of(), "field " + name);
    }

    double required(String name, Dimension dimension) {
        Double value = optional(name, dimension);
        if (value == null) {
            throw new EvaluationException(declaration.name().span(), declaration.kind().keyword() + " "
                    + declaration.name().text() + " needs a field '" + name + "'");
        }
        return value;
    }

    double zeroIfAbsent(String name, Dimension dimension) {
        Double value = optional(name, dimension);
        return value == null ? 0.0 : value;
    }

    String wordOrNull(String name) {
        Field f = field(name);
        if (f == null) {
            return null;
        }
        if (f.value() instanceof NameRef ref) {
            return ref.name();
        }
        throw new EvaluationException(f.value().span(), "field " + name + " takes a name");
    }

    String word(String name) {
        String word = wordOrNull(name);
        if (word == null) {
            throw new EvaluationException(declaration.name().span(), declaration.kind().keyword() + " "
                    + declaration.name().text() + " needs a field '" + name + "'");
        }
        return word;
    }

    /** A list of numbers in SI, for fields such as a gauge's thermal-output coefficients. */
    double[] list(Field f) {
        return expressions.numbers(f.value(), "field " + f.name().text());
    }

}
