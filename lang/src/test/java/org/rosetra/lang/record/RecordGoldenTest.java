package org.rosetra.lang.record;

import static org.junit.jupiter.api.Assertions.*;
import static org.rosetra.lang.record.RecordTestSupport.*;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.regex.Pattern;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Golden test of one calculation record: the bracket script's record.html, record.md,
 * results.json and Mohr SVG, byte for byte against files committed under
 * {@code src/test/resources/record/golden/}. The golden files are the tool's own output,
 * generated once and inspected by eye before committing: that is the point of a golden test
 * (it catches any change, wanted or not). After a wanted change, regenerate them with
 * {@code -Drosetra.updateGolden=true}, read the diff, and commit it.
 */
class RecordGoldenTest {

    static final List<String> GOLDEN = List.of(
            "record.html", "record.md", "results.json", "plots/mohr-web-heavy.svg");
    static final Path SOURCE_GOLDEN = Path.of("src/test/resources/record/golden");

    @TempDir
    static Path work;
    static Map<String, byte[]> produced;

    @BeforeAll
    static void runOnce() throws IOException {
        Path script = bracketIn(work);
        Run run = rosetra("run", script.toString());
        assertEquals(0, run.status(), run.err());
        produced = snapshot(work.resolve(OUT));
        if (Boolean.getBoolean("rosetra.updateGolden")) {
            for (String name : GOLDEN) {
                Path target = SOURCE_GOLDEN.resolve(name);
                Files.createDirectories(target.getParent());
                Files.write(target, produced.get(name));
            }
        }
    }

    static List<String> golden() {
        return GOLDEN;
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("golden")
    void outputMatchesItsGoldenFile(String name) throws IOException {
        byte[] expected = goldenBytes(name);
        byte[] actual = produced.get(name);
        assertNotNull(actual, "the run did not write " + name);
        if (!java.util.Arrays.equals(expected, actual)) {
            fail(name + " differs from its golden file: " + firstDifference(expected, actual)
                    + " (regenerate with -Drosetra.updateGolden=true after checking the change)");
        }
    }

    /** Nothing in a committed record may depend on the host, the user or the clock. */
    @ParameterizedTest(name = "{0}")
    @MethodSource("golden")
    void goldenFileHoldsNothingOfTheHostOrTheClock(String name) throws IOException {
        String text = new String(goldenBytes(name), StandardCharsets.UTF_8);
        assertFalse(Pattern.compile("\\b(19|20)\\d\\d-[01]\\d-[0-3]\\d").matcher(text).find(), name + " holds a date");
        assertFalse(Pattern.compile("\\b[0-2]\\d:[0-5]\\d:[0-5]\\d\\b").matcher(text).find(), name + " holds a time of day");
        for (String path : List.of(work.toAbsolutePath().toString(), System.getProperty("user.home"),
                System.getProperty("user.dir"), System.getProperty("java.io.tmpdir"))) {
            assertFalse(text.contains(path), name + " holds the host path " + path);
        }
        assertFalse(Pattern.compile("(?<![\\w:/.-])/(tmp|home|root|Users|var)/").matcher(text).find(),
                name + " holds an absolute path");
        String user = System.getProperty("user.name");
        // CSS has ":root", so a user called root is looked for only where a name would stand.
        assertFalse(Pattern.compile("(?<![\\w:#-])" + Pattern.quote(user) + "(?![\\w-])").matcher(text).find(),
                name + " holds the user name " + user);
        String host = java.net.InetAddress.getLocalHost().getHostName();
        if (host.length() >= 4) {
            assertFalse(text.contains(host), name + " holds the host name " + host);
        }
    }

    @Test
    void goldenRecordNamesTheScriptByItsFileNameOnly() throws IOException {
        String md = new String(goldenBytes("record.md"), StandardCharsets.UTF_8);
        assertTrue(md.contains("| bracket.strain | "), "the input table names the script by its file name");
        assertTrue(md.contains("## The script, bracket.strain"), md);
    }

    static byte[] goldenBytes(String name) throws IOException {
        try (InputStream in = RecordGoldenTest.class.getResourceAsStream("/record/golden/" + name)) {
            assertNotNull(in, "no golden file record/golden/" + name + "; generate with -Drosetra.updateGolden=true");
            return in.readAllBytes();
        }
    }

    /** Line and column of the first difference, with both lines, for a readable failure. */
    static String firstDifference(byte[] expected, byte[] actual) {
        String[] a = new String(expected, StandardCharsets.UTF_8).split("\n", -1);
        String[] b = new String(actual, StandardCharsets.UTF_8).split("\n", -1);
        for (int i = 0; i < Math.min(a.length, b.length); i++) {
            if (!a[i].equals(b[i])) {
                return "line " + (i + 1) + ": golden «" + clip(a[i]) + "» now «" + clip(b[i]) + "»";
            }
        }
        return "golden has " + a.length + " lines, now " + b.length;
    }

    private static String clip(String s) {
        return s.length() > 160 ? s.substring(0, 160) + "…" : s;
    }
}
