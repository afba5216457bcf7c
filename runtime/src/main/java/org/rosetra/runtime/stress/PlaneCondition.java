package org.rosetra.runtime.stress;

import java.util.Optional;

/** How the out-of-plane direction is held: the choice that Hooke's law in the plane needs. */
public enum PlaneCondition {
    /** σz = 0: a gauge on a free surface (the default). */
    PLANE_STRESS("plane_stress"),
    /** εz = 0: the part cannot strain out of the plane (e.g. an embedded gauge). */
    PLANE_STRAIN("plane_strain");

    private final String scriptName;

    PlaneCondition(String scriptName) {
        this.scriptName = scriptName;
    }

    /** The name a script writes: {@code plane_stress} or {@code plane_strain}. */
    public String scriptName() {
        return scriptName;
    }

    public static Optional<PlaneCondition> byScriptName(String name) {
        for (PlaneCondition c : values()) {
            if (c.scriptName.equals(name)) {
                return Optional.of(c);
            }
        }
        return Optional.empty();
    }
}
