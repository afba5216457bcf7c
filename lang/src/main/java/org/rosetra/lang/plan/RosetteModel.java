package org.rosetra.lang.plan;

import org.rosetra.runtime.gauge.ArmCorrection;
import org.rosetra.runtime.gauge.Bridge;
import org.rosetra.runtime.gauge.Gauge;
import org.rosetra.runtime.material.Material;
import org.rosetra.runtime.rosette.RosetteLayout;
import org.rosetra.runtime.rosette.RosetteSolver;
import org.rosetra.runtime.stress.PlaneCondition;

/**
 * A declared rosette with everything the runtime needs to reduce its readings.
 *
 * @param material  the rosette's material, or null (then only strain members exist)
 * @param angle     direction of arm a from the part's x-axis, radians
 * @param lead      resistance of one lead wire, ohm
 */
public record RosetteModel(String name, RosetteLayout layout, String gaugeName, Gauge gauge,
                           Material material, PlaneCondition condition, double angle, Bridge bridge,
                           double lead, double instrumentFactor, ArmCorrection correction,
                           RosetteSolver solver) {

    public int armCount() {
        return layout.armCount();
    }

    /** The arm's direction in the part's axes, radians. */
    public double armAngle(int arm) {
        return layout.angle(arm) + angle;
    }
}
