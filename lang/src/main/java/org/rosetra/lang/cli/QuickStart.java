package org.rosetra.lang.cli;

import java.nio.file.Path;
import java.util.Optional;
import org.rosetra.lang.plan.RunOptions;
import org.rosetra.lang.plan.ScriptRunner;

/**
 * The two commands a script's author and an editor hook run most, {@code run SCRIPT [--json
 * FILE] [--out DIR] [--allow-java] [--no-record]} and {@code check SCRIPT}, read without building picocli's
 * model of every command. picocli's classes are compiled for Java 5 and cannot be kept in the
 * class-data archive, so building that model cost about 85 ms of a cold run (bench/startup-phases).
 * Anything else, including every mistake and every request for help, goes to picocli, which
 * answers it as it always does: this path only ever takes command lines picocli would accept
 * with the same meaning.
 */
final class QuickStart {
    private QuickStart() {}

    /** The exit status, or empty when picocli should read this command line. */
    static Optional<Integer> tryRun(String... args) {
        if (args.length < 2) {
            return Optional.empty();
        }
        String command = args[0];
        if (command.equals("check")) {
            if (args.length != 2 || args[1].startsWith("-")) {
                return Optional.empty();
            }
            return Optional.of(runner().check(Path.of(args[1])));
        }
        if (!command.equals("run")) {
            return Optional.empty();
        }
        Path script = null;
        Path json = null;
        Path out = null;
        boolean allowJava = false;
        boolean noRecord = false;
        for (int i = 1; i < args.length; i++) {
            String a = args[i];
            switch (a) {
                case "--json":
                case "--out":
                    if (i + 1 >= args.length || args[i + 1].startsWith("-") || (a.equals("--json") ? json : out) != null) {
                        return Optional.empty();
                    }
                    if (a.equals("--json")) {
                        json = Path.of(args[++i]);
                    } else {
                        out = Path.of(args[++i]);
                    }
                    break;
                case "--allow-java":
                    allowJava = true;
                    break;
                case "--no-record":
                    noRecord = true;
                    break;
                default:
                    if (a.startsWith("-") || script != null) {
                        return Optional.empty();
                    }
                    script = Path.of(a);
            }
        }
        if (script == null) {
            return Optional.empty();
        }
        return Optional.of(runner().run(script, new RunOptions(json, out, !noRecord, allowJava)));
    }

    private static ScriptRunner runner() {
        return new ScriptRunner(System.out, System.err, VersionProvider.version());
    }
}
