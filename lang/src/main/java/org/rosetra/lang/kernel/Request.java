package org.rosetra.lang.kernel;

import java.util.List;

/**
 * A checked request from a front end: the routing identities to answer to, its header as
 * received (it becomes the parent header of every message it causes), its type and the
 * scalar fields of its content.
 */
record Request(List<byte[]> identities, byte[] header, String type, JsonFields content) {

    Request {
        identities = List.copyOf(identities);
    }
}
