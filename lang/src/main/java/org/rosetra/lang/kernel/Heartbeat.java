package org.rosetra.lang.kernel;

import java.util.List;
import org.zeromq.ZMQ;
import org.zeromq.ZMQException;

/**
 * Echoes every heartbeat back on its own thread, so a front end can tell a kernel that is
 * busy with a long cell from one that has died (Jupyter messaging protocol 5.3,
 * "Heartbeat for kernels").
 */
final class Heartbeat {
    /** How often the echo loop looks at the stop flag; heartbeats themselves are answered at once. */
    private static final int STOP_CHECK_MILLIS = 200;

    private final ZMQ.Socket socket;
    private final Thread thread;
    private volatile boolean stopped;

    /** Takes over {@code socket} (a bound REP socket); no other thread may touch it after this. */
    Heartbeat(ZMQ.Socket socket) {
        this.socket = socket;
        this.thread = new Thread(this::echo, "rosetra-heartbeat");
        this.thread.setDaemon(true);
    }

    void start() {
        socket.setReceiveTimeOut(STOP_CHECK_MILLIS);
        thread.start();
    }

    void stop() throws InterruptedException {
        stopped = true;
        thread.join(2 * STOP_CHECK_MILLIS + 1000);
    }

    private void echo() {
        try {
            while (!stopped) {
                List<byte[]> beat = Frames.receive(socket, 0);
                if (beat != null) {
                    Frames.send(socket, beat);
                }
            }
        } catch (ZMQException e) {
            // The context is closing: the kernel is going away.
        }
    }
}
