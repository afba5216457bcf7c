package org.rosetra.runtime.render.plot;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.knowm.xchart.AnnotationText;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.internal.chartpart.Chart;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Mohr's circles of one case, one panel per circle (usually strain, then stress), side by side.
 *
 * <p>Each panel shows the circle, the x-face and y-face points joined by their diameter, the two
 * principal points, and an arc marking 2θp from the x-face diameter to the first principal
 * point. Shear is plotted positive downward, the convention of Gere and Goodno, Mechanics of
 * Materials (from memory), so that 2θ on the circle turns in the same sense as θ on the part:
 * the plotted y coordinate is minus the shear and the tick labels undo the sign.
 */
public final class MohrFigure implements Figure {

  public static final int PANEL_WIDTH = 470;
  public static final int PANEL_HEIGHT = 450;
  public static final String CONVENTION_NOTE =
      "Shear is plotted positive downward (Gere and Goodno), so 2θ on the circle turns the same"
          + " way as θ on the part.";

  /** Series names, for tests that read the chart data back. */
  public static final String CIRCLE = "circle";
  public static final String DIAMETER = "diameter";
  public static final String X_FACE = "x face";
  public static final String Y_FACE = "y face";
  public static final String PRINCIPAL = "principal";
  public static final String ARC = "2θp arc";

  private static final double MARGIN = 1.2;
  private static final int CIRCLE_SAMPLES = 360;

  private final List<MohrCircle> circles;
  private final List<XYChart> charts;

  public MohrFigure(List<MohrCircle> circles) {
    this.circles = List.copyOf(circles);
    if (this.circles.isEmpty() || this.circles.size() > 3) {
      throw new IllegalArgumentException("a Mohr figure has one to three circles");
    }
    List<XYChart> built = new ArrayList<>();
    for (MohrCircle c : this.circles) {
      built.add(chartOf(c));
    }
    this.charts = List.copyOf(built);
  }

  public List<MohrCircle> circles() {
    return circles;
  }

  /** The charts, one per circle, with their series and fitted axes: for tests and notebooks. */
  public List<XYChart> charts() {
    return charts;
  }

  @Override
  public Painting painting() {
    List<Chart<?, ?>> panels = new ArrayList<>(charts);
    return new ChartRow(panels, PANEL_WIDTH, PANEL_HEIGHT, CONVENTION_NOTE);
  }

  private static XYChart chartOf(MohrCircle m) {
    XYChart chart =
        new XYChartBuilder()
            .width(PANEL_WIDTH)
            .height(PANEL_HEIGHT)
            .title(m.title())
            .xAxisTitle(m.normalAxisLabel())
            .yAxisTitle(m.shearAxisLabel() + ", positive down")
            .build();
    PlotLook.apply(chart.getStyler());
    chart.getStyler().setLegendVisible(false);
    chart.getStyler().setMarkerSize(9);
    chart.setCustomXAxisTickLabelsFormatter(TickLabels::of);
    chart.setCustomYAxisTickLabelsFormatter(v -> TickLabels.of(-v));

    double c = m.centre();
    double r = m.radius();
    double shown = Math.max(r, Math.max(1e-3 * Math.abs(c), 1e-9)); // a point-circle still gets axes

    line(chart, CIRCLE, circleX(c, r), circleY(r), PlotLook.MAIN, PlotLook.CURVE);
    line(chart, "normal axis", new double[] {c - shown * MARGIN, c + shown * MARGIN},
        new double[] {0, 0}, PlotLook.MUTED, PlotLook.DASHED);
    line(chart, DIAMETER, new double[] {m.xFace().normal(), m.yFace().normal()},
        new double[] {-m.xFace().shear(), -m.yFace().shear()}, PlotLook.INK, PlotLook.THIN);
    double arcRadius = 0.32 * r;
    double[][] arc = arc(c, arcRadius, -m.twoThetaPDeg(), 0);
    line(chart, ARC, arc[0], arc[1], PlotLook.ANGLE, PlotLook.CURVE);

    point(chart, X_FACE, new double[] {m.xFace().normal()}, new double[] {-m.xFace().shear()},
        PlotLook.ACCENT, SeriesMarkers.CIRCLE);
    point(chart, Y_FACE, new double[] {m.yFace().normal()}, new double[] {-m.yFace().shear()},
        PlotLook.MAIN, SeriesMarkers.CIRCLE);
    point(chart, PRINCIPAL, new double[] {m.principal1(), m.principal2()}, new double[] {0, 0},
        PlotLook.PRINCIPAL, SeriesMarkers.DIAMOND);

    double off = 0.13 * shown;
    label(chart, "x", outward(m.xFace().normal(), -m.xFace().shear(), c, off));
    label(chart, "y", outward(m.yFace().normal(), -m.yFace().shear(), c, off));
    label(chart, m.symbol() + "1", new double[] {m.principal1() + off, off * 0.8});
    label(chart, m.symbol() + "2", new double[] {m.principal2() - off, off * 0.8});
    double mid = Math.toRadians(-m.twoThetaPDeg() / 2);
    double labelRadius = arcRadius + 0.22 * shown;
    label(chart, String.format(Locale.ROOT, "2θp = %.1f°", m.twoThetaPDeg()),
        new double[] {c + labelRadius * Math.cos(mid), labelRadius * Math.sin(mid)});

    double xMin = c - shown * MARGIN;
    double xMax = c + shown * MARGIN;
    if (Math.abs(c) <= 3 * shown) { // show the origin when it is near: tension or compression at a glance
      xMin = Math.min(xMin, -0.1 * shown);
      xMax = Math.max(xMax, 0.1 * shown);
    }
    EqualAspect.fit(chart, (xMin + xMax) / 2, 0, (xMax - xMin) / 2, shown * MARGIN);
    return chart;
  }

  private static double[] outward(double x, double y, double c, double off) {
    double dx = x - c;
    double len = Math.hypot(dx, y);
    if (len == 0) {
      return new double[] {x, y + off};
    }
    return new double[] {x + off * dx / len, y + off * y / len};
  }

  private static double[] circleX(double c, double r) {
    double[] x = new double[CIRCLE_SAMPLES + 1];
    for (int i = 0; i <= CIRCLE_SAMPLES; i++) {
      x[i] = c + r * Math.cos(2 * Math.PI * i / CIRCLE_SAMPLES);
    }
    return x;
  }

  private static double[] circleY(double r) {
    double[] y = new double[CIRCLE_SAMPLES + 1];
    for (int i = 0; i <= CIRCLE_SAMPLES; i++) {
      y[i] = r * Math.sin(2 * Math.PI * i / CIRCLE_SAMPLES);
    }
    return y;
  }

  /** Points of an arc about (c, 0), counter-clockwise on the plot from one angle to the other. */
  private static double[][] arc(double c, double radius, double fromDeg, double toDeg) {
    int n = 48;
    double[] x = new double[n + 1];
    double[] y = new double[n + 1];
    for (int i = 0; i <= n; i++) {
      double a = Math.toRadians(fromDeg + (toDeg - fromDeg) * i / n);
      x[i] = c + radius * Math.cos(a);
      y[i] = radius * Math.sin(a);
    }
    return new double[][] {x, y};
  }

  private static void line(XYChart chart, String name, double[] x, double[] y, java.awt.Color colour,
      java.awt.BasicStroke stroke) {
    XYSeries s = chart.addSeries(name, x, y);
    s.setMarker(SeriesMarkers.NONE);
    s.setLineColor(colour);
    s.setLineStyle(stroke);
  }

  private static void point(XYChart chart, String name, double[] x, double[] y, java.awt.Color colour,
      org.knowm.xchart.style.markers.Marker marker) {
    XYSeries s = chart.addSeries(name, x, y);
    s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
    s.setMarker(marker);
    s.setMarkerColor(colour);
  }

  private static void label(XYChart chart, String text, double[] at) {
    chart.addAnnotation(new AnnotationText(text, at[0], at[1], false));
  }
}
