package org.rosetra.lang.plan;

import org.rosetra.lang.syntax.Statement;
import org.rosetra.runtime.render.plot.RenderedFigure;
import org.rosetra.runtime.render.table.ResultTable;

/** What an output statement produced, in script order: shown on a terminal, in a notebook, in the record. */
public sealed interface Output {
    Statement statement();

    /** A table of results in display units; {@code name} is its file stem in {@code tables/}. */
    record TableOutput(Statement statement, String name, ResultTable table) implements Output {}

    /** A figure drawn as SVG and PNG, saved as {@code plots/NAME.svg} and {@code .png}. */
    record FigureOutput(Statement statement, String caption, RenderedFigure figure) implements Output {}
}
