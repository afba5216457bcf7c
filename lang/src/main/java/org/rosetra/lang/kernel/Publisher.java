package org.rosetra.lang.kernel;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Executors;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.TimeUnit;
import org.zeromq.ZMQ;
import org.zeromq.ZMQException;

/**
 * The IOPub socket, shared by the shell thread and the control thread. A PUB socket is only
 * ever sent on, so a lock (which also hands the socket's state across threads) is all it
 * takes for two threads to use it in turn.
 *
 * <p>Messages are held for at most {@link #HOLD_MICROS} µs and sent together: each send
 * wakes ZeroMQ's I/O thread, and on a shared machine every wake-up can wait for a processor,
 * so a trivial cell's five messages leave in one or two bursts instead of five sends. A long
 * cell's output still streams: whatever is held goes out when the hold ends, before a reply,
 * or on {@link #flush}. Order is kept.
 */
final class Publisher {
    static final long HOLD_MICROS = 2000;

    private final ZMQ.Socket iopub;
    private final List<List<byte[]>> held = new ArrayList<>();
    private final ScheduledExecutorService timer = Executors.newSingleThreadScheduledExecutor(task -> {
        Thread t = new Thread(task, "rosetra-iopub-flush");
        t.setDaemon(true);
        return t;
    });
    private boolean flushScheduled;
    private boolean stopped;

    Publisher(ZMQ.Socket iopub) {
        this.iopub = iopub;
    }

    /** Sends {@code frames} within {@link #HOLD_MICROS} µs, after everything held before it. */
    synchronized void send(List<byte[]> frames) {
        if (stopped) {
            flush();
            Frames.send(iopub, frames);
            return;
        }
        held.add(frames);
        if (!flushScheduled) {
            flushScheduled = true;
            timer.schedule(this::flushOnTimer, HOLD_MICROS, TimeUnit.MICROSECONDS);
        }
    }

    /** Sends everything held now. */
    synchronized void flush() {
        for (List<byte[]> frames : held) {
            Frames.send(iopub, frames);
        }
        held.clear();
    }

    /** Sends what is held and sends at once from now on (the kernel is closing). */
    synchronized void stop() {
        flush();
        stopped = true;
        timer.shutdownNow();
    }

    private synchronized void flushOnTimer() {
        flushScheduled = false;
        try {
            flush();
        } catch (ZMQException e) {
            held.clear(); // the context is closing: the kernel is going away
        }
    }
}
