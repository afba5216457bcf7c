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
    void anInterruptStopsALongSeriesReadCleanly() throws Exception {
        PythonClient.require("jupyter_client");
        Map<String, String> environment = jupyterFolders();
        installThisBuild(environment);
        // An invented log long enough that reading it takes well over the interrupt's delay.
        Path data = folder.resolve("long.csv");
        try (var out = new java.io.PrintWriter(Files.newBufferedWriter(data))) {
            out.println("t_s,g1,g2,g3");
            for (int i = 0; i < 3_000_000; i++) {
                out.printf(java.util.Locale.ROOT, "%d.%03d,%d.25,%d.5,-%d.75%n", i / 1000, i % 1000,
                        100 + i % 400, 50 + i % 300, 20 + i % 200);
            }
        }
        PythonClient.Result result = PythonClient.run("interrupt_series.py", environment,
                KernelSpec.NAME, folder.toString());
        assertEquals(0, result.exitCode(), result.output());
    }

    /** The real kernel of this build, started from the test classes (the jar is made later). */
    private static void installThisBuild(Map<String, String> environment) throws IOException {
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
    }

    @Test
    void runsTheExampleNotebooks() throws Exception {
        PythonClient.require("jupyter_client", "nbclient", "nbformat");
        Path examples = Path.of(System.getProperty("rosetra.examples", "../examples"), "notebook");
        Assumptions.assumeTrue(Files.isDirectory(examples), "no " + examples);
        Map<String, String> environment = jupyterFolders();
        installThisBuild(environment);
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
