package org.rosetra.lang.kernel;

import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Assumptions;

/**
 * Runs the Python driver scripts in {@code src/test/python/kernel}, which talk to a kernel
 * through jupyter_client, the reference client of the protocol. Without a Python that has
 * jupyter_client the tests are skipped, except on CI (CI=true), where that is a failure.
 */
final class PythonClient {
    private static final Path SCRIPTS = Path.of("src/test/python/kernel").toAbsolutePath();
    private static final String PYTHON = findPython();

    record Result(int exitCode, String output) {}

    private PythonClient() {}

    /** Skips (or on CI fails) the calling test when no suitable Python is present. */
    static void require(String... modules) {
        String missing = PYTHON == null ? "a python3 with jupyter_client" : missingModules(modules);
        if (missing == null) {
            return;
        }
        if ("true".equals(System.getenv("CI"))) {
            fail("CI needs " + missing + " (apt-get install python3-jupyter-client"
                    + " python3-nbclient python3-nbformat)");
        }
        Assumptions.abort("skipped: needs " + missing);
    }

    static Result run(String script, Map<String, String> environment, String... args)
            throws IOException, InterruptedException {
        require();
        List<String> command = new ArrayList<>(List.of(PYTHON, SCRIPTS.resolve(script).toString()));
        command.addAll(List.of(args));
        ProcessBuilder builder = new ProcessBuilder(command).redirectErrorStream(true);
        builder.environment().put("PYTHONPATH", SCRIPTS.toString());
        builder.environment().putAll(environment);
        Process process = builder.start();
        byte[] output;
        try (InputStream in = process.getInputStream()) {
            output = in.readAllBytes(); // the scripts end themselves within their own timeouts
        }
        if (!process.waitFor(120, TimeUnit.SECONDS)) {
            process.destroyForcibly();
            fail(script + " did not finish");
        }
        return new Result(process.exitValue(), new String(output, StandardCharsets.UTF_8));
    }

    static Result run(String script, String... args) throws IOException, InterruptedException {
        return run(script, Map.of(), args);
    }

    private static String missingModules(String... modules) {
        for (String module : modules) {
            if (!canImport(PYTHON, module)) {
                return "the Python module " + module;
            }
        }
        return null;
    }

    /** The first of rosetra.python, python3 and /usr/bin/python3 that can import jupyter_client. */
    private static String findPython() {
        List<String> candidates = new ArrayList<>();
        String configured = System.getProperty("rosetra.python");
        if (configured != null) {
            candidates.add(configured);
        }
        candidates.add("python3");
        candidates.add("/usr/bin/python3");
        for (String candidate : candidates) {
            if ((candidate.equals("python3") || Files.isExecutable(Path.of(candidate)))
                    && canImport(candidate, "jupyter_client")) {
                return candidate;
            }
        }
        return null;
    }

    private static boolean canImport(String python, String module) {
        try {
            Process process = new ProcessBuilder(python, "-c", "import " + module)
                    .redirectErrorStream(true).start();
            process.getInputStream().readAllBytes();
            return process.waitFor(60, TimeUnit.SECONDS) && process.exitValue() == 0;
        } catch (IOException e) {
            return false;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return false;
        }
    }
}
