package org.rosetra.lang.plan;

import java.util.Arrays;
import java.util.Map;
import org.rosetra.runtime.chain.ChainBuffers;
import org.rosetra.runtime.results.RosetteMember;

/**
 * One chunk of a measured series while expressions run over its samples: the times (seconds)
 * and, per rosette the series reads, the reduced members of those samples.
 */
public record Frame(String series, int n, double[] time, Map<String, ChainBuffers> rosettes) {

    /** The first {@code n} values of a member of a rosette this chunk reads. */
    double[] member(String rosette, RosetteMember member) {
        ChainBuffers buffers = rosettes.get(rosette);
        if (buffers == null) {
            throw NotInFrame.INSTANCE;
        }
        return Arrays.copyOf(buffers.member(member), n);
    }

    /** The chunk's times in seconds (a copy of the first {@code n}). */
    double[] times() {
        return Arrays.copyOf(time, n);
    }

    /**
     * An expression names something this series does not read (a rosette it has no columns
     * for, another series): the expression is not defined over this series' samples.
     */
    static final class NotInFrame extends RuntimeException {
        private static final long serialVersionUID = 1L;
        static final NotInFrame INSTANCE = new NotInFrame();

        private NotInFrame() {
            super("not read by this series", null, false, false);
        }
    }
}
