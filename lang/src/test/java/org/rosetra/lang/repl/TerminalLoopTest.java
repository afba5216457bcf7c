package org.rosetra.lang.repl;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import org.jline.terminal.Terminal;
import org.jline.terminal.impl.DumbTerminal;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.rosetra.lang.plan.Session;

class TerminalLoopTest {
    @TempDir
    Path folder;

    private String type(String input, Optional<Path> history) throws Exception {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try (Terminal terminal = new DumbTerminal("test", "dumb",
                new ByteArrayInputStream(input.getBytes(StandardCharsets.UTF_8)), out, StandardCharsets.UTF_8)) {
            Session session = new Session(folder);
            new TerminalLoop(terminal, history).run(new Repl(session), new ScriptCompleter(session));
        }
        return out.toString(StandardCharsets.UTF_8);
    }

    @Test
    void linesTypedAtATerminalAreAnsweredAndABlockGoesOnOverLines() throws Exception {
        String shown = type("material steel {\n  E = 200 GPa\n  nu = 0.3\n}\nsteel.E\n:quit\n", Optional.empty());
        assertTrue(shown.contains("200000 MPa"), shown);
        assertFalse(shown.contains("error"), shown);
    }

    @Test
    void theEndOfInputLeavesAndTheHistoryIsKept() throws Exception {
        Path history = folder.resolve(HistoryFile.NAME);
        String shown = type("let limit = 100 MPa\n", Optional.of(history));
        assertTrue(shown.contains("limit = 100.0 MPa"), shown);
        assertTrue(Files.readString(history).contains("let limit = 100 MPa"));
    }

    @Test
    void noHistoryFileWhenTheHomeCannotBeWritten() {
        assertEquals(Optional.empty(), HistoryFile.in(folder.resolve("no-such-home").toString()));
        assertEquals(Optional.of(folder.resolve(HistoryFile.NAME)), HistoryFile.in(folder.toString()));
        assertFalse(HistoryFile.in("").isPresent());
    }

    @Test
    void jlineIsGivenTheWordAndTheCandidatesOfTheCompleter() {
        Session session = new Session(folder);
        session.submit("s", "s.strain", "material steel {\n  E = 200 GPa\n  nu = 0.3\n}\n",
                new org.rosetra.lang.check.Diagnostics());
        ScriptCompleter completer = new ScriptCompleter(session);
        org.jline.reader.ParsedLine line = new EntryParser(completer)
                .parse("let e = ste + 1", 11, org.jline.reader.Parser.ParseContext.COMPLETE);
        assertEquals("ste", line.word());
        assertEquals(3, line.wordCursor());
        java.util.List<org.jline.reader.Candidate> candidates = new java.util.ArrayList<>();
        new CompletionAdapter(completer).complete(null, line, candidates);
        assertEquals(java.util.List.of("steel"), candidates.stream().map(org.jline.reader.Candidate::value).toList());
    }

    @Test
    void anOpenBlockTellsJLineTheEntryGoesOn() {
        EntryParser parser = new EntryParser(new ScriptCompleter(new Session(folder)));
        org.junit.jupiter.api.Assertions.assertThrows(org.jline.reader.EOFError.class,
                () -> parser.parse("material steel {", 16, org.jline.reader.Parser.ParseContext.ACCEPT_LINE));
        assertEquals("}", parser.parse("material steel {\n}", 18,
                org.jline.reader.Parser.ParseContext.ACCEPT_LINE).line().substring(17));
    }
}
