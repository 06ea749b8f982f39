package dev.wavemark.imaging.synth;

import boofcv.concurrency.BoofConcurrency;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.BodyShape;
import dev.wavemark.core.model.Calibration;
import dev.wavemark.core.model.Optics;
import java.util.Arrays;
import java.util.Locale;
import java.util.Optional;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/**
 * Frame-time harness (not a timed test): a wedge frame with the full bench (window, lens, dust,
 * blur, noise) at 1024 x 768 and 2048 x 1536, one thread, in schlieren and in shadowgraph. Targets: 300 ms and 1.5 s per frame.
 * Run: {@code mvn -q test -Dtest=RenderBench -Dgroups=slow -DexcludedGroups=none}.
 */
@Tag("slow")
class RenderBench {
  public static void main(String[] args) {
    BoofConcurrency.USE_CONCURRENT = false;
    for (Optics o : new Optics[] {Optics.SCHLIEREN_VERTICAL_EDGE, Optics.SHADOWGRAPH}) {
      frameTimes(o);
    }
  }

  private static void frameTimes(Optics o) {
    for (int[] size : new int[][] {{1024, 768}, {2048, 1536}}) {
      int w = size[0];
      int h = size[1];
      double s = w / 1024.0;
      Bench b = new Bench(o, 1, 0.5, 1.5, 2e-3, 0.12, 0.1, 2.26e-4, 0.35, 1.25e-4 / s, 0.9, 0.6,
          0.4, 12, 20000, 6, 0.85, 0.12, 0.04, Optional.of(new Calibration.Window.Circle(w / 2.0, h / 2.0, 0.48 * h)),
          Optional.of(new Calibration.Lens(2400 * s, 2400 * s, w / 2.0, h / 2.0, new double[] {-0.05, 0}, new double[] {0, 0})), 6);
      BodyShape wedge = new BodyShape.Wedge(Math.toRadians(10), 0, new Point2(300 * s, 384 * s), 220 * s);
      Renderer r = Renderer.of(b, wedge, w, h, 7);
      Renderer.Condition c = new Renderer.Condition(2.0, 1.4, Math.toRadians(0.4), 0.1);
      for (int i = 0; i < 5; i++) {
        r.render(c, i);
      }
      int n = 15;
      double[] ms = new double[n];
      for (int i = 0; i < n; i++) {
        long t0 = System.nanoTime();
        r.render(c, 100 + i);
        ms[i] = (System.nanoTime() - t0) / 1e6;
      }
      Arrays.sort(ms);
      System.out.printf(Locale.ROOT, "%s %dx%d: median %.0f ms, min %.0f ms, max %.0f ms per frame (one thread)%n",
          o.contractName(), w, h, ms[n / 2], ms[0], ms[n - 1]);
    }
  }

  @Test
  void frameTimes() {
    main(new String[0]);
  }
}
