package org.rosetra.runtime.render.plot;

import java.util.List;
import java.util.Locale;
import org.knowm.xchart.AnnotationLine;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * A value against time for a long series. The series is thinned to the smallest and largest
 * sample of each pixel column ({@link MinMaxDecimation}), so every peak is drawn; the overall
 * maximum and minimum are marked and their values and times given in the note.
 */
public final class HistoryFigure implements Figure {

  public static final int WIDTH = 900;
  public static final int HEIGHT = 380;
  public static final String LINE = "history";
  public static final String EXTREMES = "extremes";

  private final History history;
  private final Decimated shown;
  private final XYChart chart;
  private final String note;

  public HistoryFigure(History history) {
    this.history = history;
    this.shown = MinMaxDecimation.decimate(history.time(), history.value(), WIDTH);
    this.chart = build();
    this.note = note();
  }

  /** The plotted (thinned) series, for tests. */
  public Decimated shown() {
    return shown;
  }

  public XYChart chart() {
    return chart;
  }

  @Override
  public Painting painting() {
    return new ChartRow(List.of(chart), WIDTH, HEIGHT, note);
  }

  private XYChart build() {
    String valueLabel = label(history.valueName(), history.valueUnit());
    XYChart c =
        new XYChartBuilder()
            .width(WIDTH)
            .height(HEIGHT)
            .title(history.title())
            .xAxisTitle(label("time", history.timeUnit()))
            .yAxisTitle(valueLabel)
            .build();
    PlotLook.apply(c.getStyler());
    c.getStyler().setLegendVisible(false);
    c.setCustomXAxisTickLabelsFormatter(TickLabels::of);
    c.setCustomYAxisTickLabelsFormatter(TickLabels::of);
    if (shown.size() == 0) {
      c.addSeries(LINE, new double[] {0}, new double[] {0}).setMarker(SeriesMarkers.NONE).setLineColor(
          java.awt.Color.WHITE);
      return c;
    }
    XYSeries line = c.addSeries(LINE, shown.time(), shown.value());
    line.setMarker(SeriesMarkers.NONE);
    line.setLineColor(PlotLook.MAIN);
    line.setLineStyle(PlotLook.THIN);
    int[] ext = extremes(shown.value());
    XYSeries marks =
        c.addSeries(EXTREMES,
            new double[] {shown.time()[ext[1]], shown.time()[ext[0]]},
            new double[] {shown.value()[ext[1]], shown.value()[ext[0]]});
    marks.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
    marks.setMarker(SeriesMarkers.CIRCLE);
    marks.setMarkerColor(PlotLook.ACCENT);
    double lo = shown.value()[ext[0]];
    double hi = shown.value()[ext[1]];
    if (history.limit().isPresent()) {
      double lim = history.limit().get().value();
      c.addAnnotation(new AnnotationLine(lim, false, false));
      lo = Math.min(lo, lim);
      hi = Math.max(hi, lim);
    }
    double pad = (hi - lo) * 0.06 + (hi == lo ? Math.max(1e-9, Math.abs(hi) * 0.05) : 0);
    c.getStyler().setYAxisMin(lo - pad).setYAxisMax(hi + pad);
    return c;
  }

  private String note() {
    if (shown.size() == 0) {
      return "No finite samples to plot.";
    }
    int[] ext = extremes(shown.value());
    String unit = history.valueUnit().isEmpty() ? "" : " " + history.valueUnit();
    String t = history.timeUnit().isEmpty() ? "" : " " + history.timeUnit();
    StringBuilder sb = new StringBuilder();
    sb.append(String.format(Locale.ROOT, "max %s%s at %s%s;  min %s%s at %s%s",
        ValueText.of(shown.value()[ext[1]]), unit, ValueText.of(shown.time()[ext[1]]), t,
        ValueText.of(shown.value()[ext[0]]), unit, ValueText.of(shown.time()[ext[0]]), t));
    history.limit().ifPresent(l ->
        sb.append(";  red line: ").append(l.label()).append(" = ").append(ValueText.of(l.value())).append(unit));
    return sb.toString();
  }

  /** Indices of the first minimum and first maximum. */
  static int[] extremes(double[] v) {
    int lo = 0;
    int hi = 0;
    for (int i = 1; i < v.length; i++) {
      if (v[i] < v[lo]) {
        lo = i;
      }
      if (v[i] > v[hi]) {
        hi = i;
      }
    }
    return new int[] {lo, hi};
  }

  static String label(String name, String unit) {
    return unit.isEmpty() ? name : name + " [" + unit + "]";
  }
}
