package org.rosetra.lang.cli;

import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.rosetra.lang.plan.RunOptions;
import org.rosetra.lang.plan.ScriptRunner;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code rosetra run SCRIPT}: check, compute and write every output. */
@Command(name = "run", mixinStandardHelpOptions = true,
        description = "Check and run a script; write results.json, the record, plots and tables.")
final class RunCommand implements Callable<Integer> {
    @Parameters(paramLabel = "SCRIPT", description = "the .strain script to run")
    Path script;

    @Option(names = "--json", paramLabel = "FILE", description = "also write the results as JSON to FILE")
    Path json;

    @Option(names = "--out", paramLabel = "DIR",
            description = "folder for the outputs (default: SCRIPT.out next to the script)")
    Path out;

    @Option(names = "--allow-java", description = "allow functions written in Java to run")
    boolean allowJava;

    @Option(names = "--no-record",
            description = "write no output folder (no record, plots or tables); with --json, only the JSON")
    boolean noRecord;

    @Override
    public Integer call() {
        RunOptions options = new RunOptions(json, out, !noRecord, allowJava);
        return new ScriptRunner(System.out, System.err, VersionProvider.version()).run(script, options);
    }
}
