package org.rosetra.lang.check;

/** What a declared name stands for. */
public enum SymbolKind {
    MATERIAL("a material"),
    GAUGE("a gauge"),
    ROSETTE("a rosette"),
    STRAIN_STATE("a strain state"),
    STRESS_STATE("a stress state"),
    BASELINE("a baseline"),
    CASE("a load case"),
    COMBINATION("a load combination"),
    SERIES("a measured series"),
    VALUE("a value"),
    FUNCTION("a function");

    private final String described;

    SymbolKind(String described) {
        this.described = described;
    }

    /** "a rosette", for messages. */
    public String described() {
        return described;
    }

    /** Rosettes and states: things with strain (and stress) members. */
    public boolean hasResults() {
        return this == ROSETTE || this == STRAIN_STATE || this == STRESS_STATE;
    }

    /** What {@code x[NAME]} may pick: a case, a combination or a series. */
    public boolean isCaseLike() {
        return this == CASE || this == COMBINATION || this == SERIES;
    }
}
