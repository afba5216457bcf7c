package org.rosetra.lang.plan;

import java.util.List;

/** The modules of the standard library that {@code use NAME} can load. */
public final class StandardModules {
    private static final List<String> NAMES = List.of("aluminium", "concrete", "margins", "steels");

    private StandardModules() {}

    public static List<String> names() {
        return NAMES;
    }
}
