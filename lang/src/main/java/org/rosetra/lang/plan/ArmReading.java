package org.rosetra.lang.plan;

import org.rosetra.runtime.gauge.CorrectionTrace;

/** One arm's reading in one case, with every correction it went through (for the record). */
public record ArmReading(String caseName, String rosette, int arm, CorrectionTrace trace) {}
