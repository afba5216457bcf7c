package org.rosetra.lang.repl;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.rosetra.lang.check.Diagnostics;
import org.rosetra.lang.plan.Session;

class ScriptCompleterTest {
    @TempDir
    Path folder;
    private ScriptCompleter completer;

    @BeforeEach
    void defineAnInventedSurvey() {
        Session session = new Session(folder);
        session.submit("script", "survey.strain", """
                material s355 {
                  E = 205 GPa
                  nu = 0.29
                }
                gauge foil {
                  factor = 2.0
                }
                rosette web_top {
                  layout = rectangular
                  gauge = foil
                  material = s355
                }
                case proof {
                  web_top = 1, 2, 3 ue
                }
                let allowable = 200 MPa
                """, new Diagnostics());
        completer = new ScriptCompleter(session::statements, List.of(":help", ":quit", ":reset"));
    }

    private List<String> at(String text) {
        return completer.complete(text, text.length()).candidates();
    }

    @Test
    void membersAfterADot() {
        List<String> members = at("web_top.");
        assertEquals("eps_x", members.get(0));
        assertTrue(members.contains("tresca") && members.contains("von_mises"), members.toString());
        assertEquals(List.of("sigma_x", "sigma_y", "sigma_z", "sigma_1", "sigma_2").stream().sorted().toList(),
                at("web_top.sig").stream().sorted().toList());
        assertTrue(at("web_top[proof].tau").contains("tau_max"));
        assertEquals(List.of("yield", "yield_c"), at("s355.yi"));
    }

    @Test
    void theReplacedRangeIsTheWordAtTheCursor() {
        Completions c = completer.complete("let x = web_top.sig + 1", 19);
        assertEquals(16, c.start());
        assertEquals(19, c.end());
    }

    @Test
    void unitsAfterANumber() {
        assertTrue(at("let p = 2 MP").contains("MPa"));
        assertTrue(at("  web_top = 412, -38, -121 u").contains("ue"));
        assertTrue(at("let q = 2 N/m").contains("mm"));
        assertFalse(at("let r = web2 M").contains("MPa"), "a name ending in a digit is not a number");
    }

    @Test
    void keywordsAndNamesAtTheStartOfALine() {
        assertTrue(at("ros").contains("rosette"));
        assertTrue(at("web").contains("web_top"));
        assertTrue(at("let y = all").contains("allowable"));
        assertTrue(at("let y = von").isEmpty() || !at("let y = von").contains("rosette"));
    }

    @Test
    void fieldsInsideABlockAndRosettesInsideACase() {
        assertTrue(at("rosette web_low {\n  lay").contains("layout"));
        assertTrue(at("case service {\n  web").contains("web_top"));
        assertTrue(at("case service {\n  temp").contains("temperature"));
    }

    @Test
    void casesInsideBrackets() {
        assertEquals(List.of("proof"), at("web_top.sigma_1[pr"));
    }

    @Test
    void commandsAtTheStartOfAnEntry() {
        Completions c = completer.complete(":re", 3);
        assertEquals(List.of(":reset"), c.candidates());
        assertEquals(0, c.start());
    }

    @Test
    void nothingInsideAJavaBody() {
        assertEquals(List.of(), at("let f(x) = java {\n  return Math.s"));
    }
}
