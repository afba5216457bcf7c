package org.rosetra.lang.plan;

import java.nio.file.Path;

/**
 * How a script is run from the command line.
 *
 * @param json        extra file to write results.json to, or null
 * @param outDir      output folder, or null for {@code SCRIPT.out} next to the script
 * @param writeOutputs whether to write the output folder at all
 * @param allowJava   whether functions written in Java may run
 */
public record RunOptions(Path json, Path outDir, boolean writeOutputs, boolean allowJava) {}
