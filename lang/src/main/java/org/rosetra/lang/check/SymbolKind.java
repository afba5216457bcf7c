package org.rosetra.lang.check;

/** What a declared name stands for. */
public enum SymbolKind {
    MATERIAL("a material", "material"),
    GAUGE("a gauge", "gauge"),
    ROSETTE("a rosette", "rosette"),
    STRAIN_STATE("a strain state", "strain"),
    STRESS_STATE("a stress state", "stress"),
    BASELINE("a baseline", "baseline"),
    CASE("a load case", "case"),
    COMBINATION("a load combination", "combine"),
    SERIES("a measured series", "series"),
    VALUE("a value", "let"),
    FUNCTION("a function", "let");

    private final String described;
    private final String keyword;

    SymbolKind(String described, String keyword) {
        this.described = described;
        this.keyword = keyword;
    }

    /** The keyword that declares it: "rosette", "strain", "let". */
    public String keyword() {
        return keyword;
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
