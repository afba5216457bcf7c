package org.rosetra.lang.check;

import java.util.List;
import org.rosetra.runtime.units.Dimension;

/**
 * One field a block may hold, with what its value must be. {@code dimension} applies to
 * quantities, readings and columns; {@code choices} to choices; {@code refersTo} to
 * references; {@code limits} (or null) to literal quantities.
 */
public record FieldSpec(String name, FieldKind kind, Dimension dimension, List<String> choices,
        SymbolKind refersTo, Limits limits, boolean required, String doc) {

    static FieldSpec quantity(String name, Dimension dimension, Limits limits, String doc) {
        return new FieldSpec(name, FieldKind.QUANTITY, dimension, List.of(), null, limits, false, doc);
    }

    static FieldSpec choice(String name, List<String> choices, String doc) {
        return new FieldSpec(name, FieldKind.CHOICE, null, choices, null, null, false, doc);
    }

    static FieldSpec reference(String name, SymbolKind kind, String doc) {
        return new FieldSpec(name, FieldKind.REFERENCE, null, List.of(), kind, null, false, doc);
    }

    static FieldSpec of(String name, FieldKind kind, Dimension dimension, String doc) {
        return new FieldSpec(name, kind, dimension, List.of(), null, null, false, doc);
    }

    FieldSpec asRequired() {
        return new FieldSpec(name, kind, dimension, choices, refersTo, limits, true, doc);
    }
}
