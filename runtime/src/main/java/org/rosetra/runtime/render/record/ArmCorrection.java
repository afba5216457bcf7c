package org.rosetra.runtime.render.record;

import java.util.Objects;

/**
 * What happened to one arm's reading in one case, in the record's strain unit: the indicated
 * value, the value after the bridge, lead and gauge factor corrections, the thermal output
 * removed, the baseline removed, and the corrected value that enters the rosette solve. A step
 * that was not applied is NaN and shows as a dash.
 */
public record ArmCorrection(
    String caseName,
    String rosette,
    String arm,
    double indicated,
    double afterBridge,
    double thermalRemoved,
    double baselineRemoved,
    double corrected) {

  public ArmCorrection {
    Objects.requireNonNull(caseName, "caseName");
    Objects.requireNonNull(rosette, "rosette");
    Objects.requireNonNull(arm, "arm");
  }
}
