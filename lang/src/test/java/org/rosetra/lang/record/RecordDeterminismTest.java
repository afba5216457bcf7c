package org.rosetra.lang.record;

import static org.junit.jupiter.api.Assertions.*;
import static org.rosetra.lang.record.RecordTestSupport.*;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Locale;
import java.util.Map;
import java.util.TimeZone;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The same script and inputs give byte-identical files, wherever and whenever they run. */
class RecordDeterminismTest {

    @Test
    void twoRunsIntoTwoFoldersWriteTheSameFiles(@TempDir Path first, @TempDir Path second) throws Exception {
        Path scriptA = bracketIn(first);
        Path scriptB = bracketIn(Files.createDirectories(second.resolve("elsewhere/deeper")));
        assertEquals(0, rosetra("run", scriptA.toString()).status());
        assertEquals(0, rosetra("run", scriptB.toString(), "--out", second.resolve("other.out").toString()).status());

        assertSameTree(snapshot(first.resolve(OUT)), snapshot(second.resolve("other.out")));
    }

    @Test
    void aRunInAnotherLocaleAndTimeZoneWritesTheSameFiles(@TempDir Path first, @TempDir Path second) throws Exception {
        assertEquals(0, rosetra("run", bracketIn(first).toString()).status());
        Locale locale = Locale.getDefault();
        TimeZone zone = TimeZone.getDefault();
        try {
            Locale.setDefault(Locale.forLanguageTag("de-DE"));
            TimeZone.setDefault(TimeZone.getTimeZone("Pacific/Chatham"));
            assertEquals(0, rosetra("run", bracketIn(second).toString()).status());
        } finally {
            Locale.setDefault(locale);
            TimeZone.setDefault(zone);
        }
        assertSameTree(snapshot(first.resolve(OUT)), snapshot(second.resolve(OUT)));
    }

    @Test
    void runningAgainIntoTheSameFolderChangesNothing(@TempDir Path dir) throws Exception {
        Path script = bracketIn(dir);
        assertEquals(0, rosetra("run", script.toString()).status());
        Map<String, byte[]> before = snapshot(dir.resolve(OUT));
        assertEquals(0, rosetra("run", script.toString()).status());
        assertSameTree(before, snapshot(dir.resolve(OUT)));
    }

    /** Same list of files, same bytes, and the bracket's usual outputs among them. */
    static void assertSameTree(Map<String, byte[]> a, Map<String, byte[]> b) {
        assertTrue(a.containsKey("record.html") && a.containsKey("plots/mohr-web-heavy.png")
                && a.containsKey("tables/rosette-web-strains.csv"), "the run wrote " + a.keySet());
        assertSameTreeOf(a, b);
    }

    /** Same list of files and same bytes. */
    static void assertSameTreeOf(Map<String, byte[]> a, Map<String, byte[]> b) {
        assertEquals(a.keySet(), b.keySet(), "the two folders hold different lists of files");
        for (String name : a.keySet()) {
            assertTrue(Arrays.equals(a.get(name), b.get(name)), name + " differs between the two runs");
        }
    }
}
