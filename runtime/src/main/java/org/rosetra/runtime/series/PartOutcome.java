package org.rosetra.runtime.series;

/**
 * What reading one part of a file found. Lines count from the part's first row start; the
 * reader shifts them once the parts before it are known.
 *
 * @param rows          data rows read (blank lines are not rows)
 * @param lineBreaks    line breaks in the part, blank lines and quoted breaks included
 * @param firstRowLine  line of the first data row, in the part's own count
 * @param firstTime     time of the first data row (valid when rows > 0)
 * @param lastTime      time of the last data row (valid when rows > 0)
 * @param error         the first bad data in the part, or null
 * @param stoppedEarly  the sink asked to stop, or another part failed first
 */
record PartOutcome(long rows, long lineBreaks, long firstRowLine, double firstTime, double lastTime,
                   SeriesDataException error, boolean stoppedEarly) {
}
