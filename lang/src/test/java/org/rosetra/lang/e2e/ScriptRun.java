package org.rosetra.lang.e2e;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.rosetra.lang.cli.Main;
import org.rosetra.lang.output.JsonTree;

/**
 * One script run end to end through the command line, as an engineer would run it:
 * {@code rosetra run SCRIPT --json FILE --out DIR}. Holds the exit status, what was printed
 * and the results JSON (null when none was written).
 */
final class ScriptRun {
    final Path script;
    final Path json;
    final Path outDir;
    final int status;
    final String out;
    final String err;
    final Map<String, Object> results;

    private ScriptRun(Path script, Path json, Path outDir, int status, String out, String err,
                      Map<String, Object> results) {
        this.script = script;
        this.json = json;
        this.outDir = outDir;
        this.status = status;
        this.out = out;
        this.err = err;
        this.results = results;
    }

    /** {@link String#format} in the root locale, so numbers are written with a decimal point. */
    static String script(String template, Object... args) {
        return String.format(java.util.Locale.ROOT, template, args);
    }

    /** Writes {@code text} to {@code dir/survey.strain} and runs it. */
    static ScriptRun run(Path dir, String text) {
        return run(dir, "survey.strain", text);
    }

    static ScriptRun run(Path dir, String fileName, String text) {
        Path script = write(dir, fileName, text);
        Path json = dir.resolve("results.json");
        Path outDir = dir.resolve("survey.out");
        String[] printed = new String[2];
        int status = captured(printed, () -> Main.execute("run", script.toString(),
                "--json", json.toString(), "--out", outDir.toString()));
        return new ScriptRun(script, json, outDir, status, printed[0], printed[1], readJson(json));
    }

    /** {@code rosetra check SCRIPT}: parse and check only. */
    static ScriptRun check(Path dir, String text) {
        Path script = write(dir, "survey.strain", text);
        String[] printed = new String[2];
        int status = captured(printed, () -> Main.execute("check", script.toString()));
        return new ScriptRun(script, null, null, status, printed[0], printed[1], null);
    }

    private static Path write(Path dir, String fileName, String text) {
        try {
            Path script = dir.resolve(fileName);
            Files.writeString(script, text, StandardCharsets.UTF_8);
            return script;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private interface Command {
        int execute();
    }

    private static synchronized int captured(String[] printed, Command command) {
        PrintStream oldOut = System.out;
        PrintStream oldErr = System.err;
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        try (PrintStream o = new PrintStream(out, true, StandardCharsets.UTF_8);
             PrintStream e = new PrintStream(err, true, StandardCharsets.UTF_8)) {
            System.setOut(o);
            System.setErr(e);
            return command.execute();
        } finally {
            System.setOut(oldOut);
            System.setErr(oldErr);
            printed[0] = out.toString(StandardCharsets.UTF_8);
            printed[1] = err.toString(StandardCharsets.UTF_8);
        }
    }

    @SuppressWarnings("unchecked")
    private static Map<String, Object> readJson(Path json) {
        if (!Files.isRegularFile(json)) {
            return null;
        }
        try {
            return (Map<String, Object>) JsonTree.parse(Files.readAllBytes(json));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Asserts the script ran with the given exit status; shows what it printed if not. */
    ScriptRun expectStatus(int expected) {
        assertEquals(expected, status, () -> "exit status; stderr:\n" + err + "\nstdout:\n" + out);
        return this;
    }

    /** Asserts the script ran and every check passed. */
    ScriptRun ok() {
        expectStatus(0);
        assertNotNull(results, "results.json was written");
        return this;
    }

    @SuppressWarnings("unchecked")
    static Map<String, Object> map(Object o, String what) {
        assertTrue(o instanceof Map, () -> what + " is an object, got " + o);
        return (Map<String, Object>) o;
    }

    Map<String, Object> rosettes() {
        return map(results.get("rosettes"), "\"rosettes\"");
    }

    /** The results of a rosette in one case, or null when it has none there. */
    Map<String, Object> resultsOf(String rosette, String caseName) {
        Map<String, Object> r = map(rosettes().get(rosette), "rosette " + rosette);
        Object perCase = map(r.get("results"), rosette + ".results").get(caseName);
        return perCase == null ? null : map(perCase, rosette + "[" + caseName + "]");
    }

    /** One member of a rosette's result in a case (SI: strain fraction, Pa, degrees). */
    double member(String rosette, String caseName, String member) {
        Map<String, Object> numbers = resultsOf(rosette, caseName);
        assertNotNull(numbers, () -> rosette + " has a result in " + caseName);
        Object v = numbers.get(member);
        assertNotNull(v, () -> rosette + "[" + caseName + "]." + member + " is in the JSON");
        return (Double) v;
    }

    String stateOf(String rosette) {
        return (String) map(rosettes().get(rosette), "rosette " + rosette).get("state");
    }

    Map<String, Object> givenState(String name) {
        return map(map(results.get("states"), "\"states\"").get(name), "state " + name);
    }

    double stateMember(String name, String member) {
        Object v = givenState(name).get(member);
        assertNotNull(v, () -> "state " + name + "." + member + " is in the JSON");
        return (Double) v;
    }

    Map<String, Object> value(String name) {
        return map(map(results.get("values"), "\"values\"").get(name), "value " + name);
    }

    double number(String name) {
        return (Double) value(name).get("value");
    }

    @SuppressWarnings("unchecked")
    List<Object> cases() {
        return (List<Object>) results.get("cases");
    }

    @SuppressWarnings("unchecked")
    Map<String, Object> check(String label) {
        for (Object c : (List<Object>) results.get("checks")) {
            Map<String, Object> m = map(c, "a check");
            if (label.equals(m.get("label"))) {
                return m;
            }
        }
        throw new AssertionError("no check labelled " + label + " in " + results.get("checks"));
    }

    /** The first line of the first diagnostic. */
    String firstErrorLine() {
        return err.lines().findFirst().orElse("");
    }
}
