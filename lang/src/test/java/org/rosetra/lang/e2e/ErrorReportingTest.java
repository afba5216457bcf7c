package org.rosetra.lang.e2e;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Disabled;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Errors in a script, reported by {@code rosetra run} (LANGUAGE.md, "Running and results"):
 * exit status 2, {@code FILE:LINE:COL: error: message}, the line with a caret, nothing
 * written. Each script in resources/e2e/errors holds one mistake and names its place.
 */
class ErrorReportingTest {
    @TempDir
    Path dir;

    private ScriptRun runScript(String name) {
        ErrorScripts.ErrorScript script = ErrorScripts.load(name);
        ScriptRun run = ScriptRun.run(dir, name + ".strain", script.text());
        ErrorScripts.assertReportedAt(run, script);
        return run;
    }

    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {
        "field-dimension",          // E = 205 ue
        "field-dimension-angle",    // angle = 30 MPa
        "unknown-name",             // rr.von_mises
        "unknown-member",           // r.von_mise
        "reading-count",            // two readings for three arms
        "baseline-missing-rosette", // read in the case, not in its baseline
        "trig-of-number",           // sin(2), at the argument
        "unlike-sum",               // 3 MPa + 2 ue
        "unclosed-block",           // gauge spare { without }
        "keyword-as-name",          // let rosette = 3
        "missing-strength",         // rankine(r) without ultimate
        "missing-strength-check",   // mohr_coulomb(r) in a check, without ultimate
    })
    void reportedAtItsPlace(String name) {
        runScript(name);
    }

    @Test
    void anUnknownNameGetsTheNearestNameAsAHint() {
        ScriptRun run = runScript("unknown-name");
        // rr is one letter away from the rosette r
        assertTrue(Pattern.compile("hint:.*\\br\\b").matcher(run.err).find(), () -> "a hint naming r:\n" + run.err);
    }

    @Test
    void anUnknownMemberGetsTheNearestMemberAsAHint() {
        ScriptRun run = runScript("unknown-member");
        assertTrue(run.err.contains("von_mises"), () -> "a hint naming von_mises:\n" + run.err);
    }

    @Test
    void unknownGaugeOfARosette() {
        ScriptRun run = runScript("unknown-gauge");
        assertTrue(run.err.contains("foil"), () -> "a hint naming foil:\n" + run.err);
    }

    @Test
    void missingBaseline() {
        runScript("missing-baseline");
    }

    @Test
    void comparingUnlikeDimensions() {
        runScript("unlike-comparison");
    }

    @Test
    void duplicateName() {
        runScript("duplicate-name");
    }

    @Test
    void readingForAnUndeclaredRosette() {
        runScript("undeclared-rosette");
    }

    @Test
    void wrongDimensionInAnUnusedDeclaration() {
        runScript("unused-field-dimension");
    }

    @Test
    void aFailedRunLeavesTheLastGoodOutputsAsTheyWere() throws Exception {
        ErrorScripts.ErrorScript broken = ErrorScripts.load("reading-count");
        // the same survey without its mistake: three readings for three arms
        String fixed = broken.text().replace("r = 100, 50 ue", "r = 100, 50, 20 ue");
        ScriptRun good = ScriptRun.run(dir, "reading-count.strain", fixed).ok();
        java.nio.file.Path results = good.outDir.resolve("results.json");
        byte[] before = java.nio.file.Files.readAllBytes(results);
        ScriptRun bad = ScriptRun.run(dir, "reading-count.strain", broken.text());
        // The record issue: "a script with an error writes nothing and leaves the last good
        // outputs as they were" (the record names the script's SHA-256, so they do not pass
        // for outputs of the broken script).
        org.junit.jupiter.api.Assertions.assertEquals(2, bad.status);
        org.junit.jupiter.api.Assertions.assertArrayEquals(before, java.nio.file.Files.readAllBytes(results));
    }
}
