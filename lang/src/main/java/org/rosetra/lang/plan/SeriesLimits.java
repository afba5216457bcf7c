package org.rosetra.lang.plan;

/** Limits that flag a measured reading as implausible. */
public final class SeriesLimits {
    /**
     * A reading beyond 50,000 microstrain (5 %) is far past what a bonded foil gauge survives on
     * a metal part: most likely the gauge debonded or the channel saturated (common practice).
     */
    public static final double PLAUSIBLE_STRAIN = 50_000e-6;

    private SeriesLimits() {}
}
