package org.rosetra.runtime.render.plot;

import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.font.FontRenderContext;
import java.awt.font.TextLayout;
import java.awt.geom.AffineTransform;
import java.util.ArrayList;
import java.util.List;
import org.knowm.xchart.internal.chartpart.Chart;

/**
 * One or more charts side by side, each in a panel of the same size, with an optional note
 * under them, wrapped to the width. Our own small layout, since XChart paints one chart per canvas.
 */
public record ChartRow(List<Chart<?, ?>> charts, int panelWidth, int panelHeight, String note)
    implements Painting {

  static final int NOTE_LINE = 16;
  static final int NOTE_PAD = 8;
  static final int NOTE_MARGIN = 12;

  /** A fixed context for measuring the note, so line breaks never depend on the canvas. */
  private static final FontRenderContext MEASURE = new FontRenderContext(null, true, true);

  public ChartRow {
    charts = List.copyOf(charts);
    if (charts.isEmpty()) {
      throw new IllegalArgumentException("a chart row needs at least one chart");
    }
    note = note == null ? "" : note;
  }

  /** The note broken at spaces into lines that fit the canvas width. */
  List<String> noteLines() {
    List<String> lines = new ArrayList<>();
    if (note.isEmpty()) {
      return lines;
    }
    Font font = PlotFont.ofSize(PlotLook.TICK_SIZE);
    double room = width() - 2.0 * NOTE_MARGIN;
    StringBuilder line = new StringBuilder();
    for (String word : note.split(" ")) {
      String candidate = line.length() == 0 ? word : line + " " + word;
      if (line.length() > 0 && font.getStringBounds(candidate, MEASURE).getWidth() > room) {
        lines.add(line.toString());
        line = new StringBuilder(word);
      } else {
        line = new StringBuilder(candidate);
      }
    }
    lines.add(line.toString());
    return lines;
  }

  @Override
  public int width() {
    return panelWidth * charts.size();
  }

  @Override
  public int height() {
    int lines = noteLines().size();
    return panelHeight + (lines == 0 ? 0 : lines * NOTE_LINE + NOTE_PAD);
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
    g.setColor(PlotLook.MUTED);
    List<String> lines = noteLines();
    for (int i = 0; i < lines.size(); i++) {
      if (lines.get(i).isEmpty()) {
        continue;
      }
      TextLayout layout = new TextLayout(lines.get(i), PlotFont.ofSize(PlotLook.TICK_SIZE), g.getFontRenderContext());
      double y = panelHeight + (i + 1) * NOTE_LINE;
      g.fill(layout.getOutline(AffineTransform.getTranslateInstance(NOTE_MARGIN, y)));
    }
  }
}
