package org.rosetra.runtime.render.plot;

import java.util.List;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Normal and shear strain against direction, with the arms' corrected readings as markers, so a
 * reviewer sees at a glance whether the readings sit on the normal-strain curve.
 */
public final class DirectionFigure implements Figure {

  public static final int WIDTH = 760;
  public static final int HEIGHT = 420;
  public static final String NORMAL = "normal strain ε(θ)";
  public static final String SHEAR = "shear strain γ(θ)";
  public static final String READINGS = "arm readings, corrected";

  private final DirectionCurves curves;
  private final XYChart chart;

  public DirectionFigure(DirectionCurves curves) {
    this.curves = curves;
    this.chart = build(curves);
  }

  public DirectionCurves curves() {
    return curves;
  }

  public XYChart chart() {
    return chart;
  }

  @Override
  public Painting painting() {
    return new ChartRow(List.of(chart), WIDTH, HEIGHT,
        "θ counter-clockwise from the part's x-axis; γ(θ) is the engineering shear strain between θ and θ + 90°.");
  }

  /** An arm's direction folded into 0 to 180 degrees, where the curves are drawn (period 180°). */
  static double folded(double deg) {
    double a = deg % 180.0;
    return a < 0 ? a + 180.0 : a;
  }

  private static XYChart build(DirectionCurves d) {
    String unit = d.unit().isEmpty() ? "" : " [" + d.unit() + "]";
    XYChart c =
        new XYChartBuilder()
            .width(WIDTH)
            .height(HEIGHT)
            .title(d.title())
            .xAxisTitle("direction θ [deg]")
            .yAxisTitle("strain" + unit)
            .build();
    PlotLook.apply(c.getStyler());
    c.getStyler().setLegendVisible(true);
    c.getStyler().setMarkerSize(9);
    c.getStyler().setXAxisMin(0.0).setXAxisMax(180.0);
    c.getStyler().setXAxisTickMarkSpacingHint(90); // ticks every 15 or 30 degrees, not every 6
    c.setCustomXAxisTickLabelsFormatter(TickLabels::of);
    c.setCustomYAxisTickLabelsFormatter(TickLabels::of);
    XYSeries n = c.addSeries(NORMAL, d.thetaDeg(), d.normal());
    n.setMarker(SeriesMarkers.NONE);
    n.setLineColor(PlotLook.MAIN);
    n.setLineStyle(PlotLook.CURVE);
    XYSeries s = c.addSeries(SHEAR, d.thetaDeg(), d.shear());
    s.setMarker(SeriesMarkers.NONE);
    s.setLineColor(PlotLook.ACCENT);
    s.setLineStyle(PlotLook.DASHED);
    if (d.armAnglesDeg().length > 0) {
      double[] at = d.armAnglesDeg();
      for (int i = 0; i < at.length; i++) {
        at[i] = folded(at[i]);
      }
      XYSeries r = c.addSeries(READINGS, at, d.armReadings());
      r.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
      r.setMarker(SeriesMarkers.DIAMOND);
      r.setMarkerColor(PlotLook.PRINCIPAL);
    }
    return c;
  }
}
