package dev.wavemark.imaging.detect;

import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.BodyShape;
import dev.wavemark.core.model.Optics;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

@Tag("slow")
class DebugLookTest {
  @Test
  void shadow() {
    var shape = new BodyShape.Wedge(Math.toRadians(10), 0, new Point2(200.4, 384.3), 300);
    RenderedCase c = RenderedCase.of("wedge", shape, 2.0, Optics.SHADOWGRAPH, 1, 1.2, 1e9, 0, 1024, 768, 5);
    // profile across the upper shock at x = 500 (y = 384.3 - 300 tan 39.31 = 138.7)
    for (int x : new int[] {250, 260, 270, 280, 290, 300, 400, 410, 420, 430, 440, 450, 500}) {
      double yt = 384.3 - (x - 200.4) * Math.tan(Math.toRadians(39.3139));
      StringBuilder sb = new StringBuilder("x " + x + " yt " + String.format("%.1f", yt) + ":");
      double[] p = new double[37]; for (int j = 0; j < 37; j++) p[j] = c.frame().get(x, (int) Math.round(yt) - 9 + j / 2) * (j % 2 == 0 ? 1 : 1);
      double[] q = new double[19]; for (int j = 0; j < 19; j++) q[j] = c.frame().get(x, (int) Math.round(yt) - 9 + j);
      Profiles.Located l = Profiles.zeroCrossing(q, 0, 18, 18);
      sb.append(" crossing-yt " + String.format("%.2f", (Math.round(yt) - 9 + l.centre()) - yt));
      System.out.println(sb);
    }
    Raster full = Raster.of(c.frame(), FlowRegion.of(c.mask())).eroded(3);
    Raster low = full.reduced(2);
    AngularScan s = AngularScan.of(low, 200.4, 384.3, Math.toRadians(30), Math.toRadians(50), 12, 1200);
    for (int i = 0; i < 0; i += 2) System.out.printf("%.2f %.5f%n", Math.toDegrees(s.angle(i)), s.mean[i]);
    System.out.println("noise " + s.noise());
  }
}
