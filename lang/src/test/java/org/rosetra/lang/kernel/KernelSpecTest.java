package org.rosetra.lang.kernel;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class KernelSpecTest {
    @TempDir
    Path folder;

    @Test
    void writesKernelJsonThatStartsTheLauncher() throws IOException {
        // jupyter_client documentation, "Kernel specs": argv with {connection_file},
        // display_name, language, interrupt_mode, metadata.
        Path written = new KernelSpec(Path.of("/opt/rosetra/rosetra")).installInto(folder);
        assertEquals(folder.resolve("rosetra/kernel.json"), written);
        String json = Files.readString(written);
        assertEquals("{\"argv\":[\"/opt/rosetra/rosetra\",\"kernel\",\"--connection-file\","
                + "\"{connection_file}\"],\"display_name\":\"Rosetra\",\"language\":\"rosetra\","
                + "\"interrupt_mode\":\"message\",\"metadata\":{\"debugger\":false}}", json);
        try (var files = Files.list(written.getParent())) {
            assertEquals(1, files.count(), "no partial file left behind");
        }
    }

    @Test
    void findsTheStandardKernelsFolders() {
        // Jupyter documentation, "Common Directories and File Locations": JUPYTER_DATA_DIR,
        // else ~/.local/share/jupyter on Linux; a prefix holds share/jupyter.
        Path home = Path.of("/home/analyst");
        assertEquals(Path.of("/home/analyst/.local/share/jupyter/kernels"),
                KernelsFolder.forUser(Map.of(), home));
        assertEquals(Path.of("/data/jupyter/kernels"),
                KernelsFolder.forUser(Map.of("JUPYTER_DATA_DIR", "/data/jupyter"), home));
        assertEquals(Path.of("/opt/env/share/jupyter/kernels"),
                KernelsFolder.underPrefix(Path.of("/opt/env")));
    }

    @Test
    void asksPythonForItsPrefix() throws IOException {
        // Python documentation, sys.prefix; the kernels folder under it as for --prefix.
        Assumptions.assumeTrue(Files.isExecutable(Path.of("/usr/bin/python3")), "needs /usr/bin/python3");
        assertEquals(Path.of("/usr/share/jupyter/kernels"),
                KernelsFolder.forPythonEnvironment("/usr/bin/python3"));
    }

    @Test
    void findsTheLauncherThreeLevelsAboveTheRunningCode() {
        // Run from lang/target/classes here, like lang/target/rosetra.jar in use.
        Path launcher = Launcher.locate();
        assertEquals("rosetra", launcher.getFileName().toString());
        assertTrue(Files.isRegularFile(launcher), launcher + " should be the project's launcher");
    }
}
