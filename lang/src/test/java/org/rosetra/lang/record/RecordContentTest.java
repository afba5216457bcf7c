package org.rosetra.lang.record;

import static org.junit.jupiter.api.Assertions.*;
import static org.rosetra.lang.record.RecordTestSupport.*;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.util.HexFormat;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Disabled;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** What a reviewer needs to find in the bracket's record.md (DESIGN.md, "Outputs": traceable, careful). */
class RecordContentTest {

    @TempDir
    static Path work;
    static String md;
    static String script;

    @BeforeAll
    static void run() throws IOException {
        Path s = bracketIn(work);
        assertEquals(0, rosetra("run", s.toString()).status());
        md = Files.readString(work.resolve(OUT).resolve("record.md"));
        script = Files.readString(s);
    }

    @Test
    void holdsTheScriptLineByLineWithItsNumbers() {
        String[] lines = script.split("\n");
        for (int i = 0; i < lines.length; i++) {
            String numbered = String.format(Locale.ROOT, "%2d  %s", i + 1, lines[i]);
            assertTrue(md.contains("\n" + numbered + "\n"), "line " + (i + 1) + " of the script: " + lines[i]);
        }
    }

    /** Source: the SHA-256 of the script's bytes by the JDK's MessageDigest (reference library). */
    @Test
    void holdsTheSha256OfTheScript() throws Exception {
        byte[] digest = MessageDigest.getInstance("SHA-256").digest(script.getBytes(StandardCharsets.UTF_8));
        assertTrue(md.contains("| " + SCRIPT + " | " + HexFormat.of().formatHex(digest) + " |"), md);
    }

    @Test
    void holdsTheCautionAndTheToolVersion() {
        assertTrue(md.contains("does not replace, the judgment of a qualified engineer"));
        assertTrue(Pattern.compile("Written by Rosetra \\d+\\.\\d+\\.\\d+").matcher(md).find());
    }

    /**
     * The check's utilization and governing case. Source: closed form, as in
     * RecordMohrGeometryTest: heavy case εx = 780, εy = −210, γ = 190 με; plane stress
     * σ1,2 = E/(1−ν)·C ± E/(1+ν)·R; von Mises √(σ1² − σ1σ2 + σ2²) (plane stress, common practice);
     * allowable 275 MPa / 1.5.
     */
    @Test
    void holdsTheGoverningCaseAndUtilizationOfTheCheck() {
        double e = 200e9, nu = 0.3;
        double c = (780 - 210) / 2.0 * 1e-6;
        double r = Math.hypot((780 + 210) / 2.0, 190 / 2.0) * 1e-6;
        double s1 = e / (1 - nu) * c + e / (1 + nu) * r;
        double s2 = e / (1 - nu) * c - e / (1 + nu) * r;
        double vm = Math.sqrt(s1 * s1 - s1 * s2 + s2 * s2);
        double utilization = vm / (275e6 / 1.5);
        Matcher row = Pattern.compile("\\| web yield margin \\| pass \\| ([0-9.]+) \\| heavy \\|").matcher(md);
        assertTrue(row.find(), md);
        assertEquals(utilization, Double.parseDouble(row.group(1)), 5e-5, "shown to four figures");
    }

    @Test
    void listsEveryCaseInTheResultTables() {
        for (String kase : new String[] {"light", "medium", "heavy"}) {
            assertEquals(3, count("\n| " + kase + " | web |", md), kase + ": three arms in the corrections table");
            assertEquals(2, count("\n| " + kase + " | ", md) - 3, kase + ": a row in the strain and the stress table");
        }
    }

    @Test
    @Disabled("BUG: a check that fails by less than the shown rounding prints 'FAIL | 1.000': the "
            + "utilization a reviewer reads is within the limit while the verdict says it is not")
    void aFailingCheckNeverShowsAUtilizationWithinTheLimit(@TempDir Path dir) throws IOException {
        Path s = dir.resolve(SCRIPT);
        // Allowable a hair under the heavy case's von Mises stress of 157.0658 MPa (see above).
        Files.writeString(s, resource(SCRIPT).replace("let allowable = plate.yield / 1.5",
                "let allowable = 157.0657 MPa"));
        Run run = rosetra("run", s.toString());
        assertEquals(1, run.status());
        String record = Files.readString(dir.resolve(OUT).resolve("record.md"));
        Matcher row = Pattern.compile("\\| web yield margin \\| FAIL \\| ([0-9.]+) \\|").matcher(record);
        assertTrue(row.find(), record);
        assertTrue(Double.parseDouble(row.group(1)) > 1, "shown utilization " + row.group(1));
    }

    private static int count(String needle, String hay) {
        int n = 0;
        for (int i = hay.indexOf(needle); i >= 0; i = hay.indexOf(needle, i + 1)) {
            n++;
        }
        return n;
    }
}
