package org.rosetra.runtime.series;

/**
 * What a fold produced.
 *
 * @param value   the merged accumulator
 * @param samples number of samples (data rows) read
 * @param parts   number of parts read in parallel (1 when read by one thread)
 */
public record FoldResult<A>(A value, long samples, int parts) {
}
