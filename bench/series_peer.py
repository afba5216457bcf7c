#!/usr/bin/env python3
"""The series benchmark's peer: the same reduction with pandas.read_csv and vectorised numpy.

Rectangular rosette (0/45/90 deg): eps_x = e_a, eps_y = e_c, gamma_xy = 2 e_b - e_a - e_c;
plane stress with E = 200 GPa, nu = 0.3; principal stresses; von Mises; its maximum.
usage: series_peer.py FILE.csv
"""
import sys

import numpy as np
import pandas as pd


def main(path):
    frame = pd.read_csv(path)
    t = frame["t_s"].to_numpy()
    ea = frame["g1"].to_numpy() * 1e-6
    eb = frame["g2"].to_numpy() * 1e-6
    ec = frame["g3"].to_numpy() * 1e-6
    ex = ea
    ey = ec
    gxy = 2.0 * eb - ea - ec
    e, nu = 200e9, 0.3
    k = e / (1.0 - nu * nu)
    g = e / (2.0 * (1.0 + nu))
    sx = k * (ex + nu * ey)
    sy = k * (ey + nu * ex)
    txy = g * gxy
    centre = (sx + sy) / 2.0
    half = (sx - sy) / 2.0
    radius = np.sqrt(half * half + txy * txy)
    s1 = centre + radius
    s2 = centre - radius
    vm = np.sqrt(s1 * s1 - s1 * s2 + s2 * s2)
    i = int(np.argmax(vm))
    print("samples %d  max von Mises %.6f MPa at t = %.3f s" % (len(t), vm[i] / 1e6, t[i]))


if __name__ == "__main__":
    main(sys.argv[1])
