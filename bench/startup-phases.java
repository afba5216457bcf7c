import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.rosetra.lang.check.Diagnostics;
import org.rosetra.lang.cli.Main;
import org.rosetra.lang.output.OutputFolder;
import org.rosetra.lang.output.ResultsJson;
import org.rosetra.lang.plan.Outcome;
import org.rosetra.lang.plan.Output;
import org.rosetra.lang.plan.ScriptRunner;
import org.rosetra.lang.plan.Session;
import org.rosetra.runtime.render.table.PlainTextTable;
import picocli.CommandLine;

/**
 * Splits one cold `rosetra run` into the steps ScriptRunner takes, in the same order, and
 * prints how long each took the first time, so we know where start-up goes. Each step's time
 * includes loading (and verifying) the classes it is first to need. Besides wall time it prints
 * the main thread's CPU time, which other work on a shared machine disturbs far less.
 * Run by bench/startup-phases.
 */
public final class StartupPhases {
  private static final List<String> lines = new ArrayList<>();
  private static final ThreadMXBean threads = ManagementFactory.getThreadMXBean();
  private static long last;
  private static long lastCpu;

  public static void main(String[] args) throws Exception {
    long mainNanos = System.nanoTime();
    last = System.nanoTime();
    lastCpu = threads.getCurrentThreadCpuTime();
    Path script = Path.of(args[0]);
    Path out = Path.of(args[1]);
    boolean checkOnly = args.length > 2 && args[2].equals("check");

    // What Main does before a subcommand runs: build the command model, parse the arguments.
    CommandLine line = new CommandLine(new Main());
    line.parseArgs("run", script.toString(), "--json", out.resolve("x.json").toString(), "--out", out.toString());
    step("picocli: command model and argument parsing");

    String text = Files.readString(script, StandardCharsets.UTF_8);
    Session session = new Session(script.toAbsolutePath().getParent());
    Diagnostics diagnostics = new Diagnostics();
    session.submit("script", script.toString(), text, diagnostics);
    step("parse (ANTLR lexer, parser, syntax records)");
    if (checkOnly) {
      session.check(diagnostics);
      step("check (names, dimensions)");
    } else {
      Outcome outcome = session.evaluate(diagnostics);
      step("check and evaluate (runtime, Commons Math)");
      PrintStream sink = new PrintStream(new ByteArrayOutputStream(), true, StandardCharsets.UTF_8);
      for (Output o : outcome.outputs()) {
        if (o instanceof Output.TableOutput t) {
          sink.println(PlainTextTable.render(t.table()));
        }
      }
      step("tables as text");
      byte[] json = ResultsJson.write(outcome.results());
      step("results as JSON (Jackson)");
      var inputs = java.util.List.of(org.rosetra.lang.output.RecordBuilder.input(script.getFileName().toString(), text));
      var record = org.rosetra.lang.output.RecordBuilder.build(script.getFileName().toString(), text, outcome, session,
          inputs, "bench");
      step("record assembled");
      OutputFolder.write(out, record, json);
      OutputFolder.writeAtomically(out.resolve("x.json"), json);
      step("output folder and --json file");
    }
    if (diagnostics.hasErrors()) {
      throw new IllegalStateException("the script has errors: " + diagnostics.all());
    }
    // JVM boot before main is not in here: time a class that only prints "hello" for that.
    System.out.printf("  wall  main-cpu%n");
    lines.forEach(System.out::println);
    System.out.printf("%6d ms %6d ms  total in main%n", (System.nanoTime() - mainNanos) / 1_000_000,
        threads.getCurrentThreadCpuTime() / 1_000_000);
    System.out.println("(main-cpu of the total includes the JVM's own start on this thread)");
  }

  private static void step(String what) {
    long t = System.nanoTime();
    long cpu = threads.getCurrentThreadCpuTime();
    lines.add(String.format("%6d ms %6d ms  %s", (t - last) / 1_000_000, (cpu - lastCpu) / 1_000_000, what));
    last = t;
    lastCpu = cpu;
  }
}
