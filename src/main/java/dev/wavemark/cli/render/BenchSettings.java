package dev.wavemark.cli.render;

import dev.wavemark.core.model.Calibration;
import dev.wavemark.core.model.Optics;
import dev.wavemark.files.SceneFile;
import dev.wavemark.imaging.synth.Bench;
import org.jspecify.annotations.Nullable;

/** The scene file's bench object over the bench defaults, and back to its wire form. */
final class BenchSettings {
  private BenchSettings() {}

  static Bench bench(Optics optics, SceneFile.@Nullable BenchJson j, Calibration cal) {
    Bench d = Bench.defaults(optics);
    if (j == null) {
      j = new SceneFile.BenchJson(null, null, null, null, null, null, null, null, null, null, null, null, null, null,
          null, null, null, null, null);
    }
    return new Bench(optics, or(j.edgeSign(), d.edgeSign()), or(j.cutFraction(), d.cutFraction()),
        or(j.focalLengthM(), d.focalLengthM()), or(j.sourceImageM(), d.sourceImageM()),
        or(j.screenDistanceM(), d.screenDistanceM()), or(j.spanM(), d.spanM()), or(j.gladstoneDale(), d.gladstoneDale()),
        or(j.freestreamDensityKgM3(), d.freestreamDensityKgM3()), cal.metersPerPixel().orElse(d.metersPerPixel()),
        or(j.shockThicknessPx(), d.shockThicknessPx()), or(j.blurPx(), d.blurPx()), or(j.defocusPx(), d.defocusPx()),
        or(j.bitDepth(), d.bitDepth()), or(j.fullWellE(), d.fullWellE()), or(j.readNoiseE(), d.readNoiseE()),
        or(j.exposure(), d.exposure()), or(j.falloff(), d.falloff()), or(j.tilt(), d.tilt()), cal.window(), cal.lens(),
        or(j.dustSpecks(), d.dustSpecks()));
  }

  /** Every bench value as used, for the truth file. */
  static SceneFile.BenchJson wire(Bench b, SceneFile.@Nullable BenchJson given) {
    Long seed = given == null || given.benchSeed() == null ? 1L : given.benchSeed();
    return new SceneFile.BenchJson(b.edgeSign(), b.cutFraction(), b.focalLengthM(), b.sourceImageM(), b.screenDistanceM(),
        b.spanM(), b.gladstoneDale(), b.freestreamDensityKgM3(), b.shockThicknessPx(), b.blurPx(), b.defocusPx(),
        b.bitDepth(), b.fullWellE(), b.readNoiseE(), b.exposure(), b.falloff(), b.tilt(), b.dustSpecks(), seed);
  }

  private static double or(@Nullable Double v, double d) {
    return v == null ? d : v;
  }

  private static int or(@Nullable Integer v, int d) {
    return v == null ? d : v;
  }
}
