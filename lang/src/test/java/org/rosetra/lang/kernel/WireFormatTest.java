package org.rosetra.lang.kernel;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

class WireFormatTest {
    private final WireFormat wire = new WireFormat(
            new MessageSigner("key".getBytes(StandardCharsets.UTF_8)), "session-1");

    private static byte[] bytes(String text) {
        return text.getBytes(StandardCharsets.UTF_8);
    }

    private List<byte[]> executeRequest() {
        JsonContent content = json -> {
            json.writeStringField("code", "let x = 1 MPa");
            json.writeBooleanField("silent", false);
            json.writeObjectFieldStart("user_expressions");
            json.writeEndObject();
        };
        return wire.encode(List.of(bytes("client-7")), "execute_request", JsonContent.EMPTY_OBJECT,
                content.toBytes());
    }

    @Test
    void framesIdentitiesDelimiterSignatureAndFourParts() {
        // Messaging protocol 5.3, "The Wire Protocol": identities, <IDS|MSG>, HMAC, header,
        // parent header, metadata, content.
        List<byte[]> frames = executeRequest();
        assertEquals(7, frames.size());
        assertArrayEquals(bytes("client-7"), frames.get(0));
        assertArrayEquals(bytes("<IDS|MSG>"), frames.get(1));
        assertEquals(64, frames.get(2).length, "hex of a SHA-256 digest");
        String header = new String(frames.get(3), StandardCharsets.UTF_8);
        assertTrue(header.contains("\"msg_type\":\"execute_request\""), header);
        assertTrue(header.contains("\"version\":\"5.3\""), header);
        assertTrue(header.contains("\"session\":\"session-1\""), header);
    }

    @Test
    void readsBackWhatItWrote() throws RejectedMessage {
        Request request = wire.decode(executeRequest());
        assertEquals("execute_request", request.type());
        assertEquals("let x = 1 MPa", request.content().text("code", ""));
        assertEquals(false, request.content().flag("silent", true));
        assertEquals(1, request.identities().size());
    }

    @Test
    void rejectsAChangedSignatureOrContent() {
        List<byte[]> badSignature = new ArrayList<>(executeRequest());
        byte[] signature = badSignature.get(2).clone();
        signature[5] = (byte) (signature[5] == 'a' ? 'b' : 'a');
        badSignature.set(2, signature);
        assertEquals("invalid signature",
                assertThrows(RejectedMessage.class, () -> wire.decode(badSignature)).getMessage());

        List<byte[]> badContent = new ArrayList<>(executeRequest());
        badContent.set(6, bytes("{\"code\":\"something else\"}"));
        assertThrows(RejectedMessage.class, () -> wire.decode(badContent));
    }

    @Test
    void rejectsMessagesThatAreNotFramedAsTheProtocolSays() {
        assertThrows(RejectedMessage.class, () -> wire.decode(List.of(bytes("hello"))));
        List<byte[]> short_ = executeRequest().subList(0, 5);
        assertThrows(RejectedMessage.class, () -> wire.decode(short_));
    }

    @Test
    void rejectsSignedPartsThatAreNotJsonObjects() {
        WireFormat unsigned = new WireFormat(new MessageSigner(new byte[0]), "s");
        List<byte[]> frames = List.of(WireFormat.DELIMITER, new byte[0], bytes("[1, 2]"),
                bytes("{}"), bytes("{}"), bytes("{}"));
        assertThrows(RejectedMessage.class, () -> unsigned.decode(frames));
        List<byte[]> noType = List.of(WireFormat.DELIMITER, new byte[0], bytes("{}"),
                bytes("{}"), bytes("{}"), bytes("{}"));
        assertThrows(RejectedMessage.class, () -> unsigned.decode(noType));
    }
}
