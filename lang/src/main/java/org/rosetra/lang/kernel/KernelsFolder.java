package org.rosetra.lang.kernel;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Map;
import java.util.concurrent.TimeUnit;

/**
 * Where kernelspecs live, by the Jupyter conventions for data folders (Jupyter client
 * documentation, "Kernel specs": {@code kernels} under a data directory).
 */
final class KernelsFolder {
    private KernelsFolder() {}

    /** The user's folder: $JUPYTER_DATA_DIR/kernels, else ~/.local/share/jupyter/kernels. */
    static Path forUser(Map<String, String> environment, Path home) {
        String dataDir = environment.get("JUPYTER_DATA_DIR");
        if (dataDir != null && !dataDir.isBlank()) {
            return Path.of(dataDir).resolve("kernels");
        }
        return home.resolve(".local/share/jupyter/kernels");
    }

    /** The folder of an installation prefix: DIR/share/jupyter/kernels. */
    static Path underPrefix(Path prefix) {
        return prefix.resolve("share/jupyter/kernels");
    }

    /** The folder of the Python environment that {@code python} runs in (its sys.prefix). */
    static Path forPythonEnvironment(String python) throws IOException {
        Process process = new ProcessBuilder(python, "-c", "import sys; print(sys.prefix)")
                .redirectErrorStream(true)
                .start();
        String output;
        try (InputStream in = process.getInputStream()) {
            output = new String(in.readAllBytes(), StandardCharsets.UTF_8).trim();
        }
        try {
            if (!process.waitFor(30, TimeUnit.SECONDS) || process.exitValue() != 0) {
                throw new IOException("could not ask " + python + " for its prefix: " + output);
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IOException("interrupted while asking " + python + " for its prefix", e);
        }
        return underPrefix(Path.of(output));
    }
}
