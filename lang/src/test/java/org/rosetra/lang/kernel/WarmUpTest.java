package org.rosetra.lang.kernel;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class WarmUpTest {
    @Test
    void sendsCellsThroughThePrivateLoopback() {
        // Whether it makes cells faster is for bench/kernel-roundtrip to show; here only that it runs.
        assertTrue(WarmUp.run() > 0);
    }

    @Test
    void runsRealCellsInTheScratchEngineOnly(@TempDir Path folder) {
        SessionCellEngine scratch = new SessionCellEngine(folder, false, "test");
        SessionCellEngine served = new SessionCellEngine(folder, false, "test");
        assertTrue(WarmUp.run(scratch) > 0);

        // The scratch session now knows x; the served one, a separate session, does not.
        assertTrue(scratch.execute("let z = x", new Collecting()) instanceof CellOutcome.Success);
        Collecting sink = new Collecting();
        CellOutcome outcome = served.execute("let z = x", sink);
        assertTrue(outcome instanceof CellOutcome.Failure, "the served session must not see the warm-up's names");
        assertEquals(List.of(), sink.shown);
    }

    private static final class Collecting implements OutputSink {
        final List<MimeBundle> shown = new ArrayList<>();

        @Override
        public void display(MimeBundle bundle) {
            shown.add(bundle);
        }

        @Override
        public void printOut(String text) {
        }

        @Override
        public void printErr(String text) {
        }
    }
}
