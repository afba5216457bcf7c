package org.rosetra.runtime.series;

/**
 * How to fold a series into an accumulator part by part: each part of the file gets a fresh
 * accumulator on its own thread, and the accumulators are merged in file order. A fold whose
 * merge is exact (extremes with earliest ties, exact sums, counts) gives the same result with
 * any number of threads.
 */
public interface SeriesFold<A> {

    /** A fresh, empty accumulator. */
    A start();

    /** Adds one chunk to the accumulator; the chunk's arrays are reused after the call. */
    void add(A accumulator, Chunk chunk);

    /** Merges two accumulators; {@code earlier} holds samples that come before {@code later}'s. */
    A merge(A earlier, A later);
}
