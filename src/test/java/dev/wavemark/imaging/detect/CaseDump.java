package dev.wavemark.imaging.detect;

import dev.wavemark.core.model.ExpectedWave;
import dev.wavemark.core.model.ObservedWave;
import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.io.File;
import java.util.List;
import javax.imageio.ImageIO;

/**
 * A look at one picture of the accuracy table (a tool, not a test): renders case {@code i} of
 * {@link DetectorBenchmark#caseOf} to {@code dir/case-i.png} (frame scaled to its 1st-99th
 * percentile), the same with the truth (green) and the detected lines (red) drawn over it, and
 * prints the detected waves and each primary search's pencil profile.
 * Run: {@code java -cp target/classes:target/test-classes:$(deps) dev.wavemark.imaging.detect.CaseDump i dir}.
 */
final class CaseDump {
  private CaseDump() {}

  public static void main(String[] args) throws Exception {
    int i = Integer.parseInt(args[0]);
    File dir = new File(args.length > 1 ? args[1] : "/tmp");
    boolean profiles = args.length > 2;
    DetectorBenchmark.Case cs = DetectorBenchmark.caseOf(i);
    System.out.println(cs);
    RenderedCase c = cs.render();
    float[] d = c.frame().data.clone();
    float[] sorted = d.clone();
    java.util.Arrays.sort(sorted);
    double lo = sorted[(int) (0.01 * sorted.length)];
    double hi = sorted[(int) (0.99 * sorted.length)];
    int w = c.frame().width;
    int h = c.frame().height;
    BufferedImage img = new BufferedImage(w, h, BufferedImage.TYPE_INT_RGB);
    for (int y = 0; y < h; y++) {
      for (int x = 0; x < w; x++) {
        int v = (int) Math.max(0, Math.min(255, 255 * (d[y * w + x] - lo) / Math.max(hi - lo, 1e-9)));
        if (c.mask().get(x, y) == 0) {
          v = 0;
        }
        img.setRGB(x, y, v << 16 | v << 8 | v);
      }
    }
    ImageIO.write(img, "png", new File(dir, "case-" + i + ".png"));
    List<ObservedWave> found;
    try {
      found = WaveDetector.create().detect(DetectionRequest.of(c.frame(), FlowRegion.of(c.mask()), cs.optics(), cs.shape(), cs.roll()));
    } catch (RuntimeException e) {
      System.out.println("detect failed: " + e.getMessage());
      found = List.of();
    }
    Graphics2D g = img.createGraphics();
    g.setStroke(new BasicStroke(1f));
    for (ExpectedWave t : c.truth()) {
      System.out.println("truth " + t.kind() + " " + t.label() + " " + DetectorBenchmark.fmtTruth(t));
      g.setColor(Color.GREEN);
      g.drawLine((int) t.startPx().x(), (int) t.startPx().y(), (int) t.endPx().x(), (int) t.endPx().y());
    }
    for (ObservedWave o : found) {
      System.out.println("found " + o.kind() + " " + DetectorBenchmark.fmtLine(o) + " sigma "
          + String.format("%.4f deg", Math.toDegrees(o.line().directionUncertaintyRad())));
      g.setColor(Color.RED);
      g.drawLine((int) o.line().startPx().x(), (int) o.line().startPx().y(), (int) o.line().endPx().x(),
          (int) o.line().endPx().y());
    }
    g.dispose();
    ImageIO.write(img, "png", new File(dir, "case-" + i + "-lines.png"));
    if (profiles) {
      Raster full = Raster.of(c.frame(), FlowRegion.of(c.mask())).eroded(WaveDetector.EDGE_MARGIN_PX);
      Raster low = full.reduced(2);
      for (Search s : Search.primary(cs.shape(), cs.roll())) {
        AngularScan scan = AngularScan.of(low, s.origin().x(), s.origin().y(), s.a0(), s.a1(), WaveDetector.ORIGIN_SKIP_PX,
            Math.hypot(w, h));
        System.out.printf("pencil %s %s fan=%b from (%.1f, %.1f), %.2f..%.2f deg, step %.3f deg, noise %.3g%n", s.feature(),
            s.side(), s.fan(), s.origin().x(), s.origin().y(), Math.toDegrees(s.a0()), Math.toDegrees(s.a1()),
            Math.toDegrees(scan.step), scan.noise());
        StringBuilder sb = new StringBuilder();
        for (int k = 0; k < scan.profile.length; k++) {
          sb.append(String.format("%.2f:%.3g/%.0f ", Math.toDegrees(scan.angle(k)), scan.profile[k] / scan.noise(), scan.reach[k]));
        }
        System.out.println(sb);
      }
    }
  }
}
