package org.rosetra.lang.kernel;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.net.ServerSocket;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HexFormat;
import java.util.UUID;
import java.util.concurrent.TimeUnit;

/** A kernel on the fake engine, in this JVM, with its connection file in a test folder. */
final class RunningKernel implements AutoCloseable {
    final Path connectionFile;
    private final Kernel kernel;
    private final Thread thread;
    private final ByteArrayOutputStream logBytes = new ByteArrayOutputStream();

    RunningKernel(Path folder) throws IOException, InterruptedException {
        connectionFile = writeConnectionFile(folder);
        PrintStream log = new PrintStream(logBytes, true, StandardCharsets.UTF_8);
        kernel = new Kernel(ConnectionInfo.read(connectionFile), new FakeEngine(), log).withoutWarmUp();
        thread = new Thread(() -> {
            try {
                kernel.run();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        }, "kernel-under-test");
        thread.start();
        if (!kernel.awaitReady(10, TimeUnit.SECONDS)) {
            throw new IllegalStateException("kernel did not bind its sockets");
        }
    }

    /** What the kernel wrote to its log (stderr when run for real). */
    synchronized String log() {
        return logBytes.toString(StandardCharsets.UTF_8);
    }

    boolean hasStoppedWithin(long millis) throws InterruptedException {
        thread.join(millis);
        return !thread.isAlive();
    }

    @Override
    public void close() {
        kernel.stop();
        try {
            thread.join(10_000);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }

    static Path writeConnectionFile(Path folder) throws IOException {
        String key = HexFormat.of().formatHex(UUID.randomUUID().toString().getBytes(StandardCharsets.US_ASCII));
        String json = "{\n"
                + "  \"transport\": \"tcp\",\n"
                + "  \"ip\": \"127.0.0.1\",\n"
                + "  \"shell_port\": " + freePort() + ",\n"
                + "  \"control_port\": " + freePort() + ",\n"
                + "  \"iopub_port\": " + freePort() + ",\n"
                + "  \"stdin_port\": " + freePort() + ",\n"
                + "  \"hb_port\": " + freePort() + ",\n"
                + "  \"signature_scheme\": \"hmac-sha256\",\n"
                + "  \"key\": \"" + key + "\",\n"
                + "  \"kernel_name\": \"rosetra\"\n"
                + "}\n";
        Path file = folder.resolve("kernel-" + UUID.randomUUID() + ".json");
        Files.writeString(file, json);
        return file;
    }

    private static int freePort() throws IOException {
        try (ServerSocket socket = new ServerSocket(0)) {
            return socket.getLocalPort();
        }
    }
}
