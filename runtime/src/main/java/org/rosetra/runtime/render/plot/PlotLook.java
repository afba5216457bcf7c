package org.rosetra.runtime.render.plot;

import java.awt.BasicStroke;
import java.awt.Color;
import java.util.Locale;
import org.knowm.xchart.style.AxesChartStyler;
import org.knowm.xchart.style.Styler;

/** The project's own look for every figure: one typeface, a quiet grid, a small palette. */
public final class PlotLook {

  public static final Color INK = new Color(0x26, 0x2b, 0x33);
  public static final Color GRID = new Color(0xe2, 0xe5, 0xe9);
  public static final Color FRAME = new Color(0xb8, 0xbe, 0xc6);
  public static final Color MAIN = new Color(0x1f, 0x5f, 0x8b);
  public static final Color ACCENT = new Color(0xb4, 0x54, 0x1f);
  public static final Color PRINCIPAL = new Color(0x2e, 0x7d, 0x4f);
  public static final Color ANGLE = new Color(0x7b, 0x4f, 0x9d);
  public static final Color LIMIT = new Color(0xb0, 0x2a, 0x37);
  public static final Color MUTED = new Color(0x8a, 0x90, 0x99);

  public static final float TITLE_SIZE = 13f;
  public static final float LABEL_SIZE = 11f;
  public static final float TICK_SIZE = 10f;

  public static final BasicStroke THIN = new BasicStroke(1f);
  public static final BasicStroke CURVE = new BasicStroke(1.8f);
  public static final BasicStroke DASHED =
      new BasicStroke(1f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {5f, 4f}, 0f);

  private PlotLook() {}

  /** Applies the look to any chart with axes; every font is ours, so nothing comes from the host. */
  public static void apply(AxesChartStyler s) {
    s.setBaseFont(PlotFont.ofSize(LABEL_SIZE));
    s.setChartTitleFont(PlotFont.ofSize(TITLE_SIZE));
    s.setAxisTitleFont(PlotFont.ofSize(LABEL_SIZE));
    s.setAxisTickLabelsFont(PlotFont.ofSize(TICK_SIZE));
    s.setLegendFont(PlotFont.ofSize(TICK_SIZE));
    s.setAnnotationTextFont(PlotFont.ofSize(TICK_SIZE));
    s.setAnnotationTextPanelFont(PlotFont.ofSize(TICK_SIZE));
    s.setToolTipFont(PlotFont.ofSize(TICK_SIZE));
    s.setChartButtonFont(PlotFont.ofSize(TICK_SIZE));
    s.setLocale(Locale.ROOT);
    s.setAntiAlias(true);

    s.setChartBackgroundColor(Color.WHITE);
    s.setPlotBackgroundColor(Color.WHITE);
    s.setChartFontColor(INK);
    s.setAxisTickLabelsColor(INK);
    s.setAxisTickMarksColor(FRAME);
    s.setAnnotationTextFontColor(INK);
    s.setAnnotationLineColor(LIMIT);
    s.setPlotBorderVisible(true);
    s.setPlotBorderColor(FRAME);
    s.setPlotGridLinesVisible(true);
    s.setPlotGridLinesColor(GRID);
    s.setPlotGridLinesStroke(THIN);
    s.setChartTitleBoxVisible(false);
    s.setChartPadding(8);
    s.setLegendBorderColor(FRAME);
    s.setLegendBackgroundColor(Color.WHITE);
    s.setLegendPosition(Styler.LegendPosition.OutsideS);
    s.setLegendLayout(Styler.LegendLayout.Horizontal);
    s.setToolTipsEnabled(false);
    s.setSeriesColors(new Color[] {MAIN, ACCENT, PRINCIPAL, ANGLE, LIMIT, MUTED});
  }
}
