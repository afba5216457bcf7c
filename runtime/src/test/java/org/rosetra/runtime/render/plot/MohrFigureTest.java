package org.rosetra.runtime.render.plot;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;

class MohrFigureTest {

  /** Invented state: eps_x = 420, eps_y = -135, gamma_xy = 260 µε; stresses invented alike. */
  static MohrFigure sample() {
    MohrCircle strain =
        MohrCircle.fromComponents("Strain, lug_fe", "ε", 420, -135, 130, "normal strain ε [µε]",
            "half shear strain γ/2 [µε]");
    MohrCircle stress =
        MohrCircle.fromComponents("Stress, lug_fe", "σ", 120, -40, 35, "normal stress σ [MPa]",
            "shear stress τ [MPa]");
    return new MohrFigure(List.of(strain, stress));
  }

  @Test
  void closedFormOfTheCircle() {
    // Gere and Goodno, Mechanics of Materials, Mohr's circle: centre (εx+εy)/2, radius
    // sqrt(((εx-εy)/2)^2 + (γ/2)^2), tan 2θp = γxy/(εx-εy).
    MohrCircle m = sample().circles().get(0);
    assertEquals(142.5, m.centre(), 1e-12);
    assertEquals(Math.hypot(277.5, 130), m.radius(), 1e-12);
    assertEquals(Math.toDegrees(Math.atan2(260, 555)), m.twoThetaPDeg(), 1e-12);
    assertEquals(142.5 + Math.hypot(277.5, 130), m.principal1(), 1e-12);
  }

  @Test
  void plottedGeometryMatchesTheInputs() {
    MohrFigure fig = sample();
    for (int i = 0; i < 2; i++) {
      MohrCircle m = fig.circles().get(i);
      XYChart chart = fig.charts().get(i);
      XYSeries circle = chart.getSeriesMap().get(MohrFigure.CIRCLE);
      double[] x = circle.getXData();
      double[] y = circle.getYData();
      for (int k = 0; k < x.length; k++) {
        assertEquals(m.radius(), Math.hypot(x[k] - m.centre(), y[k]), 1e-9 * m.radius());
      }
      // Shear is plotted positive downward: the plotted y is minus the face's shear.
      XYSeries xFace = chart.getSeriesMap().get(MohrFigure.X_FACE);
      assertArrayEquals(new double[] {m.xFace().normal()}, xFace.getXData(), 1e-12);
      assertArrayEquals(new double[] {-m.xFace().shear()}, xFace.getYData(), 1e-12);
      XYSeries diameter = chart.getSeriesMap().get(MohrFigure.DIAMETER);
      assertArrayEquals(new double[] {m.xFace().normal(), m.yFace().normal()}, diameter.getXData(), 1e-12);
      assertArrayEquals(new double[] {-m.xFace().shear(), -m.yFace().shear()}, diameter.getYData(), 1e-12);
      XYSeries principal = chart.getSeriesMap().get(MohrFigure.PRINCIPAL);
      assertArrayEquals(new double[] {m.principal1(), m.principal2()}, principal.getXData(), 1e-12);
      // The arc ends on the principal axis, starting on the x-face diameter.
      XYSeries arc = chart.getSeriesMap().get(MohrFigure.ARC);
      double[] ax = arc.getXData();
      double[] ay = arc.getYData();
      double start = Math.atan2(ay[0], ax[0] - m.centre());
      double end = Math.atan2(ay[ay.length - 1], ax[ax.length - 1] - m.centre());
      double face = Math.atan2(-m.xFace().shear(), m.xFace().normal() - m.centre());
      assertEquals(face, start, 1e-9);
      assertEquals(0, end, 1e-9);
    }
  }

  @Test
  void theCircleIsRoundOnScreen() {
    MohrFigure fig = sample();
    SvgEncoder.encode(fig.painting()); // lays the charts out as written to the file
    for (int i = 0; i < 2; i++) {
      MohrCircle m = fig.circles().get(i);
      XYChart chart = fig.charts().get(i);
      double ratio = EqualAspect.ratio(chart, m.principal2(), m.principal1(), -m.radius(), m.radius());
      assertEquals(1.0, ratio, 2e-3, "pixels per unit across and up must agree");
    }
  }

  @Test
  void inconsistentInputsAreRefused() {
    assertThrows(IllegalArgumentException.class,
        () -> new MohrCircle("bad", "ε", 100, 50, new FacePoint(150, 10), new FacePoint(50, -10),
            150, 50, 0, "ε", "γ/2"));
  }

  @Test
  void aPointCircleStillRenders() {
    MohrCircle equal = MohrCircle.fromComponents("Equal biaxial", "ε", 300, 300, 0, "ε [µε]", "γ/2 [µε]");
    RenderedFigure out = new MohrFigure(List.of(equal)).render("mohr-equal");
    assertTrue(out.svgText().startsWith("<?xml"));
    assertFalse(out.svgText().contains("NaN"));
  }
}
