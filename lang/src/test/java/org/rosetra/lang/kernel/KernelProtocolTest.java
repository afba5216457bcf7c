package org.rosetra.lang.kernel;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The kernel on the fake engine, driven by jupyter_client (the protocol's reference client)
 * through the scripts in src/test/python/kernel. Each script names the section of the
 * Jupyter messaging protocol 5.3 it checks.
 */
class KernelProtocolTest {
    @TempDir
    Path folder;

    private RunningKernel kernel;

    @BeforeEach
    void start() throws Exception {
        PythonClient.require("jupyter_client", "zmq");
        kernel = new RunningKernel(folder);
    }

    @AfterEach
    void stop() throws Exception {
        if (kernel != null) {
            kernel.close();
        }
    }

    private void passes(String script, String... more) throws Exception {
        String[] args = new String[more.length + 1];
        args[0] = kernel.connectionFile.toString();
        System.arraycopy(more, 0, args, 1, more.length);
        PythonClient.Result result = PythonClient.run(script, args);
        assertEquals(0, result.exitCode(), script + " failed:\n" + result.output()
                + "\nkernel log:\n" + kernel.log());
    }

    @Test
    void answersKernelInfo() throws Exception {
        passes("kernel_info.py");
    }

    @Test
    void publishesTablesFiguresValuesAndPrintedText() throws Exception {
        passes("rich_output.py");
    }

    @Test
    void reportsAFailedCellAndKeepsRunning() throws Exception {
        passes("error_cell.py");
    }

    @Test
    void completesAndInspectsNames() throws Exception {
        passes("complete_inspect.py");
    }

    @Test
    void tellsWhetherABlockIsOpen() throws Exception {
        passes("is_complete.py");
    }

    @Test
    void stopsALongCellOnInterrupt() throws Exception {
        passes("interrupt.py");
    }

    @Test
    void dropsBadlySignedMessagesAndLogsThem() throws Exception {
        passes("tampered_signature.py");
        String log = kernel.log();
        assertTrue(log.contains("dropped a message on shell: invalid signature"), log);
        assertTrue(log.contains("no <IDS|MSG> delimiter"), log);
    }

    @Test
    void shutsDownOnControlRequest() throws Exception {
        passes("shutdown.py", "control");
        assertTrue(kernel.hasStoppedWithin(5_000), "kernel still running after shutdown_reply");
    }

    @Test
    void shutsDownOnShellRequest() throws Exception {
        passes("shutdown.py", "shell");
        assertTrue(kernel.hasStoppedWithin(5_000), "kernel still running after shutdown_reply");
    }
}
