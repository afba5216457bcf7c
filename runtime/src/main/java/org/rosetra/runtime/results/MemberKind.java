package org.rosetra.runtime.results;

/** What a result member measures, which fixes its unit: a plain fraction, radians or Pa. */
public enum MemberKind {
    /** A strain, as a plain fraction. */
    STRAIN,
    /** An angle, in radians inside the runtime. */
    ANGLE,
    /** A stress, in Pa. */
    STRESS
}
