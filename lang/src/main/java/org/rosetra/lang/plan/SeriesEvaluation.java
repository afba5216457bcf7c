package org.rosetra.lang.plan;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.IdentityHashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.rosetra.lang.syntax.Call;
import org.rosetra.lang.syntax.Check;
import org.rosetra.lang.syntax.Plot;
import org.rosetra.runtime.chain.ChainBuffers;
import org.rosetra.runtime.chain.ReductionChain;
import org.rosetra.runtime.criteria.CheckOutcome;
import org.rosetra.runtime.criteria.Utilization;
import org.rosetra.runtime.results.RosetteMember;
import org.rosetra.runtime.series.Chunk;
import org.rosetra.runtime.series.ChunkSink;
import org.rosetra.runtime.series.Extremes;
import org.rosetra.runtime.series.FoldResult;
import org.rosetra.runtime.series.PlausibilityFlag;
import org.rosetra.runtime.series.ReadOptions;
import org.rosetra.runtime.series.SeriesFold;
import org.rosetra.runtime.series.SeriesReader;
import org.rosetra.runtime.series.WindowMean;
import org.rosetra.runtime.units.Dimension;

/**
 * Reads one measured series and reduces every sample through the same chain as a load case,
 * in bounded memory: per rosette and member the extremes with their times, every check tested
 * at every sample, the {@code max}/{@code min} of series histories, and the decimated
 * histories that plots draw. Parts of the file are folded on their own threads and merged in
 * file order, so the result does not depend on the number of threads.
 */
public final class SeriesEvaluation {
    /** A reading beyond this many microstrain is flagged as a likely debonded or saturated gauge. */
    static final double PLAUSIBLE_STRAIN = SeriesLimits.PLAUSIBLE_STRAIN;

    /** Digests series files while they are read; daemon threads, so a finished run never waits for one. */
    private static final java.util.concurrent.Executor DIGESTS = task -> {
        Thread t = new Thread(task, "rosetra-digest");
        t.setDaemon(true);
        t.start();
    };

    private final SeriesSpec spec;
    private final Evaluation evaluation;
    private final List<String> rosettes;
    private final Map<String, ReductionChain> chains = new LinkedHashMap<>();
    private final Map<String, Set<RosetteMember>> members = new LinkedHashMap<>();
    private final List<Check> checks;
    private final List<Call> reductions;
    private final List<Plot> plots;

    SeriesEvaluation(SeriesSpec spec, Evaluation evaluation, List<Check> checks, List<Call> reductions, List<Plot> plots) {
        this.spec = spec;
        this.evaluation = evaluation;
        this.rosettes = new ArrayList<>(spec.rosettes().keySet());
        this.checks = checks;
        this.reductions = reductions;
        this.plots = plots;
        for (String r : rosettes) {
            RosetteModel m = evaluation.rosette(r);
            // One gauge for every arm of a rosette: the same correction serves each.
            var arms = new org.rosetra.runtime.gauge.ArmCorrection[m.armCount()];
            java.util.Arrays.fill(arms, m.correction());
            chains.put(r, new ReductionChain(arms, m.solver(), m.material(), m.condition()));
            Set<RosetteMember> set = EnumSet.noneOf(RosetteMember.class);
            for (RosetteMember member : RosetteMember.values()) {
                if (m.material() != null || !member.needsMaterial()) {
                    set.add(member);
                }
            }
            members.put(r, set);
        }
    }

    /** What one pass over the series found. */
    public record Result(SeriesSpec spec, long samples, double firstTime, double lastTime,
                  Map<String, Map<RosetteMember, Extremes>> extremes, Map<String, PlausibilityFlag[]> flags,
                  Map<Check, ProbeResult> checks, Map<Call, Value.Number> reductions,
                  Map<Plot, Decimation> plots, Map<String, double[]> zero,
                  java.util.concurrent.CompletableFuture<String> sha256) {}

    /** A check over the samples: highest utilization, the time of it, whether every sample passed. */
    public record ProbeResult(boolean defined, boolean pass, double highest, double time, boolean unbounded) {}

    Result run(ReadOptions options, boolean digest) {
        // The record names the file's SHA-256: digest it alongside the reading, on its own thread.
        var sha256 = !digest ? java.util.concurrent.CompletableFuture.<String>completedFuture(null)
                : java.util.concurrent.CompletableFuture.supplyAsync(() -> {
            try {
                return org.rosetra.runtime.render.output.Sha256.ofFile(spec.file());
            } catch (java.io.IOException e) {
                throw new java.io.UncheckedIOException(e);
            }
        }, DIGESTS);
        Map<String, double[]> zero = zeroReadings(options);
        Map<String, ReductionChain> zeroed = new LinkedHashMap<>();
        chains.forEach((r, c) -> zeroed.put(r, zero.containsKey(r) ? c.withZero(zero.get(r)) : c));
        FoldResult<Part> folded = SeriesReader.fold(spec.source(), options, new Fold(zeroed));
        Part p = folded.value();
        if (p.samples == 0) {
            throw new EvaluationException(spec.statement().path().span(), "series " + spec.name() + " has no samples");
        }
        Map<Check, ProbeResult> checkResults = new LinkedHashMap<>();
        for (int i = 0; i < checks.size(); i++) {
            CheckProbe c = p.checks[i];
            checkResults.put(checks.get(i), new ProbeResult(!c.inactive && c.count > 0, c.pass, c.highest, c.time, c.unbounded));
        }
        Map<Call, Value.Number> reduced = new IdentityHashMap<>();
        for (int i = 0; i < reductions.size(); i++) {
            ReductionProbe r = p.reductions[i];
            Call call = reductions.get(i);
            if (r.inactive || r.extremes.count() == 0) {
                throw new EvaluationException(call.span(), "this value has no samples in series " + spec.name());
            }
            boolean max = call.function().text().equals("max");
            reduced.put(call, new Value.Number(max ? r.extremes.max() : r.extremes.min(), r.dimension));
        }
        Map<Plot, Decimation> decimated = new LinkedHashMap<>();
        for (int i = 0; i < plots.size(); i++) {
            if (!p.plots[i].inactive) {
                decimated.put(plots.get(i), p.plots[i].decimation);
            }
        }
        Map<String, Map<RosetteMember, Extremes>> extremes = new LinkedHashMap<>();
        for (int k = 0; k < rosettes.size(); k++) {
            extremes.put(rosettes.get(k), p.extremes.get(k));
        }
        Map<String, PlausibilityFlag[]> flags = new LinkedHashMap<>();
        for (int k = 0; k < rosettes.size(); k++) {
            flags.put(rosettes.get(k), p.flags.get(k));
        }
        return new Result(spec, p.samples, p.firstTime, p.lastTime, extremes, flags, checkResults, reduced, decimated, zero,
                sha256);
    }

    /** The corrected zero reading of every arm: a baseline's, or the mean over the zero window. */
    private Map<String, double[]> zeroReadings(ReadOptions options) {
        Map<String, double[]> zero = new LinkedHashMap<>();
        if (spec.zeroBaseline() != null) {
            var baseline = evaluation.program().baselines.get(spec.zeroBaseline());
            Double temperature = evaluation.temperatureC(baseline.fields());
            for (String r : rosettes) {
                var field = baseline.fields().stream().filter(f -> f.name().text().equals(r)).findFirst().orElseThrow();
                double[] readings = evaluation.readings(field, evaluation.rosette(r));
                zero.put(r, chains.get(r).correctedBaseline(readings, temperature));
            }
            return zero;
        }
        if (!spec.hasZeroWindow()) {
            return zero;
        }
        WindowMean[][] means = new WindowMean[rosettes.size()][];
        ChainBuffers[] buffers = new ChainBuffers[rosettes.size()];
        for (int k = 0; k < rosettes.size(); k++) {
            means[k] = new WindowMean[chains.get(rosettes.get(k)).armCount()];
            for (int a = 0; a < means[k].length; a++) {
                means[k][a] = new WindowMean(spec.zeroFrom(), spec.zeroTo());
            }
        }
        Scratch scratch = new Scratch();
        SeriesReader.stream(spec.source(), options.withThreads(1), new ChunkSink() {
                @Override
                public boolean accept(Chunk chunk) {
                    scratch.load(chunk);
                    for (int k = 0; k < rosettes.size(); k++) {
                        ReductionChain chain = chains.get(rosettes.get(k));
                        if (buffers[k] == null) {
                            buffers[k] = chain.buffers(chunk.rows(), Set.of(), false);
                        }
                        if (buffers[k].capacity() < chunk.rows()) {
                            buffers[k] = chain.buffers(chunk.rows(), Set.of(), false);
                        }
                        chain.correctOnly(scratch.arms[k], scratch.temperatureC, chunk.rows(), buffers[k]);
                        for (int a = 0; a < means[k].length; a++) {
                            means[k][a].add(buffers[k].corrected(a), scratch.time, chunk.rows());
                        }
                    }
                    // The samples past the zero window are read by the main pass.
                    return scratch.time[chunk.rows() - 1] <= spec.zeroTo();
                }
            });
        for (int k = 0; k < rosettes.size(); k++) {
            double[] z = new double[means[k].length];
            for (int a = 0; a < z.length; a++) {
                if (means[k][a].count() == 0) {
                    throw new EvaluationException(spec.zeroSpan(), "no sample of series " + spec.name()
                            + " lies in the zero window", "choose a window inside the series' time span");
                }
                z[a] = means[k][a].mean();
            }
            zero.put(rosettes.get(k), z);
        }
        return zero;
    }

    /** A chunk's columns in SI: time in seconds, arms as strain, temperature in degC. */
    private final class Scratch {
        double[] time = new double[0];
        double[][][] arms = new double[rosettes.size()][][];
        double[] temperatureC;

        void load(Chunk chunk) {
            int n = chunk.rows();
            if (time.length < n) {
                time = new double[n];
                for (int k = 0; k < rosettes.size(); k++) {
                    arms[k] = new double[spec.rosettes().get(rosettes.get(k)).size()][n];
                }
                temperatureC = spec.temperature() == null ? null : new double[n];
            }
            double[] t = chunk.time();
            double ts = spec.timeScale();
            for (int i = 0; i < n; i++) {
                time[i] = t[i] * ts;
            }
            int column = 1;
            for (int k = 0; k < rosettes.size(); k++) {
                double scale = spec.strainScale().get(rosettes.get(k));
                for (int a = 0; a < arms[k].length; a++, column++) {
                    double[] in = chunk.values(column - 1);
                    double[] out = arms[k][a];
                    for (int i = 0; i < n; i++) {
                        out[i] = in[i] * scale;
                    }
                }
            }
            if (temperatureC != null) {
                double[] in = chunk.values(column - 1);
                var unit = spec.temperature();
                for (int i = 0; i < n; i++) {
                    temperatureC[i] = unit.toSi(in[i]) - Evaluation.KELVIN_AT_0_DEGC;
                }
            }
        }
    }

    /** One part's accumulators (its own thread), merged in file order. */
    private final class Part {
        long samples;
        double firstTime = Double.NaN;
        double lastTime = Double.NaN;
        final List<Map<RosetteMember, Extremes>> extremes = new ArrayList<>();
        final List<PlausibilityFlag[]> flags = new ArrayList<>();
        final CheckProbe[] checks = new CheckProbe[SeriesEvaluation.this.checks.size()];
        final ReductionProbe[] reductions = new ReductionProbe[SeriesEvaluation.this.reductions.size()];
        final PlotProbe[] plots = new PlotProbe[SeriesEvaluation.this.plots.size()];
        final Scratch scratch = new Scratch();
        final Map<String, ChainBuffers> buffers = new LinkedHashMap<>();

        Part() {
            for (String r : rosettes) {
                Map<RosetteMember, Extremes> m = new LinkedHashMap<>();
                members.get(r).forEach(member -> m.put(member, new Extremes()));
                extremes.add(m);
                PlausibilityFlag[] f = new PlausibilityFlag[spec.rosettes().get(r).size()];
                for (int a = 0; a < f.length; a++) {
                    f[a] = new PlausibilityFlag(PLAUSIBLE_STRAIN);
                }
                flags.add(f);
            }
            for (int i = 0; i < checks.length; i++) {
                checks[i] = new CheckProbe();
            }
            for (int i = 0; i < reductions.length; i++) {
                reductions[i] = new ReductionProbe();
            }
            for (int i = 0; i < plots.length; i++) {
                plots[i] = new PlotProbe();
            }
        }
    }

    private static final class CheckProbe {
        boolean inactive;
        boolean pass = true;
        boolean unbounded;
        double highest = Double.NEGATIVE_INFINITY;
        double time = Double.NaN;
        long count;

        void merge(CheckProbe later) {
            inactive |= later.inactive;
            pass &= later.pass;
            if (later.count > 0 && (count == 0 || later.highest > highest)) {
                highest = later.highest;
                time = later.time;
                unbounded = later.unbounded;
            }
            count += later.count;
        }
    }

    private static final class ReductionProbe {
        boolean inactive;
        Extremes extremes = new Extremes();
        Dimension dimension = Dimension.NONE;

        void merge(ReductionProbe later) {
            inactive |= later.inactive;
            extremes = extremes.merge(later.extremes);
            if (later.extremes.count() > 0) {
                dimension = later.dimension;
            }
        }
    }

    private static final class PlotProbe {
        boolean inactive;
        Decimation decimation = new Decimation();
    }

    private final class Fold implements SeriesFold<Part> {
        private final Map<String, ReductionChain> chains;

        Fold(Map<String, ReductionChain> chains) {
            this.chains = chains;
        }

        @Override
        public Part start() {
            return new Part();
        }

        @Override
        public void add(Part part, Chunk chunk) {
            int n = chunk.rows();
            part.scratch.load(chunk);
            double[] time = part.scratch.time;
            if (part.samples == 0) {
                part.firstTime = time[0];
            }
            part.lastTime = time[n - 1];
            part.samples += n;
            for (int k = 0; k < rosettes.size(); k++) {
                String r = rosettes.get(k);
                ChainBuffers b = part.buffers.get(r);
                if (b == null || b.capacity() < n) {
                    b = chains.get(r).buffers(Math.max(n, chunk.rows()), members.get(r), false);
                    part.buffers.put(r, b);
                }
                double[][] arms = part.scratch.arms[k];
                for (int a = 0; a < arms.length; a++) {
                    part.flags.get(k)[a].add(arms[a], time, n);
                }
                try {
                    chains.get(r).run(arms, part.scratch.temperatureC, n, b);
                } catch (IllegalArgumentException e) {
                    throw new EvaluationException(spec.statement().span(), "series " + spec.name() + ", rosette "
                            + r + ", lines " + chunk.firstLine() + " to " + (chunk.firstLine() + n - 1) + ": " + e.getMessage());
                }
                for (var e : part.extremes.get(k).entrySet()) {
                    e.getValue().add(b.member(e.getKey()), time, n);
                }
            }
            if (checks.isEmpty() && reductions.isEmpty() && plots.isEmpty()) {
                return;
            }
            Frame frame = new Frame(spec.name(), n, time, part.buffers);
            for (int i = 0; i < checks.size(); i++) {
                probeCheck(checks.get(i), part.checks[i], frame);
            }
            for (int i = 0; i < reductions.size(); i++) {
                ReductionProbe probe = part.reductions[i];
                if (probe.inactive) {
                    continue;
                }
                try {
                    Value v = evaluation.expressions().evaluateIn(reductions.get(i).args().get(0), frame);
                    double[] values = Arithmetic.column(asColumn(v, n), n);
                    probe.extremes.add(values, time, n);
                    probe.dimension = Arithmetic.dimension(v, reductions.get(i).span());
                } catch (Frame.NotInFrame e) {
                    probe.inactive = true;
                }
            }
            for (int i = 0; i < plots.size(); i++) {
                PlotProbe probe = part.plots[i];
                if (probe.inactive) {
                    continue;
                }
                try {
                    Value v = evaluation.expressions().evaluateIn(plots.get(i).target(), frame);
                    probe.decimation.add(Arithmetic.column(asColumn(v, n), n), time, n);
                } catch (Frame.NotInFrame e) {
                    probe.inactive = true;
                }
            }
        }

        private void probeCheck(Check check, CheckProbe probe, Frame frame) {
            if (probe.inactive) {
                return;
            }
            int n = frame.n();
            double[] left;
            double[] right;
            try {
                Value l = evaluation.expressions().evaluateIn(check.left(), frame);
                Value r = evaluation.expressions().evaluateIn(check.right(), frame);
                if (!(l instanceof Value.History) && !(r instanceof Value.History)) {
                    probe.inactive = true; // no sample in it: tested with the cases
                    return;
                }
                left = Arithmetic.column(asColumn(l, n), n);
                right = Arithmetic.column(asColumn(r, n), n);
            } catch (Frame.NotInFrame e) {
                probe.inactive = true;
                return;
            }
            double[] u = new double[n];
            CheckOutcome o = Utilization.evaluate(left, Checks.comparison(check.op()), right, n, u, null);
            probe.pass &= o.pass();
            if (o.governing() >= 0 && (probe.count == 0 || o.utilization() > probe.highest)) {
                probe.highest = o.utilization();
                probe.time = frame.time()[o.governing()];
                probe.unbounded = o.unbounded();
            }
            probe.count += n;
        }

        @Override
        public Part merge(Part earlier, Part later) {
            if (later.samples == 0) {
                return earlier;
            }
            if (earlier.samples == 0) {
                return later;
            }
            earlier.samples += later.samples;
            earlier.lastTime = later.lastTime;
            for (int k = 0; k < rosettes.size(); k++) {
                Map<RosetteMember, Extremes> mine = earlier.extremes.get(k);
                Map<RosetteMember, Extremes> theirs = later.extremes.get(k);
                mine.replaceAll((m, x) -> x.merge(theirs.get(m)));
                PlausibilityFlag[] f = earlier.flags.get(k);
                for (int a = 0; a < f.length; a++) {
                    f[a] = f[a].merge(later.flags.get(k)[a]);
                }
            }
            for (int i = 0; i < earlier.checks.length; i++) {
                earlier.checks[i].merge(later.checks[i]);
            }
            for (int i = 0; i < earlier.reductions.length; i++) {
                earlier.reductions[i].merge(later.reductions[i]);
            }
            for (int i = 0; i < earlier.plots.length; i++) {
                earlier.plots[i].inactive |= later.plots[i].inactive;
                earlier.plots[i].decimation.append(later.plots[i].decimation);
            }
            return earlier;
        }
    }

    /** A number over a chunk becomes a constant history; a history stays as it is. */
    private static Value asColumn(Value v, int n) {
        if (v instanceof Value.History h) {
            return new Value.Column(h.values(), h.dimension());
        }
        return v;
    }

    /** The {@code max(...)} and {@code min(...)} calls of the program that reduce this series' samples. */
    static List<Call> reductionsOf(Evaluation evaluation, String series) {
        List<Call> found = new ArrayList<>();
        SeriesReferences.collect(evaluation.program(), series, found);
        return found;
    }
}
