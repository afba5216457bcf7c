package org.rosetra.lang.plan;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Function;
import java.util.function.Supplier;
import org.rosetra.lang.syntax.Check;
import org.rosetra.lang.syntax.ComparisonOp;
import org.rosetra.lang.syntax.Plot;
import org.rosetra.lang.syntax.SourceSpan;
import org.rosetra.runtime.render.plot.CaseBarFigure;
import org.rosetra.runtime.render.plot.CaseBars;
import org.rosetra.runtime.render.plot.DirectionCurves;
import org.rosetra.runtime.render.plot.DirectionFigure;
import org.rosetra.runtime.render.plot.FileStem;
import org.rosetra.runtime.render.plot.Figure;
import org.rosetra.runtime.render.plot.History;
import org.rosetra.runtime.render.plot.HistoryFigure;
import org.rosetra.runtime.render.plot.Limit;
import org.rosetra.runtime.render.plot.MohrCircle;
import org.rosetra.runtime.render.plot.MohrFigure;
import org.rosetra.runtime.strain.StrainState;
import org.rosetra.runtime.stress.Hooke;
import org.rosetra.runtime.stress.StressState;
import org.rosetra.runtime.units.Dimension;
import org.rosetra.runtime.units.DisplayUnits;
import org.rosetra.runtime.units.Unit;

/** Draws what a {@code plot} statement asks for with the runtime's figures, in display units. */
final class Figures {
    private Figures() {}

    static List<Output> of(Plot plot, Evaluation evaluation, DisplayUnits display, Function<SourceSpan, String> textOf) {
        String label = textOf.apply(plot.target().span());
        List<Output> histories = new java.util.ArrayList<>();
        for (SeriesEvaluation.Result series : evaluation.series().values()) {
            Decimation d = series.plots().get(plot);
            if (d != null) {
                histories.add(history(plot, series, d, evaluation, display, label, textOf));
            }
        }
        if (!histories.isEmpty()) {
            return histories;
        }
        Value target = evaluation.expressions().evaluate(plot.target(), Map.of());
        return switch (plot.kind()) {
            case MOHR -> List.of(mohr(plot, target, evaluation, display, label));
            case DIRECTIONS -> List.of(directions(plot, target, evaluation, display, label));
            case VALUE -> List.of(value(plot, target, evaluation, display, label, textOf));
        };
    }

    /** The strain state (and the stress state, when there is a material) that a plot draws. */
    private record Pictured(StrainState strain, StressState stress, String rosette, String caseName) {
        /** {@code web_top-proof_60kN} for a rosette in a case, else the state's written name. */
        String stem(String label) {
            return rosette != null ? rosette + "-" + caseName : label;
        }
    }

    private static Pictured pictured(Plot plot, Value target, Evaluation evaluation) {
        if (target instanceof Value.RosetteInCase rc) {
            RosetteModel model = evaluation.rosette(rc.rosette());
            StrainState s = evaluation.strains(rc.rosette())[evaluation.axisIndex.get(rc.caseName())];
            StressState stress = model.material() == null ? null : Hooke.stress(s, model.material(), model.condition());
            return new Pictured(s, stress, rc.rosette(), rc.caseName());
        }
        if (target instanceof Value.State st) {
            StateModel model = evaluation.state(st.name());
            return new Pictured(model.strain(), model.stress(), null, null);
        }
        throw new EvaluationException(plot.target().span(), "plot " + plot.kind().name().toLowerCase(java.util.Locale.ROOT)
                + " needs a rosette in one case, such as web_top[proof_60kN], or a state",
                target instanceof Value.Rosette r ? "pick a case: " + r.name() + "[" + firstCase(evaluation, r.name()) + "]" : null);
    }

    private static String firstCase(Evaluation evaluation, String rosette) {
        StrainState[] s = evaluation.strains(rosette);
        for (int i = 0; i < s.length; i++) {
            if (s[i] != null) {
                return evaluation.axis().get(i);
            }
        }
        return "CASE";
    }

    private static Output mohr(Plot plot, Value target, Evaluation evaluation, DisplayUnits display, String label) {
        Pictured p = pictured(plot, target, evaluation);
        List<MohrCircle> circles = new ArrayList<>();
        if (p.strain() != null) {
            Unit u = display.strainUnit();
            circles.add(MohrCircle.fromComponents("Strain, " + label, "ε", u.fromSi(p.strain().epsX()),
                    u.fromSi(p.strain().epsY()), u.fromSi(p.strain().gammaXY() / 2),
                    "normal strain ε [" + u.symbol() + "]", "half shear strain γ/2 [" + u.symbol() + "]"));
        }
        if (p.stress() != null) {
            Unit u = display.unitFor(Dimension.STRESS);
            circles.add(MohrCircle.fromComponents("Stress, " + label, "σ", u.fromSi(p.stress().sigmaX()),
                    u.fromSi(p.stress().sigmaY()), u.fromSi(p.stress().tauXY()),
                    "normal stress σ [" + u.symbol() + "]", "shear stress τ [" + u.symbol() + "]"));
        }
        return figure(plot, "Mohr's circles, " + label, "mohr-" + p.stem(label), () -> new MohrFigure(circles));
    }

    private static Output directions(Plot plot, Value target, Evaluation evaluation, DisplayUnits display, String label) {
        Pictured p = pictured(plot, target, evaluation);
        if (p.strain() == null) {
            throw new EvaluationException(plot.target().span(), "a state given by its stresses has no strain without a material");
        }
        Unit u = display.strainUnit();
        List<Double> angles = new ArrayList<>();
        List<Double> readings = new ArrayList<>();
        if (p.rosette() != null) {
            RosetteModel model = evaluation.rosette(p.rosette());
            for (ArmReading r : evaluation.armReadings()) {
                if (r.rosette().equals(p.rosette()) && r.caseName().equals(p.caseName())) {
                    double deg = Math.toDegrees(model.armAngle(r.arm()));
                    angles.add(((deg % 180) + 180) % 180);
                    // The arm's reading after every correction, before the solve (it still holds the
                    // small transverse-sensitivity share the solve takes out).
                    readings.add(u.fromSi(r.trace().result()));
                }
            }
        }
        DirectionCurves curves = DirectionCurves.fromState("Strain against direction, " + label,
                u.fromSi(p.strain().epsX()), u.fromSi(p.strain().epsY()), u.fromSi(p.strain().gammaXY()),
                angles.stream().mapToDouble(Double::doubleValue).toArray(),
                readings.stream().mapToDouble(Double::doubleValue).toArray(), u.symbol());
        return figure(plot, "Strain against direction, " + label, "directions-" + p.stem(label), () -> new DirectionFigure(curves));
    }

    private static Output value(Plot plot, Value target, Evaluation evaluation, DisplayUnits display, String label,
                                Function<SourceSpan, String> textOf) {
        Dimension d = Arithmetic.dimension(target, plot.target().span());
        Unit u = d.isNone() ? Unit.ONE : display.unitFor(d);
        Optional<Limit> limit = limitFor(label, evaluation, u, textOf);
        if (target instanceof Value.History h) {
            double[] shown = new double[h.values().length];
            for (int i = 0; i < shown.length; i++) {
                shown[i] = u.fromSi(h.values()[i]);
            }
            History history = new History(label + " over " + h.series(), h.time(), shown, "s", label, u.symbol(), limit);
            return figure(plot, label + " against time, series " + h.series(), label + "-" + h.series(), () -> new HistoryFigure(history));
        }
        double[] values = Arithmetic.column(target, evaluation.axis().size());
        double[] shown = new double[values.length];
        for (int i = 0; i < values.length; i++) {
            shown[i] = Double.isNaN(values[i]) ? Double.NaN : u.fromSi(values[i]);
        }
        CaseBars bars = new CaseBars(label + " per case", evaluation.axis(), shown, label, u.symbol(), limit);
        return figure(plot, label + " per case", label, () -> new CaseBarFigure(bars));
    }

    private static Output history(Plot plot, SeriesEvaluation.Result series, Decimation d, Evaluation evaluation,
                                  DisplayUnits display, String label, Function<SourceSpan, String> textOf) {
        Dimension dimension = plotDimension(plot, evaluation);
        Unit u = dimension.isNone() ? Unit.ONE : display.unitFor(dimension);
        double[][] points = d.points();
        double[] shown = new double[points[1].length];
        for (int i = 0; i < shown.length; i++) {
            shown[i] = u.fromSi(points[1][i]);
        }
        String name = series.spec().name();
        String shownLabel = label.endsWith("[" + name + "]") ? label.substring(0, label.length() - name.length() - 2) : label;
        Optional<Limit> limit = limitFor(label, evaluation, u, textOf).or(() -> limitFor(shownLabel, evaluation, u, textOf));
        History history = new History(shownLabel + ", series " + name, points[0], shown, "s", shownLabel, u.symbol(), limit);
        return figure(plot, shownLabel + " against time, series " + name, shownLabel + "-" + name, () -> new HistoryFigure(history));
    }

    /** The dimension of a plotted member (the history itself is not kept). */
    private static Dimension plotDimension(Plot plot, Evaluation evaluation) {
        org.rosetra.lang.syntax.Expr e = plot.target();
        while (e instanceof org.rosetra.lang.syntax.Index ix) {
            e = ix.target();
        }
        if (e instanceof org.rosetra.lang.syntax.Member m) {
            return org.rosetra.runtime.results.RosetteMember.byScriptName(m.member().text())
                    .map(Expressions::dimensionOf).orElse(Dimension.NONE);
        }
        return Dimension.NONE;
    }

    /** A check on the same expression against a single number gives the plot its limit line. */
    private static Optional<Limit> limitFor(String label, Evaluation evaluation, Unit unit, Function<SourceSpan, String> textOf) {
        for (Check c : evaluation.program().checks()) {
            if (!textOf.apply(c.left().span()).equals(label)) {
                continue;
            }
            Value right = evaluation.expressions().evaluate(c.right(), Map.of());
            if (right instanceof Value.Number n) {
                String how = c.op() == ComparisonOp.LESS || c.op() == ComparisonOp.LESS_OR_EQUAL ? "limit" : "lower limit";
                return Optional.of(new Limit(how + " of \"" + c.label().value() + "\"", unit.fromSi(n.si())));
            }
        }
        return Optional.empty();
    }

    /**
     * Draws a figure as SVG and as PNG, one after the other on this thread: drawing on several
     * threads at once measured slower here (bench/startup), the drawing code contending with itself.
     */
    private static Output figure(Plot plot, String caption, String stem, Supplier<Figure> make) {
        return new Output.FigureOutput(plot, caption, make.get().render(FileStem.from(stem)));
    }

}
