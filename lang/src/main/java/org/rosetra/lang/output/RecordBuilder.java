package org.rosetra.lang.output;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.rosetra.lang.plan.ArmReading;
import org.rosetra.lang.plan.CheckResult;
import org.rosetra.lang.plan.Evaluation;
import org.rosetra.lang.plan.Outcome;
import org.rosetra.lang.plan.Output;
import org.rosetra.lang.plan.Session;
import org.rosetra.lang.syntax.Declaration;
import org.rosetra.lang.syntax.Field;
import org.rosetra.lang.syntax.SourceSpan;
import org.rosetra.runtime.gauge.CorrectionTrace;
import org.rosetra.runtime.material.Material;
import org.rosetra.runtime.render.output.Sha256;
import org.rosetra.runtime.render.record.ArmCorrection;
import org.rosetra.runtime.render.record.CheckLine;
import org.rosetra.runtime.render.record.InputFile;
import org.rosetra.runtime.render.record.Property;
import org.rosetra.runtime.render.record.CalculationRecord;
import org.rosetra.runtime.render.record.RecordItem;
import org.rosetra.runtime.render.record.SeriesInput;
import org.rosetra.runtime.render.table.Cell;
import org.rosetra.runtime.render.table.Column;
import org.rosetra.runtime.render.table.ResultTable;
import org.rosetra.runtime.render.table.Row;
import org.rosetra.runtime.units.Dimension;
import org.rosetra.runtime.units.DisplayUnits;
import org.rosetra.runtime.units.Unit;

/** Assembles the calculation record of a run from what the session computed. */
public final class RecordBuilder {
    private static final String ARMS = "abcdefghijklmnopqrstuvwxyz";

    private RecordBuilder() {}

    /**
     * @param scriptName the script's file name as the record shows it
     * @param inputs     every input file (the script first) with its digest
     */
    public static CalculationRecord build(String scriptName, String scriptText, Outcome outcome, Session session,
                               List<InputFile> inputs, String toolVersion) {
        Evaluation evaluation = outcome.evaluation();
        DisplayUnits display = outcome.display();
        Unit strain = display.strainUnit();
        String title = evaluation.program().title() != null ? evaluation.program().title() : scriptName;

        List<CheckLine> checks = new ArrayList<>();
        for (CheckResult c : outcome.checks()) {
            double u = c.unbounded() ? Double.POSITIVE_INFINITY : c.highest();
            checks.add(new CheckLine(c.check().label().value(), c.passes(), u,
                    c.governingName() == null ? "" : c.governingName(),
                    c.at() == null ? java.util.OptionalDouble.empty() : java.util.OptionalDouble.of(c.at())));
        }

        List<org.rosetra.runtime.render.record.Declaration> declarations = new ArrayList<>();
        for (Declaration.Kind kind : Declaration.Kind.values()) {
            for (Declaration d : evaluation.program().declarations(kind)) {
                declarations.add(declaration(d, evaluation, session, display));
            }
        }

        List<ArmCorrection> corrections = new ArrayList<>();
        for (ArmReading r : evaluation.armReadings()) {
            CorrectionTrace t = r.trace();
            corrections.add(new ArmCorrection(r.caseName(), r.rosette(), String.valueOf(ARMS.charAt(r.arm())),
                    strain.fromSi(t.indicated()), strain.fromSi(t.afterBridge()),
                    t.thermalRemoved() ? strain.fromSi(t.thermalOutput()) : Double.NaN,
                    t.baseline().isPresent() ? strain.fromSi(t.baseline().getAsDouble()) : Double.NaN,
                    strain.fromSi(t.result())));
        }

        List<RecordItem> items = new ArrayList<>();
        Set<String> used = new HashSet<>();
        ResultTable values = valuesTable(outcome, display);
        if (values != null) {
            items.add(new RecordItem.TableItem(unique("values", used), values));
        }
        for (Output o : outcome.outputs()) {
            if (o instanceof Output.TableOutput t) {
                items.add(new RecordItem.TableItem(unique(t.name(), used), t.table()));
            } else if (o instanceof Output.FigureOutput f) {
                if (used.add(f.figure().name())) {
                    items.add(new RecordItem.FigureItem(f.caption(), f.figure()));
                }
            }
        }
        List<SeriesInput> series = new ArrayList<>();
        List<InputFile> allInputs = new ArrayList<>(inputs);
        List<Row> flagged = new ArrayList<>();
        for (var e : evaluation.series().entrySet()) {
            var r = e.getValue();
            String digest;
            try {
                digest = r.sha256().join();
            } catch (java.util.concurrent.CompletionException x) {
                throw x.getCause() instanceof RuntimeException re ? re : x;
            }
            StringBuilder zero = new StringBuilder(r.spec().zeroText());
            for (var z : r.zero().entrySet()) {
                zero.append("; ").append(z.getKey()).append(':');
                for (int a = 0; a < z.getValue().length; a++) {
                    zero.append(' ').append(ARMS.charAt(a)).append(' ')
                            .append(String.format(java.util.Locale.ROOT, "%.1f", strain.fromSi(z.getValue()[a])));
                }
                zero.append(' ').append(strain.symbol());
            }
            if (r.spec().temperatureColumn() != null) {
                zero.append("; temperature from column \"").append(r.spec().temperatureColumn()).append('"');
            }
            series.add(new SeriesInput(e.getKey(), r.spec().shownName(), digest, r.samples(), r.firstTime(),
                    r.lastTime(), "s", zero.toString()));
            allInputs.add(new InputFile(r.spec().shownName(), digest));
            for (var f : r.flags().entrySet()) {
                List<String> columns = r.spec().rosettes().get(f.getKey());
                for (int a = 0; a < f.getValue().length; a++) {
                    var flag = f.getValue()[a];
                    if (flag.raised()) {
                        flagged.add(new Row(e.getKey() + " / " + f.getKey() + " arm " + ARMS.charAt(a)
                                + " (\"" + columns.get(a) + "\")", List.of(Cell.text(Long.toString(flag.count())),
                                Cell.of(strain.fromSi(flag.worst())), Cell.of(flag.timeOfWorst()),
                                Cell.of(flag.firstTime()), Cell.of(flag.lastTime()))));
                    }
                }
            }
        }
        if (!flagged.isEmpty()) {
            ResultTable table = new ResultTable("Readings beyond a plausible range (over "
                    + Math.round(strain.fromSi(org.rosetra.lang.plan.SeriesLimits.PLAUSIBLE_STRAIN))
                    + " " + strain.symbol() + "): likely a debonded or saturated gauge", "series / arm",
                    List.of(Column.unitless("readings"), new Column("worst", strain.symbol()),
                            new Column("at", "s"), new Column("first", "s"), new Column("last", "s")), flagged);
            items.add(new RecordItem.TableItem(unique("implausible-readings", used), table));
        }
        String recordName = evaluation.program().reportName() != null ? evaluation.program().reportName()
                : scriptName.replaceFirst("\\.strain$", "");
        return new CalculationRecord(title, checks, declarations, strain.symbol(), corrections, items, series,
                scriptName, scriptText, allInputs, toolVersion, recordName);
    }

    private static org.rosetra.runtime.render.record.Declaration declaration(Declaration d, Evaluation evaluation,
                                                                            Session session, DisplayUnits display) {
        List<Property> properties = new ArrayList<>();
        for (Field f : d.fields()) {
            properties.add(new Property(f.name().text(), textOf(f.value().span(), session), ""));
        }
        if (d.kind() == Declaration.Kind.MATERIAL) {
            // The elastic constant the script left out, as the tool derived it.
            Material m = evaluation.material(d.name().text());
            Unit stress = display.unitFor(Dimension.STRESS);
            Set<String> given = new HashSet<>();
            d.fields().forEach(f -> given.add(f.name().text()));
            if (!given.contains("E")) {
                properties.add(new Property("E (derived)", format(stress.fromSi(m.e())), stress.symbol()));
            }
            if (!given.contains("nu")) {
                properties.add(new Property("nu (derived)", format(m.nu()), ""));
            }
            if (!given.contains("G")) {
                properties.add(new Property("G (derived)", format(stress.fromSi(m.g())), stress.symbol()));
            }
        }
        return new org.rosetra.runtime.render.record.Declaration(d.kind().keyword(), d.name().text(), properties);
    }

    /** Every named value that is a number, as the checks used it, in display units. */
    private static ResultTable valuesTable(Outcome outcome, DisplayUnits display) {
        List<Row> rows = new ArrayList<>();
        for (var e : outcome.results().values().entrySet()) {
            Dimension d = Dimension.named(e.getValue().dimension()).orElse(null);
            double si = e.getValue().value();
            if (d == null || d.isNone()) {
                rows.add(Row.of(e.getKey(), Cell.of(si), Cell.absent()));
            } else if (d.equals(Dimension.ANGLE)) {
                rows.add(Row.of(e.getKey(), Cell.of(si), Cell.text("deg")));
            } else {
                Unit u = display.unitFor(d);
                rows.add(Row.of(e.getKey(), Cell.of(u.fromSi(si)), Cell.text(u.symbol())));
            }
        }
        if (rows.isEmpty()) {
            return null;
        }
        return new ResultTable("Named values", "value", List.of(Column.unitless("value"), Column.unitless("unit")), rows);
    }

    private static String format(double v) {
        return String.format(java.util.Locale.ROOT, "%.6g", v);
    }

    private static String textOf(SourceSpan span, Session session) {
        String text = session.textOf(span);
        return text == null ? "" : text.replace('\n', ' ');
    }


    private static String unique(String stem, Set<String> used) {
        String s = stem;
        for (int i = 2; !used.add(s); i++) {
            s = stem + "-" + i;
        }
        return s;
    }

    /** The digest of a text as stored (UTF-8). */
    public static InputFile input(String path, String text) {
        return new InputFile(path, Sha256.of(text.getBytes(StandardCharsets.UTF_8)));
    }

    static InputFile input(String path, java.nio.file.Path file) throws IOException {
        return new InputFile(path, Sha256.ofFile(file));
    }
}
