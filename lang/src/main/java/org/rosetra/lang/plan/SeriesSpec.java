package org.rosetra.lang.plan;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.rosetra.lang.syntax.Field;
import org.rosetra.lang.syntax.NameRef;
import org.rosetra.lang.syntax.Range;
import org.rosetra.lang.syntax.Series;
import org.rosetra.lang.syntax.SourceSpan;
import org.rosetra.lang.syntax.StringList;
import org.rosetra.lang.syntax.StringLit;
import org.rosetra.runtime.series.SeriesSource;
import org.rosetra.runtime.units.Dimension;
import org.rosetra.runtime.units.Unit;
import org.rosetra.runtime.units.UnitParser;

/**
 * A {@code series} statement read into what the reader and the reduction need: which columns,
 * in which units, and how the readings are zeroed.
 *
 * @param timeScale     seconds per unit of the time column
 * @param rosettes      per rosette, the header names of its arm columns in arm order
 * @param strainScale   per rosette, the strain per unit of its arm columns
 * @param temperature   the temperature column's unit, or null when there is no such column
 * @param zeroFrom      start of the zero window in seconds, or NaN
 * @param zeroBaseline  the baseline that zeroes the readings, or null
 */
public record SeriesSpec(String name, Series statement, Path file, String shownName, char delimiter, char decimal,
                  String timeColumn, double timeScale, Map<String, List<String>> rosettes,
                  Map<String, Double> strainScale, String temperatureColumn, Unit temperature,
                  double zeroFrom, double zeroTo, String zeroBaseline, SourceSpan zeroSpan) {

    static SeriesSpec of(Series s, Path folder, Evaluation evaluation) {
        String timeColumn = null;
        double timeScale = 1;
        Map<String, List<String>> rosettes = new LinkedHashMap<>();
        Map<String, Double> strainScale = new LinkedHashMap<>();
        String temperatureColumn = null;
        Unit temperature = null;
        double zeroFrom = Double.NaN;
        double zeroTo = Double.NaN;
        String zeroBaseline = null;
        SourceSpan zeroSpan = null;
        char delimiter = ',';
        char decimal = '.';
        for (Field f : s.fields()) {
            String name = f.name().text();
            switch (name) {
                case "time": {
                    StringList columns = columns(f, 1);
                    timeColumn = columns.items().get(0).value();
                    Unit u = unit(columns, f, "s");
                    requireDimension(u, Dimension.TIME, f, "the time column");
                    timeScale = u.scale();
                    break;
                }
                case "temperature": {
                    StringList columns = columns(f, 1);
                    temperatureColumn = columns.items().get(0).value();
                    temperature = unit(columns, f, "degC");
                    requireDimension(temperature, Dimension.TEMPERATURE, f, "the temperature column");
                    break;
                }
                case "zero": {
                    zeroSpan = f.value().span();
                    if (f.value() instanceof Range r) {
                        zeroFrom = evaluation.expressions().number(r.from(), Dimension.TIME, Map.of(), "the zero window's start");
                        zeroTo = evaluation.expressions().number(r.to(), Dimension.TIME, Map.of(), "the zero window's end");
                        if (!(zeroTo > zeroFrom)) {
                            throw new EvaluationException(f.value().span(), "the zero window must end after it starts");
                        }
                    } else if (f.value() instanceof NameRef ref) {
                        zeroBaseline = ref.name();
                        if (!evaluation.program().baselines.containsKey(zeroBaseline)) {
                            throw new EvaluationException(ref.span(), "'" + zeroBaseline + "' is not a baseline",
                                    "zero = T0 to T1 (a time window) or zero = BASELINE");
                        }
                    } else {
                        throw new EvaluationException(f.value().span(), "zero takes a time window (0 s to 2 s) or a baseline");
                    }
                    break;
                }
                case "delimiter":
                    delimiter = character(f, "delimiter");
                    break;
                case "decimal":
                    decimal = character(f, "decimal");
                    break;
                default: {
                    if (!evaluation.isRosette(name)) {
                        throw new EvaluationException(f.name().span(), "'" + name + "' is not a rosette or a field of a series");
                    }
                    RosetteModel model = evaluation.rosette(name);
                    StringList columns = columns(f, model.armCount());
                    List<String> names = new ArrayList<>();
                    columns.items().forEach(c -> names.add(c.value()));
                    rosettes.put(name, names);
                    Unit u = unit(columns, f, "");
                    requireDimension(u, Dimension.NONE, f, "strain readings");
                    strainScale.put(name, u.scale());
                }
            }
        }
        if (timeColumn == null) {
            throw new EvaluationException(s.name().span(), "series " + s.name().text() + " needs a time column",
                    "add time = \"t_s\" s");
        }
        if (zeroBaseline != null) {
            var baseline = evaluation.program().baselines.get(zeroBaseline);
            for (String r : rosettes.keySet()) {
                boolean read = baseline.fields().stream().anyMatch(f -> f.name().text().equals(r));
                if (!read) {
                    throw new EvaluationException(zeroSpan, "rosette " + r + " is read in series " + s.name().text()
                            + " but not in its zero baseline " + zeroBaseline);
                }
            }
        }
        Path file = folder.resolve(s.path().value()).normalize();
        return new SeriesSpec(s.name().text(), s, file, s.path().value(), delimiter, decimal, timeColumn, timeScale,
                rosettes, strainScale, temperatureColumn, temperature, zeroFrom, zeroTo, zeroBaseline, zeroSpan);
    }

    SeriesSource source() {
        List<String> values = new ArrayList<>();
        rosettes.values().forEach(values::addAll);
        if (temperatureColumn != null) {
            values.add(temperatureColumn);
        }
        return new SeriesSource(file, shownName, delimiter, decimal, timeColumn, values);
    }

    boolean hasZeroWindow() {
        return !Double.isNaN(zeroFrom);
    }

    /** How the record describes the zero. */
    public String zeroText() {
        if (hasZeroWindow()) {
            return "mean of " + seconds(zeroFrom) + " s to " + seconds(zeroTo) + " s";
        }
        return zeroBaseline != null ? "baseline " + zeroBaseline : "none";
    }

    private static String seconds(double s) {
        return java.math.BigDecimal.valueOf(s).stripTrailingZeros().toPlainString();
    }

    private static StringList columns(Field f, int expected) {
        StringList list;
        if (f.value() instanceof StringList l) {
            list = l;
        } else if (f.value() instanceof StringLit one) {
            list = new StringList(List.of(one), null, null, one.span());
        } else {
            throw new EvaluationException(f.value().span(), "field " + f.name().text() + " names columns: \"col\" ...",
                    "write the header names in double quotes");
        }
        if (list.items().size() != expected) {
            throw new EvaluationException(f.value().span(), f.name().text() + " needs " + expected
                    + (expected == 1 ? " column" : " columns, one per arm in arm order") + ", got " + list.items().size());
        }
        return list;
    }

    private static Unit unit(StringList columns, Field f, String fallback) {
        String text = columns.unitText() != null ? columns.unitText() : fallback;
        return text.isEmpty() ? Unit.ONE : UnitParser.parse(text);
    }

    private static void requireDimension(Unit u, Dimension d, Field f, String what) {
        if (!u.dimension().equals(d)) {
            throw new EvaluationException(f.value().span(), what + " need a unit of " + d.name() + ", got " + u.symbol());
        }
    }

    private static char character(Field f, String what) {
        if (f.value() instanceof StringLit s) {
            String v = s.value();
            if (v.equals("\\t") || v.equals("tab")) {
                return '\t';
            }
            if (v.length() == 1) {
                return v.charAt(0);
            }
        }
        throw new EvaluationException(f.value().span(), what + " takes one character in quotes, such as \";\"");
    }
}
