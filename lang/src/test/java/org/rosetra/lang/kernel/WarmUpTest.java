package org.rosetra.lang.kernel;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class WarmUpTest {
    @Test
    void sendsCellsThroughThePrivateLoopback() {
        // Whether it makes cells faster is for bench/kernel-roundtrip to show; here only that it runs.
        assertTrue(WarmUp.run() > 0);
    }
}
