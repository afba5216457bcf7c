package org.rosetra.lang.kernel;

import org.zeromq.ZMQ;

/** Replies on the socket a request came from; everything else goes to IOPub. */
final class SocketOut implements MessageOut {
    private final WireFormat wire;
    private final ZMQ.Socket replies;
    private final Publisher iopub;

    /** {@code replies} must be owned by the calling thread. */
    SocketOut(WireFormat wire, ZMQ.Socket replies, Publisher iopub) {
        this.wire = wire;
        this.replies = replies;
        this.iopub = iopub;
    }

    /** Sends what is still held for IOPub. */
    @Override
    public void flush() {
        iopub.flush();
    }

    @Override
    public void publish(Request cause, String type, JsonContent content) {
        iopub.send(wire.encode(MessageOut.topic(type), type, cause.header(), content.toBytes()));
    }

    @Override
    public void reply(Request request, String type, JsonContent content) {
        iopub.flush(); // what the request published goes out before its reply
        Frames.send(replies, wire.encode(request.identities(), type, request.header(), content.toBytes()));
    }
}
