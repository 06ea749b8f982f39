package dev.wavemark.imaging.detect;

import boofcv.concurrency.BoofConcurrency;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.BodyShape;
import dev.wavemark.core.model.Optics;
import java.util.Arrays;

/**
 * Runs the speed harness's detections in a loop for a profiler (not a test): {@code wedge},
 * {@code wedge2048} or {@code freestream}, for the given number of seconds, one thread, and
 * prints the median time per frame (wall clock and the thread's CPU time, which other work on
 * the machine disturbs less). See DEVELOPERS.md for the JFR command.
 */
final class DetectorLoop {
  private DetectorLoop() {}

  public static void main(String[] args) {
    BoofConcurrency.setMaxThreads(1);
    String which = args.length > 0 ? args[0] : "wedge";
    double seconds = args.length > 1 ? Double.parseDouble(args[1]) : 20;
    RenderedCase c;
    BodyShape s;
    if (which.equals("freestream")) {
      s = new BodyShape.Freestream(java.util.Optional.empty());
      c = RenderedCase.of("freestream", s, 2.0, Optics.SCHLIEREN_VERTICAL_EDGE, 1, 1.2, 2, 0, 1024, 768, 305);
    } else {
      double f = which.equals("wedge2048") ? 2 : 1;
      s = new BodyShape.Wedge(Math.toRadians(10), 0, new Point2(200.4 * f, 384.3 * f), 300 * f);
      c = RenderedCase.of("wedge", s, 2.0, Optics.SCHLIEREN_VERTICAL_EDGE, 1, 1.2, 20, 0, (int) (1024 * f), (int) (768 * f), 9);
    }
    DetectionRequest req = DetectionRequest.of(c.frame(), FlowRegion.of(c.mask()), c.optics(), s, 0);
    WaveDetector d = WaveDetector.create();
    java.lang.management.ThreadMXBean cpu = java.lang.management.ManagementFactory.getThreadMXBean();
    double[] t = new double[100000];
    double[] tc = new double[t.length];
    int n = 0;
    long end = System.nanoTime() + (long) (seconds * 1e9);
    while (System.nanoTime() < end && n < t.length) {
      long t0 = System.nanoTime();
      long c0 = cpu.getCurrentThreadCpuTime();
      d.detect(req);
      tc[n] = (cpu.getCurrentThreadCpuTime() - c0) / 1e6;
      t[n++] = (System.nanoTime() - t0) / 1e6;
    }
    double[] u = Arrays.copyOf(t, n);
    Arrays.sort(u);
    double[] uc = Arrays.copyOf(tc, n);
    Arrays.sort(uc);
    System.out.printf("%s: %d frames, median %.1f ms (thread CPU time %.1f ms)%n", which, n, u[n / 2], uc[n / 2]);
  }
}
