package org.rosetra.lang.syntax;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import org.rosetra.lang.check.Diagnostics;

/** Small helpers shared by the syntax tests. */
final class ParseTestSupport {

    private ParseTestSupport() {
    }

    static String resource(String name) {
        try (InputStream in = ParseTestSupport.class.getResourceAsStream("/syntax/" + name)) {
            if (in == null) {
                throw new IllegalArgumentException("no test resource " + name);
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Parses and returns the script; the diagnostics are left in {@code diagnostics}. */
    static Script parse(String text, Diagnostics diagnostics) {
        return ScriptParser.parse("test.strain", text, diagnostics);
    }

    /** Parses text that must have no syntax error, and returns its only statement. */
    static Statement only(String text) {
        Diagnostics diagnostics = new Diagnostics();
        Script script = parse(text, diagnostics);
        if (diagnostics.hasErrors()) {
            throw new AssertionError(diagnostics.render(f -> text));
        }
        if (script.statements().size() != 1) {
            throw new AssertionError("expected one statement, got " + script.statements());
        }
        return script.statements().get(0);
    }

    /** The value of {@code let x = <text>}. */
    static Expr expr(String text) {
        return ((Let) only("let x = " + text)).body();
    }
}
