package org.rosetra.lang.record;

import static org.junit.jupiter.api.Assertions.*;
import static org.rosetra.lang.record.RecordTestSupport.*;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.rosetra.lang.output.JsonTree;
import org.rosetra.runtime.render.plot.MohrCircle;
import org.rosetra.runtime.render.plot.MohrFigure;
import org.rosetra.runtime.render.plot.SvgEncoder;

/**
 * The Mohr's circles of the bracket, worked out here by hand and held against what the tool
 * wrote: results.json and the figure.
 *
 * <p>Source: the closed form of a rectangular rosette with arm a on the x-axis and no transverse
 * sensitivity (Dally and Riley, Experimental Stress Analysis, rosette analysis; from memory):
 * εx = εa, εy = εc, γxy = 2εb − εa − εc; Mohr's circle of strain has centre (εx + εy)/2 and
 * radius √(((εx − εy)/2)² + (γxy/2)²) (Gere and Goodno, plane strain). For plane stress,
 * Hooke's law gives the stress circle centre E/(1 − ν)·(εx + εy)/2 and radius E/(1 + ν)·R_ε
 * (common practice). The bracket reads strain directly (bridge none, instrument factor = gauge
 * factor), so the readings are the arm strains.
 */
class RecordMohrGeometryTest {

    static final double E = 200e9;  // Pa, from the script
    static final double NU = 0.3;   // from the script

    @TempDir
    static Path work;
    static Map<String, Object> results;
    static Path svg;

    @BeforeAll
    @SuppressWarnings("unchecked")
    static void run() throws IOException {
        Path script = bracketIn(work);
        assertEquals(0, rosetra("run", script.toString()).status());
        Path out = work.resolve(OUT);
        results = (Map<String, Object>) JsonTree.parse(Files.readAllBytes(out.resolve("results.json")));
        svg = out.resolve("plots/mohr-web-heavy.svg");
    }

    @SuppressWarnings("unchecked")
    static double json(String kase, String member) {
        Map<String, Object> rosettes = (Map<String, Object>) results.get("rosettes");
        Map<String, Object> web = (Map<String, Object>) ((Map<String, Object>) rosettes.get("web")).get("results");
        return ((Number) ((Map<String, Object>) web.get(kase)).get(member)).doubleValue();
    }

    /** By hand, in με: εx, εy, γxy, centre, radius. */
    static double[] byHand(double a, double b, double c) {
        double ex = a;
        double ey = c;
        double g = 2 * b - a - c;
        double centre = (ex + ey) / 2;
        double radius = Math.sqrt(Math.pow((ex - ey) / 2, 2) + Math.pow(g / 2, 2));
        return new double[] {ex, ey, g, centre, radius};
    }

    @ParameterizedTest(name = "{0}: {1}, {2}, {3} ue")
    @CsvSource({"light, 250, 110, -60", "medium, 520, 260, -140", "heavy, 780, 380, -210"})
    void resultsJsonHasTheCircleWorkedOutByHand(String kase, double a, double b, double c) {
        double[] h = byHand(a, b, c);
        double tol = 1e-9; // in με: the JSON is SI fractions, so 1e-15 absolute
        assertEquals(h[0], json(kase, "eps_x") * 1e6, tol, "eps_x");
        assertEquals(h[1], json(kase, "eps_y") * 1e6, tol, "eps_y");
        assertEquals(h[2], json(kase, "gamma_xy") * 1e6, tol, "gamma_xy");
        assertEquals(h[3] + h[4], json(kase, "eps_1") * 1e6, tol, "eps_1 = centre + radius");
        assertEquals(h[3] - h[4], json(kase, "eps_2") * 1e6, tol, "eps_2 = centre - radius");
        assertEquals(2 * h[4], json(kase, "gamma_max") * 1e6, tol, "gamma_max = diameter");
        double twoTheta = Math.toDegrees(Math.atan2(h[2] / 2, (h[0] - h[1]) / 2));
        assertEquals(twoTheta / 2, json(kase, "theta_p"), 1e-9, "theta_p = atan2(γ/2, (εx-εy)/2) / 2");

        double sCentre = E / (1 - NU) * h[3] * 1e-6;
        double sRadius = E / (1 + NU) * h[4] * 1e-6;
        assertEquals(sCentre + sRadius, json(kase, "sigma_1"), 1e-3, "sigma_1 [Pa]");
        assertEquals(sCentre - sRadius, json(kase, "sigma_2"), 1e-3, "sigma_2 [Pa]");
        assertEquals(sRadius, json(kase, "tau_max"), 1e-3, "tau_max [Pa]");
    }

    /**
     * The figure, rebuilt from the numbers in results.json the way a reader would draw it, has
     * its circle, faces and principal points where the hand calculation puts them; and drawn to
     * SVG it is the very file the run wrote, so the file shows these numbers.
     */
    @Test
    void theFigureShowsTheCircleWorkedOutByHand() throws IOException {
        double[] h = byHand(780, 380, -210);
        String kase = "heavy";
        MohrCircle strain = MohrCircle.fromComponents("Strain, web[heavy]", "ε",
                json(kase, "eps_x") / 1e-6, json(kase, "eps_y") / 1e-6, json(kase, "gamma_xy") / 2 / 1e-6,
                "normal strain ε [με]", "half shear strain γ/2 [με]");
        MohrCircle stress = MohrCircle.fromComponents("Stress, web[heavy]", "σ",
                json(kase, "sigma_x") / 1e6, json(kase, "sigma_y") / 1e6, json(kase, "tau_xy") / 1e6,
                "normal stress σ [MPa]", "shear stress τ [MPa]");
        MohrFigure figure = new MohrFigure(List.of(strain, stress));

        XYChart chart = figure.charts().get(0);
        XYSeries circle = chart.getSeriesMap().get(MohrFigure.CIRCLE);
        double[] x = circle.getXData();
        double[] y = circle.getYData();
        assertTrue(x.length >= 72, "the circle is drawn with enough points");
        double minX = Double.MAX_VALUE;
        double maxX = -Double.MAX_VALUE;
        for (int i = 0; i < x.length; i++) {
            assertEquals(h[4], Math.hypot(x[i] - h[3], y[i]), 1e-9, "point " + i + " is on the circle");
            minX = Math.min(minX, x[i]);
            maxX = Math.max(maxX, x[i]);
        }
        assertEquals(h[3] - h[4], minX, 1e-9, "leftmost point is eps_2");
        assertEquals(h[3] + h[4], maxX, 1e-9, "rightmost point is eps_1");

        XYSeries principal = chart.getSeriesMap().get(MohrFigure.PRINCIPAL);
        assertArrayEquals(new double[] {h[3] + h[4], h[3] - h[4]}, principal.getXData(), 1e-9);
        assertArrayEquals(new double[] {0, 0}, principal.getYData(), 0);
        // Shear is plotted positive downward: the x face (εx, γ/2) sits at y = −γ/2.
        XYSeries xFace = chart.getSeriesMap().get(MohrFigure.X_FACE);
        assertEquals(h[0], xFace.getXData()[0], 1e-9);
        assertEquals(-h[2] / 2, xFace.getYData()[0], 1e-9);
        XYSeries yFace = chart.getSeriesMap().get(MohrFigure.Y_FACE);
        assertEquals(h[1], yFace.getXData()[0], 1e-9);
        assertEquals(h[2] / 2, yFace.getYData()[0], 1e-9);
        XYSeries diameter = chart.getSeriesMap().get(MohrFigure.DIAMETER);
        assertEquals(h[3], (diameter.getXData()[0] + diameter.getXData()[1]) / 2, 1e-9, "the diameter passes the centre");

        XYSeries stressCircle = figure.charts().get(1).getSeriesMap().get(MohrFigure.CIRCLE);
        double sCentre = E / (1 - NU) * h[3] * 1e-12; // MPa
        double sRadius = E / (1 + NU) * h[4] * 1e-12;
        for (int i = 0; i < stressCircle.getXData().length; i++) {
            assertEquals(sRadius, Math.hypot(stressCircle.getXData()[i] - sCentre, stressCircle.getYData()[i]), 1e-6);
        }

        byte[] drawn = SvgEncoder.encode(figure.painting());
        assertArrayEquals(Files.readAllBytes(svg), drawn,
                "the SVG the run wrote is the figure of the numbers in results.json");
    }

    /** Read back from the SVG itself: it is a picture of two panels and marks no host. */
    @Test
    void theSvgIsTwoPanelsOfTheDeclaredSize() throws IOException {
        String text = Files.readString(svg);
        int w = 2 * MohrFigure.PANEL_WIDTH;
        assertTrue(text.contains("viewBox=\"0 0 " + w + " "), text.substring(0, 400));
        assertFalse(text.contains("<image"), "no raster inside the vector figure");
        assertFalse(text.contains("<text"), "text is drawn as outlines, so no font is needed");
    }
}
