package org.rosetra.runtime.render.bench;

import java.lang.management.ManagementFactory;
import java.util.List;
import java.util.Locale;
import org.rosetra.runtime.render.plot.MohrCircle;
import org.rosetra.runtime.render.plot.MohrFigure;
import org.rosetra.runtime.render.plot.RenderedFigure;

/**
 * Prints how long one Mohr figure (strain and stress panels) takes to render to SVG and PNG:
 * first in a cold JVM (class loading, font loading, JIT warm-up included), then warm. Run it as
 * its own process so the first figure is really cold; it is a benchmark, not a test.
 *
 * <pre>java -cp runtime/target/classes:runtime/target/test-classes:DEPS \
 *     org.rosetra.runtime.render.bench.MohrRenderBenchmark [warm-repeats]</pre>
 */
public final class MohrRenderBenchmark {

  public static void main(String[] args) {
    long jvmStartMs = ManagementFactory.getRuntimeMXBean().getUptime();
    int repeats = args.length > 0 ? Integer.parseInt(args[0]) : 20;

    long t0 = System.nanoTime();
    RenderedFigure cold = figure().render("mohr-bench");
    long coldNs = System.nanoTime() - t0;

    long best = Long.MAX_VALUE;
    long total = 0;
    for (int i = 0; i < repeats; i++) {
      long s = System.nanoTime();
      figure().render("mohr-bench");
      long d = System.nanoTime() - s;
      best = Math.min(best, d);
      total += d;
    }
    System.out.printf(Locale.ROOT, "JVM uptime when main started: %d ms%n", jvmStartMs);
    System.out.printf(Locale.ROOT, "first Mohr figure, SVG + PNG (cold): %.1f ms  (svg %d B, png %d B)%n",
        coldNs / 1e6, cold.svg().length, cold.png().length);
    System.out.printf(Locale.ROOT, "warm, %d repeats: best %.1f ms, mean %.1f ms%n",
        repeats, best / 1e6, total / 1e6 / Math.max(1, repeats));
    System.out.printf(Locale.ROOT, "JVM uptime at the end: %d ms%n", ManagementFactory.getRuntimeMXBean().getUptime());
  }

  private static MohrFigure figure() {
    return new MohrFigure(List.of(
        MohrCircle.fromComponents("Strain, bench", "ε", 420, -135, 130, "normal strain ε [µε]",
            "half shear strain γ/2 [µε]"),
        MohrCircle.fromComponents("Stress, bench", "σ", 120, -40, 35, "normal stress σ [MPa]",
            "shear stress τ [MPa]")));
  }
}
