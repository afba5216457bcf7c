package org.rosetra.runtime.render.plot;

import java.util.List;
import java.util.Optional;

/** Invented figures shared by the determinism tests, the preview and the benchmark. */
public final class PlotSamples {
  private PlotSamples() {}

  public static MohrFigure mohr() {
    return MohrFigureTest.sample();
  }

  public static DirectionFigure directions() {
    // Invented rectangular rosette: arms at 0, 45, 90 deg read 412, -38, -121 µε.
    double epsX = 412;
    double epsY = -121;
    double gamma = 2 * -38 - epsX - epsY;
    return new DirectionFigure(DirectionCurves.fromState("Directions, web_top, proof_60kN",
        epsX, epsY, gamma, new double[] {0, 45, 90}, new double[] {412, -38, -121}, "µε"));
  }

  public static CaseBarFigure bars() {
    return new CaseBarFigure(new CaseBars("web_top von Mises by case",
        List.of("proof_60kN", "service", "overload"), new double[] {168.2, 100.9, Double.NaN},
        "von_mises", "MPa", Optional.of(new Limit("allowable", 236.7))));
  }

  public static HistoryFigure history() {
    int n = 120_000;
    double[] t = new double[n];
    double[] v = new double[n];
    for (int i = 0; i < n; i++) {
      t[i] = i * 0.001;
      v[i] = 80 + 40 * Math.sin(t[i] * 0.9) + 6 * Math.sin(t[i] * 37.0);
    }
    v[71_234] = 191.5; // a short peak the plot must keep
    v[5_000] = -12.25;
    return new HistoryFigure(new History("web_top von Mises, hoist_run", t, v, "s", "von_mises", "MPa",
        Optional.of(new Limit("allowable", 236.7))));
  }

  public static List<RenderedFigure> all() {
    return List.of(
        mohr().render("mohr-lug_fe"),
        directions().render("directions-web_top-proof_60kN"),
        bars().render("cases-web_top-von_mises"),
        history().render("history-web_top-von_mises"));
  }
}
