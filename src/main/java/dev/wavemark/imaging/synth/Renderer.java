package dev.wavemark.imaging.synth;

import boofcv.alg.filter.blur.GBlurImageOps;
import boofcv.struct.image.GrayF32;
import boofcv.struct.image.GrayU16;
import dev.wavemark.core.model.BodyShape;
import dev.wavemark.core.model.Optics;
import dev.wavemark.core.model.WavePattern;
import java.util.SplittableRandom;

/**
 * Renders schlieren and shadowgraph pictures of a model's wave pattern as an optical bench forms
 * them: the flow's density gradient from {@link WavePattern} (plane flows analytically, the cone
 * as a line-of-sight integral of its axisymmetric field), light deflection by the Gladstone-Dale
 * relation, the knife edge (or the shadowgraph's ray displacement), the bench's illumination,
 * window, dust and the model's silhouette, optical blur, the lens's distortion, and the sensor's
 * shot and read noise. One instance per bench and model; it keeps the bench's layers for a
 * sequence. Not thread-safe.
 */
public final class Renderer {
  private final Bench bench;
  private final BodyShape model;
  private final int width;
  private final int height;
  private final BenchLayers layers;

  /** The flow of one frame. */
  public record Condition(double mach, double gamma, double flowDirectionRad, double jitterPx) {}

  /** A rendered frame and the pattern it shows (the truth). */
  public record Frame(GrayU16 image, WavePattern.Solved pattern) {}

  private Renderer(Bench bench, BodyShape model, int width, int height, long benchSeed) {
    this.bench = bench;
    this.model = model;
    this.width = width;
    this.height = height;
    this.layers = new BenchLayers(bench, width, height, benchSeed);
  }

  /**
   * A renderer for {@code model} on {@code bench}, pictures of {@code width} x {@code height};
   * {@code benchSeed} fixes the bench's own randomness (dust, illumination unevenness).
   */
  public static Renderer of(Bench bench, BodyShape model, int width, int height, long benchSeed) {
    if (width < 16 || height < 16 || (long) width * height > 64_000_000L) {
      throw new dev.wavemark.core.WavemarkException(dev.wavemark.core.Problem.OUT_OF_RANGE,
          "picture size (px)", width + "x" + height, "16x16 to 64 Mpx");
    }
    return new Renderer(bench, model, width, height, benchSeed);
  }

  public Bench bench() {
    return bench;
  }

  /** Where an ideal (lens-corrected) image point appears on the sensor, through the bench's lens. */
  public dev.wavemark.core.geom.Point2 toSensor(dev.wavemark.core.geom.Point2 ideal) {
    return bench.lens().map(l -> BenchLayers.distort(l, width, height, ideal)).orElse(ideal);
  }

  /** A frame with flow; {@code seed} fixes the noise and the shock jitter. Deterministic. */
  public Frame render(Condition c, long seed) {
    WavePattern.Solved p = WavePattern.solve(model, c.mach(), c.gamma(), c.flowDirectionRad(), width, height);
    float[] ideal = idealIntensity(p, c.jitterPx(), new SplittableRandom(seed ^ 0x5DEECE66DL), true);
    return new Frame(expose(ideal, new SplittableRandom(seed)), p);
  }

  /** The no-flow reference frame of the same bench: model in place, no density gradients. */
  public GrayU16 reference(Condition c, long seed) {
    WavePattern.Solved p = WavePattern.solve(model, c.mach(), c.gamma(), c.flowDirectionRad(), width, height);
    float[] ideal = idealIntensity(p, 0, new SplittableRandom(seed), false);
    return expose(ideal, new SplittableRandom(seed));
  }

  /**
   * The noiseless picture on the sensor, as a fraction of full scale, after optics, blur and lens
   * (for tests and previews).
   */
  public GrayF32 noiseless(Condition c) {
    WavePattern.Solved p = WavePattern.solve(model, c.mach(), c.gamma(), c.flowDirectionRad(), width, height);
    float[] v = idealIntensity(p, 0, new SplittableRandom(0), true);
    GrayF32 out = new GrayF32(width, height);
    System.arraycopy(v, 0, out.data, 0, v.length);
    return out;
  }

  /** Flow, optics, bench layers, blur and lens, before the sensor. */
  private float[] idealIntensity(WavePattern.Solved p, double jitterPx, SplittableRandom rnd, boolean withFlow) {
    FlowRaster raster = new FlowRaster(width, height);
    if (withFlow) {
      for (WavePattern.Element e : p.elements()) {
        double shift = jitterPx * rnd.nextGaussian();
        if (e instanceof WavePattern.ConicalShock cone) {
          ConeRaster.paint(cone, raster, bench.shockThicknessPx(), shift, bench.spanM() / bench.metersPerPixel());
        } else if (e instanceof WavePattern.DetachedShock bow) {
          BluntRaster.paint(bow, raster, bench.shockThicknessPx(), shift);
        } else {
          raster.paint(e, bench.shockThicknessPx(), shift);
        }
      }
    }
    for (int i = 0; i < raster.gx.length; i++) {
      raster.gx[i] += layers.textureGx[i];
      raster.gy[i] += layers.textureGy[i];
    }
    float[] img = bench.optics() == Optics.SHADOWGRAPH ? OpticalTransfer.shadowgraph(bench, raster, width, height)
        : OpticalTransfer.schlieren(bench, raster);
    float[] sil = layers.silhouette(p.solids());
    for (int i = 0; i < img.length; i++) {
      img[i] *= layers.light[i] * sil[i];
    }
    double sigma = Math.hypot(bench.blurPx(), bench.defocusPx());
    if (sigma > 0.05) {
      GrayF32 a = new GrayF32(width, height);
      a.data = img;
      GrayF32 b = new GrayF32(width, height);
      GBlurImageOps.gaussian(a, b, sigma, -1, null);
      img = b.data;
    }
    if (layers.mapX != null) {
      img = OpticalTransfer.remap(img, layers.mapX, layers.mapY, width, height);
    }
    return img;
  }

  /**
   * Shot noise, read noise, black level and quantisation to the bench's bit depth (most
   * significant bits). Shot and read noise are drawn as one Gaussian of variance e + read^2 (the
   * Poisson distribution is Gaussian to within a fraction of a count at these signal levels),
   * from a seeded table of normal deviates: one random integer per pixel instead of a
   * Box-Muller pair, which halves the cost of this step.
   */
  private GrayU16 expose(float[] v, SplittableRandom rnd) {
    GrayU16 out = new GrayU16(width, height);
    double full = bench.fullWellE();
    double levels = (1 << bench.bitDepth()) - 1;
    int shift = 16 - bench.bitDepth();
    double black = 0.012 * full;
    boolean noisy = bench.readNoiseE() > 0 || full < 1e11;
    double read2 = bench.readNoiseE() * bench.readNoiseE();
    double toCounts = levels / full;
    float[] normal = NORMAL;
    for (int i = 0; i < v.length; i++) {
      double e = Math.max(0, v[i]) * full;
      if (noisy) {
        e += black + Math.sqrt(e + read2) * normal[rnd.nextInt() & (NORMAL.length - 1)];
      }
      long q = Math.round(e * toCounts);
      q = Math.max(0, Math.min((long) levels, q));
      out.data[i] = (short) (q << shift);
    }
    return out;
  }

  /** 2^16 standard normal deviates, fixed for reproducibility across runs and machines. */
  private static final float[] NORMAL = normalTable();

  private static float[] normalTable() {
    SplittableRandom r = new SplittableRandom(0x9E3779B97F4A7C15L);
    float[] t = new float[1 << 16];
    for (int i = 0; i < t.length; i++) {
      t[i] = (float) r.nextGaussian();
    }
    return t;
  }
}
