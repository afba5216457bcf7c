package org.rosetra.lang.kernel;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.UUID;

/**
 * Turns frames into requests and messages into frames (Jupyter messaging protocol 5.3,
 * "The Wire Protocol"): routing identities, the delimiter {@code <IDS|MSG>}, the HMAC
 * signature, then header, parent header, metadata and content as JSON; extra buffers
 * after those are ignored.
 */
final class WireFormat {
    static final String PROTOCOL_VERSION = "5.3";
    static final byte[] DELIMITER = "<IDS|MSG>".getBytes(StandardCharsets.US_ASCII);

    private final MessageSigner signer;
    private final String session;

    WireFormat(MessageSigner signer, String session) {
        this.signer = signer;
        this.session = session;
    }

    Request decode(List<byte[]> frames) throws RejectedMessage {
        int delimiter = indexOfDelimiter(frames);
        if (delimiter < 0) {
            throw new RejectedMessage("no <IDS|MSG> delimiter");
        }
        if (frames.size() < delimiter + 6) {
            throw new RejectedMessage("fewer than five frames after the delimiter");
        }
        byte[] signature = frames.get(delimiter + 1);
        byte[] header = frames.get(delimiter + 2);
        byte[] parent = frames.get(delimiter + 3);
        byte[] metadata = frames.get(delimiter + 4);
        byte[] content = frames.get(delimiter + 5);
        if (!signer.verify(signature, header, parent, metadata, content)) {
            throw new RejectedMessage("invalid signature");
        }
        try {
            JsonFields headerFields = JsonFields.parse(header);
            String type = headerFields.text("msg_type")
                    .orElseThrow(() -> new RejectedMessage("header has no msg_type"));
            return new Request(frames.subList(0, delimiter), header, type,
                    JsonFields.parse(content));
        } catch (IOException e) {
            throw new RejectedMessage("not JSON: " + e.getMessage(), e);
        }
    }

    /** The frames of a new message of {@code type}, caused by the request whose header is {@code parent}. */
    List<byte[]> encode(List<byte[]> prefix, String type, byte[] parent, byte[] content) {
        byte[] header = header(type);
        byte[] metadata = JsonContent.EMPTY_OBJECT;
        List<byte[]> frames = new ArrayList<>(prefix.size() + 6);
        frames.addAll(prefix);
        frames.add(DELIMITER);
        frames.add(signer.sign(header, parent, metadata, content));
        frames.add(header);
        frames.add(parent);
        frames.add(metadata);
        frames.add(content);
        return frames;
    }

    private byte[] header(String type) {
        String date = Instant.now().truncatedTo(ChronoUnit.MICROS).toString();
        JsonContent header = json -> {
            json.writeStringField("msg_id", UUID.randomUUID().toString());
            json.writeStringField("session", session);
            json.writeStringField("username", "rosetra");
            json.writeStringField("date", date);
            json.writeStringField("msg_type", type);
            json.writeStringField("version", PROTOCOL_VERSION);
        };
        return header.toBytes();
    }

    private static int indexOfDelimiter(List<byte[]> frames) {
        for (int i = 0; i < frames.size(); i++) {
            if (Arrays.equals(frames.get(i), DELIMITER)) {
                return i;
            }
        }
        return -1;
    }
}
