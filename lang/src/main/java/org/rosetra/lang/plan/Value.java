package org.rosetra.lang.plan;

import java.util.List;
import org.rosetra.lang.syntax.Let;
import org.rosetra.runtime.material.Material;
import org.rosetra.runtime.units.Dimension;

/** What an expression evaluates to. Numbers are SI; a NaN in a column means "no result here". */
public sealed interface Value {

    /** The dimension of a number, a column or a history; null for anything that is not numbers. */
    default Dimension dimensionOrNull() {
        if (this instanceof Number n) {
            return n.dimension();
        }
        if (this instanceof Column c) {
            return c.dimension();
        }
        if (this instanceof History h) {
            return h.dimension();
        }
        return null;
    }

    /** One number with its dimension. */
    record Number(double si, Dimension dimension) implements Value {}

    /** One number per case of the case axis (load cases, then combinations). */
    record Column(double[] values, Dimension dimension) implements Value {}

    /** One number per sample of a measured series, with the samples' times in seconds. */
    record History(String series, double[] values, double[] time, Dimension dimension) implements Value {}

    /** A rosette as a whole (its results in every case). */
    record Rosette(String name) implements Value {}

    /** A rosette in one case, as in {@code web_top[proof_60kN]}. */
    record RosetteInCase(String rosette, String caseName) implements Value {}

    /** A strain or stress state given directly. */
    record State(String name) implements Value {}

    /** A material, whose members are its properties. */
    record MaterialRef(Material material) implements Value {}

    /** A string. */
    record Text(String text) implements Value {}

    /** A function a script defined with {@code let f(p, ...) = ...}. */
    record Function(Let definition, List<String> parameters) implements Value {}
}
