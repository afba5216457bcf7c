package org.rosetra.lang.kernel;

import java.nio.charset.StandardCharsets;
import java.security.GeneralSecurityException;
import java.security.MessageDigest;
import javax.crypto.Mac;
import javax.crypto.spec.SecretKeySpec;

/**
 * Signs and checks messages with HMAC-SHA256 over header, parent header, metadata and
 * content, as lower-case hex (Jupyter messaging protocol 5.3, "The Wire Protocol"). An
 * empty key means signing is off: the signature is empty and every message is accepted.
 * Safe to share between threads.
 */
final class MessageSigner {
    private static final String ALGORITHM = "HmacSHA256";
    private static final byte[] HEX = "0123456789abcdef".getBytes(StandardCharsets.US_ASCII);

    private final SecretKeySpec key;
    private final ThreadLocal<Mac> macs;

    MessageSigner(byte[] key) {
        this.key = key.length == 0 ? null : new SecretKeySpec(key, ALGORITHM);
        this.macs = ThreadLocal.withInitial(this::newMac);
    }

    boolean isSigning() {
        return key != null;
    }

    /** The signature of the four parts, as the hex bytes sent on the wire. */
    byte[] sign(byte[] header, byte[] parentHeader, byte[] metadata, byte[] content) {
        if (key == null) {
            return new byte[0];
        }
        Mac mac = macs.get();
        mac.update(header);
        mac.update(parentHeader);
        mac.update(metadata);
        mac.update(content);
        return hex(mac.doFinal());
    }

    /** True when {@code signature} is right; compared in constant time. */
    boolean verify(byte[] signature, byte[] header, byte[] parentHeader, byte[] metadata,
            byte[] content) {
        if (key == null) {
            return true;
        }
        return MessageDigest.isEqual(signature, sign(header, parentHeader, metadata, content));
    }

    private Mac newMac() {
        try {
            Mac mac = Mac.getInstance(ALGORITHM);
            mac.init(key);
            return mac;
        } catch (GeneralSecurityException e) {
            throw new IllegalStateException("HMAC-SHA256 is part of every Java runtime", e);
        }
    }

    private static byte[] hex(byte[] digest) {
        byte[] out = new byte[digest.length * 2];
        for (int i = 0; i < digest.length; i++) {
            out[2 * i] = HEX[(digest[i] >> 4) & 0xf];
            out[2 * i + 1] = HEX[digest[i] & 0xf];
        }
        return out;
    }
}
