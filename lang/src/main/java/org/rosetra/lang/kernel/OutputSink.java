package org.rosetra.lang.kernel;

/** Where a running cell sends output that appears before the cell finishes. */
public interface OutputSink {

    /** A table, figure or note, in as many formats as the cell can render. */
    void display(MimeBundle bundle);

    /** Printed text on the cell's standard output. */
    void printOut(String text);

    /** Printed text on the cell's standard error (warnings). */
    void printErr(String text);
}
