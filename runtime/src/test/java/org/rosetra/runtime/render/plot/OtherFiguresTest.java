package org.rosetra.runtime.render.plot;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.knowm.xchart.CategorySeries;
import org.knowm.xchart.XYSeries;

class OtherFiguresTest {

  @Test
  void directionCurvesFollowTheTransformationEquations() {
    // Gere and Goodno, Mechanics of Materials, plane strain transformation: at 0° the normal
    // strain is εx and the shear γxy; at 90° the normal strain is εy; a rectangular rosette's
    // 45° arm reads (εx + εy + γxy)/2 (common practice for the 0/45/90 layout).
    DirectionCurves d = PlotSamples.directions().curves();
    assertEquals(412, d.normal()[0], 1e-9);
    assertEquals(-121, d.normal()[90], 1e-9);
    assertEquals(-38, d.normal()[45], 1e-9);
    double gamma = 2 * -38 - 412 - -121;
    assertEquals(gamma, d.shear()[0], 1e-9);
    assertEquals(-gamma, d.shear()[90], 1e-9, "γ(θ + 90°) = -γ(θ)");
  }

  @Test
  void armReadingsSitAtTheirFoldedAngles() {
    DirectionFigure f =
        new DirectionFigure(DirectionCurves.fromState("t", 100, 0, 0, new double[] {-45, 200, 90},
            new double[] {1, 2, 3}, "µε"));
    XYSeries r = f.chart().getSeriesMap().get(DirectionFigure.READINGS);
    assertArrayEquals(new double[] {135, 20, 90}, r.getXData(), 1e-12);
    assertArrayEquals(new double[] {1, 2, 3}, r.getYData(), 1e-12);
  }

  @Test
  void caseBarsLeaveOutAMissingCaseAndNameIt() {
    CaseBarFigure f = PlotSamples.bars();
    CategorySeries s = f.chart().getSeriesMap().get(CaseBarFigure.BARS);
    List<?> y = List.copyOf(s.getYData().stream().map(v -> v == null ? "none" : v).toList());
    assertEquals(List.of(168.2, 100.9, "none"), y);
    String svg = f.render("bars").svgText();
    assertFalse(svg.contains("NaN"));
  }

  @Test
  void aLongNoteWrapsInsideANarrowFigure() {
    MohrCircle only = MohrCircle.fromComponents("Strain only", "ε", 200, -50, 40, "ε [µε]", "γ/2 [µε]");
    Painting p = new MohrFigure(List.of(only)).painting();
    ChartRow row = (ChartRow) p;
    assertTrue(row.noteLines().size() >= 2, "the convention note must wrap in one panel");
    assertEquals(MohrFigure.PANEL_HEIGHT + row.noteLines().size() * ChartRow.NOTE_LINE + ChartRow.NOTE_PAD,
        p.height());
  }

  @Test
  void localeDigitsNeverReachTheSvg() {
    assertEquals("rgb(12,3,45)", SvgEncoder.asciiDigits("rgb(\u0661\u0662,\u0663,\u0664\u0665)"));
  }

  @Test
  void historyWithoutAnyFiniteSampleStillRenders() {
    HistoryFigure f = new HistoryFigure(new History("empty", new double[] {0, 1}, new double[] {Double.NaN, Double.NaN},
        "s", "v", "MPa", Optional.empty()));
    assertEquals(0, f.shown().size());
    assertFalse(f.render("empty").svgText().contains("NaN"));
  }

  @Test
  void fileStemsAreSafe() {
    assertEquals("mohr-web_top_proof_60kN_", FileStem.from("mohr-web_top[proof_60kN]"));
    org.junit.jupiter.api.Assertions.assertThrows(IllegalArgumentException.class, () -> FileStem.require("../x"));
    org.junit.jupiter.api.Assertions.assertThrows(IllegalArgumentException.class, () -> FileStem.require("a/b"));
  }
}
