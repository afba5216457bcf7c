package org.rosetra.lang.plan;

import org.rosetra.lang.syntax.Statement;
import org.rosetra.runtime.render.table.ResultTable;

/** What an output statement produced, in script order: shown on a terminal, in a notebook, in the record. */
public sealed interface Output {
    Statement statement();

    /** A table of results in display units. */
    record TableOutput(Statement statement, ResultTable table) implements Output {}

    /**
     * A figure, as SVG and PNG bytes, with the file stem it is saved under in {@code plots/}.
     */
    record FigureOutput(Statement statement, String caption, String fileStem, byte[] svg, byte[] png)
            implements Output {}
}
