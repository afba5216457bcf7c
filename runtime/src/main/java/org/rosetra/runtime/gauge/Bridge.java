package org.rosetra.runtime.gauge;

/** How a gauge is wired to the instrument. */
public enum Bridge {
    /** The instrument already indicates strain; only the gauge-factor setting is undone. */
    NONE(0),
    /** Two-wire quarter bridge: both lead wires lie in the gauge's arm. */
    QUARTER(2),
    /** Three-wire quarter bridge: one lead wire lies in the gauge's arm. */
    QUARTER_3WIRE(1);

    private final int leadsInGaugeArm;

    Bridge(int leadsInGaugeArm) {
        this.leadsInGaugeArm = leadsInGaugeArm;
    }

    /** n in {@code (1 + n R_lead / R_gauge)}: the lead wires in series with the gauge. */
    public int leadsInGaugeArm() {
        return leadsInGaugeArm;
    }

    /** True when the reading is a quarter bridge's linear indication. */
    public boolean isQuarter() {
        return this != NONE;
    }
}
