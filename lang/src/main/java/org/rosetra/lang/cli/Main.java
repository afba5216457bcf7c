package org.rosetra.lang.cli;

import java.nio.file.Path;
import org.rosetra.lang.kernel.KernelCommand;
import org.rosetra.lang.kernel.SessionCellEngine;
import org.rosetra.lang.repl.ReplCommand;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/** The {@code rosetra} command: hands each subcommand to its own class. */
@Command(
        name = "rosetra",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        description = "Reduces strain-gauge rosette measurements written as a checked script.",
        subcommands = {RunCommand.class, CheckCommand.class, VerifyCommand.class, ReplCommand.class,
                CommandLine.HelpCommand.class})
public final class Main implements Runnable {
    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    public static void main(String[] args) {
        System.exit(execute(args));
    }

    /** Runs the command line and returns the exit status (0 ran and passed, 1 a check failed, 2 error). */
    public static int execute(String... args) {
        var quick = QuickStart.tryRun(args);
        if (quick.isPresent()) {
            return quick.get();
        }
        CommandLine line = new CommandLine(new Main());
        // The kernel serves cells from a session in the folder it was started in. Java-bodied
        // functions run in it only when the kernel's environment allows them (for instance
        // "env": {"ROSETRA_ALLOW_JAVA": "1"} in its kernel.json).
        boolean kernelAllowsJava = "1".equals(System.getenv("ROSETRA_ALLOW_JAVA"));
        line.addSubcommand("kernel", new KernelCommand(() ->
                new SessionCellEngine(Path.of("").toAbsolutePath(), kernelAllowsJava, VersionProvider.version())));
        line.setExecutionExceptionHandler(new UserErrorHandler());
        return line.execute(args);
    }

    @Override
    public void run() {
        spec.commandLine().usage(System.out);
    }
}
