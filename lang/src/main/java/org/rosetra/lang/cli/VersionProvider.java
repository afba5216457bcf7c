package org.rosetra.lang.cli;

import picocli.CommandLine.IVersionProvider;

/** The tool's version, from the jar manifest (or the build's version when run from classes). */
public final class VersionProvider implements IVersionProvider {
    public static String version() {
        String v = Main.class.getPackage().getImplementationVersion();
        return v != null ? v : "0.1.0";
    }

    @Override
    public String[] getVersion() {
        return new String[] {"rosetra " + version()};
    }
}
