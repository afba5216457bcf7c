package org.rosetra.runtime.render.plot;

import de.erichseifert.vectorgraphics2d.VectorGraphics2D;
import org.knowm.xchart.XYChart;

/**
 * Sets an XY chart's axis ranges so one data unit spans as many pixels across as up, so that a
 * circle is drawn round. The plot area is known only after XChart lays out its axes, so we paint
 * into a throw-away vector canvas, measure, widen the tighter range, and repeat until it settles.
 */
final class EqualAspect {

  private static final int MAX_ROUNDS = 8;
  private static final double TOLERANCE = 1e-4;

  private EqualAspect() {}

  /** Fits the ranges around the centre; the spans given are minimums, only ever widened. */
  static void fit(XYChart chart, double xCentre, double yCentre, double xHalfSpan, double yHalfSpan) {
    double hx = xHalfSpan;
    double hy = yHalfSpan;
    for (int round = 0; round < MAX_ROUNDS; round++) {
      setRanges(chart, xCentre, yCentre, hx, hy);
      VectorGraphics2D scratch = new VectorGraphics2D();
      chart.paint(scratch, chart.getWidth(), chart.getHeight());
      scratch.dispose();
      double px = Math.abs(chart.getScreenXFromChart(xCentre + hx) - chart.getScreenXFromChart(xCentre - hx));
      double py = Math.abs(chart.getScreenYFromChart(yCentre + hy) - chart.getScreenYFromChart(yCentre - hy));
      double kx = px / (2 * hx); // pixels per unit across
      double ky = py / (2 * hy); // pixels per unit up
      if (Math.abs(kx / ky - 1) < TOLERANCE) {
        return;
      }
      double k = Math.min(kx, ky);
      hx = px / (2 * k);
      hy = py / (2 * k);
    }
    setRanges(chart, xCentre, yCentre, hx, hy);
  }

  /** Pixels per data unit across divided by pixels per unit up, as last painted (1 is round). */
  static double ratio(XYChart chart, double x0, double x1, double y0, double y1) {
    double kx = Math.abs(chart.getScreenXFromChart(x1) - chart.getScreenXFromChart(x0)) / Math.abs(x1 - x0);
    double ky = Math.abs(chart.getScreenYFromChart(y1) - chart.getScreenYFromChart(y0)) / Math.abs(y1 - y0);
    return kx / ky;
  }

  private static void setRanges(XYChart chart, double xc, double yc, double hx, double hy) {
    chart.getStyler().setXAxisMin(xc - hx).setXAxisMax(xc + hx);
    chart.getStyler().setYAxisMin(yc - hy).setYAxisMax(yc + hy);
  }
}
