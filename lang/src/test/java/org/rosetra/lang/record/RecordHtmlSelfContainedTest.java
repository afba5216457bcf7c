package org.rosetra.lang.record;

import static org.junit.jupiter.api.Assertions.*;
import static org.rosetra.lang.record.RecordTestSupport.*;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * record.html opens and prints the same anywhere, off line: it loads nothing from outside, its
 * figures are inline SVG, and it has a print page rule (A4 and Letter both take "size: auto").
 */
class RecordHtmlSelfContainedTest {

    @TempDir
    static Path work;
    static String html;

    @BeforeAll
    static void run() throws IOException {
        assertEquals(0, rosetra("run", bracketIn(work).toString()).status());
        html = Files.readString(work.resolve(OUT).resolve("record.html"));
    }

    @Test
    void loadsNothingFromOutside() {
        for (String banned : new String[] {"http://", "https://", "<link", "@import", "<iframe", "<object",
                "<embed", "<img", "<script"}) {
            assertFalse(html.toLowerCase(java.util.Locale.ROOT).contains(banned), "record.html holds " + banned);
        }
        Matcher url = Pattern.compile("url\\(\\s*['\"]?([^)'\"]*)").matcher(html);
        int count = 0;
        while (url.find()) {
            assertTrue(url.group(1).startsWith("#"), "url() points outside the page: " + url.group(1));
            count++;
        }
        assertTrue(count > 0, "the inline figure uses its own clip paths");
        Matcher ref = Pattern.compile("(?:src|href|xlink:href)\\s*=\\s*\"([^\"]*)\"").matcher(html);
        while (ref.find()) {
            String target = ref.group(1);
            assertTrue(target.startsWith("#"), "record.html refers to " + target);
        }
    }

    @Test
    void everyFigureIsInlineSvgWithUniqueIds() {
        int figures = count("<figure", html);
        assertEquals(1, figures, "the bracket has one plot");
        assertEquals(figures, count("<svg", html), "every figure is an inline <svg>");
        assertEquals(0, count("<?xml", html), "no XML prologue pasted into the page");
        assertEquals(0, count("<!DOCTYPE svg", html), "no SVG doctype pasted into the page");
        Matcher ids = Pattern.compile("\\sid=\"([^\"]+)\"").matcher(html);
        java.util.Set<String> seen = new java.util.HashSet<>();
        while (ids.find()) {
            assertTrue(seen.add(ids.group(1)), "id used twice: " + ids.group(1));
        }
        Matcher refs = Pattern.compile("url\\(#([^)]+)\\)").matcher(html);
        while (refs.find()) {
            assertTrue(seen.contains(refs.group(1)), "url(#" + refs.group(1) + ") names no element");
        }
    }

    @Test
    void printsOnA4AndLetter() {
        Matcher page = Pattern.compile("@page\\s*\\{([^}]*)\\}").matcher(html);
        assertTrue(page.find(), "an @page rule exists");
        String rule = page.group(1);
        assertTrue(rule.contains("size: auto"), "the printer's paper (A4 or Letter) decides: " + rule);
        assertTrue(rule.contains("margin"), rule);
        assertTrue(html.contains("@media print"), "print styles");
        assertTrue(html.contains("break-inside: avoid"), "tables and figures are not split across pages");
    }

    @Test
    void carriesItsCautionAndWhatMadeIt() {
        assertTrue(html.contains("does not replace, the judgment of a qualified engineer"));
        assertTrue(html.contains("Written by Rosetra "), "the tool's version");
        assertTrue(Pattern.compile("<td class=\"text\">[0-9a-f]{64}</td>").matcher(html).find(), "the script's SHA-256");
    }

    private static int count(String needle, String hay) {
        int n = 0;
        for (int i = hay.indexOf(needle); i >= 0; i = hay.indexOf(needle, i + 1)) {
            n++;
        }
        return n;
    }
}
