package org.rosetra.lang.kernel;

import java.util.concurrent.locks.LockSupport;

/**
 * Keeps one processor busy while the kernel answers a request and for a moment after, so the
 * threads that carry its messages (ZeroMQ's I/O thread here, and the front end's) are woken
 * on a processor that is awake.
 *
 * <p>Why: timing each step of slow cells (kernel and client on one clock) showed the kernel
 * sending its reply on time and the front end getting it about 2 ms late, while a processor
 * that has gone idle on this shared virtual machine was being woken. bench/kernel-roundtrip,
 * 200 cells, alternating runs: medians 2.40-2.75 ms (7 runs, spinning through each whole
 * request) against 2.19-3.73 ms (7 runs, two above 3 ms) without; then, with the 2 ms cap,
 * 2.29-2.95 ms through the kernelspec (8 runs). It spins for at most {@link #MAX_SPIN_NANOS} at the start
 * of a request, so a long cell does not keep a processor from its own work, and
 * {@link #AFTER_NANOS} after its end, when the reply and the idle status leave.
 */
final class StayAwake {
    static final long MAX_SPIN_NANOS = 2_000_000;
    static final long AFTER_NANOS = 300_000;

    private final Thread thread = new Thread(this::run, "rosetra-stay-awake");
    private volatile long spinUntil;
    private volatile boolean stopped;

    StayAwake() {
        thread.setDaemon(true);
    }

    void start() {
        thread.start();
    }

    /** A request is being answered. */
    void begin() {
        awakeUntil(System.nanoTime() + MAX_SPIN_NANOS);
    }

    /** Its reply and status have been handed to ZeroMQ. */
    void end() {
        awakeUntil(System.nanoTime() + AFTER_NANOS);
    }

    void stop() {
        stopped = true;
        LockSupport.unpark(thread);
    }

    /** For tests: RUNNABLE while spinning, WAITING while parked. */
    Thread.State state() {
        return thread.getState();
    }

    private void awakeUntil(long deadline) {
        spinUntil = deadline;
        LockSupport.unpark(thread);
    }

    private void run() {
        while (!stopped) {
            while (System.nanoTime() < spinUntil && !stopped) {
                Thread.onSpinWait();
            }
            LockSupport.park(); // until the next request (a spurious wake-up only loops)
        }
    }
}
