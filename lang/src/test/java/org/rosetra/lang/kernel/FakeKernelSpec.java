package org.rosetra.lang.kernel;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;

/**
 * A temporary Jupyter data folder holding a kernelspec that starts this build's kernel on
 * the fake engine in its own JVM, and the environment that points Jupyter at it.
 */
final class FakeKernelSpec {
    static final String NAME = "rosetra-fake";

    private FakeKernelSpec() {}

    static Map<String, String> install(Path folder) throws IOException {
        Path data = Files.createDirectories(folder.resolve("jupyter-data"));
        Path runtime = Files.createDirectories(folder.resolve("jupyter-runtime"));
        List<String> argv = List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-cp", System.getProperty("java.class.path"), FakeKernelMain.class.getName(),
                "--no-warm-up", "--connection-file", "{connection_file}");
        JsonContent spec = json -> {
            JsonContent.writeStrings(json, "argv", argv);
            json.writeStringField("display_name", "Rosetra (fake engine)");
            json.writeStringField("language", "rosetra");
            json.writeStringField("interrupt_mode", "message");
        };
        Path specFolder = Files.createDirectories(data.resolve("kernels").resolve(NAME));
        Files.write(specFolder.resolve("kernel.json"), spec.toBytes());
        return Map.of("JUPYTER_DATA_DIR", data.toString(), "JUPYTER_PATH", data.toString(),
                "JUPYTER_RUNTIME_DIR", runtime.toString());
    }
}
