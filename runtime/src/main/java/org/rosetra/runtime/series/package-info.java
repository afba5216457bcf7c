/**
 * Streaming readers for measured series: a CSV file (RFC 4180, header row) read in chunks
 * of reused {@code double[]} columns, so memory does not grow with the file.
 *
 * <p>{@link org.rosetra.runtime.series.SeriesReader#stream} hands chunks to one sink in file
 * order; {@link org.rosetra.runtime.series.SeriesReader#fold} splits the file by byte ranges
 * at line boundaries, folds each part into its own accumulator on its own thread and merges
 * the accumulators in file order, so the result is the same as with one thread.
 */
package org.rosetra.runtime.series;
