package org.rosetra.runtime.series.bench;

import java.nio.file.Path;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.rosetra.runtime.chain.ChainBuffers;
import org.rosetra.runtime.chain.ReductionChain;
import org.rosetra.runtime.gauge.Bridge;
import org.rosetra.runtime.gauge.Gauge;
import org.rosetra.runtime.material.Material;
import org.rosetra.runtime.results.RosetteMember;
import org.rosetra.runtime.rosette.RosetteLayout;
import org.rosetra.runtime.series.Chunk;
import org.rosetra.runtime.series.Extremes;
import org.rosetra.runtime.series.FoldResult;
import org.rosetra.runtime.series.ReadOptions;
import org.rosetra.runtime.series.SeriesFold;
import org.rosetra.runtime.series.SeriesReader;
import org.rosetra.runtime.series.SeriesSource;

/**
 * The series benchmark through the runtime's own reduction chain (run by bench/series, not
 * a unit test): what a script's series statement will do, one rosette of three arms with no
 * bridge correction, plane stress, E = 200 GPa, nu = 0.3. With {@code all} it computes every
 * member of the rosette and keeps the extremes and their times of each; otherwise von Mises
 * alone, like the peer.
 *
 * <p>usage: SeriesChainBench FILE.csv [THREADS] [all|von_mises]
 */
public final class SeriesChainBench {

    private SeriesChainBench() {
    }

    public static void main(String[] args) {
        Path file = Path.of(args[0]);
        int threads = args.length > 1 ? Integer.parseInt(args[1]) : 2;
        boolean all = args.length > 2 && args[2].equals("all");
        Set<RosetteMember> members = all ? EnumSet.allOf(RosetteMember.class) : EnumSet.of(RosetteMember.VON_MISES);
        Gauge gauge = Gauge.withFactor(2.0).withTransverse(0.0);
        Material steel = Material.of("invented hoist steel", 200e9, 0.3, null, null, null, null, null);
        ReductionChain chain = ReductionChain.of(gauge, Bridge.NONE, 0.0, 2.0, RosetteLayout.rectangular(), 0.0,
                steel, org.rosetra.runtime.stress.PlaneCondition.PLANE_STRESS);
        SeriesSource source = new SeriesSource(file, file.toString(), ',', '.', "t_s", List.of("g1", "g2", "g3"));
        ReadOptions options = ReadOptions.defaults().withThreads(threads);
        FoldResult<PerPart> result = SeriesReader.fold(source, options,
                new ChainFold(chain, members, options.chunkRows()));
        PerPart summary = result.value();
        System.out.printf(Locale.ROOT, "samples %d  max von Mises %.6f MPa at t = %.3f s%n", result.samples(),
                summary.extremes(RosetteMember.VON_MISES).max() / 1e6,
                summary.extremes(RosetteMember.VON_MISES).timeOfMax());
        if (all) {
            for (RosetteMember m : members) {
                Extremes e = summary.extremes(m);
                System.out.printf(Locale.ROOT, "  %-9s max %.6e at %.3f s   min %.6e at %.3f s%n", m.scriptName(),
                        e.max(), e.timeOfMax(), e.min(), e.timeOfMin());
            }
        }
    }

    /** One part's (so one thread's) chain buffers, strain columns and the members' extremes. */
    static final class PerPart {
        final ChainBuffers buffers;
        final double[][] strain;
        final RosetteMember[] members;
        final Extremes[] extremes;

        PerPart(ReductionChain chain, Set<RosetteMember> wanted, int rows) {
            buffers = chain.buffers(rows, wanted, false);
            strain = new double[3][rows];
            members = wanted.toArray(new RosetteMember[0]);
            extremes = new Extremes[members.length];
            for (int i = 0; i < members.length; i++) {
                extremes[i] = new Extremes();
            }
        }

        Extremes extremes(RosetteMember m) {
            for (int i = 0; i < members.length; i++) {
                if (members[i] == m) {
                    return extremes[i];
                }
            }
            throw new IllegalArgumentException(m + " was not computed");
        }
    }

    static final class ChainFold implements SeriesFold<PerPart> {
        private final ReductionChain chain;
        private final Set<RosetteMember> members;
        private final int rows;

        ChainFold(ReductionChain chain, Set<RosetteMember> members, int rows) {
            this.chain = chain;
            this.members = members;
            this.rows = rows;
        }

        @Override
        public PerPart start() {
            return new PerPart(chain, members, rows);
        }

        @Override
        public void add(PerPart p, Chunk chunk) {
            int n = chunk.rows();
            for (int arm = 0; arm < 3; arm++) {
                double[] in = chunk.values(arm);
                double[] out = p.strain[arm];
                for (int i = 0; i < n; i++) {
                    out[i] = in[i] * 1e-6; // the file is in microstrain; the runtime works in SI
                }
            }
            chain.run(p.strain, null, n, p.buffers);
            for (int i = 0; i < p.members.length; i++) {
                p.extremes[i].add(p.buffers.member(p.members[i]), chunk.time(), n);
            }
        }

        @Override
        public PerPart merge(PerPart earlier, PerPart later) {
            for (int i = 0; i < earlier.extremes.length; i++) {
                earlier.extremes[i].merge(later.extremes[i]);
            }
            return earlier;
        }
    }
}
