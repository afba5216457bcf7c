package org.rosetra.runtime.gauge;

import java.util.OptionalDouble;

/**
 * Every step one reading went through, for the calculation record (LANGUAGE.md, "What happens
 * to one reading, in order", steps 1 to 3). All strains are fractions.
 *
 * @param indicated        the instrument's indication
 * @param bridge           the bridge the reading came through
 * @param afterBridge      after step 1: gauge factor, bridge non-linearity and lead wires
 * @param temperatureC     the reading's temperature in degC, when it had one
 * @param thermalOutput    the thermal output removed in step 2 (already at the gauge's
 *                         factor); 0 when none was removed
 * @param corrected        after step 2: {@code afterBridge - thermalOutput}
 * @param baseline         the same arm's corrected baseline reading, when step 3 applies
 * @param result           the reading handed to the rosette solve
 */
public record CorrectionTrace(double indicated, Bridge bridge, double afterBridge,
                              OptionalDouble temperatureC, double thermalOutput, double corrected,
                              OptionalDouble baseline, double result) {

    /** Step 3: this reading less the same arm's corrected baseline reading. */
    public CorrectionTrace withBaseline(double correctedBaseline) {
        if (!Double.isFinite(correctedBaseline)) {
            throw new GaugeException("corrected baseline reading must be a finite strain, got "
                    + correctedBaseline + "; check the baseline's reading of this arm");
        }
        if (baseline.isPresent()) {
            throw new GaugeException("this reading already had a baseline of " + baseline.getAsDouble()
                    + " subtracted; subtract a baseline once, from the trace before step 3");
        }
        return new CorrectionTrace(indicated, bridge, afterBridge, temperatureC, thermalOutput, corrected,
                OptionalDouble.of(correctedBaseline), corrected - correctedBaseline);
    }

    /** True when step 2 removed a thermal output. */
    public boolean thermalRemoved() {
        return temperatureC.isPresent() && thermalOutput != 0;
    }
}
