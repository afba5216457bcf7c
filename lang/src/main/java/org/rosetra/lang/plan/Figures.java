package org.rosetra.lang.plan;

import java.util.List;
import java.util.function.Function;
import org.rosetra.lang.syntax.Plot;
import org.rosetra.lang.syntax.SourceSpan;
import org.rosetra.runtime.units.DisplayUnits;

/** Draws the figures a {@code plot} statement asks for (wired to the runtime's plots as they land). */
final class Figures {
    private Figures() {}

    static List<Output> of(Plot plot, Evaluation evaluation, DisplayUnits display, Function<SourceSpan, String> textOf) {
        return List.of();
    }
}
