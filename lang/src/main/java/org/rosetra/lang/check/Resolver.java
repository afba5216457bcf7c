package org.rosetra.lang.check;

import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.rosetra.lang.syntax.*;

/**
 * The first checking pass: every name a script uses is declared (in any order), names the
 * right kind of thing, and every block holds the fields its kind allows. Finds the arm
 * count of every rosette. Stateless between runs: a new Resolver per check.
 */
public final class Resolver {

    private final Diagnostics diagnostics;
    private final Map<String, Symbol> symbols = new LinkedHashMap<>();
    private final Map<String, Integer> armCounts = new LinkedHashMap<>();

    public Resolver(Diagnostics diagnostics) {
        this.diagnostics = diagnostics;
    }

    /** What the resolver found; the symbol table holds the first of duplicate names. */
    public record Resolution(SymbolTable symbols, Map<String, Integer> armCounts) {
    }

    public Resolution resolve(Script script) {
        for (Statement statement : script.statements()) {
            declare(statement);
        }
        for (Symbol symbol : symbols.values()) {
            if (symbol.kind() == SymbolKind.ROSETTE) {
                countArms((Declaration) symbol.statement());
            }
        }
        for (Statement statement : script.statements()) {
            check(statement);
        }
        return new Resolution(new SymbolTable(symbols), Collections.unmodifiableMap(new LinkedHashMap<>(armCounts)));
    }

    /**
     * Resolves the names of one value against symbols already known (a REPL or notebook
     * cell that asks to see a value).
     */
    public void resolveExpression(SymbolTable known, Expr expr) {
        symbols.clear();
        known.all().forEach(symbol -> symbols.put(symbol.text(), symbol));
        names(expr, Set.of());
    }

    // ---- declarations ------------------------------------------------------------------

    private void declare(Statement statement) {
        Name name = StatementNames.nameOf(statement);
        if (name == null) {
            return;
        }
        SymbolKind kind = kindOf(statement);
        Symbol earlier = symbols.get(name.text());
        if (earlier != null) {
            diagnostics.error(name.span(), "'" + name.text() + "' is already declared, as "
                    + earlier.kind().described(), "first declared at line " + earlier.name().span().line());
            return;
        }
        if (kind == SymbolKind.VALUE || kind == SymbolKind.FUNCTION) {
            if (Builtins.function(name.text()).isPresent()) {
                diagnostics.error(name.span(), "'" + name.text() + "' is a built-in function",
                        "choose another name");
                return;
            }
        }
        symbols.put(name.text(), new Symbol(name, kind, statement));
    }

    private static SymbolKind kindOf(Statement statement) {
        if (statement instanceof Declaration d) {
            return switch (d.kind()) {
                case MATERIAL -> SymbolKind.MATERIAL;
                case GAUGE -> SymbolKind.GAUGE;
                case ROSETTE -> SymbolKind.ROSETTE;
                case STRAIN -> SymbolKind.STRAIN_STATE;
                case STRESS -> SymbolKind.STRESS_STATE;
            };
        } else if (statement instanceof Baseline) {
            return SymbolKind.BASELINE;
        } else if (statement instanceof Case) {
            return SymbolKind.CASE;
        } else if (statement instanceof Combine) {
            return SymbolKind.COMBINATION;
        } else if (statement instanceof Series) {
            return SymbolKind.SERIES;
        } else if (statement instanceof Let l) {
            return l.isFunction() ? SymbolKind.FUNCTION : SymbolKind.VALUE;
        }
        throw new IllegalArgumentException("not a declaration: " + statement);
    }

    private void countArms(Declaration rosette) {
        for (Field field : rosette.fields()) {
            if (!field.name().text().equals("layout")) {
                continue;
            }
            if (field.value() instanceof NameRef ref) {
                Builtins.layoutArms(ref.name()).ifPresentOrElse(
                        arms -> armCounts.put(rosette.name().text(), arms),
                        () -> diagnostics.error(ref.span(), "unknown layout '" + ref.name() + "'",
                                hintOr(NearestName.hint(ref.name(), Builtins.layoutNames()),
                                        "use rectangular, delta, tee or arms(0 deg, 45 deg, 90 deg)")));
            } else if (field.value() instanceof Call call && call.function().text().equals("arms")) {
                if (call.args().size() < 3) {
                    diagnostics.error(call.span(), "arms(...) takes three or more angles, got "
                            + call.args().size(), "for two arms on the principal axes use layout = tee");
                } else {
                    armCounts.put(rosette.name().text(), call.args().size());
                }
            } else {
                diagnostics.error(field.value().span(), "a layout is rectangular, delta, tee or arms(...)", null);
            }
            return;
        }
    }

    // ---- statements --------------------------------------------------------------------

    private void check(Statement statement) {
        if (statement instanceof Declaration d) {
            checkBlock(BlockKind.of(d.kind()), d.kind().keyword() + " " + d.name().text(), d.name(), d.fields());
        } else if (statement instanceof Baseline b) {
            checkReadings(BlockKind.BASELINE, "baseline " + b.name().text(), b.fields());
        } else if (statement instanceof Case c) {
            checkCase(c);
        } else if (statement instanceof Combine c) {
            checkCombine(c);
        } else if (statement instanceof Series s) {
            checkSeries(s);
        } else if (statement instanceof Let l) {
            checkLet(l);
        } else if (statement instanceof Check c) {
            names(c.left(), Set.of());
            names(c.right(), Set.of());
        } else if (statement instanceof Table t) {
            t.items().forEach(item -> names(item, Set.of()));
        } else if (statement instanceof Plot p) {
            names(p.target(), Set.of());
        }
    }

    private void checkBlock(BlockKind kind, String owner, Name ownerName, List<Field> fields) {
        Map<String, Field> seen = fieldsOnce(owner, fields);
        for (Field field : fields) {
            Optional<FieldSpec> spec = Builtins.field(kind, field.name().text());
            if (spec.isEmpty()) {
                List<String> known = Builtins.fields(kind).stream().map(FieldSpec::name).toList();
                diagnostics.error(field.name().span(), "unknown field '" + field.name().text() + "' in " + owner,
                        hintOr(NearestName.hint(field.name().text(), known), "fields of a " + kind.keyword()
                                + ": " + String.join(", ", known)));
                continue;
            }
            checkFieldValue(spec.get(), field, owner);
        }
        for (FieldSpec spec : Builtins.fields(kind)) {
            if (spec.required() && !seen.containsKey(spec.name())) {
                diagnostics.error(ownerName.span(), owner + " needs a '" + spec.name() + "' field",
                        spec.name() + ": " + spec.doc());
            }
        }
    }

    private void checkFieldValue(FieldSpec spec, Field field, String owner) {
        Expr value = field.value();
        switch (spec.kind()) {
            case REFERENCE -> {
                if (value instanceof NameRef ref) {
                    expectKind(ref.name(), ref.span(), spec.refersTo(), "field " + spec.name() + " of " + owner);
                } else {
                    diagnostics.error(value.span(), "field " + spec.name() + " of " + owner + " names "
                            + spec.refersTo().described(), null);
                }
            }
            case CHOICE -> {
                if (!(value instanceof NameRef ref) || !spec.choices().contains(ref.name())) {
                    String written = value instanceof NameRef ref ? ref.name() : null;
                    diagnostics.error(value.span(), "field " + spec.name() + " of " + owner + " is one of "
                            + String.join(", ", spec.choices()),
                            written == null ? null : NearestName.hint(written, spec.choices()));
                }
            }
            case LAYOUT -> {
                if (value instanceof Call call) {
                    call.args().forEach(arg -> names(arg, Set.of()));
                }
            }
            case WINDOW_OR_BASELINE -> {
                if (value instanceof NameRef ref) {
                    expectKind(ref.name(), ref.span(), SymbolKind.BASELINE, "field zero of " + owner);
                } else {
                    names(value, Set.of());
                }
            }
            default -> names(value, Set.of());
        }
    }

    private Map<String, Field> fieldsOnce(String owner, List<Field> fields) {
        Map<String, Field> seen = new HashMap<>();
        for (Field field : fields) {
            Field earlier = seen.putIfAbsent(field.name().text(), field);
            if (earlier != null) {
                diagnostics.error(field.name().span(), "field '" + field.name().text() + "' is given twice in "
                        + owner, "first given at line " + earlier.span().line());
            }
        }
        return seen;
    }

    private void checkCase(Case loadCase) {
        String owner = "case " + loadCase.name().text();
        checkReadings(BlockKind.CASE, owner, loadCase.fields());
        if (loadCase.from() == null) {
            return;
        }
        Symbol baseline = expectKind(loadCase.from().text(), loadCase.from().span(), SymbolKind.BASELINE,
                "'from' of " + owner);
        if (baseline != null) {
            requireBaselineReadings(loadCase.fields(), (Baseline) baseline.statement(), owner);
        }
    }

    /** A rosette read in a case (or series) with a baseline must be read in the baseline. */
    private void requireBaselineReadings(List<Field> fields, Baseline baseline, String owner) {
        Set<String> inBaseline = new HashSet<>();
        baseline.fields().forEach(f -> inBaseline.add(f.name().text()));
        for (Field field : fields) {
            String rosette = field.name().text();
            if (symbols.containsKey(rosette) && symbols.get(rosette).kind() == SymbolKind.ROSETTE
                    && !inBaseline.contains(rosette)) {
                diagnostics.error(field.name().span(), "missing baseline reading: rosette " + rosette
                        + " is read in " + owner + " but not in baseline " + baseline.name().text(),
                        "add " + rosette + " to baseline " + baseline.name().text() + " (line "
                                + baseline.span().line() + ")");
            }
        }
    }

    private void checkReadings(BlockKind kind, String owner, List<Field> fields) {
        fieldsOnce(owner, fields);
        for (Field field : fields) {
            String name = field.name().text();
            Optional<FieldSpec> spec = Builtins.field(kind, name);
            if (spec.isPresent()) {
                checkFieldValue(spec.get(), field, owner);
                continue;
            }
            Symbol symbol = symbols.get(name);
            if (symbol == null) {
                List<String> candidates = new ArrayList<>(Builtins.fields(kind).stream().map(FieldSpec::name).toList());
                candidates.addAll(namesOf(SymbolKind.ROSETTE));
                diagnostics.error(field.name().span(), "reading for an undeclared rosette '" + name + "' in " + owner,
                        hintOr(NearestName.hint(name, candidates), "declare it with rosette " + name + " { ... }"));
                continue;
            }
            if (symbol.kind() != SymbolKind.ROSETTE) {
                diagnostics.error(field.name().span(), name + " is " + symbol.kind().described()
                        + ", not a rosette: only rosettes are read in " + owner, null);
                continue;
            }
            Integer arms = armCounts.get(name);
            int given = countOf(field.value());
            if (arms != null && given >= 0 && given != arms) {
                boolean columns = field.value() instanceof StringList || field.value() instanceof StringLit;
                String what = columns ? (given == 1 ? " column is" : " columns are")
                        : (given == 1 ? " reading is" : " readings are");
                diagnostics.error(field.value().span(), "rosette " + name + " has " + arms + " arms, but "
                        + given + what + " given", columns ? "name one column per arm, in arm order"
                        : "list one reading per arm, in arm order");
            }
        }
    }

    /** How many readings or columns a value lists, or -1 when it is not a list. */
    private static int countOf(Expr value) {
        if (value instanceof ReadingList list) {
            return list.values().size();
        } else if (value instanceof StringList list) {
            return list.items().size();
        } else if (value instanceof NumberLit || value instanceof QuantityLit || value instanceof StringLit) {
            return 1;
        }
        return -1;
    }

    private void checkCombine(Combine combine) {
        for (Term term : combine.terms()) {
            expectKind(term.caseName().text(), term.caseName().span(), SymbolKind.CASE,
                    "combination " + combine.name().text());
        }
    }

    private void checkSeries(Series series) {
        String owner = "series " + series.name().text();
        checkReadings(BlockKind.SERIES, owner, series.fields());
        boolean hasTime = series.fields().stream().anyMatch(f -> f.name().text().equals("time"));
        if (!hasTime) {
            diagnostics.error(series.name().span(), owner + " needs a 'time' field",
                    "time = \"t_s\" s names the time column and its unit");
        }
        for (Field field : series.fields()) {
            if (field.name().text().equals("zero") && field.value() instanceof NameRef ref
                    && symbols.get(ref.name()) != null && symbols.get(ref.name()).kind() == SymbolKind.BASELINE) {
                requireBaselineReadings(series.fields(), (Baseline) symbols.get(ref.name()).statement(), owner);
            }
        }
    }

    private void checkLet(Let let) {
        Set<String> params = new HashSet<>();
        for (Param param : let.params()) {
            if (!params.add(param.name().text())) {
                diagnostics.error(param.name().span(), "parameter '" + param.name().text() + "' is named twice", null);
            }
        }
        names(let.body(), params);
    }

    // ---- names in values ---------------------------------------------------------------

    /** Every name used in a value is declared and is something a value can use. */
    private void names(Expr expr, Set<String> params) {
        if (expr instanceof NameRef ref) {
            nameInValue(ref, params);
        } else if (expr instanceof Member member) {
            names(member.target(), params);
        } else if (expr instanceof Index index) {
            names(index.target(), params);
            Symbol picked = symbols.get(index.caseName().text());
            if (picked == null) {
                unknown(index.caseName().text(), index.caseName().span(),
                        namesOf(SymbolKind.CASE, SymbolKind.COMBINATION, SymbolKind.SERIES));
            } else if (!picked.kind().isCaseLike()) {
                diagnostics.error(index.caseName().span(), index.caseName().text() + " is "
                        + picked.kind().described() + ", not a load case",
                        "x[CASE] picks one case, combination or series");
            }
        } else if (expr instanceof Call call) {
            String function = call.function().text();
            Symbol symbol = symbols.get(function);
            if (symbol != null && symbol.kind() != SymbolKind.FUNCTION) {
                diagnostics.error(call.function().span(), function + " is " + symbol.kind().described()
                        + ", not a function", null);
            } else if (symbol == null && Builtins.function(function).isEmpty()) {
                List<String> candidates = new ArrayList<>(namesOf(SymbolKind.FUNCTION));
                Builtins.functions().forEach(f -> candidates.add(f.name()));
                diagnostics.error(call.function().span(), "unknown function '" + function + "'",
                        NearestName.hint(function, candidates));
            }
            call.args().forEach(arg -> names(arg, params));
        } else if (expr instanceof Binary binary) {
            names(binary.left(), params);
            names(binary.right(), params);
        } else if (expr instanceof Negate negate) {
            names(negate.operand(), params);
        } else if (expr instanceof Range range) {
            names(range.from(), params);
            names(range.to(), params);
        }
    }

    private void nameInValue(NameRef ref, Set<String> params) {
        if (params.contains(ref.name())) {
            return;
        }
        Symbol symbol = symbols.get(ref.name());
        if (symbol == null) {
            List<String> candidates = new ArrayList<>(params);
            symbols.values().forEach(s -> candidates.add(s.text()));
            unknown(ref.name(), ref.span(), candidates);
            return;
        }
        switch (symbol.kind()) {
            case CASE, COMBINATION, SERIES -> diagnostics.error(ref.span(), ref.name() + " is "
                    + symbol.kind().described() + ", not a value", "pick one case of a value with x[" + ref.name() + "]");
            case BASELINE -> diagnostics.error(ref.span(), ref.name() + " is a baseline, not a value",
                    "a baseline has no results; name it in a case: case c from " + ref.name() + " { ... }");
            case FUNCTION -> diagnostics.error(ref.span(), ref.name() + " is a function; call it with arguments",
                    null);
            default -> { }
        }
    }

    private Symbol expectKind(String name, SourceSpan span, SymbolKind kind, String where) {
        Symbol symbol = symbols.get(name);
        if (symbol == null) {
            unknown(name, span, namesOf(kind));
            return null;
        }
        if (symbol.kind() != kind) {
            diagnostics.error(span, where + " names " + kind.described() + ", but " + name + " is "
                    + symbol.kind().described(), hintOr(NearestName.hint(name, namesOf(kind)), null));
            return null;
        }
        return symbol;
    }

    private void unknown(String name, SourceSpan span, List<String> candidates) {
        String hint = NearestName.hint(name, candidates);
        if (hint == null) {
            hint = NearestName.hint(name, new ArrayList<>(symbols.keySet()));
        }
        diagnostics.error(span, "unknown name '" + name + "'", hint);
    }

    private List<String> namesOf(SymbolKind... kinds) {
        List<SymbolKind> wanted = List.of(kinds);
        return symbols.values().stream().filter(s -> wanted.contains(s.kind())).map(Symbol::text).toList();
    }

    private static String hintOr(String hint, String otherwise) {
        return hint != null ? hint : otherwise;
    }
}
