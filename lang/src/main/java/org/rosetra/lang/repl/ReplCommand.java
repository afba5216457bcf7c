package org.rosetra.lang.repl;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.jline.terminal.Terminal;
import org.jline.terminal.TerminalBuilder;
import org.rosetra.lang.plan.Session;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code rosetra repl [SCRIPT]}: type statements and expressions, see results at once. */
@Command(name = "repl", mixinStandardHelpOptions = true,
        description = "Enter statements and expressions one at a time and see their results;"
                + " optionally load a script first.")
public final class ReplCommand implements Callable<Integer> {
    static final List<String> COMMANDS = List.of(":help", ":load", ":names", ":reset", ":quit");

    @Parameters(arity = "0..1", paramLabel = "SCRIPT", description = "a .strain script to load before the first prompt")
    Path script;

    @Option(names = "--allow-java", description = "allow functions written in Java to run (only for scripts you trust)")
    boolean allowJava;

    @Override
    public Integer call() throws IOException {
        if (script != null && !Files.isRegularFile(script)) {
            System.err.println("rosetra: error: cannot find the script " + script);
            return 2;
        }
        Path folder = script != null ? script.toAbsolutePath().getParent() : Path.of("").toAbsolutePath();
        Session session = new Session(folder);
        session.allowJava(allowJava);
        Repl repl = new Repl(session);
        try (Terminal terminal = TerminalBuilder.builder().system(true).dumb(true).build()) {
            terminal.writer().println("Rosetra: :help for help, :quit or Ctrl-D to leave."
                    + (allowJava ? " Functions written in Java may run." : ""));
            if (script != null) {
                String loaded = repl.load(script).text();
                if (!loaded.isEmpty()) {
                    terminal.writer().println(loaded.stripTrailing());
                }
            }
            ScriptCompleter completer = new ScriptCompleter(session::statements, COMMANDS);
            new TerminalLoop(terminal, HistoryFile.in(System.getProperty("user.home"))).run(repl, completer);
        }
        return 0;
    }
}
