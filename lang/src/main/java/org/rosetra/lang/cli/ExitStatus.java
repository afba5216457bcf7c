package org.rosetra.lang.cli;

/** Exit statuses of LANGUAGE.md ("Running and results"). */
public final class ExitStatus {
    /** The script ran and every check passed. */
    public static final int PASSED = 0;
    /** The script ran and a check failed; every output is still written. */
    public static final int CHECK_FAILED = 1;
    /** The script has an error and nothing was computed. */
    public static final int ERROR = 2;

    private ExitStatus() {}
}
