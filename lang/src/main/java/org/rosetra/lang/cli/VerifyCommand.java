package org.rosetra.lang.cli;

import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.rosetra.lang.plan.ScriptRunner;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code rosetra verify SCRIPT}: re-run and compare every number with the committed results. */
@Command(name = "verify", mixinStandardHelpOptions = true,
        description = "Re-run a script and compare every number with its committed results.json.")
final class VerifyCommand implements Callable<Integer> {
    @Parameters(paramLabel = "SCRIPT", description = "the .strain script to re-run")
    Path script;

    @Option(names = "--against", paramLabel = "FILE",
            description = "the results to compare with (default: SCRIPT.out/results.json)")
    Path against;

    @Option(names = "--rtol", paramLabel = "R", defaultValue = "1e-9",
            description = "relative tolerance for numbers (default: ${DEFAULT-VALUE})")
    double rtol;

    @Option(names = "--allow-java", description = "allow functions written in Java to run")
    boolean allowJava;

    @Override
    public Integer call() {
        Path committed = against != null ? against : ScriptRunner.defaultOutputFolder(script).resolve("results.json");
        return new ScriptRunner(System.out, System.err, VersionProvider.version()).verify(script, committed, rtol, allowJava);
    }
}
