#!/usr/bin/python3
"""Peer for bench/record-peer: the bracket reduction of lang/src/test/resources/record/bracket.strain
done by hand in numpy, with its Mohr's circles saved as PNG and SVG by matplotlib.

Same work as the Rosetra run it is timed against: three cases of one rectangular rosette
(arm a on the x-axis, strains read directly, no transverse sensitivity), strains and stresses
in plane stress, von Mises check against yield / 1.5, results as JSON, the result table as CSV,
Mohr's circles of strain and stress for the heavy case as PNG and SVG, and a short Markdown and
HTML record with the SVG inline. Inputs are written here, not parsed from the script.

usage: record_peer.py OUT_DIR   (prints one summary line: the check's utilization)
"""
import json
import os
import sys

import numpy as np
import matplotlib

matplotlib.use("Agg")
import matplotlib.pyplot as plt  # noqa: E402

E, NU, YIELD = 200e9, 0.3, 275e6
CASES = ["light", "medium", "heavy"]
READINGS = np.array([[250, 110, -60], [520, 260, -140], [780, 380, -210]], dtype=float) * 1e-6


def reduce(readings):
    a, b, c = readings.T
    ex, ey, g = a, c, 2 * b - a - c
    centre = (ex + ey) / 2
    radius = np.hypot((ex - ey) / 2, g / 2)
    e1, e2 = centre + radius, centre - radius
    theta = np.degrees(np.arctan2(g, ex - ey)) / 2
    ez = -NU / (1 - NU) * (ex + ey)
    k = E / (1 - NU ** 2)
    sx, sy, txy = k * (ex + NU * ey), k * (ey + NU * ex), E / (2 * (1 + NU)) * g
    sc, sr = (sx + sy) / 2, np.hypot((sx - sy) / 2, txy)
    s1, s2 = sc + sr, sc - sr
    sz = np.zeros_like(s1)
    three = np.stack([s1, s2, sz])
    vm = np.sqrt(((s1 - s2) ** 2 + (s2 - sz) ** 2 + (sz - s1) ** 2) / 2)
    tresca = three.max(axis=0) - three.min(axis=0)
    return {
        "eps_x": ex, "eps_y": ey, "gamma_xy": g, "eps_1": e1, "eps_2": e2, "theta_p": theta,
        "gamma_max": e1 - e2, "eps_z": ez, "sigma_x": sx, "sigma_y": sy, "tau_xy": txy,
        "sigma_1": s1, "sigma_2": s2, "sigma_z": sz, "tau_max": sr, "tau_abs": tresca / 2,
        "von_mises": vm, "tresca": tresca,
    }


def circle(ax, title, x, y, h, unit):
    c, r = (x + y) / 2, np.hypot((x - y) / 2, h)
    t = np.linspace(0, 2 * np.pi, 361)
    ax.plot(c + r * np.cos(t), r * np.sin(t))
    ax.plot([x, y], [-h, h], color="k", lw=0.8)
    ax.plot([c - r, c + r], [0, 0], "D")
    ax.plot([x], [-h], "o")
    ax.plot([y], [h], "o")
    ax.axhline(0, ls="--", lw=0.6, color="grey")
    ax.set_aspect("equal")
    ax.invert_yaxis()
    ax.set_title(title)
    ax.set_xlabel(f"normal [{unit}]")
    ax.set_ylabel(f"shear [{unit}], positive down")


def main(out):
    os.makedirs(os.path.join(out, "plots"), exist_ok=True)
    os.makedirs(os.path.join(out, "tables"), exist_ok=True)
    res = reduce(READINGS)
    allowable = YIELD / 1.5
    use = res["von_mises"] / allowable
    gov = int(np.argmax(use))
    results = {
        "title": "Bracket BK-7, bench load test", "cases": CASES,
        "rosettes": {"web": {"state": "plane_stress", "results": {
            k: {m: float(v[i]) for m, v in res.items()} for i, k in enumerate(CASES)}}},
        "values": {"allowable": {"value": allowable, "dimension": "stress"}},
        "checks": [{"label": "web yield margin", "pass": bool(use.max() <= 1),
                    "utilization": float(use.max()), "governing": CASES[gov]}],
    }
    with open(os.path.join(out, "results.json"), "w") as f:
        json.dump(results, f, indent=2)
    with open(os.path.join(out, "tables", "rosette-web.csv"), "w") as f:
        f.write("case," + ",".join(res) + "\n")
        for i, k in enumerate(CASES):
            f.write(k + "," + ",".join(repr(float(v[i])) for v in res.values()) + "\n")

    i = CASES.index("heavy")
    fig, (a1, a2) = plt.subplots(1, 2, figsize=(9.4, 4.7))
    circle(a1, "Strain, web[heavy]", res["eps_x"][i] * 1e6, res["eps_y"][i] * 1e6, res["gamma_xy"][i] / 2 * 1e6, "ue")
    circle(a2, "Stress, web[heavy]", res["sigma_x"][i] / 1e6, res["sigma_y"][i] / 1e6, res["tau_xy"][i] / 1e6, "MPa")
    fig.tight_layout()
    svg_path = os.path.join(out, "plots", "mohr-web-heavy.svg")
    fig.savefig(svg_path, metadata={"Date": None})
    fig.savefig(os.path.join(out, "plots", "mohr-web-heavy.png"), dpi=200, metadata={"Software": None})
    plt.close(fig)

    rows = "\n".join(f"| {k} | " + " | ".join(f"{res[m][j] * 1e6:.1f}" for m in ("eps_x", "eps_y", "gamma_xy", "eps_1", "eps_2"))
                     + " |" for j, k in enumerate(CASES))
    md = (f"# {results['title']}\n\nCheck web yield margin: utilization {use.max():.4f}, governing {CASES[gov]}\n\n"
          "| case | eps_x | eps_y | gamma_xy | eps_1 | eps_2 |\n| --- | ---: | ---: | ---: | ---: | ---: |\n"
          + rows + "\n\n![Mohr's circles](plots/mohr-web-heavy.svg)\n")
    with open(os.path.join(out, "record.md"), "w") as f:
        f.write(md)
    with open(svg_path) as f:
        svg = f.read()
    svg = svg[svg.index("<svg"):]
    with open(os.path.join(out, "record.html"), "w") as f:
        f.write(f"<!DOCTYPE html><html><head><meta charset='utf-8'><title>{results['title']}</title></head>"
                f"<body><pre>{md}</pre><figure>{svg}</figure></body></html>\n")
    print(f"utilization {use.max():.6f} governing {CASES[gov]}")


if __name__ == "__main__":
    main(sys.argv[1])
