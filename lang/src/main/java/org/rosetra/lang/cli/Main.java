package org.rosetra.lang.cli;

/** Entry point of the {@code rosetra} command (placeholder until the CLI lands). */
public final class Main {
    private Main() {}

    public static void main(String[] args) {
        System.out.println("rosetra 0.1.0");
    }
}
