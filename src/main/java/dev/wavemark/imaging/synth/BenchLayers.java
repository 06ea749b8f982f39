package dev.wavemark.imaging.synth;

import boofcv.alg.distort.LensDistortionNarrowFOV;
import boofcv.factory.distort.LensDistortionFactory;
import boofcv.struct.calib.CameraPinholeBrown;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.Calibration;
import georegression.struct.point.Point2D_F64;
import java.util.List;
import java.util.SplittableRandom;
import boofcv.struct.distort.Point2Transform2_F64;
import org.jspecify.annotations.Nullable;

/**
 * The parts of a picture that belong to the bench rather than the flow, computed once per bench
 * and reused for every frame of a sequence and for the no-flow reference: the transmission of
 * the illumination, window, dust and model silhouette in the ideal image, and the lens map.
 */
final class BenchLayers {
  /** Transmission of the model's silhouette: a little stray light reaches it. */
  static final double SILHOUETTE = 0.03;

  final int width;
  final int height;
  /** Illumination times window times dust, in the ideal image. */
  final float[] light;
  /** For each sensor pixel, where it looks in the ideal image (null: no lens). */
  final float @Nullable [] mapX;
  final float @Nullable [] mapY;

  /**
   * Weak density texture of the bench (window striae, the tunnel's residual turbulence) as a
   * density-gradient field in the raster's units, added to every flow frame.
   */
  final float[] textureGx;
  final float[] textureGy;

  private @Nullable List<List<Point2>> cachedSolids;
  private float @Nullable [] cachedSilhouette;

  BenchLayers(Bench bench, int width, int height, long benchSeed) {
    this.width = width;
    this.height = height;
    this.light = new float[width * height];
    SplittableRandom rnd = new SplittableRandom(benchSeed);
    illumination(bench, rnd);
    bench.window().ifPresent(this::window);
    dust(bench.dustSpecks(), rnd);
    textureGx = new float[width * height];
    textureGy = new float[width * height];
    if (bench.falloff() > 0 || bench.tilt() != 0) {
      texture(rnd, 4.0e-3);
    }
    if (bench.lens().isPresent()) {
      mapX = new float[width * height];
      mapY = new float[width * height];
      lensMap(bench.lens().get());
    } else {
      mapX = null;
      mapY = null;
    }
  }

  /** A smooth, slightly uneven field: quadratic fall-off, a tilt and faint low-frequency mottling of the source. */
  private void illumination(Bench b, SplittableRandom rnd) {
    double cx = 0.5 * (width - 1);
    double cy = 0.5 * (height - 1);
    double r2max = cx * cx + cy * cy;
    double tiltAngle = rnd.nextDouble() * 2 * Math.PI;
    double tx = Math.cos(tiltAngle) * b.tilt() / Math.sqrt(r2max);
    double ty = Math.sin(tiltAngle) * b.tilt() / Math.sqrt(r2max);
    int waves = 3;
    double[] kx = new double[waves];
    double[] ky = new double[waves];
    double[] ph = new double[waves];
    for (int i = 0; i < waves; i++) {
      double a = rnd.nextDouble() * 2 * Math.PI;
      double k = 2 * Math.PI * (0.6 + 1.8 * rnd.nextDouble()) / Math.max(width, height);
      kx[i] = k * Math.cos(a);
      ky[i] = k * Math.sin(a);
      ph[i] = rnd.nextDouble() * 2 * Math.PI;
    }
    double mottle = b.falloff() > 0 ? 0.012 : 0;
    for (int y = 0; y < height; y++) {
      for (int x = 0; x < width; x++) {
        double dx = x - cx;
        double dy = y - cy;
        double v = 1 - b.falloff() * (dx * dx + dy * dy) / r2max + tx * dx + ty * dy;
        for (int i = 0; i < waves; i++) {
          v += mottle * Math.cos(kx[i] * x + ky[i] * y + ph[i]);
        }
        light[y * width + x] = (float) Math.max(0, v);
      }
    }
  }

  /**
   * Band-limited random density (blobs of 10 to 40 px), amplitude {@code rms} in rho/rho_inf:
   * coarse Gaussian noise, bilinearly enlarged and smoothed, then differentiated.
   */
  private void texture(SplittableRandom rnd, double rms) {
    int step = 12;
    int cw = width / step + 3;
    int ch = height / step + 3;
    float[] coarse = new float[cw * ch];
    for (int i = 0; i < coarse.length; i++) {
      coarse[i] = (float) (rms * rnd.nextGaussian());
    }
    boofcv.struct.image.GrayF32 fine = new boofcv.struct.image.GrayF32(width, height);
    for (int y = 0; y < height; y++) {
      for (int x = 0; x < width; x++) {
        fine.data[y * width + x] = (float) OpticalTransfer.bilinear(coarse, cw, ch, x / (double) step + 1, y / (double) step + 1, 0f);
      }
    }
    boofcv.struct.image.GrayF32 sm = new boofcv.struct.image.GrayF32(width, height);
    boofcv.alg.filter.blur.GBlurImageOps.gaussian(fine, sm, step * 0.6, -1, null);
    for (int y = 1; y < height - 1; y++) {
      for (int x = 1; x < width - 1; x++) {
        int i = y * width + x;
        textureGx[i] = 0.5f * (sm.data[i + 1] - sm.data[i - 1]);
        textureGy[i] = 0.5f * (sm.data[i + width] - sm.data[i - width]);
      }
    }
  }

  /** Dark outside the window, with a soft rim two pixels wide. */
  private void window(Calibration.Window w) {
    for (int y = 0; y < height; y++) {
      for (int x = 0; x < width; x++) {
        double inside;
        if (w instanceof Calibration.Window.Circle c) {
          inside = c.radiusPx() - Math.hypot(x - c.centerXPx(), y - c.centerYPx());
        } else {
          Calibration.Window.Rectangle r = (Calibration.Window.Rectangle) w;
          inside = Math.min(0.5 * r.widthPx() - Math.abs(x - r.centerXPx()), 0.5 * r.heightPx() - Math.abs(y - r.centerYPx()));
        }
        double t = Math.max(0, Math.min(1, 0.5 + inside / 2.0));
        light[y * width + x] *= (float) t;
      }
    }
  }

  /** Out-of-focus dust on the windows: soft dark discs of a few pixels. */
  private void dust(int n, SplittableRandom rnd) {
    for (int i = 0; i < n; i++) {
      double x0 = rnd.nextDouble() * width;
      double y0 = rnd.nextDouble() * height;
      double s = 1.0 + 3.0 * rnd.nextDouble();
      double depth = 0.12 + 0.4 * rnd.nextDouble();
      int r = (int) Math.ceil(3 * s);
      for (int y = Math.max(0, (int) y0 - r); y <= Math.min(height - 1, (int) y0 + r); y++) {
        for (int x = Math.max(0, (int) x0 - r); x <= Math.min(width - 1, (int) x0 + r); x++) {
          double d2 = ((x - x0) * (x - x0) + (y - y0) * (y - y0)) / (2 * s * s);
          light[y * width + x] *= (float) (1 - depth * Math.exp(-d2));
        }
      }
    }
  }

  /** Sensor pixel to ideal-image pixel through the Brown model (BoofCV's convention). */
  private void lensMap(Calibration.Lens lens) {
    double[] t = lens.tangential();
    CameraPinholeBrown cam = new CameraPinholeBrown(lens.radial().length)
        .fsetK(lens.fx(), lens.fy(), 0, lens.cx(), lens.cy(), width, height)
        .fsetRadial(lens.radial()).fsetTangential(t[0], t[1]);
    LensDistortionNarrowFOV model = LensDistortionFactory.narrow(cam);
    Point2Transform2_F64 undistort = model.undistort_F64(true, true);
    Point2D_F64 out = new Point2D_F64();
    for (int y = 0; y < height; y++) {
      for (int x = 0; x < width; x++) {
        undistort.compute(x, y, out);
        mapX[y * width + x] = (float) out.x;
        mapY[y * width + x] = (float) out.y;
      }
    }
  }

  /** Ideal (undistorted) pixel to sensor pixel, for placing model features in a run file. */
  static Point2 distort(Calibration.Lens lens, int width, int height, Point2 ideal) {
    double[] t = lens.tangential();
    CameraPinholeBrown cam = new CameraPinholeBrown(lens.radial().length)
        .fsetK(lens.fx(), lens.fy(), 0, lens.cx(), lens.cy(), width, height)
        .fsetRadial(lens.radial()).fsetTangential(t[0], t[1]);
    Point2D_F64 out = new Point2D_F64();
    LensDistortionFactory.narrow(cam).distort_F64(true, true).compute(ideal.x(), ideal.y(), out);
    return new Point2(out.x, out.y);
  }

  /** The model's silhouette transmission (1 clear, SILHOUETTE inside), antialiased; cached per outline. */
  float[] silhouette(List<List<Point2>> solids) {
    if (cachedSilhouette != null && solids.equals(cachedSolids)) {
      return cachedSilhouette;
    }
    float[] t = new float[width * height];
    java.util.Arrays.fill(t, 1f);
    for (List<Point2> poly : solids) {
      Polygons.paint(poly, t, width, height, SILHOUETTE);
    }
    cachedSolids = List.copyOf(solids);
    cachedSilhouette = t;
    return t;
  }
}
