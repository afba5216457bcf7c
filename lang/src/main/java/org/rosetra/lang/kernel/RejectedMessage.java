package org.rosetra.lang.kernel;

/** A message the kernel drops: badly framed, badly signed or not JSON. */
final class RejectedMessage extends Exception {
    RejectedMessage(String reason) {
        super(reason);
    }

    RejectedMessage(String reason, Throwable cause) {
        super(reason, cause);
    }
}
