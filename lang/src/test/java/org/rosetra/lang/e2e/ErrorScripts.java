package org.rosetra.lang.e2e;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The scripts with one mistake each, in {@code src/test/resources/e2e/errors/}. The first line
 * of each says where the error must be reported ({@code # expected: error at LINE:COL, ...})
 * and which part of LANGUAGE.md makes it an error.
 */
final class ErrorScripts {
    private static final Pattern EXPECTED = Pattern.compile("^# expected: error at (\\d+):(\\d+)");

    private ErrorScripts() {}

    /** One script and the place of its error. */
    record ErrorScript(String name, String text, int line, int column) {
        @Override
        public String toString() {
            return name;
        }
    }

    static ErrorScript load(String name) {
        try (InputStream in = ErrorScripts.class.getResourceAsStream("/e2e/errors/" + name + ".strain")) {
            assertNotNull(in, "resource e2e/errors/" + name + ".strain");
            String text = new String(in.readAllBytes(), StandardCharsets.UTF_8);
            Matcher m = EXPECTED.matcher(text);
            assertTrue(m.find(), name + " starts with '# expected: error at LINE:COL'");
            return new ErrorScript(name, text, Integer.parseInt(m.group(1)), Integer.parseInt(m.group(2)));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * LANGUAGE.md, "Running and results": exit status 2, {@code FILE:LINE:COL: error: message},
     * then the line itself and a caret under the place; nothing computed, nothing written.
     */
    static void assertReportedAt(ScriptRun run, ErrorScript script) {
        run.expectStatus(2);
        List<String> err = run.err.lines().toList();
        String where = run.script + ":" + script.line() + ":" + script.column() + ": error: ";
        assertTrue(!err.isEmpty() && err.get(0).startsWith(where),
                () -> "first line starts with " + where + "\n" + run.err);
        String sourceLine = script.text().lines().toList().get(script.line() - 1);
        assertTrue(err.size() >= 3, () -> "the line and a caret follow:\n" + run.err);
        assertEquals(sourceLine, err.get(1), "the source line is shown");
        String caret = err.get(2);
        assertEquals(script.column() - 1, caret.indexOf('^'), () -> "caret under column " + script.column() + ":\n" + run.err);
        assertTrue(caret.substring(0, script.column() - 1).isBlank(), caret);
        if (run.json != null) {
            assertFalse(Files.exists(run.json), "no results.json written on error");
        }
        if (run.outDir != null) {
            assertFalse(Files.exists(run.outDir.resolve("results.json")), "no output folder results on error");
        }
    }
}
