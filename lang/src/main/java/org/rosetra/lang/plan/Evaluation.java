package org.rosetra.lang.plan;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Deque;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Supplier;
import org.rosetra.lang.syntax.Baseline;
import org.rosetra.lang.syntax.Call;
import org.rosetra.lang.syntax.Case;
import org.rosetra.lang.syntax.Combine;
import org.rosetra.lang.syntax.Declaration;
import org.rosetra.lang.syntax.Field;
import org.rosetra.lang.syntax.Let;
import org.rosetra.lang.syntax.NameRef;
import org.rosetra.lang.syntax.SourceSpan;
import org.rosetra.lang.syntax.Term;
import org.rosetra.runtime.gauge.ArmCorrection;
import org.rosetra.runtime.gauge.Bridge;
import org.rosetra.runtime.gauge.CorrectionTrace;
import org.rosetra.runtime.gauge.Gauge;
import org.rosetra.runtime.material.Material;
import org.rosetra.runtime.results.ResultColumns;
import org.rosetra.runtime.results.RosetteMember;
import org.rosetra.runtime.rosette.RosetteLayout;
import org.rosetra.runtime.rosette.RosetteSolver;
import org.rosetra.runtime.strain.StrainState;
import org.rosetra.runtime.stress.Hooke;
import org.rosetra.runtime.stress.PlaneCondition;
import org.rosetra.runtime.stress.StressState;
import org.rosetra.runtime.units.Dimension;

/**
 * The computation of one checked program: every declaration turned into runtime objects, every
 * reading reduced, every value and check evaluated. Everything is computed on first use and
 * kept, so declarations and values may be written in any order; a definition that needs itself
 * is reported as a cycle.
 */
public final class Evaluation {
    static final double KELVIN_AT_0_DEGC = 273.15;

    final Program program;
    final List<String> axis;
    final Map<String, Integer> axisIndex = new HashMap<>();
    private final Map<String, Object> memo = new HashMap<>();
    private final Deque<String> underway = new ArrayDeque<>();
    private final Expressions expressions;

    /** Per rosette, its strain state at each position of the case axis (null: no result). */
    private Map<String, StrainState[]> strains;
    private final List<ArmReading> armReadings = new ArrayList<>();
    private boolean javaAllowed;

    public Evaluation(Program program) {
        this.program = program;
        this.axis = program.caseAxis();
        for (int i = 0; i < axis.size(); i++) {
            axisIndex.put(axis.get(i), i);
        }
        this.expressions = new Expressions(this);
    }

    public Program program() {
        return program;
    }

    public List<String> axis() {
        return axis;
    }

    public Expressions expressions() {
        return expressions;
    }

    /** Whether functions written in Java may run (the user allowed it). */
    public boolean javaAllowed() {
        return javaAllowed;
    }

    void allowJava(boolean allow) {
        this.javaAllowed = allow;
    }

    // ---- declarations -------------------------------------------------------------------

    public Material material(String name) {
        return cached("material " + name, () -> buildMaterial(program.declaration(name, Declaration.Kind.MATERIAL)));
    }

    public Gauge gauge(String name) {
        return cached("gauge " + name, () -> buildGauge(program.declaration(name, Declaration.Kind.GAUGE)));
    }

    public RosetteModel rosette(String name) {
        return cached("rosette " + name, () -> buildRosette(program.declaration(name, Declaration.Kind.ROSETTE)));
    }

    public StateModel state(String name) {
        return cached("state " + name, () -> {
            Declaration d = program.declarations.get(name);
            return buildState(d);
        });
    }

    public boolean isRosette(String name) {
        return program.declaration(name, Declaration.Kind.ROSETTE) != null;
    }

    public boolean isState(String name) {
        Declaration d = program.declarations.get(name);
        return d != null && (d.kind() == Declaration.Kind.STRAIN || d.kind() == Declaration.Kind.STRESS);
    }

    public boolean isMaterial(String name) {
        return program.declaration(name, Declaration.Kind.MATERIAL) != null;
    }

    public List<String> rosetteNames() {
        return program.declarations(Declaration.Kind.ROSETTE).stream().map(d -> d.name().text()).toList();
    }

    public List<String> stateNames() {
        List<String> names = new ArrayList<>();
        for (Declaration d : program.declarations.values()) {
            if (d.kind() == Declaration.Kind.STRAIN || d.kind() == Declaration.Kind.STRESS) {
                names.add(d.name().text());
            }
        }
        return names;
    }

    /** A {@code let} value (not a function), computed once. */
    public Value let(String name) {
        Let let = program.lets.get(name);
        if (let.isFunction()) {
            return new Value.Function(let, let.params().stream().map(p -> p.name().text()).toList());
        }
        try {
            return cached("value " + name, () -> expressions.evaluate(let.body(), Map.of()));
        } catch (CycleException e) {
            throw new EvaluationException(let.name().span(), e.getMessage(),
                    "a value cannot be defined through itself; break the chain");
        }
    }

    /** A {@code let} value evaluated over one chunk of a series (never kept: it changes per chunk). */
    Value letIn(String name, Frame frame) {
        Let let = program.lets.get(name);
        if (let.isFunction()) {
            return let(name);
        }
        return expressions.evaluate(let.body(), new Scope(Map.of(), frame));
    }

    // ---- measured series ----------------------------------------------------------------

    private Map<String, SeriesEvaluation.Result> seriesResults;
    private java.nio.file.Path folder = java.nio.file.Path.of(".");
    private org.rosetra.runtime.series.ReadOptions readOptions = org.rosetra.runtime.series.ReadOptions.defaults();

    private java.io.PrintStream progressOut;
    private boolean digestSeries = true;

    /** Whether series files are digested while read (the record names their SHA-256). */
    public void digestSeries(boolean digest) {
        this.digestSeries = digest;
    }

    /**
     * Where series files are found, how they are read (threads, cancel flag), and where a
     * progress bar is drawn (null: none).
     */
    public void configureSeries(java.nio.file.Path folder, org.rosetra.runtime.series.ReadOptions options,
                                java.io.PrintStream progressOut) {
        this.folder = folder;
        this.readOptions = options;
        this.progressOut = progressOut;
    }

    /** Every series read and reduced, in the order written; read once, on first use. */
    public Map<String, SeriesEvaluation.Result> series() {
        if (seriesResults == null) {
            Map<String, SeriesEvaluation.Result> out = new LinkedHashMap<>();
            if (!program.series.isEmpty()) {
                warmUp();
                for (var s : program.series.values()) {
                    SeriesSpec spec = SeriesSpec.of(s, folder, this);
                    List<Call> reductions = SeriesEvaluation.reductionsOf(this, spec.name());
                    List<org.rosetra.lang.syntax.Plot> plots = new ArrayList<>();
                    for (var o : program.outputs) {
                        if (o instanceof org.rosetra.lang.syntax.Plot p && p.kind() == org.rosetra.lang.syntax.PlotKind.VALUE
                                && (SeriesReferences.mentions(p.target(), program, spec.name()) || program.caseAxis().isEmpty())) {
                            plots.add(p);
                        }
                    }
                    var options = readOptions;
                    org.rosetra.runtime.series.ProgressBar bar = null;
                    if (progressOut != null) {
                        bar = new org.rosetra.runtime.series.ProgressBar(progressOut, "reading " + spec.shownName());
                        options = options.withProgress(bar);
                    }
                    try {
                        out.put(spec.name(), new SeriesEvaluation(spec, this, program.checks, reductions, plots)
                                .run(options, digestSeries));
                    } finally {
                        if (bar != null) {
                            bar.finish();
                        }
                    }
                }
            }
            seriesResults = out;
        }
        return seriesResults;
    }

    /** The value of {@code max(x[series])} or {@code min(...)} from the series' pass, or null. */
    Value seriesReduction(Call call) {
        for (SeriesEvaluation.Result r : series().values()) {
            Value v = r.reductions().get(call);
            if (v != null) {
                return v;
            }
        }
        return null;
    }

    /**
     * Builds every declaration and reduces every case before a series is read on several
     * threads, so that the threads only ever read what is kept here.
     */
    private void warmUp() {
        buildDeclarations();
        reduce();
        for (String r : rosetteNames()) {
            results(r);
        }
    }

    /** Builds every material, gauge, rosette and state as the runtime will use it. */
    void buildDeclarations() {
        for (Declaration d : program.declarations.values()) {
            switch (d.kind()) {
                case MATERIAL -> material(d.name().text());
                case GAUGE -> gauge(d.name().text());
                case ROSETTE -> rosette(d.name().text());
                default -> state(d.name().text());
            }
        }
    }

    public boolean isLet(String name) {
        return program.lets.containsKey(name);
    }

    // ---- reduction ----------------------------------------------------------------------

    /** The rosette's strain state at each position of the case axis; null where it has none. */
    public StrainState[] strains(String rosette) {
        reduce();
        return strains.get(rosette);
    }

    /** Every arm reading of every case with its corrections, in case then rosette order. */
    public List<ArmReading> armReadings() {
        reduce();
        return List.copyOf(armReadings);
    }

    /** Every member of the rosette's result over the case axis; NaN where it has no result. */
    @SuppressWarnings("unchecked")
    public EnumMap<RosetteMember, double[]> results(String rosette) {
        return cached("results " + rosette, () -> {
            RosetteModel model = rosette(rosette);
            StrainState[] states = strains(rosette);
            int[] defined = definedPositions(states);
            int n = defined.length;
            double[] ex = new double[n];
            double[] ey = new double[n];
            double[] gxy = new double[n];
            for (int k = 0; k < n; k++) {
                StrainState s = states[defined[k]];
                ex[k] = s.epsX();
                ey[k] = s.epsY();
                gxy[k] = s.gammaXY();
            }
            EnumMap<RosetteMember, double[]> compact = new EnumMap<>(RosetteMember.class);
            for (RosetteMember m : RosetteMember.values()) {
                if (model.material() != null || !m.needsMaterial()) {
                    compact.put(m, new double[n]);
                }
            }
            ResultColumns.compute(ex, ey, gxy, n, model.material(), model.condition(), compact);
            EnumMap<RosetteMember, double[]> full = new EnumMap<>(RosetteMember.class);
            for (var e : compact.entrySet()) {
                double[] column = new double[axis.size()];
                Arrays.fill(column, Double.NaN);
                for (int k = 0; k < n; k++) {
                    column[defined[k]] = e.getValue()[k];
                }
                full.put(e.getKey(), column);
            }
            return full;
        });
    }

    private static int[] definedPositions(Object[] values) {
        int count = 0;
        for (Object v : values) {
            if (v != null) {
                count++;
            }
        }
        int[] out = new int[count];
        int k = 0;
        for (int i = 0; i < values.length; i++) {
            if (values[i] != null) {
                out[k++] = i;
            }
        }
        return out;
    }

    private void reduce() {
        if (strains != null) {
            return;
        }
        Map<String, StrainState[]> byRosette = new LinkedHashMap<>();
        for (String r : rosetteNames()) {
            byRosette.put(r, new StrainState[axis.size()]);
        }
        for (Case c : program.cases.values()) {
            int position = axisIndex.get(c.name().text());
            Baseline baseline = c.from() == null ? null : program.baselines.get(c.from().text());
            Double temperature = temperatureC(c.fields());
            Double baselineTemperature = baseline == null ? null : temperatureC(baseline.fields());
            for (Field f : c.fields()) {
                String r = f.name().text();
                if (!isRosette(r)) {
                    continue;
                }
                RosetteModel model = rosette(r);
                double[] readings = readings(f, model);
                double[] baseReadings = null;
                if (baseline != null) {
                    Field bf = baseline.fields().stream().filter(x -> x.name().text().equals(r)).findFirst()
                            .orElseThrow(() -> new EvaluationException(f.span(), "rosette " + r + " is read in case "
                                    + c.name().text() + " but not in its baseline " + baseline.name().text(),
                                    "add a reading of " + r + " to baseline " + baseline.name().text()));
                    baseReadings = readings(bf, model);
                }
                double[] result = new double[readings.length];
                for (int arm = 0; arm < readings.length; arm++) {
                    CorrectionTrace trace = trace(model.correction(), readings[arm], temperature, f.span());
                    if (baseReadings != null) {
                        CorrectionTrace base = trace(model.correction(), baseReadings[arm], baselineTemperature, f.span());
                        trace = trace.withBaseline(base.corrected());
                    }
                    armReadings.add(new ArmReading(c.name().text(), r, arm, trace));
                    result[arm] = trace.result();
                }
                try {
                    byRosette.get(r)[position] = model.solver().solve(result).state();
                } catch (IllegalArgumentException e) {
                    throw new EvaluationException(f.span(), e.getMessage());
                }
            }
        }
        for (Combine combine : program.combinations.values()) {
            int position = axisIndex.get(combine.name().text());
            for (var entry : byRosette.entrySet()) {
                StrainState sum = StrainState.ZERO;
                boolean inEveryTerm = true;
                for (Term term : combine.terms()) {
                    Integer termPosition = axisIndex.get(term.caseName().text());
                    StrainState s = termPosition == null ? null : entry.getValue()[termPosition];
                    if (s == null) {
                        inEveryTerm = false;
                        break;
                    }
                    double factor = expressions.number(term.factor(), Dimension.NONE, Map.of(), "a combination factor");
                    sum = sum.plus(s.times(factor));
                }
                if (inEveryTerm) {
                    entry.getValue()[position] = sum;
                }
            }
        }
        strains = byRosette;
    }

    private static CorrectionTrace trace(ArmCorrection correction, double indicated, Double temperatureC, SourceSpan at) {
        try {
            return correction.trace(indicated, temperatureC);
        } catch (IllegalArgumentException e) {
            throw new EvaluationException(at, e.getMessage());
        }
    }

    /** A reading block's temperature in degC, or null when it gives none. */
    Double temperatureC(List<Field> fields) {
        for (Field f : fields) {
            if (f.name().text().equals("temperature")) {
                double kelvin = expressions.number(f.value(), Dimension.TEMPERATURE, Map.of(), "temperature");
                return kelvin - KELVIN_AT_0_DEGC;
            }
        }
        return null;
    }

    /** A rosette's readings in arm order, as strain fractions. */
    double[] readings(Field f, RosetteModel model) {
        double[] values = expressions.numbers(f.value(), "a reading");
        if (values.length != model.armCount()) {
            throw new EvaluationException(f.value().span(), "rosette " + model.name() + " has "
                    + model.armCount() + " arms but " + values.length + " readings are given",
                    "give one reading per arm, in arm order");
        }
        return values;
    }

    // ---- building declarations ----------------------------------------------------------

    private Material buildMaterial(Declaration d) {
        Fields f = new Fields(d, expressions);
        try {
            return Material.of(d.name().text(), f.optional("E", Dimension.STRESS), f.optional("nu", Dimension.NONE),
                    f.optional("G", Dimension.STRESS), f.optional("yield", Dimension.STRESS),
                    f.optional("yield_c", Dimension.STRESS), f.optional("ultimate", Dimension.STRESS),
                    f.optional("ultimate_c", Dimension.STRESS));
        } catch (IllegalArgumentException e) {
            throw new EvaluationException(d.name().span(), e.getMessage());
        }
    }

    private Gauge buildGauge(Declaration d) {
        Fields f = new Fields(d, expressions);
        try {
            Gauge g = Gauge.withFactor(f.required("factor", Dimension.NONE));
            Double kt = f.optional("transverse", Dimension.NONE);
            if (kt != null) {
                g = g.withTransverse(kt);
            }
            Double nu0 = f.optional("nu0", Dimension.NONE);
            if (nu0 != null) {
                g = g.withNu0(nu0);
            }
            Double resistance = f.optional("resistance", Dimension.RESISTANCE);
            if (resistance != null) {
                g = g.withResistance(resistance);
            }
            Field thermal = f.field("thermal");
            if (thermal != null) {
                g = g.withThermal(f.list(thermal));
            }
            Double thermalFactor = f.optional("thermal_factor", Dimension.NONE);
            if (thermalFactor != null) {
                g = g.withThermalFactor(thermalFactor);
            }
            return g;
        } catch (IllegalArgumentException e) {
            throw new EvaluationException(d.name().span(), e.getMessage());
        }
    }

    private RosetteModel buildRosette(Declaration d) {
        Fields f = new Fields(d, expressions);
        String name = d.name().text();
        RosetteLayout layout = layout(f.field("layout"), name, d);
        String gaugeName = f.word("gauge");
        Gauge gauge = gauge(gaugeName);
        String materialName = f.wordOrNull("material");
        Material material = materialName == null ? null : material(materialName);
        PlaneCondition condition = planeCondition(f.wordOrNull("state"), f.field("state"));
        Double angle = f.optional("angle", Dimension.ANGLE);
        Bridge bridge = bridge(f.wordOrNull("bridge"), f.field("bridge"));
        Double lead = f.optional("lead", Dimension.RESISTANCE);
        Double instrument = f.optional("instrument_factor", Dimension.NONE);
        double rotation = angle == null ? 0 : angle;
        double leadOhm = lead == null ? 0 : lead;
        double instrumentFactor = instrument == null ? gauge.factor() : instrument;
        try {
            ArmCorrection correction = new ArmCorrection(gauge, bridge, leadOhm, instrumentFactor);
            RosetteSolver solver = new RosetteSolver(layout, rotation, gauge.transverse(), gauge.nu0());
            return new RosetteModel(name, layout, gaugeName, gauge, material, condition, rotation, bridge,
                    leadOhm, instrumentFactor, correction, solver);
        } catch (IllegalArgumentException e) {
            throw new EvaluationException(d.name().span(), "rosette " + name + ": " + e.getMessage());
        }
    }

    private RosetteLayout layout(Field field, String rosette, Declaration d) {
        if (field == null) {
            throw new EvaluationException(d.name().span(), "rosette " + rosette + " needs a layout",
                    "add layout = rectangular, delta, tee or arms(...)");
        }
        try {
            if (field.value() instanceof NameRef ref) {
                switch (ref.name()) {
                    case "rectangular": return RosetteLayout.rectangular();
                    case "delta": return RosetteLayout.delta();
                    case "tee": return RosetteLayout.tee();
                    default: break;
                }
            } else if (field.value() instanceof Call call && call.function().text().equals("arms")) {
                double[] angles = new double[call.args().size()];
                for (int i = 0; i < angles.length; i++) {
                    angles[i] = expressions.number(call.args().get(i), Dimension.ANGLE, Map.of(), "an arm angle");
                }
                return RosetteLayout.arms(angles);
            }
        } catch (IllegalArgumentException e) {
            throw new EvaluationException(field.value().span(), e.getMessage());
        }
        throw new EvaluationException(field.value().span(), "unknown layout",
                "use rectangular, delta, tee or arms(0 deg, 45 deg, 90 deg, ...)");
    }

    static PlaneCondition planeCondition(String word, Field field) {
        if (word == null || word.equals("plane_stress")) {
            return PlaneCondition.PLANE_STRESS;
        }
        if (word.equals("plane_strain")) {
            return PlaneCondition.PLANE_STRAIN;
        }
        throw new EvaluationException(field.value().span(), "unknown state '" + word + "'",
                "use plane_stress or plane_strain");
    }

    private static Bridge bridge(String word, Field field) {
        if (word == null || word.equals("none")) {
            return Bridge.NONE;
        }
        switch (word) {
            case "quarter": return Bridge.QUARTER;
            case "quarter_3wire": return Bridge.QUARTER_3WIRE;
            default:
                throw new EvaluationException(field.value().span(), "unknown bridge '" + word + "'",
                        "use none, quarter or quarter_3wire");
        }
    }

    private StateModel buildState(Declaration d) {
        Fields f = new Fields(d, expressions);
        String materialName = f.wordOrNull("material");
        Material material = materialName == null ? null : material(materialName);
        PlaneCondition condition = planeCondition(f.wordOrNull("state"), f.field("state"));
        try {
            if (d.kind() == Declaration.Kind.STRAIN) {
                StrainState strain = new StrainState(f.zeroIfAbsent("eps_x", Dimension.NONE),
                        f.zeroIfAbsent("eps_y", Dimension.NONE), f.zeroIfAbsent("gamma_xy", Dimension.NONE));
                StressState stress = material == null ? null : Hooke.stress(strain, material, condition);
                return new StateModel(d.name().text(), strain, stress, material, condition);
            }
            StressState stress = new StressState(f.zeroIfAbsent("sigma_x", Dimension.STRESS),
                    f.zeroIfAbsent("sigma_y", Dimension.STRESS), f.zeroIfAbsent("tau_xy", Dimension.STRESS));
            StrainState strain = material == null ? null : Hooke.strain(stress, material, condition);
            return new StateModel(d.name().text(), strain, stress, material, condition);
        } catch (IllegalArgumentException e) {
            throw new EvaluationException(d.name().span(), e.getMessage());
        }
    }

    // ---- memo ---------------------------------------------------------------------------

    @SuppressWarnings("unchecked")
    private <T> T cached(String key, Supplier<T> compute) {
        Object known = memo.get(key);
        if (known != null) {
            return (T) known;
        }
        if (underway.contains(key)) {
            List<String> cycle = new ArrayList<>(underway);
            java.util.Collections.reverse(cycle);
            cycle.add(key);
            throw new CycleException(String.join(" -> ", cycle));
        }
        underway.push(key);
        try {
            T value = compute.get();
            memo.put(key, value);
            return value;
        } finally {
            underway.pop();
        }
    }

    /** A definition that needs its own value to be computed. */
    static final class CycleException extends RuntimeException {
        private static final long serialVersionUID = 1L;

        CycleException(String path) {
            super("a definition depends on itself: " + path);
        }
    }
}
