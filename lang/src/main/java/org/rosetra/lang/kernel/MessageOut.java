package org.rosetra.lang.kernel;

import java.nio.charset.StandardCharsets;
import java.util.List;

/** Where the handling of a request sends the messages it causes. */
interface MessageOut {

    /** Sends a message of {@code type} on the broadcast channel, as caused by {@code cause}. */
    void publish(Request cause, String type, JsonContent content);

    /** Answers {@code request} on the socket it came from. */
    void reply(Request request, String type, JsonContent content);

    /** Sends at once whatever is held back to be sent together (see {@link Publisher}). */
    default void flush() {
    }

    default void status(Request cause, String state) {
        publish(cause, "status", json -> json.writeStringField("execution_state", state));
    }

    /** The IOPub topic: the message type, the convention front ends expect. */
    static List<byte[]> topic(String type) {
        return List.of(("kernel." + type).getBytes(StandardCharsets.US_ASCII));
    }
}
