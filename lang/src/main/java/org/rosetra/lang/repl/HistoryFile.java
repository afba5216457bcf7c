package org.rosetra.lang.repl;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;

/** Where the REPL keeps its history: ~/.rosetra_history, or nowhere when the home cannot be written. */
final class HistoryFile {
    static final String NAME = ".rosetra_history";

    private HistoryFile() {
    }

    static Optional<Path> in(String home) {
        if (home == null || home.isBlank()) {
            return Optional.empty();
        }
        Path folder = Path.of(home);
        Path file = folder.resolve(NAME);
        boolean usable = Files.exists(file) ? Files.isWritable(file) : Files.isDirectory(folder) && Files.isWritable(folder);
        return usable ? Optional.of(file) : Optional.empty();
    }
}
