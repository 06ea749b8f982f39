package dev.wavemark.cli.render;

import boofcv.struct.image.GrayU16;
import dev.wavemark.cli.Main;
import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import dev.wavemark.core.gas.Gas;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.BodyShape;
import dev.wavemark.core.model.Calibration;
import dev.wavemark.core.model.ExpectedWave;
import dev.wavemark.core.model.Optics;
import dev.wavemark.core.model.WavePattern;
import dev.wavemark.files.CalibrationFile;
import dev.wavemark.files.ModelJson;
import dev.wavemark.files.RunFile;
import dev.wavemark.files.SceneFile;
import dev.wavemark.files.TruthFile;
import dev.wavemark.imaging.synth.Bench;
import dev.wavemark.imaging.synth.Renderer;
import dev.wavemark.imaging.synth.SynthImages;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.function.UnaryOperator;
import org.jspecify.annotations.Nullable;

/**
 * Renders one scene file: the picture (or sequence), the no-flow reference, the truth file and a
 * run file that {@code analyze} reads directly. Files go beside the picture:
 * {@code NAME.png|tif}, {@code NAME.tare.png|tif}, {@code NAME.truth.json}, {@code NAME.run.json}.
 */
final class SceneJob {
  private SceneJob() {}

  /** What was written. */
  record Written(Path image, @Nullable Path reference, Path truth, Path run, int frames, int waves) {}

  static Written run(Path sceneFile, Path image) {
    SceneFile s = SceneFile.read(sceneFile);
    String src = sceneFile.toString();
    int width = s.sizePx() == null ? 1024 : s.sizePx()[0];
    int height = s.sizePx() == null ? 768 : s.sizePx()[1];
    double gamma = s.gas() == null || s.gas().gamma() == null ? 1.4 : s.gas().gamma();
    Gas.check(gamma);
    BodyShape model = s.model().toDomain(src);
    Calibration cal = s.calibrationDomain(sceneFile);
    CalibrationFile calWire = s.calibrationFile(sceneFile);
    double flowDir = s.flowDirectionDeg() != null ? Math.toRadians(s.flowDirectionDeg()) : cal.flowDirectionRad();
    Optics optics = s.optics() == null ? Optics.SCHLIEREN_VERTICAL_EDGE : Optics.fromContract(s.optics());
    if (optics == null || optics == Optics.AUTO) {
      throw new WavemarkException(Problem.JSON_INVALID, src,
          "optics must be schlieren-vertical-edge, schlieren-horizontal-edge or shadowgraph, got '" + s.optics() + "'");
    }
    Bench bench;
    try {
      bench = BenchSettings.bench(optics, s.bench(), cal);
    } catch (WavemarkException e) {
      throw new WavemarkException(e, Problem.JSON_INVALID, src, "bench: " + e.getMessage());
    }
    long benchSeed = s.bench() != null && s.bench().benchSeed() != null ? s.bench().benchSeed() : 1L;
    long seed = s.seed() == null ? 1L : s.seed();
    Renderer r = Renderer.of(bench, model, width, height, benchSeed);

    String base = baseName(image);
    boolean tiff = SynthImages.isTiff(image);
    int n = s.sequence() == null ? 1 : s.sequence().frames();
    if (n > 1 && !tiff) {
      throw new WavemarkException(Problem.BAD_ARGUMENT, image + ": a sequence is written as a multi-page TIFF; use --out NAME.tif");
    }
    double mach = s.mach();
    Renderer.Condition nominal = new Renderer.Condition(mach, gamma, flowDir, 0);
    List<TruthFile.FrameJson> frames = new ArrayList<>();
    SplittableRandom run = new SplittableRandom(seed * 31 + 7);
    // a sequence goes to the file a page at a time, so that its length is bounded by the disk only
    try (SynthImages.PageWriter tiffOut = tiff ? SynthImages.openTiff(image) : null) {
      for (int i = 0; i < n; i++) {
        Renderer.Condition c = nominal;
        if (n > 1) {
          SceneFile.SequenceJson q = s.sequence();
          double m = mach + i * orZero(q.machDriftPerFrame()) + orZero(q.machJitter()) * run.nextGaussian();
          c = new Renderer.Condition(m, gamma, flowDir, orZero(q.shockJitterPx()));
        }
        long frameSeed = seed + 1000003L * i;
        Renderer.Frame f = r.render(c, frameSeed);
        if (tiffOut != null) {
          tiffOut.add(f.image());
        } else {
          SynthImages.write(f.image(), image);
        }
        frames.add(new TruthFile.FrameJson(i, c.mach(), frameSeed,
            f.pattern().expectedWaves().stream().map(w -> Math.toDegrees(w.angleToFlowRad())).toList()));
      }
      if (tiffOut != null) {
        tiffOut.commit();
      }
    }
    Path dir = image.toAbsolutePath().getParent();
    Path refPath = null;
    if (s.reference() == null || s.reference()) {
      refPath = dir.resolve(base + ".tare" + (tiff ? ".tif" : ".png"));
      SynthImages.write(r.reference(nominal, seed + 77), refPath);
    }
    WavePattern.Solved truth = WavePattern.solve(model, mach, gamma, flowDir, width, height);
    UnaryOperator<Point2> toSensor = r::toSensor;
    Path truthPath = dir.resolve(base + ".truth.json");
    truthFile(s, image, refPath, width, height, gamma, mach, flowDir, optics, bench, seed, calWire, truth, frames, toSensor)
        .write(truthPath);
    Path runPath = dir.resolve(base + ".run.json");
    runFile(s, sceneFile, image, refPath, calWire, optics, toSensor).write(runPath);
    return new Written(image, refPath, truthPath, runPath, n, truth.expectedWaves().size());
  }

  private static double orZero(@Nullable Double d) {
    return d == null ? 0 : d;
  }

  static String baseName(Path image) {
    String n = image.getFileName().toString();
    int dot = n.lastIndexOf('.');
    return dot > 0 ? n.substring(0, dot) : n;
  }

  private static TruthFile truthFile(SceneFile s, Path image, @Nullable Path ref, int w, int h, double gamma, double mach,
      double flowDir, Optics optics, Bench bench, long seed, @Nullable CalibrationFile cal, WavePattern.Solved p,
      List<TruthFile.FrameJson> frames, UnaryOperator<Point2> toSensor) {
    List<TruthFile.WaveJson> waves = new ArrayList<>();
    for (WavePattern.Element e : p.elements()) {
      for (ExpectedWave x : e.waves()) {
        double[] st = states(e, x);
        waves.add(TruthFile.WaveJson.of(x, st[0], st[1], st[2], st[3], toSensor));
      }
    }
    List<String> notes = new ArrayList<>(p.notes());
    notes.add("startPx/endPx are in the ideal (lens-corrected) image; *SensorPx are as photographed; "
        + "angles are the acute angle to the local upstream flow (for an expansion tail: to the flow behind the fan)");
    TruthFile.NoiseJson noise = new TruthFile.NoiseJson(bench.bitDepth(),
        bench.bitDepth() == 16 ? "16-bit samples" : bench.bitDepth() + " significant bits in the high bits of 16-bit samples",
        bench.fullWellE(), bench.readNoiseE(), "shot (Gaussian approximation of Poisson) plus read noise, 1.2 % black level", seed);
    return new TruthFile(s.label(), "wavemark " + Main.version(), image.getFileName().toString(),
        ref == null ? null : ref.getFileName().toString(), new int[] {w, h}, gamma, mach, Math.toDegrees(flowDir),
        s.model(), optics.contractName(), BenchSettings.wire(bench, s.bench()), noise, cal, p.reflection(), waves, frames, notes);
  }

  /** Mach and density (over freestream) upstream and downstream of a wave. */
  private static double[] states(WavePattern.Element e, ExpectedWave x) {
    if (e instanceof WavePattern.Shock s) {
      return new double[] {s.before().mach(), s.after().mach(), s.before().density(), s.after().density()};
    }
    if (e instanceof WavePattern.Fan f) {
      return new double[] {f.before().mach(), f.after().mach(), f.before().density(), f.after().density()};
    }
    if (e instanceof WavePattern.Slip sl) {
      return new double[] {sl.left().mach(), sl.right().mach(), sl.left().density(), sl.right().density()};
    }
    if (e instanceof WavePattern.DetachedShock b) {
      return new double[] {b.before().mach(), dev.wavemark.core.gas.NormalShock.m2(b.before().mach(), b.shape().gamma()),
          b.before().density(), b.before().density() * b.shape().densityBehind(0)};
    }
    WavePattern.ConicalShock c = (WavePattern.ConicalShock) e;
    double behind = c.field().density(c.field().shockAngleRad());
    return new double[] {c.before().mach(), Double.NaN, 1.0, behind};
  }

  private static RunFile runFile(SceneFile s, Path sceneFile, Path image, @Nullable Path ref, @Nullable CalibrationFile cal,
      Optics optics, UnaryOperator<Point2> toSensor) {
    Path dir = image.toAbsolutePath().getParent();
    com.fasterxml.jackson.databind.JsonNode calNode = null;
    if (s.calibration() != null && s.calibration().isTextual()) {
      Path calPath = sceneFile.toAbsolutePath().getParent().resolve(s.calibration().asText()).normalize();
      calNode = com.fasterxml.jackson.databind.node.TextNode.valueOf(dir.relativize(calPath).toString().replace('\\', '/'));
    } else if (cal != null) {
      calNode = dev.wavemark.files.Json.MAPPER.valueToTree(cal);
    }
    RunFile.ImagesJson images = new RunFile.ImagesJson(List.of(image.getFileName().toString()),
        ref == null ? null : ref.getFileName().toString(), null);
    return new RunFile(s.label(), s.gas() == null ? new RunFile.GasJson(1.4) : s.gas(), images, calNode,
        optics.contractName(), sensorModel(s.model(), toSensor), s.tunnel());
  }

  /** The model object with every point moved to where the lens puts it (the run file is as photographed). */
  static ModelJson sensorModel(ModelJson m, UnaryOperator<Point2> f) {
    return new ModelJson(m.shape(), m.deflectionDeg(), m.incidenceDeg(), pt(m.leadingEdgePx(), f), m.chordPx(),
        m.angleToleranceDeg(), pts(m.wallPx(), f), m.wallSide(), pt(m.secondCornerPx(), f), m.secondDeflectionDeg(),
        pts(m.leadingEdgesPx(), f), m.deflectionsDeg(), pt(m.centerPx(), f), m.noseRadiusPx(), m.noseRadiusTolerancePx());
  }

  private static double @Nullable [] pt(double @Nullable [] p, UnaryOperator<Point2> f) {
    if (p == null || p.length != 2) {
      return p;
    }
    Point2 q = f.apply(new Point2(p[0], p[1]));
    return new double[] {round(q.x()), round(q.y())};
  }

  private static double @Nullable [][] pts(double @Nullable [][] ps, UnaryOperator<Point2> f) {
    if (ps == null) {
      return null;
    }
    double[][] out = new double[ps.length][];
    for (int i = 0; i < ps.length; i++) {
      out[i] = pt(ps[i], f);
    }
    return out;
  }

  private static double round(double v) {
    return Math.round(v * 1000) / 1000.0;
  }
}
