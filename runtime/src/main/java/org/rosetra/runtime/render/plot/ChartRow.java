package org.rosetra.runtime.render.plot;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.font.TextLayout;
import java.awt.geom.AffineTransform;
import java.util.List;
import org.knowm.xchart.internal.chartpart.Chart;

/**
 * One or more charts side by side, each in a panel of the same size, with an optional one-line
 * note under them. Our own small layout, since XChart paints one chart per canvas.
 */
public record ChartRow(List<Chart<?, ?>> charts, int panelWidth, int panelHeight, String note)
    implements Painting {

  static final int NOTE_HEIGHT = 22;

  public ChartRow {
    charts = List.copyOf(charts);
    if (charts.isEmpty()) {
      throw new IllegalArgumentException("a chart row needs at least one chart");
    }
    note = note == null ? "" : note;
  }

  @Override
  public int width() {
    return panelWidth * charts.size();
  }

  @Override
  public int height() {
    return panelHeight + (note.isEmpty() ? 0 : NOTE_HEIGHT);
  }

  @Override
  public void paint(Graphics2D g) {
    g.setColor(Color.WHITE);
    g.fillRect(0, 0, width(), height());
    for (int i = 0; i < charts.size(); i++) {
      Graphics2D panel = (Graphics2D) g.create();
      try {
        panel.translate(i * panelWidth, 0);
        panel.clipRect(0, 0, panelWidth, panelHeight);
        charts.get(i).paint(panel, panelWidth, panelHeight);
      } finally {
        panel.dispose();
      }
    }
    if (!note.isEmpty()) {
      paintNote(g);
    }
  }

  /** The note is drawn as glyph outlines, like XChart's own text, so no font travels in the SVG. */
  private void paintNote(Graphics2D g) {
    TextLayout layout = new TextLayout(note, PlotFont.ofSize(PlotLook.TICK_SIZE), g.getFontRenderContext());
    double x = 12;
    double y = panelHeight + NOTE_HEIGHT - 8;
    g.setColor(PlotLook.MUTED);
    g.fill(layout.getOutline(AffineTransform.getTranslateInstance(x, y)));
  }
}
