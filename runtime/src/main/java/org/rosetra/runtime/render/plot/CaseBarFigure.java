package org.rosetra.runtime.render.plot;

import java.util.ArrayList;
import java.util.List;
import org.knowm.xchart.AnnotationLine;
import org.knowm.xchart.CategoryChart;
import org.knowm.xchart.CategoryChartBuilder;
import org.knowm.xchart.CategorySeries;

/** One member's value per case as bars, case names underneath, a check's limit as a red line. */
public final class CaseBarFigure implements Figure {

  public static final int WIDTH = 760;
  public static final int HEIGHT = 400;
  public static final String BARS = "value";

  private final CaseBars bars;
  private final CategoryChart chart;

  public CaseBarFigure(CaseBars bars) {
    this.bars = bars;
    this.chart = build(bars);
  }

  public CategoryChart chart() {
    return chart;
  }

  @Override
  public Painting painting() {
    return new ChartRow(List.of(chart), WIDTH, HEIGHT, note());
  }

  private String note() {
    List<String> parts = new ArrayList<>();
    String unit = bars.unit().isEmpty() ? "" : " " + bars.unit();
    bars.limit().ifPresent(l -> parts.add("red line: " + l.label() + " = " + ValueText.of(l.value()) + unit));
    List<String> missing = new ArrayList<>();
    double[] v = bars.values();
    for (int i = 0; i < v.length; i++) {
      if (!Double.isFinite(v[i])) {
        missing.add(bars.cases().get(i));
      }
    }
    if (!missing.isEmpty()) {
      parts.add("no result in " + String.join(", ", missing));
    }
    return String.join(";  ", parts);
  }

  private static CategoryChart build(CaseBars b) {
    String unit = b.unit().isEmpty() ? "" : " [" + b.unit() + "]";
    CategoryChart c =
        new CategoryChartBuilder()
            .width(WIDTH)
            .height(HEIGHT)
            .title(b.title())
            .xAxisTitle("case")
            .yAxisTitle(b.valueName() + unit)
            .build();
    PlotLook.apply(c.getStyler());
    c.getStyler().setLegendVisible(false);
    c.getStyler().setAvailableSpaceFill(0.55);
    if (b.cases().size() > 6) {
      c.getStyler().setXAxisLabelRotation(40); // many case names would overlap side by side
    }
    c.setCustomYAxisTickLabelsFormatter(TickLabels::of);
    List<Double> values = new ArrayList<>();
    double lo = 0;
    double hi = 0;
    for (double v : b.values()) {
      values.add(Double.isFinite(v) ? v : null);
      if (Double.isFinite(v)) {
        lo = Math.min(lo, v);
        hi = Math.max(hi, v);
      }
    }
    if (b.limit().isPresent()) {
      double lim = b.limit().get().value();
      c.addAnnotation(new AnnotationLine(lim, false, false));
      lo = Math.min(lo, lim);
      hi = Math.max(hi, lim);
    }
    double pad = (hi - lo) * 0.08 + (hi == lo ? 1 : 0);
    c.getStyler().setYAxisMin(lo < 0 ? lo - pad : 0.0).setYAxisMax(hi > 0 ? hi + pad : 0.0 + (hi == lo ? 1 : 0));
    CategorySeries s = c.addSeries(BARS, b.cases(), values);
    s.setFillColor(PlotLook.MAIN);
    return c;
  }
}
