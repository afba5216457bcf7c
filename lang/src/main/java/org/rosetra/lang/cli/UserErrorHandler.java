package org.rosetra.lang.cli;

import org.rosetra.lang.plan.ScriptRunner;
import picocli.CommandLine;
import picocli.CommandLine.IExecutionExceptionHandler;

/**
 * Last line of defence: an exception that escapes a subcommand is reported as one line on
 * stderr with exit status 2. Set ROSETRA_DEBUG=1 to see the stack trace of a fault of ours.
 */
final class UserErrorHandler implements IExecutionExceptionHandler {
    @Override
    public int handleExecutionException(Exception e, CommandLine line, CommandLine.ParseResult parsed) {
        String message = e.getMessage() != null ? e.getMessage() : e.getClass().getSimpleName();
        line.getErr().println("rosetra: error: " + message);
        if (System.getenv("ROSETRA_DEBUG") != null) {
            e.printStackTrace(line.getErr());
        }
        return ScriptRunner.ERROR;
    }
}
