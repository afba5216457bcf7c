package org.rosetra.lang.kernel;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.Test;

class MessageSignerTest {
    private static byte[] bytes(String text) {
        return text.getBytes(StandardCharsets.UTF_8);
    }

    @Test
    void signsWithHmacSha256AsLowerCaseHex() {
        // RFC 4231, section 4.3 (test case 2): key "Jefe", data "what do ya want for nothing?".
        // The four parts are concatenated before hashing (messaging protocol 5.3, "The Wire Protocol").
        MessageSigner signer = new MessageSigner(bytes("Jefe"));
        byte[] signature = signer.sign(bytes("what do "), bytes("ya want "), bytes("for "), bytes("nothing?"));
        assertEquals("5bdcc146bf60754e6a042426089575c75a003f089d2739839dec58b964ec3843",
                new String(signature, StandardCharsets.US_ASCII));
    }

    @Test
    void acceptsOnlyTheRightSignature() {
        MessageSigner signer = new MessageSigner(bytes("a-shared-key"));
        byte[] header = bytes("{\"msg_type\":\"kernel_info_request\"}");
        byte[] empty = bytes("{}");
        byte[] signature = signer.sign(header, empty, empty, empty);
        assertTrue(signer.verify(signature, header, empty, empty, empty));

        byte[] wrong = signature.clone();
        wrong[0] = (byte) (wrong[0] == '0' ? '1' : '0');
        assertFalse(signer.verify(wrong, header, empty, empty, empty));
        assertFalse(signer.verify(signature, header, empty, empty, bytes("{\"code\":\"x\"}")));
        assertFalse(new MessageSigner(bytes("another-key")).verify(signature, header, empty, empty, empty));
    }

    @Test
    void anEmptyKeyTurnsSigningOff() {
        // Messaging protocol 5.3, "The Wire Protocol": with authentication disabled the signature is empty.
        MessageSigner signer = new MessageSigner(new byte[0]);
        assertFalse(signer.isSigning());
        assertArrayEquals(new byte[0], signer.sign(bytes("{}"), bytes("{}"), bytes("{}"), bytes("{}")));
        assertTrue(signer.verify(new byte[0], bytes("{}"), bytes("{}"), bytes("{}"), bytes("{}")));
    }
}
