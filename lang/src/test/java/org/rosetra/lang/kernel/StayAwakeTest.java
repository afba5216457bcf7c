package org.rosetra.lang.kernel;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class StayAwakeTest {
    /** Waits up to two seconds for the thread to reach {@code state} (the machine may be slow). */
    private static boolean reaches(StayAwake awake, Thread.State state) throws InterruptedException {
        for (int i = 0; i < 200; i++) {
            if (awake.state() == state) {
                return true;
            }
            Thread.sleep(10);
        }
        return false;
    }

    @Test
    void sleepsBetweenRequestsAndStopsSpinningDuringALongOne() throws InterruptedException {
        StayAwake awake = new StayAwake();
        awake.start();
        try {
            assertTrue(reaches(awake, Thread.State.WAITING), "parked before any request");

            awake.begin(); // a long cell: the spinning ends on its own after MAX_SPIN_NANOS
            assertTrue(reaches(awake, Thread.State.WAITING), "parked while a long request still runs");

            awake.end();
            assertTrue(reaches(awake, Thread.State.WAITING), "parked again after the reply");
        } finally {
            awake.stop();
        }
        assertTrue(reaches(awake, Thread.State.TERMINATED), "stop() ends the thread");
        assertEquals(Thread.State.TERMINATED, awake.state());
    }
}
