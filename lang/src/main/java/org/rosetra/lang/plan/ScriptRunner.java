package org.rosetra.lang.plan;

import java.io.PrintStream;
import java.nio.file.Path;

/** Runs or checks one script file for the command line (being built). */
public final class ScriptRunner {
    private final PrintStream out;
    private final PrintStream err;

    public ScriptRunner(PrintStream out, PrintStream err) {
        this.out = out;
        this.err = err;
    }

    public int run(Path script, RunOptions options) {
        err.println("rosetra: run is not available yet");
        return 2;
    }

    public int check(Path script) {
        err.println("rosetra: check is not available yet");
        return 2;
    }
}
