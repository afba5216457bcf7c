package org.rosetra.runtime.series;

/**
 * A run of consecutive samples as columns: {@code columns[0]} is time, then the value
 * columns in the order of {@link SeriesSource#valueColumns()}; rows {@code 0..rows-1} are valid.
 *
 * <p>The arrays are reused for the next chunk: a sink reads them during its call and keeps
 * nothing. In {@link SeriesReader#stream} the sample index and line are the file's own; in a
 * parallel {@link SeriesReader#fold} they count from the start of the part being read,
 * because the parts before it are still being read (accumulators work on times, not indices).
 *
 * @param firstSample index of the first row among the samples (0-based)
 * @param firstLine   line number of the first row (1-based, the header is line 1)
 * @param rows        number of valid rows
 * @param columns     the column arrays, each at least {@code rows} long
 */
public record Chunk(long firstSample, long firstLine, int rows, double[][] columns) {

    /** The time column. */
    public double[] time() {
        return columns[0];
    }

    /** Value column {@code i} (0-based over the value columns). */
    public double[] values(int i) {
        return columns[i + 1];
    }
}
