package org.rosetra.runtime.render.record;

import java.util.List;
import java.util.Objects;

/**
 * The calculation record of one run, in the order it is read: title, (caution), checks, what was
 * declared, the corrections applied to every reading, the outputs (tables and figures) in script
 * order, the measured series read, the script itself, every input file with its digest, and the
 * tool's version. Numbers are already in display units; {@code strainUnit} labels the
 * corrections.
 */
public record CalculationRecord(
    String title,
    List<CheckLine> checks,
    List<Declaration> declarations,
    String strainUnit,
    List<ArmCorrection> corrections,
    List<RecordItem> outputs,
    List<SeriesInput> series,
    String scriptName,
    String script,
    List<InputFile> inputs,
    String toolVersion,
    String recordName) {

  public CalculationRecord {
    Objects.requireNonNull(title, "title");
    Objects.requireNonNull(strainUnit, "strainUnit");
    Objects.requireNonNull(scriptName, "scriptName");
    Objects.requireNonNull(script, "script");
    Objects.requireNonNull(toolVersion, "toolVersion");
    Objects.requireNonNull(recordName, "recordName");
    checks = List.copyOf(checks);
    declarations = List.copyOf(declarations);
    corrections = List.copyOf(corrections);
    outputs = List.copyOf(outputs);
    series = List.copyOf(series);
    inputs = List.copyOf(inputs);
  }

  /** A record named after its script (the script gave no {@code report} name). */
  public CalculationRecord(String title, List<CheckLine> checks, List<Declaration> declarations,
      String strainUnit, List<ArmCorrection> corrections, List<RecordItem> outputs,
      List<SeriesInput> series, String scriptName, String script, List<InputFile> inputs,
      String toolVersion) {
    this(title, checks, declarations, strainUnit, corrections, outputs, series, scriptName, script,
        inputs, toolVersion, scriptName.replaceFirst("\\.strain$", ""));
  }
}
