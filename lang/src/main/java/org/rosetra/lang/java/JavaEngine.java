package org.rosetra.lang.java;

import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.ToDoubleFunction;
import java.util.stream.Collectors;
import jdk.jshell.DeclarationSnippet;
import jdk.jshell.Diag;
import jdk.jshell.JShell;
import jdk.jshell.Snippet;
import jdk.jshell.SnippetEvent;
import org.rosetra.lang.plan.EvaluationException;
import org.rosetra.lang.syntax.JavaCode;

/**
 * The process's one JShell, started the first time a script calls a function written in Java
 * (never before), running in this JVM (several times quicker to start than a second JVM).
 * Each function body is compiled once and kept; the same parameters and body text reuse it.
 */
public final class JavaEngine {
    private static final JavaEngine SHARED = new JavaEngine();

    private final Map<String, CompiledFunction> compiled = new HashMap<>();
    private CapturingExecution execution;
    private JShell shell;
    private long startupNanos = -1;

    private JavaEngine() {
    }

    public static JavaEngine shared() {
        return SHARED;
    }

    /** Whether JShell has been started in this process. */
    public synchronized boolean started() {
        return shell != null;
    }

    /** How long JShell took to start and compile its first line, in ms; -1 before it started. */
    public synchronized long startupMillis() {
        return startupNanos < 0 ? -1 : startupNanos / 1_000_000;
    }

    /** The compiled function; a body that does not compile is an error at its line. */
    synchronized CompiledFunction compile(String functionName, List<String> parameters, JavaCode code) {
        String key = parameters + "\u0000" + code.source();
        CompiledFunction known = compiled.get(key);
        if (known != null) {
            return known;
        }
        JShell jshell = shell(functionName, code);
        GeneratedSource source = GeneratedSource.of(parameters, code);
        SnippetEvent made = jshell.eval(source.text()).get(0);
        if (made.status() != Snippet.Status.VALID) {
            throw compileError(jshell, made.snippet(), source, functionName, code);
        }
        if (made.exception() != null || !(execution.lastValue() instanceof ToDoubleFunction<?>)) {
            throw new EvaluationException(code.span(), "cannot prepare the Java function " + functionName);
        }
        @SuppressWarnings("unchecked")
        ToDoubleFunction<double[]> body = (ToDoubleFunction<double[]>) execution.lastValue();
        CompiledFunction function = new CompiledFunction(functionName, body);
        compiled.put(key, function);
        return function;
    }

    private JShell shell(String functionName, JavaCode code) {
        if (shell != null) {
            return shell;
        }
        long start = System.nanoTime();
        // The in-process loader makes itself the thread's context loader; keep ours.
        ClassLoader ours = Thread.currentThread().getContextClassLoader();
        try {
            CapturingExecution capturing = new CapturingExecution();
            JShell started = JShell.builder().executionEngine(new CapturingEngine(capturing), Map.of()).build();
            started.eval("import static java.lang.Math.*;");
            execution = capturing;
            shell = started;
        } catch (RuntimeException | LinkageError e) {
            throw new EvaluationException(code.span(), "cannot start Java for function " + functionName + ": "
                    + e.getMessage(), "the Java bridge needs a full JDK 17 or later, with the jdk.jshell module");
        } finally {
            Thread.currentThread().setContextClassLoader(ours);
        }
        startupNanos = System.nanoTime() - start;
        return shell;
    }

    private static EvaluationException compileError(JShell jshell, Snippet snippet, GeneratedSource source,
                                                     String functionName, JavaCode code) {
        String prefix = "the Java body of function " + functionName + " does not compile: ";
        List<Diag> diagnostics = jshell.diagnostics(snippet).filter(Diag::isError).toList();
        if (!diagnostics.isEmpty()) {
            Diag first = diagnostics.get(0);
            return new EvaluationException(source.spanAt(first.getStartPosition()), prefix + message(first));
        }
        if (snippet instanceof DeclarationSnippet declaration) {
            List<String> missing = jshell.unresolvedDependencies(declaration).toList();
            if (!missing.isEmpty()) {
                String symbol = missing.get(0);
                String word = symbol.substring(symbol.lastIndexOf(' ') + 1);
                return new EvaluationException(source.spanOfWord(word), prefix + "cannot find symbol " + symbol,
                        "a Java body sees its parameters and the JDK; Math's functions need no prefix");
            }
        }
        return new EvaluationException(code.span(), prefix + "JShell did not accept it");
    }

    /** The compiler's message on one line, without the generated class's location. */
    private static String message(Diag diag) {
        return diag.getMessage(Locale.ROOT).lines().map(String::strip)
                .filter(line -> !line.isEmpty() && !line.startsWith("location:"))
                .collect(Collectors.joining("; "));
    }
}
