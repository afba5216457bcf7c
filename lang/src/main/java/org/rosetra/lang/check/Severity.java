package org.rosetra.lang.check;

/** How bad a diagnostic is; only errors stop a script from running. */
public enum Severity {
    ERROR, WARNING, NOTE;

    public String label() {
        return name().toLowerCase(java.util.Locale.ROOT);
    }
}
