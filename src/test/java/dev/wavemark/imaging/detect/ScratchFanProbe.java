package dev.wavemark.imaging.detect;

import dev.wavemark.core.geom.ImageAngles;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.ExpectedWave;
import dev.wavemark.core.model.WaveKind;

/** Scratch: profiles across the true fan boundaries of a case, the centre offset against D. */
final class ScratchFanProbe {
  public static void main(String[] args) {
    int ci = Integer.parseInt(args[0]);
    DetectorBenchmark.Case cs = DetectorBenchmark.caseOf(ci);
    System.out.println(cs);
    RenderedCase c = cs.render();
    Raster full = Raster.of(c.frame(), FlowRegion.of(c.mask()));
    boolean shadow = cs.optics() == dev.wavemark.core.model.Optics.SHADOWGRAPH;
    for (ExpectedWave t : c.truth()) {
      if (t.kind() != WaveKind.EXPANSION_HEAD && t.kind() != WaveKind.EXPANSION_TAIL) continue;
      // the partner boundary: same feature and side, the other kind
      ExpectedWave o = c.truth().stream().filter(x -> x.feature() == t.feature() && x.side() == t.side() && x != t
          && (x.kind() == WaveKind.EXPANSION_HEAD || x.kind() == WaveKind.EXPANSION_TAIL)).findFirst().orElseThrow();
      Point2 u = ImageAngles.unit(t.directionRad());
      Point2 uo = ImageAngles.unit(o.directionRad());
      double nx = -u.y(), ny = u.x();
      int fanSide = nx * uo.x() + ny * uo.y() >= 0 ? 1 : -1;
      double len = t.startPx().distanceTo(t.endPx());
      System.out.printf("%s %s fanSide %d len %.0f%n", t.kind(), t.label(), fanSide, len);
      double half = 8;
      int m = 33;
      for (double s0 : new double[] {40, 60, 100, 150, 200, 300}) {
        if (s0 + 20 > len) break;
        double[] mean = new double[m];
        int n = 0;
        for (double s = s0 - 10; s < s0 + 10; s += 1) {
          double[] p = new double[m];
          if (full.sampleLine(t.startPx().x() + s * u.x(), t.startPx().y() + s * u.y(), nx, ny, 0.5, half, m, p)) {
            for (int j = 0; j < m; j++) mean[j] += p[j];
            n++;
          }
        }
        if (n == 0) continue;
        for (int j = 0; j < m; j++) mean[j] /= n;
        String loc;
        if (shadow) {
          double[] q = Profiles.detrend(mean, 3);
          Profiles.Located a = Profiles.peak(q, 1, m / 6, m - 1 - m / 6);
          Profiles.Located b = Profiles.peak(q, -1, m / 6, m - 1 - m / 6);
          Profiles.Located l = a != null && (b == null || a.amplitude() > b.amplitude()) ? a : b;
          double area = Profiles.area(q) * 0.5;
          loc = String.format("peak off %+.3f px  area %+.3f px  off/area %+.2f  fanLvl %+.4f", (l.centre() - 16) * 0.5, area,
              (l.centre() - 16) * 0.5 / area, mean[m - 1 - (fanSide > 0 ? 0 : m - 1)] - mean[fanSide > 0 ? 0 : m - 1]);
        } else {
          int sg = Measure.dominantSign(mean, Signature.STEP);
          Profiles.Located l = Profiles.step(mean, sg, m / 6, m - 1 - m / 6, 8);
          Profiles.Kink k = Profiles.kinkFit(mean, sg, fanSide, m / 6, m - 1 - m / 6, 8);
          double bias = k == null ? Double.NaN : Profiles.stepKinkBias(m, sg, fanSide, l.centre(), k.blur(), k.slope(), m / 6, m - 1 - m / 6, 8);
          loc = String.format("step off %+.3f px kink x0 %+.3f blur %.2f slope*s %+.2f  predicted bias %+.3f px", (l.centre() - 16) * 0.5,
              k == null ? Double.NaN : (k.centre() - 16) * 0.5, k == null ? Double.NaN : k.blur() * 0.5, k == null ? Double.NaN : k.slope() * 2 * s0, bias * 0.5);
        }
        StringBuilder sb = new StringBuilder();
        for (double v : mean) sb.append(String.format(" %.4f", v));
        System.out.printf("  s %5.0f  %s%n", s0, loc);
        if (args.length > 1) System.out.println("     " + sb);
      }
    }
  }
}
