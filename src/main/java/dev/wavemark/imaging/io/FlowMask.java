package dev.wavemark.imaging.io;

import boofcv.alg.filter.binary.BinaryImageOps;
import boofcv.alg.filter.blur.GBlurImageOps;
import boofcv.struct.ConnectRule;
import boofcv.struct.image.GrayF32;
import boofcv.struct.image.GrayS32;
import boofcv.struct.image.GrayU8;
import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.BodyShape;
import dev.wavemark.core.model.Calibration;
import dev.wavemark.core.model.RunSpec;
import dev.wavemark.core.model.WavePattern;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;
import java.util.List;
import java.util.Optional;

/**
 * The flow region of a picture: the pixels where waves can be seen. It is the test-section
 * window (from the calibration, or, where absent, every bright region of a sample picture),
 * less the model and walls (their outline from the run file's geometry, the same polygons the
 * renderer paints, and any dark silhouette in the sample), eroded by a margin so that the
 * bright-dark rims of window and model never pass for waves.
 *
 * <p>"Dark" means below {@value #DARK_FRACTION} of the sample's 95th-percentile brightness after
 * a Gaussian blur of {@value #BLUR_SIGMA_PX} px: the blur dilutes a thin dark wave band (a
 * knife-edge cut-off shock a few pixels wide keeps most of its brightness) while the silhouettes
 * and the surround, tens of pixels across, stay dark.
 *
 * <p>Immutable and thread-safe once built; {@link #pixels()} is shared, do not modify it.
 */
public final class FlowMask {
  static final double DARK_FRACTION = 0.3;
  static final double BLUR_SIGMA_PX = 8.0;
  /** Bright regions smaller than this fraction of the picture are specks, not flow. */
  static final double MIN_REGION_FRACTION = 0.01;
  /** Default margin, pixels: wider than the blur of a window rim or a model edge in a typical bench picture. */
  public static final int DEFAULT_MARGIN_PX = 3;

  private final GrayU8 mask;
  private final int count;

  private FlowMask(GrayU8 mask) {
    this.mask = mask;
    int c = 0;
    for (byte b : mask.data) {
      c += b != 0 ? 1 : 0;
    }
    this.count = c;
  }

  /**
   * The mask for one run: its calibration's window, its model's outline, and a sample picture
   * (the no-flow reference if there is one, else the first frame) for what the geometry does not give.
   */
  public static FlowMask forRun(RunSpec run, int width, int height, Optional<GrayF32> sample) {
    double machHint = run.tunnel().nominalMach().orElse(5.0);
    List<List<Point2>> solids = modelOutline(run.model(), machHint, run.gas().gamma(), run.calibration().flowDirectionRad(), width, height);
    return build(width, height, run.calibration().window(), solids, sample, DEFAULT_MARGIN_PX);
  }

  /**
   * The model's and walls' outline polygons (image px) from {@link WavePattern#solve}; empty when the
   * geometry gives none (or the pattern cannot be solved at {@code machHint}, for example a
   * detached shock: the outline does not depend on the Mach number, the wave pattern does).
   */
  public static List<List<Point2>> modelOutline(BodyShape shape, double machHint, double gamma, double flowDirectionRad,
      int width, int height) {
    try {
      return WavePattern.solve(shape, machHint, gamma, flowDirectionRad, width, height).solids();
    } catch (WavemarkException e) {
      return List.of();
    }
  }

  /**
   * Builds a mask.
   *
   * @param window the window, if the calibration knows it
   * @param solids polygons (image px) to exclude
   * @param sample a picture whose dark parts are excluded, if any
   * @param marginPx erosion of the result, pixels (0 for none)
   * @throws WavemarkException {@link Problem#MASK_OUTSIDE} when the window covers no pixel of the
   *     picture, or nothing of the picture is left for the flow
   */
  public static FlowMask build(int width, int height, Optional<Calibration.Window> window, List<List<Point2>> solids,
      Optional<GrayF32> sample, int marginPx) {
    GrayU8 m = new GrayU8(width, height);
    String size = width + "x" + height;
    if (window.isPresent()) {
      Calibration.Window w = window.get();
      int n = 0;
      for (int y = 0; y < height; y++) {
        for (int x = 0; x < width; x++) {
          if (w.contains(x, y)) {
            m.unsafe_set(x, y, 1);
            n++;
          }
        }
      }
      if (n == 0) {
        throw new WavemarkException(Problem.MASK_OUTSIDE, "calibration window", describe(w), size);
      }
    } else {
      java.util.Arrays.fill(m.data, (byte) 1);
    }
    for (List<Point2> poly : solids) {
      clear(m, poly);
    }
    if (sample.isPresent()) {
      GrayF32 s = sample.get();
      if (s.width != width || s.height != height) {
        throw new WavemarkException(Problem.FRAME_SIZE_MISMATCH, "mask sample picture", s.width + "x" + s.height, size);
      }
      keepBright(m, s);
    }
    if (marginPx > 0) {
      m = BinaryImageOps.erode8(m, marginPx, null);
    }
    FlowMask mask = new FlowMask(m);
    if (mask.count == 0) {
      throw new WavemarkException(Problem.MASK_OUTSIDE, "flow region",
          "the window less the model silhouette and the dark parts", size);
    }
    return mask;
  }

  /** Every pixel of the picture. */
  public static FlowMask all(int width, int height) {
    GrayU8 m = new GrayU8(width, height);
    java.util.Arrays.fill(m.data, (byte) 1);
    return new FlowMask(m);
  }

  public boolean inside(int x, int y) {
    return x >= 0 && y >= 0 && x < mask.width && y < mask.height && mask.unsafe_get(x, y) != 0;
  }

  /** 1 inside the flow region, 0 outside. Shared: do not modify. */
  public GrayU8 pixels() {
    return mask;
  }

  /** Number of pixels inside. */
  public int count() {
    return count;
  }

  public int width() {
    return mask.width;
  }

  public int height() {
    return mask.height;
  }

  private static void clear(GrayU8 m, List<Point2> poly) {
    if (poly.size() < 3) {
      return;
    }
    Path2D.Double path = new Path2D.Double();
    path.moveTo(poly.get(0).x(), poly.get(0).y());
    for (int i = 1; i < poly.size(); i++) {
      path.lineTo(poly.get(i).x(), poly.get(i).y());
    }
    path.closePath();
    Rectangle2D b = path.getBounds2D();
    int x0 = Math.max(0, (int) Math.floor(b.getMinX()));
    int x1 = Math.min(m.width - 1, (int) Math.ceil(b.getMaxX()));
    int y0 = Math.max(0, (int) Math.floor(b.getMinY()));
    int y1 = Math.min(m.height - 1, (int) Math.ceil(b.getMaxY()));
    for (int y = y0; y <= y1; y++) {
      for (int x = x0; x <= x1; x++) {
        if (path.contains(x, y)) {
          m.unsafe_set(x, y, 0);
        }
      }
    }
  }

  private static void keepBright(GrayU8 m, GrayF32 sample) {
    GrayF32 blurred = GBlurImageOps.gaussian(sample, null, BLUR_SIGMA_PX, -1, null);
    double bright = Robust.quantile(blurred, null, 0.95);
    double threshold = DARK_FRACTION * bright;
    GrayU8 lit = new GrayU8(m.width, m.height);
    for (int i = 0; i < lit.data.length; i++) {
      lit.data[i] = (byte) (blurred.data[i] > threshold ? 1 : 0);
    }
    // keep only bright regions of some size: specks of glare outside the window are not flow
    GrayS32 labels = new GrayS32(m.width, m.height);
    int regions = BinaryImageOps.contour(lit, ConnectRule.EIGHT, labels).size();
    int[] area = new int[regions + 1];
    for (int v : labels.data) {
      area[v]++;
    }
    int minArea = (int) (MIN_REGION_FRACTION * m.width * m.height);
    for (int i = 0; i < m.data.length; i++) {
      int label = labels.data[i];
      if (label == 0 || area[label] < minArea) {
        m.data[i] = 0;
      }
    }
  }

  private static String describe(Calibration.Window w) {
    if (w instanceof Calibration.Window.Circle c) {
      return "circle centred (" + WavemarkException.num(c.centerXPx()) + ", " + WavemarkException.num(c.centerYPx())
          + ") px of radius " + WavemarkException.num(c.radiusPx()) + " px";
    }
    Calibration.Window.Rectangle r = (Calibration.Window.Rectangle) w;
    return "rectangle centred (" + WavemarkException.num(r.centerXPx()) + ", " + WavemarkException.num(r.centerYPx())
        + ") px of " + WavemarkException.num(r.widthPx()) + "x" + WavemarkException.num(r.heightPx()) + " px";
  }
}
