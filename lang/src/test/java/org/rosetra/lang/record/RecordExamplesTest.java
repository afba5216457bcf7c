package org.rosetra.lang.record;

import static org.junit.jupiter.api.Assertions.*;
import static org.rosetra.lang.record.RecordTestSupport.*;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.junit.jupiter.api.io.TempDir;

/**
 * The records committed with the examples are current: a fresh run of each example, in a copy
 * of its folder without its outputs, writes the committed output folder byte for byte (the
 * committed files are the golden files here) and verifies against its committed results.json.
 */
class RecordExamplesTest {

    static Path examples() {
        return Path.of(System.getProperty("rosetra.examples", "../examples"));
    }

    static List<String> scripts() throws IOException {
        try (Stream<Path> s = Files.list(examples())) {
            return s.filter(Files::isDirectory)
                    .flatMap(d -> {
                        try (Stream<Path> f = Files.list(d)) {
                            return f.filter(p -> p.toString().endsWith(".strain")).toList().stream();
                        } catch (IOException e) {
                            throw new java.io.UncheckedIOException(e);
                        }
                    })
                    .map(p -> examples().relativize(p).toString().replace('\\', '/'))
                    .sorted().toList();
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("scripts")
    void committedRecordIsWhatAFreshRunWrites(String example, @TempDir Path dir) throws IOException {
        Path source = examples().resolve(example);
        String stem = source.getFileName().toString().replaceAll("\\.strain$", "");
        Path committedOut = source.resolveSibling(stem + ".out");
        assertTrue(Files.isDirectory(committedOut), "the example commits its outputs: " + committedOut);
        copyWithout(source.getParent(), dir, committedOut);

        Path script = dir.resolve(source.getFileName());
        Run run = rosetra("run", script.toString());
        assertTrue(run.status() == 0 || run.status() == 1, run.err());
        RecordDeterminismTest.assertSameTreeOf(snapshot(committedOut), snapshot(dir.resolve(stem + ".out")));

        Run verify = rosetra("verify", script.toString(), "--against", committedOut.resolve("results.json").toString());
        assertEquals(0, verify.status(), verify.out() + verify.err());
    }

    private static void copyWithout(Path from, Path to, Path skip) throws IOException {
        try (Stream<Path> walk = Files.walk(from)) {
            for (Path p : (Iterable<Path>) walk::iterator) {
                if (p.startsWith(skip)) {
                    continue;
                }
                Path target = to.resolve(from.relativize(p).toString());
                if (Files.isDirectory(p)) {
                    Files.createDirectories(target);
                } else {
                    Files.copy(p, target);
                }
            }
        }
    }
}
