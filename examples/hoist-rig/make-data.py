#!/usr/bin/env python3
"""Writes data/lift-run.csv: an invented endurance lift logged at 100 Hz on a hoist rig.

Three arms of a rectangular rosette at the boom root (arm a along the boom), in microstrain
as the instrument shows them, and the gauge temperature. The lift: 2 s at rest (the zero
window), a ramp to full load, a hold with the hoist's vibration, a lowering. Deterministic.
"""
import math
import random

E, NU = 210e9, 0.3
G = E / (2 * (1 + NU))
THERMAL = [-21.5, 2.10, -0.0430, 0.000155]  # apparent strain in ue, polynomial in degC


def load(t):
    if t < 2.0:
        return 0.0
    if t < 12.0:
        return (t - 2.0) / 10.0
    if t < 42.0:
        return 1.0
    if t < 52.0:
        return 1.0 - (t - 42.0) / 10.0
    return 0.0


def main():
    rnd = random.Random(20261201)
    rows = ["t_s,g1,g2,g3,temp_c"]
    for i in range(6000):
        t = i / 100.0
        f = load(t)
        sway = 0.04 * f * math.sin(2 * math.pi * 1.7 * t)
        sx = (118e6 * f) * (1 + sway)
        tau = 21e6 * f
        ex, ey, gxy = sx / E, -NU * sx / E, tau / G
        arms = [ex, (ex + ey) / 2 + gxy / 2, ey]
        temp = 20.0 + 4.0 * t / 60.0
        apparent = sum(c * temp ** k for k, c in enumerate(THERMAL))
        offsets = [3.0, -2.0, 4.0]
        values = [a * 1e6 + apparent + o + rnd.gauss(0, 0.8) for a, o in zip(arms, offsets)]
        rows.append("%.2f,%.2f,%.2f,%.2f,%.2f" % (t, values[0], values[1], values[2], temp))
    with open("data/lift-run.csv", "w", newline="\n") as out:
        out.write("\n".join(rows) + "\n")


if __name__ == "__main__":
    main()
