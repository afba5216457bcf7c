package org.rosetra.lang.record;

import static org.junit.jupiter.api.Assertions.*;
import static org.rosetra.lang.record.RecordTestSupport.*;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Disabled;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code rosetra verify}: a reviewer re-runs the script against the committed results.json. */
class RecordVerifyTest {

    @TempDir
    Path dir;
    Path script;
    Path results;

    @BeforeEach
    void runOnce() throws IOException {
        script = bracketIn(dir);
        assertEquals(0, rosetra("run", script.toString()).status());
        results = dir.resolve(OUT).resolve("results.json");
    }

    @Test
    void aFreshRunVerifies() {
        Run v = rosetra("verify", script.toString());
        assertEquals(0, v.status(), v.out() + v.err());
        assertTrue(v.out().startsWith("verified: every number agrees with "), v.out());
    }

    @Test
    void oneEditedNumberFailsAndIsNamedByRosetteMemberAndCase() throws IOException {
        String committed = Files.readString(results);
        double now = member(committed, "heavy", "eps_1");
        Files.writeString(results, withMember(committed, "heavy", "eps_1", now + 5e-6)); // 5 με more

        Run v = rosetra("verify", script.toString());
        assertEquals(1, v.status(), v.out() + v.err());
        String[] lines = v.out().split("\n");
        assertEquals(2, lines.length, v.out());
        assertTrue(lines[0].startsWith("web.eps_1[heavy]: "), lines[0]);
        assertTrue(lines[0].contains(" → "), lines[0]);
        assertEquals("1 difference from " + results, lines[1]);
    }

    @Test
    void relativeToleranceIsRespected() throws IOException {
        String committed = Files.readString(results);
        double sigma = member(committed, "medium", "von_mises");
        Files.writeString(results, withMember(committed, "medium", "von_mises", sigma * (1 + 1e-6)));

        assertEquals(1, rosetra("verify", script.toString()).status(), "default rtol 1e-9 sees a change of 1e-6");
        assertEquals(1, rosetra("verify", script.toString(), "--rtol", "1e-7").status());
        assertEquals(0, rosetra("verify", script.toString(), "--rtol", "1e-5").status());
        Run bad = rosetra("verify", script.toString(), "--rtol", "-1");
        assertEquals(2, bad.status());
        assertTrue(bad.err().contains("--rtol must be zero or positive"), bad.err());
    }

    @Test
    void missingCommittedResultsIsAnErrorThatSaysWhatToDo() throws IOException {
        Files.delete(results);
        Run v = rosetra("verify", script.toString());
        assertEquals(2, v.status());
        assertTrue(v.err().contains("there are no committed results at " + results), v.err());
        assertTrue(v.err().contains("--against"), v.err());
        assertFalse(v.err().contains("Exception"), v.err());

        Path elsewhere = dir.resolve("nowhere/results.json");
        Run w = rosetra("verify", script.toString(), "--against", elsewhere.toString());
        assertEquals(2, w.status());
        assertTrue(w.err().contains(elsewhere.toString()), w.err());
    }

    @Test
    void committedResultsThatAreNotJsonAreAnError() throws IOException {
        Files.writeString(results, "{ \"format\": ");
        Run v = rosetra("verify", script.toString());
        assertEquals(2, v.status());
        assertTrue(v.err().startsWith("rosetra: error: cannot read " + results), v.err());
    }

    @Test
    void verifyWritesNothing() throws IOException {
        var before = snapshot(dir);
        assertEquals(0, rosetra("verify", script.toString()).status());
        RecordDeterminismTest.assertSameTreeOf(before, snapshot(dir));
    }

    @Test
    /** A hand-edited or other writer's 0 means the same number as 0.0. */
    void anIntegerInTheCommittedFileAgreesWithTheSameDouble() throws IOException {
        String committed = Files.readString(results);
        Files.writeString(results, committed.replace("\"sigma_z\" : 0.0", "\"sigma_z\" : 0"));
        Run v = rosetra("verify", script.toString());
        assertEquals(0, v.status(), v.out());
    }

    @Test
    @Disabled("BUG: ResultsFlattener ignores a rosette's \"state\" (and title, cases): a committed "
            + "plane_strain that is now plane_stress verifies as agreeing")
    void aChangedPlaneConditionIsADifference() throws IOException {
        String committed = Files.readString(results);
        Files.writeString(results, committed.replace("\"state\" : \"plane_stress\"", "\"state\" : \"plane_strain\""));
        Run v = rosetra("verify", script.toString());
        assertEquals(1, v.status(), v.out());
    }

    /** The number of MEMBER in CASE of the only rosette, read from the JSON text. */
    static double member(String json, String kase, String member) {
        Matcher m = memberPattern(kase, member).matcher(json);
        assertTrue(m.find(), kase + "." + member + " in results.json");
        return Double.parseDouble(m.group(2));
    }

    static String withMember(String json, String kase, String member, double value) {
        Matcher m = memberPattern(kase, member).matcher(json);
        assertTrue(m.find());
        return json.substring(0, m.start(2)) + String.format(Locale.ROOT, "%.17g", value) + json.substring(m.end(2));
    }

    private static Pattern memberPattern(String kase, String member) {
        return Pattern.compile("(\"" + kase + "\" : \\{[^}]*?\"" + member + "\" : )([-0-9.Ee+]+)", Pattern.DOTALL);
    }
}
