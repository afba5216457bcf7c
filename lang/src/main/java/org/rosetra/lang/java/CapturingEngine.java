package org.rosetra.lang.java;

import java.util.Map;
import jdk.jshell.spi.ExecutionControl;
import jdk.jshell.spi.ExecutionControlProvider;
import jdk.jshell.spi.ExecutionEnv;

/**
 * JShell's hook for choosing where snippets run: here, in this JVM, through one
 * {@link CapturingExecution}. In-process start-up is several times faster than a second JVM.
 */
final class CapturingEngine implements ExecutionControlProvider {
    private final CapturingExecution execution;

    CapturingEngine(CapturingExecution execution) {
        this.execution = execution;
    }

    @Override
    public String name() {
        return "rosetra-in-process";
    }

    @Override
    public ExecutionControl generate(ExecutionEnv env, Map<String, String> parameters) {
        return execution;
    }
}
