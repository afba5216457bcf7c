package org.rosetra.lang.check;

import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.HashSet;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.rosetra.lang.check.ValueType.Entity;
import org.rosetra.lang.check.ValueType.Value;
import org.rosetra.lang.syntax.*;
import org.rosetra.runtime.units.Dimension;
import org.rosetra.runtime.units.Rational;
import org.rosetra.runtime.units.Unit;
import org.rosetra.runtime.units.UnitException;
import org.rosetra.runtime.units.UnitParser;

/**
 * The second checking pass: the dimension of every value, before anything is computed.
 * Fields get the dimension their block asks for, sums and comparisons join like
 * dimensions, trigonometry takes angles, criteria find the strengths they need, literal
 * values lie in their range. Names were resolved by the {@link Resolver}; a name it
 * reported is {@link ValueType#UNKNOWN} here and raises nothing more.
 */
public final class DimensionChecker {

    private static final Value NONE = new Value(Dimension.NONE, false);

    private final SymbolTable symbols;
    private final Map<String, Integer> armCounts;
    private final Diagnostics diagnostics;
    private final Set<String> reported = new HashSet<>();

    private final Map<Expr, Dimension> dimensions = new IdentityHashMap<>();
    private final Set<Expr> perCase = Collections.newSetFromMap(new IdentityHashMap<>());
    private final Map<Node, Unit> units = new IdentityHashMap<>();
    private final Map<String, Object> parsedUnits = new HashMap<>();

    private final Map<String, ValueType> letTypes = new HashMap<>();
    private final Set<String> inProgress = new HashSet<>();
    private final Map<String, ValueType> callTypes = new HashMap<>();

    public DimensionChecker(SymbolTable symbols, Map<String, Integer> armCounts, Diagnostics diagnostics) {
        this.symbols = symbols;
        this.armCounts = armCounts;
        this.diagnostics = diagnostics;
    }

    public Map<Expr, Dimension> dimensions() {
        return Collections.unmodifiableMap(dimensions);
    }

    public Set<Expr> perCase() {
        return Collections.unmodifiableSet(perCase);
    }

    public Map<Node, Unit> units() {
        return Collections.unmodifiableMap(units);
    }

    public void check(Script script) {
        for (Statement statement : script.statements()) {
            if (statement instanceof Declaration d) {
                declaration(d);
            } else if (statement instanceof Baseline b) {
                readings(BlockKind.BASELINE, "baseline " + b.name().text(), b.fields());
            } else if (statement instanceof Case c) {
                readings(BlockKind.CASE, "case " + c.name().text(), c.fields());
            } else if (statement instanceof Series s) {
                series(s);
            } else if (statement instanceof Combine c) {
                c.terms().forEach(term -> record(term.factor(), NONE));
            } else if (statement instanceof Let l) {
                let(l);
            } else if (statement instanceof Check c) {
                check(c);
            } else if (statement instanceof Table t) {
                table(t);
            } else if (statement instanceof Plot p) {
                plot(p);
            } else if (statement instanceof Display d) {
                display(d);
            }
        }
    }

    /** Checks one value outside any statement; its dimensions land in {@link #dimensions()}. */
    public void checkValue(Expr expr) {
        ValueType type = typeOf(expr, Map.of());
        if (!(type instanceof ValueType.Unknown) && !(type instanceof Value)
                && !(type instanceof Entity entity && entity.symbol().kind().hasResults())) {
            value(type, expr, "a cell");
        }
    }

    // ---- blocks ------------------------------------------------------------------------

    private void declaration(Declaration declaration) {
        BlockKind kind = BlockKind.of(declaration.kind());
        String owner = kind.keyword() + " " + declaration.name().text();
        for (Field field : declaration.fields()) {
            Builtins.field(kind, field.name().text()).ifPresent(spec -> field(spec, field, owner));
        }
        if (kind == BlockKind.MATERIAL) {
            elasticConstants(declaration);
        }
    }

    private void field(FieldSpec spec, Field field, String owner) {
        Expr value = field.value();
        switch (spec.kind()) {
            case QUANTITY -> {
                ValueType type = typeOf(value, Map.of());
                expectDimension(type, spec.dimension(), value,
                        "field " + spec.name() + " of " + owner + " needs " + describe(spec.dimension()));
                literal(value).ifPresent(number -> {
                    if (spec.limits() != null && !spec.limits().contains(number)) {
                        error(value.span(), "field " + spec.name() + " of " + owner + " must be "
                                + spec.limits().describe() + ", got " + format(number), null);
                    }
                });
            }
            case READINGS -> readingValues(value, spec.dimension(), "field " + spec.name() + " of " + owner);
            case LAYOUT -> {
                if (value instanceof Call call) {
                    for (Expr arm : call.args()) {
                        expectDimension(typeOf(arm, Map.of()), Dimension.ANGLE, arm,
                                "an arm of " + owner + " needs an angle");
                    }
                }
            }
            case COLUMN -> column(value, spec.dimension(), "field " + spec.name() + " of " + owner);
            case TEXT -> {
                if (!(value instanceof StringLit text)) {
                    error(value.span(), "field " + spec.name() + " of " + owner + " is a string", null);
                } else if (spec.name().equals("source")) {
                    // Free text for the record.
                } else if (text.value().length() != 1 && !(spec.name().equals("delimiter")
                        && (text.value().equals("tab") || text.value().equals("\\t")))) {
                    error(value.span(), "field " + spec.name() + " of " + owner + " is one character",
                            spec.name().equals("delimiter") ? "use \",\", \";\" or \"tab\"" : null);
                } else if (spec.name().equals("decimal") && !text.value().equals(".") && !text.value().equals(",")) {
                    error(value.span(), "the decimal mark is \".\" or \",\"", null);
                }
            }
            case WINDOW_OR_BASELINE -> {
                if (value instanceof Range range) {
                    expectDimension(typeOf(range.from(), Map.of()), Dimension.TIME, range.from(),
                            "the start of the zero window needs a time");
                    expectDimension(typeOf(range.to(), Map.of()), Dimension.TIME, range.to(),
                            "the end of the zero window needs a time");
                } else if (!(value instanceof NameRef)) {
                    error(value.span(), "zero is a time window (0 s to 2 s) or the name of a baseline", null);
                }
            }
            case REFERENCE, CHOICE -> { }
        }
    }

    /** Any two of E, nu, G; all three must agree within 0.5 % (LANGUAGE.md, "Declarations"). */
    private void elasticConstants(Declaration material) {
        Map<String, Field> given = new HashMap<>();
        for (Field field : material.fields()) {
            given.putIfAbsent(field.name().text(), field);
        }
        long count = List.of("E", "nu", "G").stream().filter(given::containsKey).count();
        if (count < 2) {
            error(material.name().span(), "material " + material.name().text() + " needs two of E, nu and G",
                    "the third follows from G = E / (2 (1 + nu))");
            return;
        }
        if (count == 3) {
            Optional<Double> e = siLiteral(given.get("E").value());
            Optional<Double> nu = siLiteral(given.get("nu").value());
            Optional<Double> g = siLiteral(given.get("G").value());
            if (e.isPresent() && nu.isPresent() && g.isPresent()) {
                double expected = e.get() / (2 * (1 + nu.get()));
                if (Math.abs(g.get() - expected) > 0.005 * Math.abs(expected)) {
                    error(given.get("G").value().span(), "E, nu and G of material " + material.name().text()
                            + " disagree by more than 0.5 %: E / (2 (1 + nu)) is " + format(expected / 1e9)
                            + " GPa", "give only two of them");
                }
            }
        }
    }

    private void readings(BlockKind kind, String owner, List<Field> fields) {
        for (Field field : fields) {
            Optional<FieldSpec> spec = Builtins.field(kind, field.name().text());
            if (spec.isPresent()) {
                field(spec.get(), field, owner);
            } else if (symbols.isKind(field.name().text(), SymbolKind.ROSETTE)) {
                readingValues(field.value(), Dimension.NONE, "the readings of " + field.name().text() + " in " + owner);
            }
        }
    }

    private void series(Series series) {
        String owner = "series " + series.name().text();
        for (Field field : series.fields()) {
            Optional<FieldSpec> spec = Builtins.field(BlockKind.SERIES, field.name().text());
            if (spec.isPresent()) {
                field(spec.get(), field, owner);
            } else if (symbols.isKind(field.name().text(), SymbolKind.ROSETTE)) {
                Expr value = field.value();
                if (value instanceof StringList list) {
                    Unit unit = list.unitText() == null ? Unit.ONE : unit(list, list.unitText(), list.unitSpan());
                    if (unit != null && !unit.dimension().isNone()) {
                        error(list.unitSpan(), "the columns of " + field.name().text() + " in " + owner
                                + " need a strain unit (ue, %), got " + describe(unit.dimension()), null);
                    }
                } else if (!(value instanceof StringLit)) {
                    error(value.span(), "a rosette in a series names its columns: \"g1\", \"g2\", \"g3\" ue", null);
                }
            }
        }
    }

    /** A column name with its unit: {@code "t_s" s}. */
    private void column(Expr value, Dimension dimension, String what) {
        if (value instanceof StringList list && list.items().size() == 1 && list.unitText() != null) {
            Unit unit = unit(list, list.unitText(), list.unitSpan());
            if (unit != null && !unit.dimension().equals(dimension)) {
                error(list.unitSpan(), what + " needs " + describe(dimension) + " unit, got "
                        + describe(unit.dimension()), null);
            }
        } else if (value instanceof StringLit) {
            error(value.span(), what + " needs the column's unit after its name",
                    "write the unit after the column name, e.g. \"t_s\" s");
        } else {
            error(value.span(), what + " names one column of the file: \"name\" unit", null);
        }
    }

    /** Numbers with one unit of the given dimension: a reading list, or a single value. */
    private void readingValues(Expr value, Dimension dimension, String what) {
        if (value instanceof ReadingList list) {
            Unit unit = list.unitText() == null ? Unit.ONE : unit(list, list.unitText(), list.unitSpan());
            if (unit != null && !unit.dimension().equals(dimension)) {
                error(list.unitSpan(), what + " need " + (dimension.isNone() ? "a strain unit (ue, %)"
                        : describe(dimension)) + ", got " + describe(unit.dimension()), null);
            }
            if (list.unitText() == null && dimension.isNone()
                    && list.values().stream().anyMatch(v -> Math.abs(v) >= 0.1)) {
                diagnostics.warning(list.span(), what + " have no unit, so they are plain strain "
                        + "(" + format(list.values().get(0)) + " is " + format(list.values().get(0) * 1e6) + " ue)",
                        "give the unit after the last reading: ... ue");
            }
            record(list, new Value(dimension, false));
        } else if (value instanceof NumberLit || value instanceof QuantityLit) {
            expectDimension(typeOf(value, Map.of()), dimension, value, what + " need " + describe(dimension));
        } else {
            error(value.span(), what + " are numbers with one unit at the end: 412, -38, -121 ue", null);
        }
    }

    // ---- statements --------------------------------------------------------------------

    private void let(Let let) {
        if (let.body() instanceof JavaCode) {
            boolean typed = let.resultDimension() != null
                    && let.params().stream().allMatch(p -> p.dimension() != null);
            if (!typed) {
                error(let.name().span(), "a Java function declares its dimensions",
                        "let " + let.name().text() + "(x: stress): stress = java { ... }");
            }
            let.params().forEach(p -> dimensionNamed(p.dimension()));
            dimensionNamed(let.resultDimension());
            return;
        }
        if (let.isFunction()) {
            boolean typed = let.params().stream().allMatch(p -> p.dimension() != null);
            if (typed) {
                Map<String, ValueType> env = new HashMap<>();
                for (Param param : let.params()) {
                    Dimension dimension = dimensionNamed(param.dimension());
                    env.put(param.name().text(), dimension == null ? ValueType.UNKNOWN : new Value(dimension, false));
                }
                ValueType result = typeOf(let.body(), env);
                Dimension declared = dimensionNamed(let.resultDimension());
                if (declared != null) {
                    expectDimension(result, declared, let.body(), "function " + let.name().text() + " returns "
                            + describe(declared));
                }
            }
            return;
        }
        ValueType type = letType(let);
        Dimension declared = dimensionNamed(let.resultDimension());
        if (declared != null) {
            expectDimension(type, declared, let.body(), let.name().text() + " is declared " + describe(declared));
        }
    }

    private void check(Check check) {
        ValueType left = typeOf(check.left(), Map.of());
        ValueType right = typeOf(check.right(), Map.of());
        Value l = value(left, check.left(), "the left side of a check");
        Value r = value(right, check.right(), "the right side of a check");
        if (l != null && r != null && !l.dimension().equals(r.dimension())) {
            error(check.left().span(), "check \"" + check.label().value() + "\" compares "
                    + describe(l.dimension()) + " with " + describe(r.dimension()),
                    "both sides of a comparison need the same dimension");
        }
    }

    private void table(Table table) {
        for (Expr item : table.items()) {
            ValueType type = typeOf(item, Map.of());
            if (type instanceof Entity entity && !entity.symbol().kind().hasResults()) {
                error(item.span(), "a table lists rosettes, states or values; " + entity.symbol().text()
                        + " is " + entity.symbol().kind().described(), null);
            }
        }
    }

    private void plot(Plot plot) {
        ValueType type = typeOf(plot.target(), Map.of());
        if (plot.kind() == PlotKind.VALUE) {
            value(type, plot.target(), "plot");
            return;
        }
        String what = plot.kind() == PlotKind.MOHR ? "plot mohr" : "plot directions";
        if (type instanceof Entity entity && entity.symbol().kind().hasResults()) {
            if (entity.symbol().kind() == SymbolKind.ROSETTE && !entity.caseChosen()) {
                error(plot.target().span(), what + " draws one case of a rosette",
                        "pick the case: " + what + " " + entity.symbol().text() + "[CASE]");
            }
        } else if (!(type instanceof ValueType.Unknown)) {
            error(plot.target().span(), what + " draws a rosette at one case, or a state", null);
        }
    }

    private void display(Display display) {
        String subject = display.subject().text();
        if (display.isUnitSet()) {
            if (!Builtins.DISPLAY_SETS.contains(subject)) {
                error(display.subject().span(), "unknown set of display units '" + subject + "'",
                        hintOr(NearestName.hint(subject, Builtins.DISPLAY_SETS), "use display si or display us"));
            }
            return;
        }
        Dimension dimension = dimensionNamed(display.subject());
        Unit unit = unit(display, display.unitText(), display.unitSpan());
        if (dimension != null && unit != null && !unit.dimension().equals(dimension)) {
            error(display.unitSpan(), "display " + subject + " needs " + describe(dimension) + " unit, got "
                    + describe(unit.dimension()), null);
        }
    }

    // ---- values ------------------------------------------------------------------------

    private ValueType letType(Let let) {
        String name = let.name().text();
        ValueType known = letTypes.get(name);
        if (known != null) {
            return known;
        }
        if (!inProgress.add(name)) {
            error(let.name().span(), "the value of " + name + " depends on itself", null);
            return ValueType.UNKNOWN;
        }
        ValueType type = typeOf(let.body(), Map.of());
        inProgress.remove(name);
        letTypes.put(name, type);
        return type;
    }

    private ValueType typeOf(Expr expr, Map<String, ValueType> env) {
        ValueType type = computeType(expr, env);
        if (type instanceof Value value) {
            record(expr, value);
        }
        return type;
    }

    private void record(Expr expr, Value value) {
        dimensions.putIfAbsent(expr, value.dimension());
        if (value.perCase()) {
            perCase.add(expr);
        }
    }

    private ValueType computeType(Expr expr, Map<String, ValueType> env) {
        if (expr instanceof NumberLit) {
            return NONE;
        } else if (expr instanceof QuantityLit quantity) {
            Unit unit = unit(quantity, quantity.unitText(), quantity.unitSpan());
            return unit == null ? ValueType.UNKNOWN : new Value(unit.dimension(), false);
        } else if (expr instanceof ReadingList list) {
            Unit unit = list.unitText() == null ? Unit.ONE : unit(list, list.unitText(), list.unitSpan());
            return unit == null ? ValueType.UNKNOWN : new Value(unit.dimension(), false);
        } else if (expr instanceof StringLit || expr instanceof StringList) {
            error(expr.span(), "a string is not a value", "strings name things: titles, labels, files and columns");
            return ValueType.UNKNOWN;
        } else if (expr instanceof NameRef ref) {
            return nameType(ref, env);
        } else if (expr instanceof Member member) {
            return memberType(member, env);
        } else if (expr instanceof Index index) {
            return indexType(index, env);
        } else if (expr instanceof Call call) {
            return callType(call, env);
        } else if (expr instanceof Binary binary) {
            return binaryType(binary, env);
        } else if (expr instanceof Negate negate) {
            ValueType operand = typeOf(negate.operand(), env);
            Value value = value(operand, negate.operand(), "'-'");
            return value == null ? ValueType.UNKNOWN : value;
        } else if (expr instanceof Range range) {
            error(range.span(), "a range 'a to b' only gives a series its zero window", null);
            return ValueType.UNKNOWN;
        }
        return ValueType.UNKNOWN;
    }

    private ValueType nameType(NameRef ref, Map<String, ValueType> env) {
        ValueType param = env.get(ref.name());
        if (param != null) {
            return param;
        }
        Optional<Symbol> symbol = symbols.find(ref.name());
        if (symbol.isEmpty()) {
            return ValueType.UNKNOWN;
        }
        return switch (symbol.get().kind()) {
            case VALUE -> letType((Let) symbol.get().statement());
            case ROSETTE, STRAIN_STATE, STRESS_STATE, MATERIAL, GAUGE -> new Entity(symbol.get(), false);
            default -> ValueType.UNKNOWN;
        };
    }

    private ValueType memberType(Member member, Map<String, ValueType> env) {
        ValueType target = typeOf(member.target(), env);
        String name = member.member().text();
        if (target instanceof Value) {
            error(member.member().span(), "a value has no members; '" + name + "' belongs to a rosette, "
                    + "state or material", null);
            return ValueType.UNKNOWN;
        }
        if (!(target instanceof Entity entity)) {
            return ValueType.UNKNOWN;
        }
        Symbol symbol = entity.symbol();
        if (symbol.kind().hasResults()) {
            Optional<BuiltinMember> result = Builtins.resultMember(name);
            if (result.isEmpty()) {
                error(member.member().span(), symbol.kind().keyword() + " " + symbol.text()
                        + " has no member '" + name + "'",
                        NearestName.hint(name, Builtins.resultMembers().stream().map(BuiltinMember::name).toList()));
                return ValueType.UNKNOWN;
            }
            // A stress given directly needs a material for its strains, a strain for its stresses.
            boolean needsMaterial = symbol.kind() == SymbolKind.STRESS_STATE
                    ? result.get().kind().equals("strain") : result.get().needsMaterial();
            if (needsMaterial && materialOf(symbol) == null) {
                error(member.member().span(), symbol.text() + " has no material, so it has no " + name,
                        "add material = ... to " + symbol.kind().keyword() + " " + symbol.text());
                return ValueType.UNKNOWN;
            }
            boolean columns = symbol.kind() == SymbolKind.ROSETTE && !entity.caseChosen();
            return new Value(result.get().dimension(), columns);
        }
        BlockKind kind = symbol.kind() == SymbolKind.MATERIAL ? BlockKind.MATERIAL : BlockKind.GAUGE;
        Optional<FieldSpec> spec = Builtins.field(kind, name).filter(s -> s.kind() == FieldKind.QUANTITY);
        if (spec.isEmpty()) {
            List<String> known = Builtins.fields(kind).stream().filter(s -> s.kind() == FieldKind.QUANTITY)
                    .map(FieldSpec::name).toList();
            error(member.member().span(), kind.keyword() + " " + symbol.text() + " has no member '" + name + "'",
                    hintOr(NearestName.hint(name, known), "members: " + String.join(", ", known)));
            return ValueType.UNKNOWN;
        }
        if (kind == BlockKind.MATERIAL && !materialGives((Declaration) symbol.statement(), name)) {
            error(member.member().span(), "material " + symbol.text() + " does not give '" + name + "'",
                    "add " + name + " = ... to material " + symbol.text());
            return ValueType.UNKNOWN;
        }
        return new Value(spec.get().dimension(), false);
    }

    private ValueType indexType(Index index, Map<String, ValueType> env) {
        ValueType target = typeOf(index.target(), env);
        boolean caseLike = symbols.find(index.caseName().text()).map(s -> s.kind().isCaseLike()).orElse(false);
        if (!caseLike) {
            return target instanceof Value v ? new Value(v.dimension(), false) : ValueType.UNKNOWN;
        }
        if (target instanceof Value value) {
            if (!value.perCase()) {
                error(index.span(), "this value is the same in every case; [" + index.caseName().text()
                        + "] picks a case of a rosette's result", null);
            }
            // A series picks a history over its samples: still a column.
            boolean series = symbols.isKind(index.caseName().text(), SymbolKind.SERIES);
            return new Value(value.dimension(), series);
        }
        if (target instanceof Entity entity && entity.symbol().kind() == SymbolKind.ROSETTE && !entity.caseChosen()) {
            return new Entity(entity.symbol(), true);
        }
        if (target instanceof Entity entity) {
            error(index.span(), entity.symbol().text() + " is " + entity.symbol().kind().described()
                    + "; only a rosette's results differ from case to case", null);
        }
        return ValueType.UNKNOWN;
    }

    private ValueType binaryType(Binary binary, Map<String, ValueType> env) {
        ValueType leftType = typeOf(binary.left(), env);
        ValueType rightType = typeOf(binary.right(), env);
        Value left = value(leftType, binary.left(), "'" + binary.op().symbol() + "'");
        Value right = value(rightType, binary.right(), "'" + binary.op().symbol() + "'");
        if (left == null || right == null) {
            return ValueType.UNKNOWN;
        }
        boolean columns = left.perCase() || right.perCase();
        switch (binary.op()) {
            case ADD, SUBTRACT -> {
                if (!left.dimension().equals(right.dimension())) {
                    error(binary.span(), "cannot " + (binary.op() == BinaryOp.ADD ? "add " : "subtract ")
                            + describe(right.dimension()) + (binary.op() == BinaryOp.ADD ? " to " : " from ")
                            + describe(left.dimension()), null);
                    return ValueType.UNKNOWN;
                }
                return new Value(left.dimension(), columns);
            }
            case MULTIPLY -> {
                return new Value(left.dimension().times(right.dimension()), columns);
            }
            case DIVIDE -> {
                return new Value(left.dimension().over(right.dimension()), columns);
            }
            default -> {
                if (!right.dimension().isNone()) {
                    error(binary.right().span(), "a power needs a dimensionless exponent, got "
                            + describe(right.dimension()), null);
                    return ValueType.UNKNOWN;
                }
                if (left.dimension().isNone()) {
                    return new Value(Dimension.NONE, columns);
                }
                Optional<Rational> exponent = literal(binary.right()).flatMap(DimensionChecker::rational);
                if (exponent.isEmpty()) {
                    error(binary.right().span(), "a power of " + describe(left.dimension())
                            + " needs a constant exponent such as 2 or 0.5", null);
                    return ValueType.UNKNOWN;
                }
                return new Value(left.dimension().pow(exponent.get()), columns);
            }
        }
    }

    private ValueType callType(Call call, Map<String, ValueType> env) {
        String name = call.function().text();
        Optional<Symbol> user = symbols.find(name).filter(s -> s.kind() == SymbolKind.FUNCTION);
        if (user.isPresent()) {
            return userCall(call, (Let) user.get().statement(), env);
        }
        Optional<BuiltinFunction> builtin = Builtins.function(name);
        if (builtin.isEmpty()) {
            call.args().forEach(arg -> typeOf(arg, env));
            return ValueType.UNKNOWN;
        }
        List<ValueType> args = new ArrayList<>();
        for (Expr arg : call.args()) {
            args.add(typeOf(arg, env));
        }
        return switch (builtin.get().shape()) {
            case SAME -> arity(call, 1) ? oneValue(call, args, name, v -> v) : ValueType.UNKNOWN;
            case SQUARE_ROOT -> arity(call, 1)
                    ? oneValue(call, args, name, v -> new Value(v.dimension().sqrt(), v.perCase()))
                    : ValueType.UNKNOWN;
            case TRIGONOMETRIC -> {
                if (!arity(call, 1)) {
                    yield ValueType.UNKNOWN;
                }
                Value angle = value(args.get(0), call.args().get(0), name);
                if (angle == null) {
                    yield ValueType.UNKNOWN;
                }
                if (!angle.dimension().equals(Dimension.ANGLE)) {
                    error(call.args().get(0).span(), name + " needs an angle, got " + describe(angle.dimension()),
                            "give the angle its unit: " + name + "(30 deg) or " + name + "(0.5 rad)");
                    yield ValueType.UNKNOWN;
                }
                yield new Value(Dimension.NONE, angle.perCase());
            }
            case ANGLE_OF_PAIR -> {
                if (!arity(call, 2)) {
                    yield ValueType.UNKNOWN;
                }
                Value y = value(args.get(0), call.args().get(0), name);
                Value x = value(args.get(1), call.args().get(1), name);
                if (x == null || y == null) {
                    yield ValueType.UNKNOWN;
                }
                if (!x.dimension().equals(y.dimension())) {
                    error(call.span(), name + " needs two values of one dimension, got " + describe(y.dimension())
                            + " and " + describe(x.dimension()), null);
                    yield ValueType.UNKNOWN;
                }
                yield new Value(Dimension.ANGLE, x.perCase() || y.perCase());
            }
            case EXTREME -> extreme(call, args, name);
            case STRAIN_IN_DIRECTION, STRESS_IN_DIRECTION -> direction(call, args, builtin.get());
            case FAILURE_INDEX -> failureIndex(call, args, builtin.get());
            case LAYOUT -> {
                error(call.span(), "arms(...) only gives a rosette its layout", "layout = arms(0 deg, 30 deg, 90 deg)");
                yield ValueType.UNKNOWN;
            }
        };
    }

    private ValueType extreme(Call call, List<ValueType> args, String name) {
        if (args.isEmpty()) {
            error(call.span(), name + " needs at least one value", null);
            return ValueType.UNKNOWN;
        }
        if (args.size() == 1) {
            Value only = value(args.get(0), call.args().get(0), name);
            return only == null ? ValueType.UNKNOWN : new Value(only.dimension(), false);
        }
        Value first = null;
        boolean columns = false;
        for (int i = 0; i < args.size(); i++) {
            Value v = value(args.get(i), call.args().get(i), name);
            if (v == null) {
                return ValueType.UNKNOWN;
            }
            if (first != null && !first.dimension().equals(v.dimension())) {
                error(call.args().get(i).span(), name + " compares values of one dimension: "
                        + describe(first.dimension()) + " and " + describe(v.dimension()), null);
                return ValueType.UNKNOWN;
            }
            first = first == null ? v : first;
            columns |= v.perCase();
        }
        return new Value(first.dimension(), columns);
    }

    private ValueType direction(Call call, List<ValueType> args, BuiltinFunction function) {
        String name = function.name();
        if (!arity(call, 2)) {
            return ValueType.UNKNOWN;
        }
        Entity entity = results(args.get(0), call.args().get(0), name);
        Value angle = value(args.get(1), call.args().get(1), name);
        if (entity == null || angle == null) {
            return ValueType.UNKNOWN;
        }
        if (!angle.dimension().equals(Dimension.ANGLE)) {
            error(call.args().get(1).span(), name + " needs a direction (an angle), got "
                    + describe(angle.dimension()), "write the angle with its unit: 30 deg");
            return ValueType.UNKNOWN;
        }
        boolean stress = function.shape() == FunctionShape.STRESS_IN_DIRECTION;
        if (stress && materialOf(entity.symbol()) == null && entity.symbol().kind() != SymbolKind.STRESS_STATE) {
            error(call.span(), name + "(" + entity.symbol().text() + ", ...) needs a material: "
                    + entity.symbol().text() + " has none", "add material = ... to " + entity.symbol().text());
            return ValueType.UNKNOWN;
        }
        boolean columns = entity.symbol().kind() == SymbolKind.ROSETTE && !entity.caseChosen() || angle.perCase();
        return new Value(stress ? Dimension.STRESS : Dimension.NONE, columns);
    }

    private ValueType failureIndex(Call call, List<ValueType> args, BuiltinFunction function) {
        String name = function.name();
        if (!arity(call, 1)) {
            return ValueType.UNKNOWN;
        }
        Entity entity = results(args.get(0), call.args().get(0), name);
        if (entity == null) {
            return ValueType.UNKNOWN;
        }
        String of = name + "(" + entity.symbol().text() + ")";
        Symbol material = materialOf(entity.symbol());
        if (material == null) {
            error(call.span(), of + " needs a material: " + entity.symbol().text() + " has none",
                    "add material = ... to " + entity.symbol().text());
            return ValueType.UNKNOWN;
        }
        for (String strength : function.materialNeeds()) {
            if (!materialGives((Declaration) material.statement(), strength)) {
                error(call.span(), of + " needs material " + material.text() + " to give '" + strength + "'",
                        "add " + strength + " = ... to material " + material.text() + " (line "
                                + material.name().span().line() + ")");
                return ValueType.UNKNOWN;
            }
        }
        return new Value(Dimension.NONE, entity.symbol().kind() == SymbolKind.ROSETTE && !entity.caseChosen());
    }

    private ValueType userCall(Call call, Let function, Map<String, ValueType> env) {
        List<ValueType> args = new ArrayList<>();
        for (Expr arg : call.args()) {
            args.add(typeOf(arg, env));
        }
        String name = function.name().text();
        if (args.size() != function.params().size()) {
            error(call.span(), name + " takes " + function.params().size() + " argument"
                    + (function.params().size() == 1 ? "" : "s") + ", got " + args.size(),
                    "defined at line " + function.span().line());
            return ValueType.UNKNOWN;
        }
        Map<String, ValueType> bound = new HashMap<>();
        boolean columns = false;
        for (int i = 0; i < args.size(); i++) {
            Param param = function.params().get(i);
            ValueType arg = args.get(i);
            if (arg instanceof ValueType.Unknown) {
                return ValueType.UNKNOWN;
            }
            Dimension declared = param.dimension() == null ? null : Builtins.dimensionNamed(param.dimension().text())
                    .orElse(null);
            if (declared != null) {
                expectDimension(arg, declared, call.args().get(i), "parameter " + param.name().text() + " of "
                        + name + " needs " + describe(declared));
            }
            columns |= arg instanceof Value v && v.perCase();
            bound.put(param.name().text(), arg);
        }
        if (function.body() instanceof JavaCode) {
            Dimension result = function.resultDimension() == null ? null
                    : Builtins.dimensionNamed(function.resultDimension().text()).orElse(null);
            return result == null ? ValueType.UNKNOWN : new Value(result, columns);
        }
        String key = name + bound;
        ValueType known = callTypes.get(key);
        if (known != null) {
            return known;
        }
        if (!inProgress.add(name)) {
            error(call.span(), "function " + name + " calls itself", "a function cannot call itself");
            return ValueType.UNKNOWN;
        }
        ValueType result = typeOf(function.body(), bound);
        inProgress.remove(name);
        callTypes.put(key, result);
        return result;
    }

    // ---- helpers -----------------------------------------------------------------------

    private boolean arity(Call call, int wanted) {
        if (call.args().size() == wanted) {
            return true;
        }
        error(call.span(), call.function().text() + " takes " + wanted + " argument" + (wanted == 1 ? "" : "s")
                + ", got " + call.args().size(), Builtins.function(call.function().text())
                .map(BuiltinFunction::signature).orElse(null));
        return false;
    }

    private ValueType oneValue(Call call, List<ValueType> args, String name,
            java.util.function.UnaryOperator<Value> result) {
        Value v = value(args.get(0), call.args().get(0), name);
        return v == null ? ValueType.UNKNOWN : result.apply(v);
    }

    /** The value, or null after reporting that a rosette, state or material is not one. */
    private Value value(ValueType type, Expr where, String user) {
        if (type instanceof Value value) {
            return value;
        }
        if (type instanceof Entity entity) {
            String thing = entity.symbol().text();
            String hint = entity.symbol().kind().hasResults() ? "pick a member, e.g. " + thing + ".von_mises"
                    : entity.symbol().kind() == SymbolKind.MATERIAL ? "pick a member, e.g. " + thing + ".yield" : null;
            error(where.span(), thing + " is " + entity.symbol().kind().described() + ", not a value for " + user,
                    hint);
        }
        return null;
    }

    /** A rosette or state, or null after reporting what else it is. */
    private Entity results(ValueType type, Expr where, String function) {
        if (type instanceof Entity entity && entity.symbol().kind().hasResults()) {
            return entity;
        }
        if (!(type instanceof ValueType.Unknown)) {
            error(where.span(), function + " needs a rosette or a state", null);
        }
        return null;
    }

    private void expectDimension(ValueType type, Dimension wanted, Expr value, String message) {
        Value v = value(type, value, message.substring(0, message.indexOf(" needs") > 0
                ? message.indexOf(" needs") : message.length()));
        if (v != null && !v.dimension().equals(wanted)) {
            error(value.span(), message + ", got " + describe(v.dimension(), value), null);
        }
    }

    /** The rosette's or state's material, or null. */
    private Symbol materialOf(Symbol symbol) {
        for (Field field : ((Declaration) symbol.statement()).fields()) {
            if (field.name().text().equals("material") && field.value() instanceof NameRef ref) {
                return symbols.find(ref.name()).filter(s -> s.kind() == SymbolKind.MATERIAL).orElse(null);
            }
        }
        return null;
    }

    /** Whether a material gives a property, directly or by LANGUAGE.md's defaults. */
    private static boolean materialGives(Declaration material, String property) {
        Set<String> given = new HashSet<>();
        material.fields().forEach(f -> given.add(f.name().text()));
        return switch (property) {
            case "E", "nu", "G" -> given.contains(property)
                    || List.of("E", "nu", "G").stream().filter(given::contains).count() >= 2;
            case "yield_c" -> given.contains("yield_c") || given.contains("yield");
            case "ultimate_c" -> given.contains("ultimate_c") || given.contains("ultimate");
            default -> given.contains(property);
        };
    }

    private Dimension dimensionNamed(Name name) {
        if (name == null) {
            return null;
        }
        Optional<Dimension> dimension = Builtins.dimensionNamed(name.text());
        if (dimension.isEmpty()) {
            error(name.span(), "unknown dimension '" + name.text() + "'",
                    hintOr(NearestName.hint(name.text(), Builtins.dimensionNames()), "e.g. stress, strain, angle"));
        }
        return dimension.orElse(null);
    }

    /** Parses a unit once per spelling; reports an unknown one at its place. */
    private Unit unit(Node owner, String text, SourceSpan span) {
        Object parsed = parsedUnits.computeIfAbsent(text, t -> {
            try {
                return UnitParser.parse(t);
            } catch (UnitException e) {
                return e;
            }
        });
        if (parsed instanceof Unit unit) {
            units.put(owner, unit);
            return unit;
        }
        UnitException problem = (UnitException) parsed;
        SourceSpan where = span;
        boolean sameWidth = span.line() == span.endLine() && span.endColumn() - span.column() == text.length();
        if (sameWidth && problem.length() > 0) {
            int column = span.column() + problem.offset();
            where = new SourceSpan(span.file(), span.line(), column, span.line(), column + problem.length());
        }
        String message = problem.getMessage();
        if (message.startsWith("unknown unit") && problem.suggestion().isPresent()) {
            int end = Math.min(text.length(), problem.offset() + Math.max(1, problem.length()));
            message = "unknown unit '" + text.substring(problem.offset(), end) + "'; did you mean '"
                    + problem.suggestion().get() + "'?";
        }
        error(where, message, null);
        return null;
    }

    /** The value of a literal number or quantity, in its written unit. */
    private static Optional<Double> literal(Expr expr) {
        if (expr instanceof NumberLit number) {
            return Optional.of(number.value());
        }
        if (expr instanceof QuantityLit quantity) {
            return Optional.of(quantity.value());
        }
        return Optional.empty();
    }

    /** The SI value of a literal, for comparing E with G. */
    private Optional<Double> siLiteral(Expr expr) {
        if (expr instanceof NumberLit number) {
            return Optional.of(number.value());
        }
        if (expr instanceof QuantityLit quantity && units.get(quantity) != null) {
            return Optional.of(units.get(quantity).toSi(quantity.value()));
        }
        return Optional.empty();
    }

    private static Optional<Rational> rational(double value) {
        for (int denominator = 1; denominator <= 12; denominator++) {
            double numerator = value * denominator;
            if (Math.abs(numerator - Math.rint(numerator)) < 1e-9 && Math.abs(numerator) < 1e6) {
                return Optional.of(Rational.of((int) Math.rint(numerator), denominator));
            }
        }
        return Optional.empty();
    }

    private static String describe(Dimension dimension) {
        if (dimension.isNone()) {
            return "a dimensionless number";
        }
        String name = dimension.toString();
        return ("aeiou".indexOf(name.charAt(0)) >= 0 ? "an " : "a ") + name;
    }

    /** As above, calling a literal in a strain unit what it is: a strain. */
    private String describe(Dimension dimension, Expr value) {
        if (dimension.isNone() && value instanceof QuantityLit) {
            return "a dimensionless strain";
        }
        return describe(dimension);
    }

    private static String format(double value) {
        return value == Math.rint(value) && Math.abs(value) < 1e15 ? Long.toString((long) value)
                : String.format(java.util.Locale.ROOT, "%.4g", value);
    }

    private static String hintOr(String hint, String otherwise) {
        return hint != null ? hint : otherwise;
    }

    /** Reports once per place and message: a function body checked per call says it once. */
    private void error(SourceSpan span, String message, String hint) {
        if (reported.add(span + message)) {
            diagnostics.error(span, message, hint);
        }
    }
}
