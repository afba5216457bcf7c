package org.rosetra.lang.plan;

import java.util.Map;

/**
 * What an expression is evaluated in: the parameters of the function being applied, and the
 * chunk of a measured series when it runs over samples (null over the load cases).
 */
record Scope(Map<String, Value> params, Frame frame) {
    Value get(String name) {
        return params.get(name);
    }
}
