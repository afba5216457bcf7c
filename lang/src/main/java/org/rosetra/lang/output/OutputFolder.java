package org.rosetra.lang.output;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Map;
import org.rosetra.runtime.render.record.CalculationRecord;
import org.rosetra.runtime.render.record.RecordFolder;

/**
 * Writes a run's output folder in one transaction: results.json, record.html, record.md,
 * tables/*.csv, plots/*.svg and *.png. Nothing is visible until every file is written; stale
 * tables and plots are removed; a failure leaves the folder as it was.
 */
public final class OutputFolder {
    private OutputFolder() {}

    public static void write(Path folder, CalculationRecord record, byte[] resultsJson) throws IOException {
        RecordFolder.write(folder, record, Map.of("results.json", resultsJson));
    }

    /** Writes one file by a temporary name and a rename, so a reader never sees half of it. */
    public static void writeAtomically(Path file, byte[] bytes) throws IOException {
        org.rosetra.runtime.render.output.OutputTransaction.writeOne(file, bytes);
    }

}
