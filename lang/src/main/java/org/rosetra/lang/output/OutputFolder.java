package org.rosetra.lang.output;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.HashSet;
import java.util.Locale;
import java.util.Set;
import org.rosetra.lang.plan.Outcome;
import org.rosetra.lang.plan.Output;
import org.rosetra.lang.plan.ScriptRunner;
import org.rosetra.runtime.render.output.OutputTransaction;
import org.rosetra.runtime.render.table.CsvTable;

/**
 * Writes a run's output folder in one transaction: results.json, tables/*.csv, plots/*.svg and
 * *.png. Nothing is visible until every file is written; stale tables and plots are removed.
 */
public final class OutputFolder {
    private OutputFolder() {}

    public static void write(Path folder, ScriptRunner.Loaded script, Outcome outcome, byte[] json) throws IOException {
        try (OutputTransaction tx = OutputTransaction.begin(folder)) {
            tx.write("results.json", json);
            Set<String> used = new HashSet<>();
            int table = 0;
            for (Output o : outcome.outputs()) {
                if (o instanceof Output.TableOutput t) {
                    table++;
                    String stem = unique(String.format(Locale.ROOT, "table-%02d-%s", table, slug(t.table().title())), used);
                    tx.write("tables/" + stem + ".csv", CsvTable.render(t.table()).getBytes(java.nio.charset.StandardCharsets.UTF_8));
                } else if (o instanceof Output.FigureOutput f) {
                    String stem = unique(f.fileStem(), used);
                    tx.write("plots/" + stem + ".svg", f.svg());
                    tx.write("plots/" + stem + ".png", f.png());
                }
            }
            tx.commit();
        }
    }

    /** Writes one file by a temporary name and a rename, so a reader never sees half of it. */
    public static void writeAtomically(Path file, byte[] bytes) throws IOException {
        Path target = file.toAbsolutePath();
        Files.createDirectories(target.getParent());
        Path temp = Files.createTempFile(target.getParent(), ".rosetra-", ".part");
        try {
            Files.write(temp, bytes);
            try {
                Files.move(temp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (java.nio.file.AtomicMoveNotSupportedException e) {
                Files.move(temp, target, StandardCopyOption.REPLACE_EXISTING);
            }
        } finally {
            Files.deleteIfExists(temp);
        }
    }

    /** A file-name-safe lower-case form of a title. */
    public static String slug(String text) {
        String s = text.toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9_]+", "-").replaceAll("(^-+|-+$)", "");
        return s.isEmpty() ? "item" : s;
    }

    private static String unique(String stem, Set<String> used) {
        String s = stem;
        for (int i = 2; !used.add(s); i++) {
            s = stem + "-" + i;
        }
        return s;
    }
}
