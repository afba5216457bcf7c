package org.rosetra.runtime.series;

/** A read stopped on request (cancel flag or thread interrupt) before it finished. */
public final class SeriesCancelledException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    public SeriesCancelledException(String shownName) {
        super(shownName + ": reading was cancelled");
    }
}
