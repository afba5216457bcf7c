package org.rosetra.lang.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The quick reading of {@code run} and {@code check} means what picocli's reading means. */
class QuickStartTest {
    private static final String SCRIPT = String.join("\n",
            "material m {", "  E  = 200 GPa", "  nu = 0.3", "}",
            "gauge g {", "  factor = 2.0", "}",
            "rosette r {", "  layout   = rectangular", "  gauge    = g", "  material = m", "}",
            "case c {", "  r = 100, 50, -20 ue", "}",
            "check \"limit\": r.von_mises <= 100 MPa", "");

    @TempDir
    Path dir;

    @Test
    void runGivesTheSameResultsEitherWay() throws Exception {
        Path script = Files.writeString(dir.resolve("s.strain"), SCRIPT);
        Path quickJson = dir.resolve("quick.json");
        Path slowJson = dir.resolve("slow.json");
        assertTrue(QuickStart.tryRun("run", script.toString(), "--json", quickJson.toString(),
                "--out", dir.resolve("q").toString()).isPresent());
        // "--json=FILE" is picocli's own spelling, which the quick reading leaves to picocli.
        assertTrue(QuickStart.tryRun("run", script.toString(), "--json=" + slowJson).isEmpty());
        int quick = Main.execute("run", script.toString(), "--json", quickJson.toString(), "--out", dir.resolve("q").toString());
        int slow = Main.execute("run", script.toString(), "--json=" + slowJson, "--out=" + dir.resolve("s"));
        assertEquals(slow, quick);
        assertArrayEquals(Files.readAllBytes(slowJson), Files.readAllBytes(quickJson));
        assertArrayEquals(Files.readAllBytes(dir.resolve("s/record.md")), Files.readAllBytes(dir.resolve("q/record.md")));
    }

    @Test
    void anythingUnusualIsLeftToPicocli() {
        assertTrue(QuickStart.tryRun("run", "--help").isEmpty());
        assertTrue(QuickStart.tryRun("run", "a.strain", "--json").isEmpty());
        assertTrue(QuickStart.tryRun("run", "a.strain", "b.strain").isEmpty());
        assertTrue(QuickStart.tryRun("run", "a.strain", "--rtol", "1").isEmpty());
        assertTrue(QuickStart.tryRun("check", "a.strain", "--verbose").isEmpty());
        assertTrue(QuickStart.tryRun("verify", "a.strain").isEmpty());
        assertTrue(QuickStart.tryRun("run").isEmpty());
    }

    @Test
    void checkGivesTheSameStatusEitherWay() throws Exception {
        Path script = Files.writeString(dir.resolve("bad.strain"), SCRIPT.replace("200 GPa", "200 ue"));
        assertEquals(2, QuickStart.tryRun("check", script.toString()).orElseThrow());
        assertEquals(2, Main.execute("check", "--", script.toString()));
    }
}
