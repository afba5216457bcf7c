package org.rosetra.lang.kernel;

import com.fasterxml.jackson.core.JsonGenerator;
import java.io.IOException;
import java.io.PrintStream;
import java.util.List;

/**
 * Runs cells for execute requests (Jupyter messaging protocol 5.3, "Execute"): keeps the
 * execution counter, publishes execute_input, the output, execute_result or error, and
 * replies ok, error or aborted. {@code silent} publishes nothing; {@code silent} or
 * {@code store_history = false} leaves the counter as it is.
 */
final class CellRunner {
    private final CellEngine engine;
    private final PrintStream log;

    private volatile boolean running;
    private int executionCount;

    CellRunner(CellEngine engine, PrintStream log) {
        this.engine = engine;
        this.log = log;
    }

    /** Whether a cell is running now; read by the control thread to decide on an interrupt. */
    boolean isRunning() {
        return running;
    }

    /** Replies "aborted" to a cell queued behind a failed one, without running it. */
    void abort(Request request, MessageOut out) {
        int count = executionCount;
        out.reply(request, "execute_reply", json -> {
            json.writeStringField("status", "aborted");
            json.writeNumberField("execution_count", count);
        });
    }

    /**
     * Runs the cell of an execute_request and publishes what it shows; true when it failed
     * and the request asks to stop on error.
     */
    boolean execute(Request request, MessageOut out) {
        JsonFields content = request.content();
        String code = content.text("code", "");
        boolean silent = content.flag("silent", false);
        boolean storeHistory = !silent && content.flag("store_history", true);
        if (storeHistory) {
            executionCount++;
        }
        int count = executionCount;
        if (!silent) {
            out.publish(request, "execute_input", json -> {
                json.writeStringField("code", code);
                json.writeNumberField("execution_count", count);
            });
        }
        CellOutcome outcome = run(code, new CellOutputSink(out, request, silent));
        if (outcome instanceof CellOutcome.Success success) {
            if (!silent && success.value().isPresent()) {
                MimeBundle value = success.value().get();
                out.publish(request, "execute_result", json -> {
                    json.writeNumberField("execution_count", count);
                    JsonContent.writeBundle(json, "data", value);
                    JsonContent.writeEmptyObject(json, "metadata");
                });
            }
            out.reply(request, "execute_reply", json -> {
                json.writeStringField("status", "ok");
                json.writeNumberField("execution_count", count);
                JsonContent.writeEmptyObject(json, "user_expressions");
                json.writeArrayFieldStart("payload");
                json.writeEndArray();
            });
            return false;
        } else {
            CellOutcome.Failure failure = (CellOutcome.Failure) outcome; // the only other kind
            if (!silent) {
                out.publish(request, "error", json -> writeFailure(json, failure));
            }
            out.reply(request, "execute_reply", json -> {
                json.writeStringField("status", "error");
                json.writeNumberField("execution_count", count);
                writeFailure(json, failure);
            });
            return content.flag("stop_on_error", true);
        }
    }

    private CellOutcome run(String code, OutputSink sink) {
        running = true;
        try {
            CellOutcome outcome = engine.execute(code, sink);
            return outcome != null ? outcome : internalError("the engine returned no outcome");
        } catch (RuntimeException | StackOverflowError e) {
            // An engine fault must not take the notebook down; the user sees it as a failed cell.
            log.println("rosetra kernel: the engine failed on a cell");
            e.printStackTrace(log);
            return internalError(String.valueOf(e));
        } finally {
            running = false;
        }
    }

    private static CellOutcome internalError(String message) {
        return CellOutcome.failed("InternalError", message, List.of("Internal error: " + message,
                "The kernel is still running; please report this cell."));
    }

    private static void writeFailure(JsonGenerator json,
            CellOutcome.Failure failure) throws IOException {
        json.writeStringField("ename", failure.name());
        json.writeStringField("evalue", failure.message());
        JsonContent.writeStrings(json, "traceback", failure.traceback());
    }
}
