package org.rosetra.lang.cli;

import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.rosetra.lang.plan.ScriptRunner;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;

/** {@code rosetra check SCRIPT}: parse and check only, computing nothing (for editors and hooks). */
@Command(name = "check", mixinStandardHelpOptions = true,
        description = "Parse and check a script (names, units, readings) without computing it.")
final class CheckCommand implements Callable<Integer> {
    @Parameters(paramLabel = "SCRIPT", description = "the .strain script to check")
    Path script;

    @Override
    public Integer call() {
        return new ScriptRunner(System.out, System.err, VersionProvider.version()).check(script);
    }
}
