package org.rosetra.lang.java;

import java.lang.reflect.Method;
import jdk.jshell.execution.DirectExecutionControl;

/**
 * Runs JShell's snippets in this JVM and keeps the object the last one produced, so a compiled
 * function comes back as a real Java object instead of the text JShell would print for it.
 */
final class CapturingExecution extends DirectExecutionControl {
    private Object lastValue;

    @Override
    protected String invoke(Method snippet) throws Exception {
        Object value = snippet.invoke(null);
        lastValue = value;
        return valueString(value);
    }

    /** The value of the snippet run last (null for a declaration). */
    Object lastValue() {
        return lastValue;
    }
}
