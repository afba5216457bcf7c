package org.rosetra.lang.kernel;

import java.io.PrintStream;
import java.util.List;

/**
 * Answers shell requests, one at a time on the shell thread, by asking the engine
 * (Jupyter messaging protocol 5.3, "Messages on the shell (ROUTER/DEALER) channel"). Every
 * request is wrapped in status busy ... idle on IOPub.
 */
final class ShellRequests {
    private final CellEngine engine;
    private final String implementationVersion;
    private final String languageVersion;
    private final PrintStream log;
    private final CellRunner cells;

    ShellRequests(CellEngine engine, String implementationVersion, String languageVersion,
            PrintStream log) {
        this.engine = engine;
        this.implementationVersion = implementationVersion;
        this.languageVersion = languageVersion;
        this.log = log;
        this.cells = new CellRunner(engine, log);
    }

    boolean isCellRunning() {
        return cells.isRunning();
    }

    /** Declines a cell queued behind a failed one. */
    void abort(Request request, MessageOut out) {
        out.status(request, "busy");
        cells.abort(request, out);
        out.status(request, "idle");
    }

    /** Answers {@code request}; true when it was a cell that failed and asks to stop on error. */
    boolean handle(Request request, MessageOut out) {
        boolean failedCell = false;
        out.status(request, "busy");
        try {
            switch (request.type()) {
                case "execute_request" -> failedCell = cells.execute(request, out);
                case "kernel_info_request" -> out.reply(request, "kernel_info_reply",
                        KernelInfo.content(implementationVersion, languageVersion));
                case "complete_request" -> complete(request, out);
                case "inspect_request" -> inspect(request, out);
                case "is_complete_request" -> isComplete(request, out);
                case "comm_info_request" -> out.reply(request, "comm_info_reply", json -> {
                    json.writeStringField("status", "ok");
                    JsonContent.writeEmptyObject(json, "comms");
                });
                case "history_request" -> out.reply(request, "history_reply", json -> {
                    json.writeStringField("status", "ok");
                    JsonContent.writeStrings(json, "history", List.of());
                });
                case "shutdown_request" -> {
                    boolean restart = request.content().flag("restart", false);
                    out.reply(request, "shutdown_reply", json -> {
                        json.writeStringField("status", "ok");
                        json.writeBooleanField("restart", restart);
                    });
                }
                default -> log.println("rosetra kernel: ignoring " + request.type() + " on shell");
            }
        } finally {
            out.status(request, "idle");
        }
        return failedCell;
    }

    private void complete(Request request, MessageOut out) {
        String code = request.content().text("code", "");
        int cursor = cursor(request, code);
        CompletionResult result;
        try {
            result = engine.complete(code, cursor);
        } catch (RuntimeException e) {
            logFault("completion", e);
            result = CompletionResult.none(cursor);
        }
        CompletionResult found = result;
        out.reply(request, "complete_reply", json -> {
            json.writeStringField("status", "ok");
            JsonContent.writeStrings(json, "matches", found.matches());
            json.writeNumberField("cursor_start", found.cursorStart());
            json.writeNumberField("cursor_end", found.cursorEnd());
            JsonContent.writeEmptyObject(json, "metadata");
        });
    }

    private void inspect(Request request, MessageOut out) {
        String code = request.content().text("code", "");
        int cursor = cursor(request, code);
        int detail = request.content().whole("detail_level", 0);
        InspectionResult result;
        try {
            result = engine.inspect(code, cursor, detail);
        } catch (RuntimeException e) {
            logFault("inspection", e);
            result = InspectionResult.notFound();
        }
        InspectionResult found = result;
        out.reply(request, "inspect_reply", json -> {
            json.writeStringField("status", "ok");
            json.writeBooleanField("found", found.found());
            JsonContent.writeBundle(json, "data", found.documentation());
            JsonContent.writeEmptyObject(json, "metadata");
        });
    }

    private void isComplete(Request request, MessageOut out) {
        Completeness result;
        try {
            result = engine.isComplete(request.content().text("code", ""));
        } catch (RuntimeException e) {
            logFault("completeness check", e);
            result = Completeness.unknown();
        }
        Completeness verdict = result;
        out.reply(request, "is_complete_reply", json -> {
            if (verdict instanceof Completeness.Incomplete incomplete) {
                json.writeStringField("status", "incomplete");
                json.writeStringField("indent", incomplete.indent());
            } else if (verdict instanceof Completeness.Complete) {
                json.writeStringField("status", "complete");
            } else if (verdict instanceof Completeness.Invalid) {
                json.writeStringField("status", "invalid");
            } else {
                json.writeStringField("status", "unknown");
            }
        });
    }

    /** The cursor, clamped into the code (protocol offsets count code points). */
    private static int cursor(Request request, String code) {
        int length = code.codePointCount(0, code.length());
        int cursor = request.content().whole("cursor_pos", length);
        return Math.max(0, Math.min(cursor, length));
    }

    private void logFault(String what, RuntimeException e) {
        log.println("rosetra kernel: the engine failed during " + what);
        e.printStackTrace(log);
    }
}
