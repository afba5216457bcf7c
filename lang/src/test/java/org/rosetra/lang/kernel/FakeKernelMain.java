package org.rosetra.lang.kernel;

import picocli.CommandLine;

/**
 * Starts the kernel on the fake engine in its own process, as {@code rosetra kernel} will on
 * the real session; bench/kernel-roundtrip uses it until the language is wired.
 */
public final class FakeKernelMain {
    private FakeKernelMain() {}

    public static void main(String[] args) {
        System.exit(new CommandLine(new KernelCommand(FakeEngine::new)).execute(args));
    }
}
