package org.rosetra.lang.kernel;

import java.util.ArrayList;
import java.util.List;
import org.zeromq.ZMQ;

/** Sends and receives the frames of one multipart ZeroMQ message. */
final class Frames {
    private Frames() {}

    /** All frames of one message, or null when {@code flags} say not to wait and none is there. */
    static List<byte[]> receive(ZMQ.Socket socket, int flags) {
        byte[] first = socket.recv(flags);
        if (first == null) {
            return null;
        }
        List<byte[]> frames = new ArrayList<>(8);
        frames.add(first);
        while (socket.hasReceiveMore()) {
            frames.add(socket.recv(0));
        }
        return frames;
    }

    static void send(ZMQ.Socket socket, List<byte[]> frames) {
        int last = frames.size() - 1;
        for (int i = 0; i < last; i++) {
            socket.sendMore(frames.get(i));
        }
        socket.send(frames.get(last), 0);
    }
}
