package org.rosetra.lang.plan;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.rosetra.lang.syntax.Binary;
import org.rosetra.lang.syntax.Call;
import org.rosetra.lang.syntax.Expr;
import org.rosetra.lang.java.JavaFunctionCall;
import org.rosetra.lang.syntax.Index;
import org.rosetra.lang.syntax.JavaCode;
import org.rosetra.lang.syntax.Let;
import org.rosetra.lang.syntax.Member;
import org.rosetra.lang.syntax.NameRef;
import org.rosetra.lang.syntax.Negate;
import org.rosetra.lang.syntax.NumberLit;
import org.rosetra.lang.syntax.QuantityLit;
import org.rosetra.lang.syntax.ReadingList;
import org.rosetra.lang.syntax.SourceSpan;
import org.rosetra.lang.syntax.StringLit;
import org.rosetra.runtime.column.ColumnDomainException;
import org.rosetra.runtime.column.Columns;
import org.rosetra.runtime.criteria.MohrCoulomb;
import org.rosetra.runtime.criteria.Rankine;
import org.rosetra.runtime.material.Material;
import org.rosetra.runtime.results.RosetteMember;
import org.rosetra.runtime.results.RosetteResult;
import org.rosetra.runtime.strain.StrainState;
import org.rosetra.runtime.stress.Hooke;
import org.rosetra.runtime.stress.StressState;
import org.rosetra.runtime.units.Dimension;
import org.rosetra.runtime.units.Rational;
import org.rosetra.runtime.units.UnitException;
import org.rosetra.runtime.units.UnitParser;

/**
 * Evaluates expressions over whole columns: a rosette member is one number per case, and an
 * operation on it runs over every case at once. Numbers are SI and carry their dimension.
 */
public final class Expressions {
    private final Evaluation evaluation;

    Expressions(Evaluation evaluation) {
        this.evaluation = evaluation;
    }

    /** The value of {@code e}, with the function parameters in {@code params} bound. */
    public Value evaluate(Expr e, Map<String, Value> params) {
        return evaluate(e, new Scope(params, null));
    }

    /**
     * The value of {@code e} over one chunk of a measured series: rosette members are then the
     * chunk's samples ({@link Value.History}); a name the chunk does not read throws
     * {@link Frame.NotInFrame}.
     */
    public Value evaluateIn(Expr e, Frame frame) {
        return evaluate(e, new Scope(Map.of(), frame));
    }

    Value evaluate(Expr e, Scope params) {
        try {
            return eval(e, params);
        } catch (ColumnDomainException x) {
            String where = x.index() < evaluation.axis.size() ? " in case " + evaluation.axis.get(x.index()) : "";
            throw new EvaluationException(e.span(), x.getMessage() + where);
        } catch (UnitException x) {
            throw new EvaluationException(e.span(), x.getMessage());
        }
    }

    /** A single number of the given dimension, in SI; anything else is an error naming {@code what}. */
    double number(Expr e, Dimension expected, Map<String, Value> params, String what) {
        Value v = evaluate(e, new Scope(params, null));
        if (v instanceof Value.Number n) {
            if (!n.dimension().equals(expected)) {
                throw new EvaluationException(e.span(), what + " needs " + describe(expected) + ", got "
                        + describe(n.dimension()));
            }
            return n.si();
        }
        throw new EvaluationException(e.span(), what + " needs a single number, got " + kindOf(v));
    }

    /**
     * The numbers of a field in SI: a list of readings with its one unit ({@code 412, -38,
     * -121 ue}), or a single dimensionless value.
     */
    double[] numbers(Expr value, String what) {
        if (value instanceof ReadingList list) {
            double scale = list.unitText() == null ? 1.0 : UnitParser.parse(list.unitText()).scale();
            double[] out = new double[list.values().size()];
            for (int i = 0; i < out.length; i++) {
                out[i] = list.values().get(i) * scale;
            }
            return out;
        }
        return new double[] {number(value, Dimension.NONE, Map.of(), what)};
    }

    private Value eval(Expr e, Scope params) {
        if (e instanceof NumberLit n) {
            return new Value.Number(n.value(), Dimension.NONE);
        }
        if (e instanceof QuantityLit q) {
            var unit = UnitParser.parse(q.unitText());
            return new Value.Number(unit.toSi(q.value()), unit.dimension());
        }
        if (e instanceof ReadingList list) {
            if (list.values().size() == 1) {
                double scale = list.unitText() == null ? 1 : UnitParser.parse(list.unitText()).scale();
                Dimension d = list.unitText() == null ? Dimension.NONE : UnitParser.parse(list.unitText()).dimension();
                return new Value.Number(list.values().get(0) * scale, d);
            }
            throw new EvaluationException(e.span(), "a list of readings is not a value here");
        }
        if (e instanceof StringLit s) {
            return new Value.Text(s.value());
        }
        if (e instanceof NameRef ref) {
            return name(ref, params);
        }
        if (e instanceof Member m) {
            return member(m, eval(m.target(), params), params);
        }
        if (e instanceof Index ix) {
            return index(ix, params);
        }
        if (e instanceof Negate neg) {
            Value v = eval(neg.operand(), params);
            return Arithmetic.negate(v, neg.span());
        }
        if (e instanceof Binary b) {
            Value left = eval(b.left(), params);
            Value right = eval(b.right(), params);
            return Arithmetic.binary(b.op(), left, right, b.span());
        }
        if (e instanceof Call c) {
            return call(c, params);
        }
        throw new EvaluationException(e.span(), "this is not a value that can be computed");
    }

    private Value name(NameRef ref, Scope params) {
        String name = ref.name();
        Value bound = params.get(name);
        if (bound == null && params.frame() != null && evaluation.isLet(name)) {
            return evaluation.letIn(name, params.frame());
        }
        if (bound != null) {
            return bound;
        }
        if (evaluation.isLet(name)) {
            return evaluation.let(name);
        }
        if (evaluation.isRosette(name)) {
            return new Value.Rosette(name);
        }
        if (evaluation.isState(name)) {
            return new Value.State(name);
        }
        if (evaluation.isMaterial(name)) {
            return new Value.MaterialRef(evaluation.material(name));
        }
        throw new EvaluationException(ref.span(), "'" + name + "' is not a value");
    }

    private Value member(Member m, Value target, Scope scope) {
        String name = m.member().text();
        SourceSpan at = m.member().span();
        if (target instanceof Value.MaterialRef mat) {
            return materialMember(mat.material(), name, at);
        }
        Optional<RosetteMember> member = RosetteMember.byScriptName(name);
        if (member.isEmpty()) {
            throw new EvaluationException(at, "'" + name + "' is not a member of a rosette's result");
        }
        Dimension d = dimensionOf(member.get());
        if (target instanceof Value.Rosette r && scope.frame() != null) {
            if (member.get().needsMaterial() && evaluation.rosette(r.name()).material() == null) {
                throw new EvaluationException(at, "rosette " + r.name() + " has no material, so it has no " + name);
            }
            Frame f = scope.frame();
            return new Value.History(f.series(), f.member(r.name(), member.get()), f.times(), d);
        }
        if (target instanceof Value.Rosette r) {
            double[] column = evaluation.results(r.name()).get(member.get());
            if (column == null) {
                throw new EvaluationException(at, "rosette " + r.name() + " has no material, so it has no " + name,
                        "give the rosette a material to get stresses");
            }
            return new Value.Column(column.clone(), d);
        }
        if (target instanceof Value.RosetteInCase rc) {
            double[] column = evaluation.results(rc.rosette()).get(member.get());
            if (column == null) {
                throw new EvaluationException(at, "rosette " + rc.rosette() + " has no material, so it has no " + name);
            }
            double v = column[evaluation.axisIndex.get(rc.caseName())];
            return new Value.Number(v, d);
        }
        if (target instanceof Value.State s) {
            RosetteResult result = stateResult(evaluation.state(s.name()));
            if (!result.has(member.get())) {
                throw new EvaluationException(at, "state " + s.name() + " has no " + name
                        + " (it needs a material to relate strain and stress)");
            }
            return new Value.Number(result.get(member.get()), d);
        }
        throw new EvaluationException(at, "'" + name + "' needs a rosette, a state or a material before the dot, got "
                + kindOf(target));
    }

    /** Member values of a state: via the strain when it is known, else from the stress alone. */
    static RosetteResult stateResult(StateModel state) {
        StrainState strain = state.strain();
        if (strain == null) {
            return RosetteResult.ofStress(state.stress(), state.material(), state.condition());
        }
        return RosetteResult.of(strain, state.material(), state.condition());
    }

    private static Value materialMember(Material m, String name, SourceSpan at) {
        switch (name) {
            case "E": return new Value.Number(m.e(), Dimension.STRESS);
            case "nu": return new Value.Number(m.nu(), Dimension.NONE);
            case "G": return new Value.Number(m.g(), Dimension.STRESS);
            case "yield": return strength(m, m.yield(), "yield", at);
            case "yield_c": return strength(m, m.yieldC(), "yield_c", at);
            case "ultimate": return strength(m, m.ultimate(), "ultimate", at);
            case "ultimate_c": return strength(m, m.ultimateC(), "ultimate_c", at);
            default:
                throw new EvaluationException(at, "'" + name + "' is not a property of a material",
                        "a material has E, nu, G, yield, yield_c, ultimate and ultimate_c");
        }
    }

    private static Value strength(Material m, java.util.OptionalDouble value, String name, SourceSpan at) {
        if (value.isEmpty()) {
            throw new EvaluationException(at, "material " + m.name() + " gives no " + name,
                    "add " + name + " = ... to material " + m.name());
        }
        return new Value.Number(value.getAsDouble(), Dimension.STRESS);
    }

    static Dimension dimensionOf(RosetteMember m) {
        switch (m.kind()) {
            case STRESS: return Dimension.STRESS;
            case ANGLE: return Dimension.ANGLE;
            default: return Dimension.NONE;
        }
    }

    private Value index(Index ix, Scope params) {
        String caseName = ix.caseName().text();
        Integer position = evaluation.axisIndex.get(caseName);
        if (position == null && evaluation.program.series.containsKey(caseName)) {
            if (params.frame() == null) {
                throw new EvaluationException(ix.span(), "a history of series " + caseName
                        + " is a value per sample: reduce it with max() or min(), check it, or plot it");
            }
            if (!params.frame().series().equals(caseName)) {
                throw Frame.NotInFrame.INSTANCE;
            }
            return eval(ix.target(), params);
        }
        if (position != null && params.frame() != null) {
            // A load case picked inside a series expression: a single number from the cases.
            return index(ix, new Scope(params.params(), null));
        }
        if (position == null) {
            throw new EvaluationException(ix.caseName().span(), "'" + caseName + "' is not a load case or combination");
        }
        Value target = eval(ix.target(), params);
        if (target instanceof Value.Rosette r) {
            if (evaluation.strains(r.name())[position] == null) {
                throw new EvaluationException(ix.span(), "rosette " + r.name() + " has no result in " + caseName,
                        "read it in that case, or pick another");
            }
            return new Value.RosetteInCase(r.name(), caseName);
        }
        if (target instanceof Value.Column c) {
            double v = c.values()[position];
            if (Double.isNaN(v)) {
                throw new EvaluationException(ix.span(), "this value has no result in " + caseName);
            }
            return new Value.Number(v, c.dimension());
        }
        if (target instanceof Value.Number) {
            return target;
        }
        throw new EvaluationException(ix.span(), "only a value per case can be picked by case, not " + kindOf(target));
    }

    // ---- calls --------------------------------------------------------------------------

    private Value call(Call c, Scope params) {
        String f = c.function().text();
        if ((f.equals("max") || f.equals("min")) && params.frame() == null) {
            // max(x[series]) was reduced during the series' pass.
            Value reduced = evaluation.seriesReduction(c);
            if (reduced != null) {
                return reduced;
            }
        }
        List<Value> args = new ArrayList<>();
        for (Expr a : c.args()) {
            args.add(eval(a, params));
        }
        if (evaluation.isLet(f)) {
            Value fn = evaluation.let(f);
            if (fn instanceof Value.Function function) {
                return apply(function, args, c, params);
            }
            throw new EvaluationException(c.function().span(), "'" + f + "' is a value, not a function");
        }
        switch (f) {
            case "sqrt": return Arithmetic.sqrt(one(c, args), c.span());
            case "abs": return Arithmetic.map(one(c, args), Columns::abs, Math::abs, c.span());
            case "sin": return Arithmetic.trig(one(c, args), Columns::sin, Math::sin, c.span(), "sin");
            case "cos": return Arithmetic.trig(one(c, args), Columns::cos, Math::cos, c.span(), "cos");
            case "tan": return Arithmetic.trig(one(c, args), Columns::tan, Math::tan, c.span(), "tan");
            case "atan2": return Arithmetic.atan2(two(c, args, 0), two(c, args, 1), c.span());
            case "max": return Arithmetic.extreme(args, true, c.span(), evaluation.axis);
            case "min": return Arithmetic.extreme(args, false, c.span(), evaluation.axis);
            case "strain_at": return directional(c, args, Direction.STRAIN, params);
            case "shear_at": return directional(c, args, Direction.SHEAR, params);
            case "stress_at": return directional(c, args, Direction.STRESS, params);
            case "shear_stress_at": return directional(c, args, Direction.SHEAR_STRESS, params);
            case "mohr_coulomb": return criterion(c, args, true, params);
            case "rankine": return criterion(c, args, false, params);
            default:
                throw new EvaluationException(c.function().span(), "unknown function '" + f + "'");
        }
    }

    private Value apply(Value.Function function, List<Value> args, Call c, Scope scope) {
        Let def = function.definition();
        if (args.size() != function.parameters().size()) {
            throw new EvaluationException(c.span(), "function " + def.name().text() + " takes "
                    + function.parameters().size() + " arguments, got " + args.size());
        }
        Map<String, Value> bound = new HashMap<>();
        for (int i = 0; i < args.size(); i++) {
            bound.put(function.parameters().get(i), args.get(i));
        }
        if (def.body() instanceof JavaCode) {
            return JavaFunctionCall.call(def, args, c.span(), evaluation.axis, evaluation.javaAllowed());
        }
        return evaluate(def.body(), new Scope(bound, scope.frame()));
    }

    private static Value one(Call c, List<Value> args) {
        if (args.size() != 1) {
            throw new EvaluationException(c.span(), c.function().text() + " takes one argument, got " + args.size());
        }
        return args.get(0);
    }

    private static Value two(Call c, List<Value> args, int which) {
        if (args.size() != 2) {
            throw new EvaluationException(c.span(), c.function().text() + " takes two arguments, got " + args.size());
        }
        return args.get(which);
    }

    private enum Direction { STRAIN, SHEAR, STRESS, SHEAR_STRESS }

    private Value directional(Call c, List<Value> args, Direction kind, Scope scope) {
        Value target = two(c, args, 0);
        Value angle = two(c, args, 1);
        if (!(angle instanceof Value.Number a) || !a.dimension().equals(Dimension.ANGLE)) {
            throw new EvaluationException(c.args().get(1).span(), c.function().text() + " needs a direction as an angle, such as 30 deg");
        }
        double theta = a.si();
        Dimension d = kind == Direction.STRESS || kind == Direction.SHEAR_STRESS ? Dimension.STRESS : Dimension.NONE;
        if (target instanceof Value.Rosette r && scope.frame() != null) {
            return directionalOverSamples(c, r.name(), kind, theta, d, scope.frame());
        }
        if (target instanceof Value.State s) {
            StateModel state = evaluation.state(s.name());
            return new Value.Number(directionalValue(kind, state.strain(), state.stress(), theta, c, s.name()), d);
        }
        String rosette;
        Integer only = null;
        if (target instanceof Value.Rosette r) {
            rosette = r.name();
        } else if (target instanceof Value.RosetteInCase rc) {
            rosette = rc.rosette();
            only = evaluation.axisIndex.get(rc.caseName());
        } else {
            throw new EvaluationException(c.args().get(0).span(), c.function().text() + " needs a rosette or a state, got "
                    + kindOf(target));
        }
        RosetteModel model = evaluation.rosette(rosette);
        if ((kind == Direction.STRESS || kind == Direction.SHEAR_STRESS) && model.material() == null) {
            throw new EvaluationException(c.span(), c.function().text() + " needs rosette " + rosette + " to have a material");
        }
        StrainState[] states = evaluation.strains(rosette);
        double[] out = new double[states.length];
        for (int i = 0; i < states.length; i++) {
            StrainState s = states[i];
            if (s == null) {
                out[i] = Double.NaN;
                continue;
            }
            StressState stress = model.material() == null ? null : Hooke.stress(s, model.material(), model.condition());
            out[i] = directionalValue(kind, s, stress, theta, c, rosette);
        }
        if (only != null) {
            return new Value.Number(out[only], d);
        }
        return new Value.Column(out, d);
    }

    /** The same transformation over a chunk of samples, from the chunk's strain or stress columns. */
    private Value directionalOverSamples(Call c, String rosette, Direction kind, double theta, Dimension d, Frame f) {
        boolean stress = kind == Direction.STRESS || kind == Direction.SHEAR_STRESS;
        if (stress && evaluation.rosette(rosette).material() == null) {
            throw new EvaluationException(c.span(), c.function().text() + " needs rosette " + rosette + " to have a material");
        }
        double[] x = f.member(rosette, stress ? RosetteMember.SIGMA_X : RosetteMember.EPS_X);
        double[] y = f.member(rosette, stress ? RosetteMember.SIGMA_Y : RosetteMember.EPS_Y);
        double[] xy = f.member(rosette, stress ? RosetteMember.TAU_XY : RosetteMember.GAMMA_XY);
        double[] out = new double[f.n()];
        for (int i = 0; i < out.length; i++) {
            out[i] = switch (kind) {
                case STRAIN -> new StrainState(x[i], y[i], xy[i]).normalAt(theta);
                case SHEAR -> new StrainState(x[i], y[i], xy[i]).shearAt(theta);
                case STRESS -> new StressState(x[i], y[i], xy[i]).normalAt(theta);
                case SHEAR_STRESS -> new StressState(x[i], y[i], xy[i]).shearAt(theta);
            };
        }
        return new Value.History(f.series(), out, f.times(), d);
    }

    private static double directionalValue(Direction kind, StrainState strain, StressState stress, double theta,
                                           Call c, String name) {
        switch (kind) {
            case STRAIN:
            case SHEAR:
                if (strain == null) {
                    throw new EvaluationException(c.span(), name + " has no strain: give it a material");
                }
                break;
            default:
                if (stress == null) {
                    throw new EvaluationException(c.span(), name + " has no stress: give it a material");
                }
        }
        return switch (kind) {
            case STRAIN -> strain.normalAt(theta);
            case SHEAR -> strain.shearAt(theta);
            case STRESS -> stress.normalAt(theta);
            case SHEAR_STRESS -> stress.shearAt(theta);
        };
    }

    private Value criterion(Call c, List<Value> args, boolean mohrCoulomb, Scope scope) {
        Value target = one(c, args);
        String what = mohrCoulomb ? "mohr_coulomb" : "rankine";
        Material material;
        double[] s1;
        double[] s2;
        double[] s3;
        Integer only = null;
        Frame frame = target instanceof Value.Rosette ? scope.frame() : null;
        if (frame != null) {
            Value.Rosette r = (Value.Rosette) target;
            material = evaluation.rosette(r.name()).material();
            if (material == null) {
                throw new EvaluationException(c.span(), what + " needs rosette " + r.name() + " to have a material");
            }
            s1 = frame.member(r.name(), RosetteMember.SIGMA_1);
            s2 = frame.member(r.name(), RosetteMember.SIGMA_2);
            s3 = frame.member(r.name(), RosetteMember.SIGMA_Z);
        } else if (target instanceof Value.State s) {
            StateModel state = evaluation.state(s.name());
            RosetteResult r = stateResult(state);
            if (state.material() == null || !r.has(RosetteMember.SIGMA_Z)) {
                throw new EvaluationException(c.span(), what + " needs state " + s.name() + " to have a material");
            }
            material = state.material();
            s1 = new double[] {r.get(RosetteMember.SIGMA_1)};
            s2 = new double[] {r.get(RosetteMember.SIGMA_2)};
            s3 = new double[] {r.get(RosetteMember.SIGMA_Z)};
        } else {
            String rosette;
            if (target instanceof Value.Rosette r) {
                rosette = r.name();
            } else if (target instanceof Value.RosetteInCase rc) {
                rosette = rc.rosette();
                only = evaluation.axisIndex.get(rc.caseName());
            } else {
                throw new EvaluationException(c.args().get(0).span(), what + " needs a rosette or a state, got " + kindOf(target));
            }
            RosetteModel model = evaluation.rosette(rosette);
            if (model.material() == null) {
                throw new EvaluationException(c.span(), what + " needs rosette " + rosette + " to have a material");
            }
            material = model.material();
            EnumMap<RosetteMember, double[]> results = evaluation.results(rosette);
            s1 = results.get(RosetteMember.SIGMA_1);
            s2 = results.get(RosetteMember.SIGMA_2);
            s3 = results.get(RosetteMember.SIGMA_Z);
        }
        double[] out = new double[s1.length];
        try {
            for (int i = 0; i < s1.length; i++) {
                if (Double.isNaN(s1[i])) {
                    out[i] = Double.NaN;
                } else {
                    out[i] = mohrCoulomb ? MohrCoulomb.index(s1[i], s2[i], s3[i], material)
                            : Rankine.index(s1[i], s2[i], s3[i], material);
                }
            }
        } catch (IllegalArgumentException e) {
            throw new EvaluationException(c.span(), e.getMessage());
        }
        if (frame != null) {
            return new Value.History(frame.series(), out, frame.times(), Dimension.NONE);
        }
        if (target instanceof Value.State) {
            return new Value.Number(out[0], Dimension.NONE);
        }
        if (only != null) {
            return new Value.Number(out[only], Dimension.NONE);
        }
        return new Value.Column(out, Dimension.NONE);
    }

    // ---- naming -------------------------------------------------------------------------

    static String describe(Dimension d) {
        return d.isNone() ? "a plain number (or strain)" : "a " + d.name();
    }

    /** How an error message names what a value is: "a stress", "a rosette", ... */
    public static String kindOf(Value v) {
        if (v instanceof Value.Number n) {
            return describe(n.dimension());
        }
        if (v instanceof Value.Column) {
            return "a value per case";
        }
        if (v instanceof Value.History) {
            return "a history of a series";
        }
        if (v instanceof Value.Rosette || v instanceof Value.RosetteInCase) {
            return "a rosette";
        }
        if (v instanceof Value.State) {
            return "a state";
        }
        if (v instanceof Value.MaterialRef) {
            return "a material";
        }
        if (v instanceof Value.Text) {
            return "a string";
        }
        return "a function";
    }

    static Rational exponentOf(double x) {
        if (x == Math.rint(x) && Math.abs(x) < 1000) {
            return Rational.of((int) x);
        }
        double twice = 2 * x;
        if (twice == Math.rint(twice) && Math.abs(x) < 1000) {
            return Rational.of((int) twice, 2);
        }
        return null;
    }
}
