/**
 * Streaming readers for measured series: a CSV file (RFC 4180, header row) read in chunks
 * of reused {@code double[]} columns, so memory does not grow with the file.
 *
 * <p>{@link org.rosetra.runtime.series.SeriesReader#stream} hands chunks to one sink in file
 * order and lets it stop early; {@link org.rosetra.runtime.series.SeriesReader#fold} splits
 * the file by byte ranges at line boundaries, folds each part into its own accumulator on
 * its own thread and merges the accumulators in file order, so the result is the same as
 * with one thread. Bad data is a {@link org.rosetra.runtime.series.SeriesDataException}
 * naming the file, the line and the column: the first one in file order, whatever the split.
 *
 * <p>A series with a zero window reads twice: {@code stream} until the first chunk past the
 * window's end, taking a {@link org.rosetra.runtime.series.WindowMean} of each arm's
 * corrected readings; then {@code fold} over the whole file with the zero subtracted, each
 * part keeping {@link org.rosetra.runtime.series.Extremes} per member (and any per-thread
 * work columns), {@link org.rosetra.runtime.series.PlausibilityFlag}s per arm, and the
 * checks' own extremes.
 */
package org.rosetra.runtime.series;
