package org.rosetra.lang.series;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.rosetra.lang.cli.Main;
import org.rosetra.lang.output.JsonTree;

/**
 * One run of the command line on a script in a folder of the test's own: the exit status,
 * what went to stdout and stderr, and the results.json when one was written.
 */
record SeriesRun(int status, String out, String err, Path json, Path outDir) {

    /** Writes {@code script} as {@code folder/run.strain} and runs it with --json and --out. */
    static SeriesRun of(Path folder, String script) throws IOException {
        Path file = folder.resolve("run.strain");
        Files.writeString(file, script, StandardCharsets.UTF_8);
        Path json = folder.resolve("results-extra.json");
        Path outDir = folder.resolve("run.out");
        return run(file, json, outDir);
    }

    static synchronized SeriesRun run(Path script, Path json, Path outDir) {
        PrintStream stdout = System.out;
        PrintStream stderr = System.err;
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int status;
        try {
            System.setOut(new PrintStream(out, true, StandardCharsets.UTF_8));
            System.setErr(new PrintStream(err, true, StandardCharsets.UTF_8));
            status = Main.execute("run", script.toString(), "--json", json.toString(), "--out", outDir.toString());
        } finally {
            System.setOut(stdout);
            System.setErr(stderr);
        }
        return new SeriesRun(status, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8),
                json, outDir);
    }

    @SuppressWarnings("unchecked")
    Map<String, Object> results() throws IOException {
        return (Map<String, Object>) JsonTree.parse(Files.readAllBytes(json));
    }

    /** {@code series.NAME.rosettes.ROSETTE.MEMBER} of results.json: max, t_max, min, t_min. */
    @SuppressWarnings("unchecked")
    Map<String, Object> member(String series, String rosette, String member) throws IOException {
        Map<String, Object> s = (Map<String, Object>) ((Map<String, Object>) results().get("series")).get(series);
        Map<String, Object> r = (Map<String, Object>) ((Map<String, Object>) s.get("rosettes")).get(rosette);
        return (Map<String, Object>) r.get(member);
    }

    @SuppressWarnings("unchecked")
    long samples(String series) throws IOException {
        Map<String, Object> s = (Map<String, Object>) ((Map<String, Object>) results().get("series")).get(series);
        return Math.round((Double) s.get("samples"));
    }

    @SuppressWarnings("unchecked")
    double value(String name) throws IOException {
        Map<String, Object> v = (Map<String, Object>) ((Map<String, Object>) results().get("values")).get(name);
        return (Double) v.get("value");
    }

    @SuppressWarnings("unchecked")
    Map<String, Object> check(String label) throws IOException {
        for (Object o : (List<Object>) results().get("checks")) {
            Map<String, Object> c = (Map<String, Object>) o;
            if (label.equals(c.get("label"))) {
                return c;
            }
        }
        throw new AssertionError("no check \"" + label + "\" in " + json);
    }

    /** Everything this run left on disk where its outputs go. */
    boolean wroteNothing() {
        return !Files.exists(json) && !Files.exists(outDir);
    }

    String describe() {
        return "status " + status + "\nstdout:\n" + out + "\nstderr:\n" + err;
    }
}
