package org.rosetra.lang.kernel;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * The connection file a front end writes before it starts a kernel: where to listen and
 * the key that signs every message (Jupyter client documentation, "Connection files").
 */
public record ConnectionInfo(
        String transport, String ip, int shellPort, int controlPort, int iopubPort,
        int stdinPort, int heartbeatPort, String signatureScheme, String key) {

    /** Reads a connection file; a missing or unusable field is an {@link IOException}. */
    public static ConnectionInfo read(Path file) throws IOException {
        JsonFields fields = JsonFields.parse(Files.readAllBytes(file));
        ConnectionInfo info = new ConnectionInfo(
                fields.text("transport", "tcp"),
                fields.text("ip", "127.0.0.1"),
                port(fields, "shell_port", file),
                port(fields, "control_port", file),
                port(fields, "iopub_port", file),
                port(fields, "stdin_port", file),
                port(fields, "hb_port", file),
                fields.text("signature_scheme", "hmac-sha256"),
                fields.text("key", ""));
        if (!info.transport.equals("tcp")) {
            throw new IOException(file + ": transport \"" + info.transport
                    + "\" is not supported; use \"tcp\"");
        }
        if (!info.signatureScheme.equals("hmac-sha256")) {
            throw new IOException(file + ": signature_scheme \"" + info.signatureScheme
                    + "\" is not supported; use \"hmac-sha256\"");
        }
        return info;
    }

    private static int port(JsonFields fields, String name, Path file) throws IOException {
        int port = fields.whole(name, -1);
        if (port <= 0 || port > 65535) {
            throw new IOException(file + ": \"" + name + "\" must be a port number");
        }
        return port;
    }

    /** The ZeroMQ address for {@code port} on this connection's interface. */
    public String endpoint(int port) {
        return transport + "://" + ip + ":" + port;
    }

    public byte[] keyBytes() {
        return key.getBytes(StandardCharsets.UTF_8);
    }

    @Override
    public String toString() {
        // The key stays out of logs.
        return "ConnectionInfo[" + transport + "://" + ip + " shell=" + shellPort
                + " control=" + controlPort + " iopub=" + iopubPort + " stdin=" + stdinPort
                + " hb=" + heartbeatPort + "]";
    }
}
