package org.rosetra.lang.examples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.rosetra.lang.cli.Main;
import org.rosetra.lang.output.JsonTree;
import org.rosetra.lang.output.ResultsComparison;

/**
 * Every demo scenario in examples/ runs as written, every check in it passes, and it gives the
 * numbers its committed results.json holds (the reviewer's re-run, as `rosetra verify` does).
 */
class ExamplesTest {
    static Path examples() {
        return Path.of(System.getProperty("rosetra.examples", "../examples")).toAbsolutePath().normalize();
    }

    static Stream<Path> scripts() throws Exception {
        try (Stream<Path> files = Files.walk(examples(), 2)) {
            List<Path> found = files.filter(p -> p.toString().endsWith(".strain")).sorted().toList();
            return found.stream();
        }
    }

    @ParameterizedTest
    @MethodSource("scripts")
    void runsAsWrittenAndAgreesWithItsCommittedResults(Path script, @TempDir Path out) throws Exception {
        PrintStream stdout = System.out;
        ByteArrayOutputStream captured = new ByteArrayOutputStream();
        int status;
        try {
            System.setOut(new PrintStream(captured, true, StandardCharsets.UTF_8));
            status = Main.execute("run", script.toString(), "--out", out.toString());
        } finally {
            System.setOut(stdout);
        }
        assertEquals(0, status, "every check of " + script.getFileName() + " passes:\n" + captured);
        String stem = script.getFileName().toString().replace(".strain", "");
        Path committed = script.resolveSibling(stem + ".out").resolve("results.json");
        assertTrue(Files.isRegularFile(committed), "the example commits its results: " + committed);
        var differences = ResultsComparison.compare(JsonTree.parse(Files.readAllBytes(committed)),
                JsonTree.parse(Files.readAllBytes(out.resolve("results.json"))), 1e-9);
        assertEquals(List.of(), differences, "numbers agree with " + committed);
        for (String file : List.of("record.html", "record.md", "results.json")) {
            assertTrue(Files.size(out.resolve(file)) > 0, file + " is written");
        }
    }
}
