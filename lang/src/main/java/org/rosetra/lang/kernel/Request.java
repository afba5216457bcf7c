package org.rosetra.lang.kernel;

import java.util.List;

/**
 * A checked request from a front end: the routing identities to answer to, its header as
 * received (it becomes the parent header of every message it causes), its type and the
 * scalar fields of its content. {@code sequence} numbers shell requests in arrival order.
 */
record Request(List<byte[]> identities, byte[] header, String type, JsonFields content,
        long sequence) {

    Request {
        identities = List.copyOf(identities);
    }

    Request numbered(long arrival) {
        return new Request(identities, header, type, content, arrival);
    }
}
