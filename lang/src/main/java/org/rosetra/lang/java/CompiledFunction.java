package org.rosetra.lang.java;

import java.util.function.ToDoubleFunction;

/** A Java-bodied function compiled once; called with its arguments in SI, in order. */
record CompiledFunction(String name, ToDoubleFunction<double[]> body) {

    double call(double... arguments) {
        return body.applyAsDouble(arguments);
    }
}
