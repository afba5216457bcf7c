package org.rosetra.lang.check;

/** How a built-in function's result dimension follows from its arguments. */
public enum FunctionShape {
    /** abs(x): the dimension of x. */
    SAME,
    /** sqrt(x): half the exponents of x. */
    SQUARE_ROOT,
    /** sin, cos, tan: an angle in, a plain number out. */
    TRIGONOMETRIC,
    /** atan2(y, x): two values of one dimension in, an angle out. */
    ANGLE_OF_PAIR,
    /** min, max: one argument reduces over the cases; several of one dimension pick one. */
    EXTREME,
    /** strain_at, shear_at: a rosette or state and a direction in, a strain out. */
    STRAIN_IN_DIRECTION,
    /** stress_at, shear_stress_at: as above, a stress out; needs a material. */
    STRESS_IN_DIRECTION,
    /** mohr_coulomb, rankine: a rosette or state in, a failure index out. */
    FAILURE_INDEX,
    /** arms(...): the arm angles of a layout; only in a rosette's layout field. */
    LAYOUT
}
