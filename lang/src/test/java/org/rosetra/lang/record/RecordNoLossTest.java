package org.rosetra.lang.record;

import static org.junit.jupiter.api.Assertions.*;
import static org.rosetra.lang.record.RecordTestSupport.*;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A failed run leaves the output folder alone; a successful one leaves nothing stale behind. */
class RecordNoLossTest {

    @TempDir
    Path dir;
    Path script;
    Path out;
    Map<String, byte[]> good;

    @BeforeEach
    void runOnce() throws IOException {
        script = bracketIn(dir);
        assertEquals(0, rosetra("run", script.toString()).status());
        out = dir.resolve(OUT);
        good = snapshot(out);
    }

    @Test
    void aSyntaxErrorLeavesEveryOutputAsItWas() throws IOException {
        edit("case heavy {", "case heavy {{");
        Run r = rosetra("run", script.toString());
        assertEquals(2, r.status(), r.out());
        assertTrue(r.err().contains(SCRIPT + ":29:"), r.err());
        assertTrue(r.err().contains("error:"), r.err());
        assertEquals("", r.out(), "nothing is computed, so no table is printed");
        RecordDeterminismTest.assertSameTree(good, snapshot(out));
    }

    @Test
    void aUnitErrorLeavesEveryOutputAsItWas() throws IOException {
        edit("E     = 200 GPa", "E     = 200 ue");
        Run r = rosetra("run", script.toString());
        assertEquals(2, r.status(), r.out());
        assertTrue(r.err().contains(SCRIPT + ":6:"), r.err());
        RecordDeterminismTest.assertSameTree(good, snapshot(out));
    }

    @Test
    void anErrorLeavesTheJsonFileAsItWas() throws IOException {
        Path json = dir.resolve("side.json");
        assertEquals(0, rosetra("run", script.toString(), "--json", json.toString()).status());
        byte[] before = Files.readAllBytes(json);
        edit("web = 780, 380, -210 ue", "web = 780, 380 ue");
        assertEquals(2, rosetra("run", script.toString(), "--json", json.toString()).status());
        assertArrayEquals(before, Files.readAllBytes(json));
    }

    @Test
    void aPlotRemovedFromTheScriptLeavesNoFileBehind() throws IOException {
        assertTrue(good.containsKey("plots/mohr-web-heavy.svg") && good.containsKey("plots/mohr-web-heavy.png"));
        edit("plot mohr web[heavy]\n", "");
        assertEquals(0, rosetra("run", script.toString()).status());
        Map<String, byte[]> now = snapshot(out);
        assertFalse(now.containsKey("plots/mohr-web-heavy.svg"), now.keySet().toString());
        assertFalse(now.containsKey("plots/mohr-web-heavy.png"), now.keySet().toString());
        String md = Files.readString(out.resolve("record.md"));
        assertFalse(md.contains("mohr-web-heavy"), "the record still shows the removed figure");

        // Nothing stale: the folder holds exactly what a first run of the new script writes.
        Path fresh = dir.resolve("fresh.out");
        assertEquals(0, rosetra("run", script.toString(), "--out", fresh.toString()).status());
        RecordDeterminismTest.assertSameTreeOf(snapshot(fresh), now);
    }

    @Test
    void aFailingCheckStillWritesEveryOutput() throws IOException {
        edit("plate.yield / 1.5", "plate.yield / 2");
        Run r = rosetra("run", script.toString());
        assertEquals(1, r.status(), r.err());
        assertTrue(r.out().contains("FAIL  check \"web yield margin\""), r.out());
        Map<String, byte[]> now = snapshot(out);
        assertEquals(good.keySet(), now.keySet());
        assertTrue(Files.readString(out.resolve("results.json")).contains("\"pass\" : false"));
        assertFalse(Files.readString(out.resolve("record.md")).contains("Every check passed."));
    }

    @Test
    void aRunDeletesOnlyFilesThatAnEarlierRunWrote() throws IOException {
        Path folder = dir.resolve("site");
        Files.createDirectories(folder.resolve("tables"));
        Files.writeString(folder.resolve("tables/survey-notes.csv"), "arm,note\na,kept by hand\n");
        assertEquals(0, rosetra("run", script.toString(), "--out", folder.toString()).status());
        assertTrue(Files.exists(folder.resolve("tables/survey-notes.csv")), "the user's own file is gone");
    }

    @Test
    void aCommitThatFailsHalfWayLeavesNoMixOfOldAndNew() throws IOException {
        Files.delete(out.resolve("record.md"));
        Files.createDirectories(out.resolve("record.md/in-the-way"));
        Map<String, byte[]> before = snapshot(out);
        edit("web = 780, 380, -210 ue", "web = 790, 380, -210 ue");
        Run r = rosetra("run", script.toString());
        assertEquals(2, r.status(), r.out());
        RecordDeterminismTest.assertSameTreeOf(before, snapshot(out));
    }

    @Test
    void anOutputFolderThatIsAFileIsAnErrorAndTheFileStays() throws IOException {
        Path file = dir.resolve("not-a-folder");
        Files.writeString(file, "keep");
        Run r = rosetra("run", script.toString(), "--out", file.toString());
        assertEquals(2, r.status());
        assertTrue(r.err().startsWith("rosetra: error: cannot write the outputs"), r.err());
        assertEquals("keep", Files.readString(file));
    }

    private void edit(String from, String to) throws IOException {
        String text = Files.readString(script);
        assertTrue(text.contains(from), from);
        Files.writeString(script, text.replace(from, to));
    }
}
