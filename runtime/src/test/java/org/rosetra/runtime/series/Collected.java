package org.rosetra.runtime.series;

import java.util.Arrays;

/** Test helper: every chunk of a read copied into whole columns, plus the chunk lines seen. */
final class Collected {

    double[][] columns = new double[0][];
    long rows;
    long[] chunkFirstLines = new long[0];

    static Collected read(SeriesSource source, ReadOptions options) {
        Collected all = new Collected();
        all.columns = new double[source.columnCount()][0];
        SeriesReader.stream(source, options, all::add);
        return all;
    }

    boolean add(Chunk chunk) {
        if (chunk.firstSample() != rows) {
            throw new AssertionError("chunk starts at sample " + chunk.firstSample() + ", expected " + rows);
        }
        for (int c = 0; c < columns.length; c++) {
            double[] grown = Arrays.copyOf(columns[c], (int) rows + chunk.rows());
            System.arraycopy(chunk.columns()[c], 0, grown, (int) rows, chunk.rows());
            columns[c] = grown;
        }
        chunkFirstLines = Arrays.copyOf(chunkFirstLines, chunkFirstLines.length + 1);
        chunkFirstLines[chunkFirstLines.length - 1] = chunk.firstLine();
        rows += chunk.rows();
        return true;
    }
}
