package org.rosetra.lang.record;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.PrintStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;
import org.rosetra.lang.cli.Main;

/**
 * Drives the command line the way a user does, on the invented bracket script
 * ({@code src/test/resources/record/bracket.strain}): three cases of one rectangular rosette,
 * one table, one Mohr plot and the record.
 */
final class RecordTestSupport {

    static final String SCRIPT = "bracket.strain";
    static final String OUT = "bracket.out";

    private RecordTestSupport() {}

    /** What one command printed and returned. */
    record Run(int status, String out, String err) {}

    /** Runs {@code rosetra ARGS} in-process, capturing stdout and stderr. */
    static synchronized Run rosetra(String... args) {
        PrintStream oldOut = System.out;
        PrintStream oldErr = System.err;
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        try (PrintStream o = new PrintStream(out, true, StandardCharsets.UTF_8);
                PrintStream e = new PrintStream(err, true, StandardCharsets.UTF_8)) {
            System.setOut(o);
            System.setErr(e);
            int status = Main.execute(args);
            return new Run(status, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
        } finally {
            System.setOut(oldOut);
            System.setErr(oldErr);
        }
    }

    /** The test resource {@code record/NAME} as text. */
    static String resource(String name) {
        try (InputStream in = RecordTestSupport.class.getResourceAsStream("/record/" + name)) {
            if (in == null) {
                throw new IllegalStateException("missing test resource record/" + name);
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Copies the bracket script into {@code dir} and returns its path there. */
    static Path bracketIn(Path dir) throws IOException {
        Path script = dir.resolve(SCRIPT);
        Files.writeString(script, resource(SCRIPT), StandardCharsets.UTF_8);
        return script;
    }

    /** Every regular file under {@code root}, by relative path with forward slashes, with its bytes. */
    static Map<String, byte[]> snapshot(Path root) throws IOException {
        Map<String, byte[]> files = new TreeMap<>();
        try (Stream<Path> walk = Files.walk(root)) {
            for (Path p : (Iterable<Path>) walk.filter(Files::isRegularFile)::iterator) {
                files.put(root.relativize(p).toString().replace('\\', '/'), Files.readAllBytes(p));
            }
        }
        return files;
    }
}
