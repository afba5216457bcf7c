package org.rosetra.lang.kernel;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ConnectionInfoTest {
    @TempDir
    Path folder;

    @Test
    void readsTheFieldsOfAConnectionFile() throws IOException {
        // jupyter_client documentation, "Connection files": the fields and their names.
        Path file = folder.resolve("connection.json");
        Files.writeString(file, """
                {"shell_port": 50001, "iopub_port": 50002, "stdin_port": 50003,
                 "control_port": 50004, "hb_port": 50005, "ip": "127.0.0.1",
                 "key": "a0b1c2", "transport": "tcp", "signature_scheme": "hmac-sha256",
                 "kernel_name": "rosetra", "extra": {"ignored": [1, 2]}}
                """);
        ConnectionInfo info = ConnectionInfo.read(file);
        assertEquals(50001, info.shellPort());
        assertEquals(50004, info.controlPort());
        assertEquals(50005, info.heartbeatPort());
        assertEquals("tcp://127.0.0.1:50002", info.endpoint(info.iopubPort()));
        assertEquals("a0b1c2", info.key());
        assertFalse(info.toString().contains("a0b1c2"), "the key stays out of logs");
    }

    @Test
    void refusesWhatItCannotServe() throws IOException {
        Path noPorts = folder.resolve("no-ports.json");
        Files.writeString(noPorts, "{\"ip\": \"127.0.0.1\", \"key\": \"k\"}");
        assertThrows(IOException.class, () -> ConnectionInfo.read(noPorts));

        Path otherScheme = folder.resolve("other-scheme.json");
        Files.writeString(otherScheme, """
                {"shell_port": 1, "iopub_port": 2, "stdin_port": 3, "control_port": 4,
                 "hb_port": 5, "signature_scheme": "hmac-md5", "key": "k"}
                """);
        assertThrows(IOException.class, () -> ConnectionInfo.read(otherScheme));

        Path notJson = folder.resolve("not-json.json");
        Files.writeString(notJson, "shell_port = 1");
        assertThrows(IOException.class, () -> ConnectionInfo.read(notJson));
    }
}
