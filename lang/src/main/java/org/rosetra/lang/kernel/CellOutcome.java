package org.rosetra.lang.kernel;

import java.util.List;
import java.util.Objects;
import java.util.Optional;

/** How a cell ended: with an optional value to show, or with a failure to report. */
public sealed interface CellOutcome {

    /** The cell ran; {@code value} is what it evaluated to, if it shows anything. */
    record Success(Optional<MimeBundle> value) implements CellOutcome {
        public Success {
            Objects.requireNonNull(value, "value");
        }
    }

    /**
     * The cell failed or was stopped. {@code name} is a short kind ("UnitError",
     * "Interrupted"), {@code message} one line, and {@code traceback} the lines a front end
     * prints: our diagnostics with cell line, column and a caret under the spot.
     */
    record Failure(String name, String message, List<String> traceback) implements CellOutcome {
        public Failure {
            Objects.requireNonNull(name, "name");
            Objects.requireNonNull(message, "message");
            traceback = List.copyOf(traceback);
        }
    }

    static CellOutcome nothingToShow() {
        return new Success(Optional.empty());
    }

    static CellOutcome shows(MimeBundle value) {
        return new Success(Optional.of(value));
    }

    static CellOutcome failed(String name, String message, List<String> traceback) {
        return new Failure(name, message, traceback);
    }
}
