package org.rosetra.lang.kernel;

/**
 * What the notebook kernel asks of a language session. The session implements it; the
 * kernel only carries messages. Every method but {@link #interrupt()} is called from one
 * worker thread, one request at a time, so an implementation need not be thread-safe
 * beyond that.
 */
public interface CellEngine {

    /**
     * Runs one cell. Output produced while it runs (tables, figures, printed text) goes to
     * {@code sink} as it appears; the value of the cell, if any, comes back in the outcome.
     * A mistake in the cell is a {@link CellOutcome.Failure}, never an exception.
     */
    CellOutcome execute(String code, OutputSink sink);

    /** Names that could stand at {@code cursorPos} (a code-point offset into {@code code}). */
    CompletionResult complete(String code, int cursorPos);

    /** Documentation of the name at {@code cursorPos}; {@code detailLevel} is 0 or 1. */
    InspectionResult inspect(String code, int cursorPos, int detailLevel);

    /** Whether {@code code} is ready to run or needs more lines (an open block). */
    Completeness isComplete(String code);

    /**
     * Asks the running cell to stop soon and return a failure that says it was stopped.
     * Called from another thread, only while {@link #execute} runs; the next cell must
     * start with the request cleared.
     */
    void interrupt();

    /** The language version reported to front ends, for instance "0.1.0". */
    String languageVersion();
}
