package org.rosetra.lang.kernel;

import java.util.List;
import org.zeromq.ZMQ;

/**
 * The IOPub socket, shared by the shell thread and the control thread. A PUB socket is only
 * ever sent on, so a lock (which also hands the socket's state across threads) is all it
 * takes for two threads to use it in turn.
 */
final class Publisher {
    private final ZMQ.Socket iopub;

    Publisher(ZMQ.Socket iopub) {
        this.iopub = iopub;
    }

    synchronized void send(List<byte[]> frames) {
        Frames.send(iopub, frames);
    }
}
