package dev.wavemark.imaging.detect;

import boofcv.struct.image.GrayF32;
import boofcv.struct.image.GrayU16;
import boofcv.struct.image.GrayU8;
import dev.wavemark.core.model.BodyShape;
import dev.wavemark.core.model.ExpectedWave;
import dev.wavemark.core.model.Optics;
import dev.wavemark.imaging.synth.Bench;
import dev.wavemark.imaging.synth.Renderer;
import java.util.List;
import java.util.Optional;
import java.util.Random;

/**
 * One picture from the project renderer with its truth, normalised the way the detector expects
 * (frame over no-flow reference, minus one) and masked where the reference is dark (window,
 * silhouette). Noise is added to the normalised frame so that the signal-to-noise ratio across
 * the strongest shock is exactly the one asked for (the bench itself is rendered noiseless).
 */
record RenderedCase(String name, GrayF32 frame, GrayU8 mask, Optics optics, BodyShape shape, double flowRad,
    List<ExpectedWave> truth, double noiseSigma, GrayF32 clean) {

  static RenderedCase of(String name, BodyShape shape, double mach, Optics optics, int edgeSign, double blurPx,
      double snr, double rollRad, int w, int h, long seed) {
    Bench base = Bench.defaults(optics).withOptics(optics, edgeSign);
    Bench b = new Bench(base.optics(), base.edgeSign(), base.cutFraction(), base.focalLengthM(), base.sourceImageM(),
        base.screenDistanceM(), base.spanM(), base.gladstoneDale(), base.freestreamDensityKgM3(), base.metersPerPixel(),
        base.shockThicknessPx(), blurPx, 0, 16, 1e12, 0, base.exposure(), 0.1, 0.03, Optional.empty(), Optional.empty(), 0);
    Renderer r = Renderer.of(b, shape, w, h, seed);
    Renderer.Condition c = new Renderer.Condition(mach, 1.4, rollRad, 0);
    Renderer.Frame f = r.render(c, seed);
    GrayU16 ref = r.reference(c, seed);
    GrayF32 norm = new GrayF32(w, h);
    GrayU8 mask = new GrayU8(w, h);
    double refMax = 0;
    for (int i = 0; i < ref.data.length; i++) {
      refMax = Math.max(refMax, ref.data[i] & 0xffff);
    }
    double maxAbs = 0;
    for (int i = 0; i < w * h; i++) {
      double rv = ref.data[i] & 0xffff;
      double fv = f.image().data[i] & 0xffff;
      boolean flow = rv > 0.25 * refMax;
      mask.data[i] = (byte) (flow ? 1 : 0);
      norm.data[i] = flow ? (float) (fv / rv - 1) : 0f;
      if (flow) {
        maxAbs = Math.max(maxAbs, Math.abs(norm.data[i]));
      }
    }
    double sigma = Double.isInfinite(snr) ? 0 : shockAmplitude(norm, mask, f.pattern().expectedWaves(), maxAbs) / snr;
    GrayF32 clean = norm.clone();
    Random rnd = new Random(seed * 31 + 7);
    for (int i = 0; i < w * h; i++) {
      if (mask.data[i] != 0) {
        norm.data[i] += (float) (sigma * rnd.nextGaussian());
      }
    }
    return new RenderedCase(name, norm, mask, optics, shape, rollRad, f.pattern().expectedWaves(), sigma, clean);
  }

  /**
   * A truth wave's own signal-to-noise ratio per pixel: the median, along the wave, of the largest
   * |clean frame| within 4 px across it, over the noise deviation (infinite on a clean picture).
   * The picture's SNR is defined across its strongest shock; this is the same for one wave.
   */
  double ownSnr(ExpectedWave e) {
    return noiseSigma > 0 ? lineSignal(clean, mask, e, 1) / noiseSigma : Double.POSITIVE_INFINITY;
  }

  /**
   * The median along a truth line (15 px clear of its start) of the largest |frame| within 4 px
   * across it; 0 with fewer than {@code minSamples} samples (every 2 px).
   */
  private static double lineSignal(GrayF32 norm, GrayU8 mask, ExpectedWave e, int minSamples) {
    double len = e.startPx().distanceTo(e.endPx());
    java.util.List<Double> v = new java.util.ArrayList<>();
    double nx = -(e.endPx().y() - e.startPx().y()) / len;
    double ny = (e.endPx().x() - e.startPx().x()) / len;
    for (double s = 15; s < len - 5; s += 2) {
      double x = e.startPx().x() + (e.endPx().x() - e.startPx().x()) * s / len;
      double y = e.startPx().y() + (e.endPx().y() - e.startPx().y()) * s / len;
      double m = 0;
      for (double o = -4; o <= 4; o += 0.5) {
        int ix = (int) Math.round(x + o * nx);
        int iy = (int) Math.round(y + o * ny);
        if (ix >= 0 && iy >= 0 && ix < norm.width && iy < norm.height && mask.get(ix, iy) != 0) {
          m = Math.max(m, Math.abs(norm.get(ix, iy)));
        }
      }
      v.add(m);
    }
    if (v.size() < minSamples) {
      return 0;
    }
    java.util.Collections.sort(v);
    return v.get(v.size() / 2);
  }

  /**
   * The signal across the strongest shock: the 95th percentile of |frame| sampled on the truth
   * shock lines (so that the SNR is defined across a shock, as the benchmark asks); in a picture
   * of Mach waves only (no model), the same across the Mach waves; otherwise falls back to a
   * tenth of the frame's largest excursion.
   */
  private static double shockAmplitude(GrayF32 norm, GrayU8 mask, List<ExpectedWave> truth, double maxAbs) {
    boolean anyShock = truth.stream().anyMatch(e -> e.kind().isShock());
    double best = 0;
    for (ExpectedWave e : truth) {
      if (anyShock ? !e.kind().isShock() : e.kind() != dev.wavemark.core.model.WaveKind.MACH_WAVE) {
        continue;
      }
      best = Math.max(best, lineSignal(norm, mask, e, 11));
    }
    return best > 0 ? best : 0.1 * maxAbs;
  }
}
