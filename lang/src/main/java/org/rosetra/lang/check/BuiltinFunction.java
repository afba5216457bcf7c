package org.rosetra.lang.check;

import java.util.List;

/**
 * A function every script can call. {@code signature} is for people ("sin(angle) -> none");
 * {@code materialNeeds} names the material fields a failure index reads.
 */
public record BuiltinFunction(String name, String signature, FunctionShape shape,
        List<String> materialNeeds, String doc) {
}
