package org.rosetra.lang.kernel;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

class KernelCommandTest {
    @TempDir
    Path folder;

    @Test
    void installsTheKernelspecUnderAPrefix() throws Exception {
        int exit = new CommandLine(new KernelCommand(FakeEngine::new))
                .execute("install", "--prefix", folder.toString());
        assertEquals(0, exit);
        String json = Files.readString(folder.resolve("share/jupyter/kernels/rosetra/kernel.json"));
        assertTrue(json.contains("\"kernel\",\"--connection-file\",\"{connection_file}\""), json);
    }

    @Test
    void refusesTwoDestinations() {
        int exit = new CommandLine(new KernelCommand(FakeEngine::new))
                .execute("install", "--user", "--prefix", folder.toString());
        assertEquals(CommandLine.ExitCode.USAGE, exit);
    }

    @Test
    void needsAConnectionFileAndAnEngine() throws Exception {
        assertEquals(2, new CommandLine(new KernelCommand(FakeEngine::new)).execute());
        assertEquals(2, new CommandLine(new KernelCommand(FakeEngine::new))
                .execute("--connection-file", folder.resolve("missing.json").toString()));
        Path file = RunningKernel.writeConnectionFile(folder);
        assertEquals(1, new CommandLine(new KernelCommand()).execute("--no-warm-up", "--connection-file", file.toString()));
    }

    @Test
    void servesUntilShutdown() throws Exception {
        PythonClient.require("jupyter_client", "zmq");
        Path file = RunningKernel.writeConnectionFile(folder);
        int[] exit = {-1};
        Thread kernel = new Thread(() -> exit[0] = new CommandLine(new KernelCommand(FakeEngine::new))
                .execute("--no-warm-up", "--connection-file", file.toString()));
        kernel.start();
        PythonClient.Result result = PythonClient.run("shutdown.py", file.toString());
        assertEquals(0, result.exitCode(), result.output());
        kernel.join(10_000);
        assertEquals(0, exit[0]);
    }
}
