package org.rosetra.lang.kernel;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;
import org.junit.jupiter.api.io.TempDir;

/**
 * Notebooks run by nbclient, which starts the kernel from its kernelspec the way notebook
 * front ends do (a KernelManager, interrupt_mode "message"). Kernelspecs go into a
 * temporary JUPYTER_DATA_DIR so nothing of the user's is touched.
 */
class NotebookTest {
    @TempDir
    Path folder;

    private Map<String, String> jupyterFolders() throws IOException {
        Path data = Files.createDirectories(folder.resolve("jupyter-data"));
        Path runtime = Files.createDirectories(folder.resolve("jupyter-runtime"));
        return Map.of("JUPYTER_DATA_DIR", data.toString(), "JUPYTER_PATH", data.toString(),
                "JUPYTER_RUNTIME_DIR", runtime.toString());
    }

    @Test
    void runsANotebookOnTheFakeEngine() throws Exception {
        PythonClient.require("jupyter_client", "nbclient", "nbformat");
        PythonClient.Result result = PythonClient.run("run_notebook.py", FakeKernelSpec.install(folder),
                "--fake-engine", folder.toString(), FakeKernelSpec.NAME);
        assertEquals(0, result.exitCode(), result.output());
    }

    @Test
    void interruptsAndShutsDownThroughAKernelManager() throws Exception {
        PythonClient.require("jupyter_client");
        PythonClient.Result result = PythonClient.run("kernel_manager.py", FakeKernelSpec.install(folder),
                FakeKernelSpec.NAME);
        assertEquals(0, result.exitCode(), result.output());
    }

    @Test
    void runsTheExampleNotebooks() throws Exception {
        PythonClient.require("jupyter_client", "nbclient", "nbformat");
        Path examples = Path.of(System.getProperty("rosetra.examples", "../examples"), "notebook");
        Assumptions.assumeTrue(Files.isDirectory(examples), "no " + examples);
        Map<String, String> environment = jupyterFolders();
        // The real kernel of this build, started from the test classes (the jar is made later).
        List<String> argv = List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-cp", System.getProperty("java.class.path"), "org.rosetra.lang.cli.Main",
                "kernel", "--no-warm-up", "--connection-file", "{connection_file}");
        JsonContent spec = json -> {
            JsonContent.writeStrings(json, "argv", argv);
            json.writeStringField("display_name", "Rosetra (this build)");
            json.writeStringField("language", "rosetra");
            json.writeStringField("interrupt_mode", "message");
        };
        Path specFolder = Files.createDirectories(Path.of(environment.get("JUPYTER_DATA_DIR"), "kernels", KernelSpec.NAME));
        Files.write(specFolder.resolve("kernel.json"), spec.toBytes());
        List<Path> notebooks;
        try (Stream<Path> files = Files.list(examples)) {
            notebooks = files.filter(file -> file.toString().endsWith(".ipynb")).sorted().toList();
        }
        Assumptions.assumeFalse(notebooks.isEmpty(), "no notebooks in " + examples);
        for (Path notebook : notebooks) {
            PythonClient.Result result = PythonClient.run("run_notebook.py", environment,
                    notebook.toString(), KernelSpec.NAME);
            assertEquals(0, result.exitCode(), notebook + ":\n" + result.output());
        }
    }
}
