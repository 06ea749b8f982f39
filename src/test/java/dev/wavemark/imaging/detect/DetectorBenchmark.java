package dev.wavemark.imaging.detect;

import boofcv.concurrency.BoofConcurrency;
import dev.wavemark.core.geom.ImageAngles;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.BodyShape;
import dev.wavemark.core.model.ExpectedWave;
import dev.wavemark.core.model.ObservedWave;
import dev.wavemark.core.model.Optics;
import dev.wavemark.core.model.Side;
import dev.wavemark.core.model.WaveKind;
import dev.wavemark.core.model.WavePattern;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/**
 * Accuracy and speed harness on pictures from the project renderer with known truth (not a timed
 * test; run with {@code mvn test -Dtest=DetectorBenchmark -DexcludedGroups=none}). Prints the
 * tables for the README.
 */
@Tag("slow")
class DetectorBenchmark {

  static List<BodyShape> shapes() {
    BodyShape.Wall lowWall = new BodyShape.Wall(new Point2(0, 640), new Point2(1024, 640), Side.LOWER);
    double d8 = Math.toRadians(8);
    return List.of(
        new BodyShape.Wedge(Math.toRadians(10), 0, new Point2(200.4, 384.3), 300),
        new BodyShape.Diamond(Math.toRadians(6), Math.toRadians(2), new Point2(250.2, 384.6), 400),
        new BodyShape.FlatPlate(Math.toRadians(5), new Point2(250.7, 384.1), 400),
        new BodyShape.Cone(Math.toRadians(12), 0, new Point2(200.3, 384.2), 350),
        new BodyShape.Ramp(Math.toRadians(12), new Point2(400.3, 640), lowWall),
        new BodyShape.ExpansionCorner(Math.toRadians(10), new Point2(400.6, 640), lowWall),
        new BodyShape.DoubleRamp(d8, new Point2(300.2, 640), d8, new Point2(420.2, 640 - 120 * Math.tan(d8)), lowWall),
        new BodyShape.ShockGenerator(d8, new Point2(100.5, 150.2), lowWall),
        new BodyShape.TwinGenerators(new Point2(100.5, 150.2), new Point2(100.5, 620.7), d8, d8));
  }

  /**
   * One matched wave: its direction error, and its error in acute angle to the local upstream
   * flow (negative: the line reads too close to the flow direction).
   */
  record Row(String kind, double errDeg, double sigmaDeg, String label, Case c, double flowErrDeg) {}

  /**
   * With {@code -Dwavemark.bench.autoOptics=true} the accuracy table is detected with the optics
   * left to the detector's guess (the run file's {@code auto}) instead of the picture's own.
   */
  static final boolean AUTO_OPTICS = Boolean.getBoolean("wavemark.bench.autoOptics");

  /** Number of pictures of the accuracy table. */
  static final int CASES = 63;

  /** One picture of the accuracy table: everything needed to render it again. */
  record Case(int index, BodyShape shape, Optics optics, int edge, double blur, double snr, double roll, double mach,
      long seed) {
    RenderedCase render() {
      return RenderedCase.of(shape.contractName(), shape, mach, optics, edge, blur, snr, roll, 1024, 768, seed);
    }

    @Override
    public String toString() {
      return String.format("case %d: %s %s edge %+d blur %.2f px SNR %s roll %.2f deg M %.3f seed %d", index,
          shape.contractName(), optics.contractName(), edge, blur, Double.isInfinite(snr) ? "clean" : String.valueOf(snr),
          Math.toDegrees(roll), mach, seed);
    }
  }

  /** Picture {@code i} of the accuracy table (its cycle of shapes, optics, blur, noise and roll). */
  static Case caseOf(int i) {
    List<BodyShape> shapes = shapes();
    Optics[] optics = {Optics.SCHLIEREN_VERTICAL_EDGE, Optics.SCHLIEREN_HORIZONTAL_EDGE, Optics.SHADOWGRAPH};
    double[] snrs = {Double.POSITIVE_INFINITY, 20, 10, 5};
    BodyShape shape = shapes.get(i % shapes.size());
    Optics o = optics[(i / shapes.size()) % 3];
    int edge = (i / 27) % 2 == 0 ? 1 : -1;
    double blur = 0.8 + 1.7 * ((i * 7) % 10) / 9.0;
    double snr = snrs[(i * 3 + i / 9) % 4];
    double roll = Math.toRadians(5.0 * ((i * 5) % 11) / 10.0) * (i % 2 == 0 ? 1 : -1);
    double mach = 2.0 + 0.5 * ((i * 3) % 7) / 6.0;
    return new Case(i, shape, o, edge, blur, snr, roll, mach, 100 + i);
  }

  static String fmtTruth(ExpectedWave t) {
    return String.format("(dir %.2f deg, %.0f,%.0f -> %.0f,%.0f)", Math.toDegrees(t.directionRad()), t.startPx().x(),
        t.startPx().y(), t.endPx().x(), t.endPx().y());
  }

  static String fmtLine(ObservedWave w) {
    return String.format("(dir %.2f deg, %.0f,%.0f -> %.0f,%.0f)", Math.toDegrees(w.line().directionRad()),
        w.line().startPx().x(), w.line().startPx().y(), w.line().endPx().x(), w.line().endPx().y());
  }

  @Test
  void accuracy() {
    BoofConcurrency.setMaxThreads(1);
    List<Row> rows = new ArrayList<>();
    Map<String, int[]> miss = new TreeMap<>();
    int cases = 0;
    int failed = 0;
    int falseShocksHighSnr = 0;
    int missedShocksHighSnr = 0;
    int opticsRight = 0;
    Map<String, int[]> setApartCounts = new TreeMap<>();
    for (int i = 0; i < CASES; i++) {
      Case cs = caseOf(i);
      BodyShape shape = cs.shape();
      Optics o = cs.optics();
      double snr = cs.snr();
      double roll = cs.roll();
      RenderedCase c;
      try {
        c = cs.render();
      } catch (RuntimeException e) {
        System.out.println("render failed " + cs + ": " + e.getMessage());
        continue;
      }
      cases++;
      OpticsGuess guess = WaveDetector.guessOptics(c.frame(), FlowRegion.of(c.mask()), shape, roll);
      System.out.printf("optics guess %s from %d lines, net fraction %.3f: %s%n", guess.optics().contractName(), guess.lines(),
          guess.netFraction(), cs);
      if ((guess.optics() == Optics.SHADOWGRAPH) == (o == Optics.SHADOWGRAPH)) {
        opticsRight++;
      } else {
        System.out.println("optics guessed wrong: " + cs);
      }
      List<ObservedWave> found;
      try {
        found = WaveDetector.create().detect(DetectionRequest.of(c.frame(), FlowRegion.of(c.mask()), AUTO_OPTICS ? Optics.AUTO : o, shape, roll));
      } catch (RuntimeException e) {
        System.out.println("detect failed " + cs + ": " + e.getMessage());
        failed++;
        found = List.of();
      }
      boolean[] used = new boolean[found.size()];
      Map<String, Double> steps = densitySteps(shape, cs.mach(), roll);
      List<ExpectedWave> apart = new ArrayList<>();
      for (ExpectedWave t : c.truth()) {
        String k = family(t.kind());
        double step = steps.getOrDefault(key(t), Double.NaN);
        if (k == null || (t.kind() == WaveKind.SLIP_LINE && !(Math.abs(step) >= VISIBLE_SLIP_STEP))) {
          continue;
        }
        if (setApart(c, t) != null) {
          apart.add(t);
          continue;
        }
        int best = match(t, k, found, used);
        int[] m = miss.computeIfAbsent(k, x -> new int[3]);
        m[0]++;
        if (best < 0) {
          m[1]++;
          if (!k.equals("shock")) {
            System.out.println("missed " + t.label() + " " + fmtTruth(t) + " in " + cs);
          }
          if (k.equals("shock") && snr >= 10) {
            missedShocksHighSnr++;
            System.out.println("missed " + t.label() + " " + fmtTruth(t) + " in " + cs);
          }
          continue;
        }
        used[best] = true;
        ObservedWave w = found.get(best);
        double flowErr = ImageAngles.acuteToFlow(w.line().directionRad(), t.localFlowDirectionRad()) - t.angleToFlowRad();
        rows.add(new Row(k, Math.toDegrees(lineDiff(w.line().directionRad(), t.directionRad())),
            Math.toDegrees(w.line().directionUncertaintyRad()), t.label(), cs, Math.toDegrees(flowErr)));
      }
      // waves set apart are paired last, so that they take no detection from a counted wave; what
      // is found on one is not false
      for (ExpectedWave t : apart) {
        String why = setApart(c, t);
        int best = match(t, family(t.kind()), found, used);
        if (best >= 0) {
          used[best] = true;
        }
        int[] a = setApartCounts.computeIfAbsent(family(t.kind()) + " | " + why, x -> new int[2]);
        a[0]++;
        a[1] += best >= 0 ? 1 : 0;
        System.out.printf("set apart (%s, own SNR %.2f): %s %s %s in %s%n", why, c.ownSnr(t), t.label(), fmtTruth(t),
            best >= 0 ? "found" : "not found", cs);
      }
      for (int j = 0; j < found.size(); j++) {
        if (!used[j]) {
          String k = family(found.get(j).kind());
          miss.computeIfAbsent(k, x -> new int[3])[2]++;
          if (!"shock".equals(k)) {
            System.out.println("false " + found.get(j).kind() + " " + fmtLine(found.get(j)) + " in " + cs);
          }
          if ("shock".equals(k) && snr >= 10) {
            falseShocksHighSnr++;
            System.out.println("false " + found.get(j).kind() + " " + fmtLine(found.get(j)) + " in " + cs);
          }
        }
      }
    }
    System.out.println("pictures " + cases + ", detection failures " + failed);
    // every matched wave, for a look at the worst ones: target/detector-accuracy.csv
    StringBuilder csv = new StringBuilder("family,wave,error_deg,sigma_deg,flow_error_deg,case\n");
    for (Row r : rows) {
      csv.append(String.format("%s,%s,%.5f,%.5f,%.5f,%s%n", r.kind(), r.label(), r.errDeg(), r.sigmaDeg(), r.flowErrDeg(), r.c()));
    }
    try {
      java.nio.file.Files.writeString(java.nio.file.Path.of("target", "detector-accuracy.csv"), csv);
    } catch (java.io.IOException e) {
      System.out.println("could not write target/detector-accuracy.csv: " + e.getMessage());
    }
    System.out.println("| family | truth waves | matched | median err (deg) | p90 err (deg) | missed | false | within 1 sigma |");
    for (var e : miss.entrySet()) {
      List<Double> errs = new ArrayList<>();
      int within = 0;
      for (Row r : rows) {
        if (r.kind().equals(e.getKey())) {
          errs.add(Math.abs(r.errDeg()));
          within += Math.abs(r.errDeg()) <= r.sigmaDeg() ? 1 : 0;
        }
      }
      errs.sort(null);
      int n = errs.size();
      System.out.printf("| %s | %d | %d | %.4f | %.4f | %d | %d | %.0f%% |%n", e.getKey(), e.getValue()[0], n,
          n == 0 ? Double.NaN : errs.get(n / 2), n == 0 ? Double.NaN : errs.get((int) Math.min(n - 1, Math.floor(0.9 * n))),
          e.getValue()[1], e.getValue()[2], n == 0 ? 0 : 100.0 * within / n);
    }
    System.out.println("| set apart: family | why | truth waves | found |");
    for (var e : setApartCounts.entrySet()) {
      System.out.printf("| %s | %d | %d |%n", e.getKey(), e.getValue()[0], e.getValue()[1]);
    }
    printFanBias(rows);
    System.out.println("missed shocks at SNR >= 10: " + missedShocksHighSnr + ", false shocks at SNR >= 10: " + falseShocksHighSnr);
    System.out.println("optics guess (shadowgraph or schlieren) right on " + opticsRight + " of " + cases + " pictures");
  }

  /**
   * The error all fan boundaries of a picture share (the basis of the inference's fan-locator
   * budget line): per picture, the mean of its matched fan boundaries' errors in angle to the local
   * flow; then the mean and rms of those means over the pictures, and the rms of the boundaries
   * about their own picture's mean. Printed for all pictures and for schlieren and shadowgraph apart.
   */
  static void printFanBias(List<Row> rows) {
    for (String group : List.of("all", "schlieren", "shadowgraph")) {
      Map<Integer, List<Double>> byCase = new TreeMap<>();
      for (Row r : rows) {
        boolean shadow = r.c().optics() == Optics.SHADOWGRAPH;
        if (r.kind().startsWith("fan-") && (group.equals("all") || shadow == group.equals("shadowgraph"))) {
          byCase.computeIfAbsent(r.c().index(), x -> new ArrayList<>()).add(r.flowErrDeg());
        }
      }
      double sum = 0;
      double sumSq = 0;
      double within = 0;
      int boundaries = 0;
      for (List<Double> e : byCase.values()) {
        double m = e.stream().mapToDouble(Double::doubleValue).average().orElseThrow();
        sum += m;
        sumSq += m * m;
        for (double x : e) {
          within += (x - m) * (x - m);
        }
        boundaries += e.size();
      }
      int n = byCase.size();
      System.out.printf("fan bias (%s): %d pictures, %d boundaries; picture mean %+.4f deg on average, %.4f deg rms over pictures; "
          + "%.4f deg rms about the picture's mean%n", group, n, boundaries, sum / n, Math.sqrt(sumSq / n),
          Math.sqrt(within / Math.max(1, boundaries - n)));
    }
  }

  /**
   * Freestream Mach-wave families: per picture and family, the inverse-variance weighted mean
   * angle of the detected lines (inference's rule) against the renderer's Mach angle; 36
   * pictures over M 1.5 to 3, both knife edges and shadowgraph, blur 0.8-2.5 px, SNR infinite to
   * 1 across the Mach waves, roll up to 5 degrees, no hints.
   */
  @Test
  void machWaveFamilies() {
    BoofConcurrency.setMaxThreads(1);
    Optics[] optics = {Optics.SCHLIEREN_VERTICAL_EDGE, Optics.SCHLIEREN_HORIZONTAL_EDGE, Optics.SHADOWGRAPH};
    double[] snrs = {Double.POSITIVE_INFINITY, 5, 2, 1};
    double[] machs = {1.5, 2.0, 2.5, 3.0};
    BodyShape shape = new BodyShape.Freestream(java.util.Optional.empty());
    List<Double> lineErr = new ArrayList<>();
    List<Double> meanErr = new ArrayList<>();
    int lineWithin = 0;
    int families = 0;
    int familiesFound = 0;
    int truthLines = 0;
    int falseLines = 0;
    double[] ms = new double[36];
    for (int i = 0; i < 36; i++) {
      Optics o = optics[i % 3];
      int edge = (i / 3) % 2 == 0 ? 1 : -1;
      double mach = machs[(i / 3) % 4];
      double snr = snrs[(i / 12 + i) % 4];
      double blur = 0.8 + 1.7 * ((i * 7) % 10) / 9.0;
      double roll = Math.toRadians(5.0 * ((i * 5) % 11) / 10.0) * (i % 2 == 0 ? 1 : -1);
      RenderedCase c = RenderedCase.of("freestream", shape, mach, o, edge, blur, snr, roll, 1024, 768, 300 + i);
      List<ObservedWave> found;
      long t0 = System.nanoTime();
      try {
        found = WaveDetector.create().detect(DetectionRequest.of(c.frame(), FlowRegion.of(c.mask()), AUTO_OPTICS ? Optics.AUTO : o, shape, roll));
      } catch (RuntimeException e) {
        found = List.of();
      }
      ms[i] = (System.nanoTime() - t0) / 1e6;
      for (Side side : Side.values()) {
        List<ExpectedWave> truth = c.truth().stream().filter(t -> t.kind() == WaveKind.MACH_WAVE && t.side() == side).toList();
        families++;
        truthLines += truth.size();
        double mu = truth.get(0).angleToFlowRad();
        double sw = 0;
        double swx = 0;
        for (ObservedWave w : found) {
          if (w.side().orElseThrow() != side) {
            continue;
          }
          double a = ImageAngles.acuteToFlow(w.line().directionRad(), roll);
          double s = w.line().directionUncertaintyRad();
          boolean onTruth = truth.stream().anyMatch(t -> Math.abs(t.startPx().minus(w.line().centroid())
              .cross(ImageAngles.unit(t.directionRad()))) < 5);
          falseLines += onTruth ? 0 : 1;
          lineErr.add(Math.toDegrees(Math.abs(a - mu)));
          lineWithin += Math.abs(a - mu) <= s ? 1 : 0;
          sw += 1 / (s * s);
          swx += a / (s * s);
        }
        if (sw > 0) {
          familiesFound++;
          meanErr.add(Math.toDegrees(Math.abs(swx / sw - mu)));
        }
      }
    }
    lineErr.sort(null);
    meanErr.sort(null);
    java.util.Arrays.sort(ms);
    int n = lineErr.size();
    int f = meanErr.size();
    System.out.println("| wave | truth | found | median error | 90th percentile | missed | false | errors within 1σ |");
    System.out.printf("| Mach wave (each line) | %d | %d | %.4f | %.4f | %d | %d | %.0f%% |%n", truthLines, n - falseLines,
        lineErr.get(n / 2), lineErr.get((int) Math.floor(0.9 * (n - 1))), truthLines - (n - falseLines), falseLines,
        100.0 * lineWithin / n);
    System.out.printf("| Mach-wave family mean | %d | %d | %.4f | %.4f | %d | - | - |%n", families, f, meanErr.get(f / 2),
        meanErr.get((int) Math.floor(0.9 * (f - 1))), families - f);
    System.out.printf("freestream detection time: median %.0f ms%n", ms[ms.length / 2]);
  }

  @Test
  void speed() throws Exception {
    BoofConcurrency.setMaxThreads(1);
    BodyShape shape = shapes().get(0);
    for (int[] size : new int[][] {{1024, 768}, {2048, 1536}}) {
      double f = size[0] / 1024.0;
      BodyShape s = new BodyShape.Wedge(Math.toRadians(10), 0, new Point2(200.4 * f, 384.3 * f), 300 * f);
      RenderedCase c = RenderedCase.of("wedge", s, 2.0, Optics.SCHLIEREN_VERTICAL_EDGE, 1, 1.2, 20, 0, size[0], size[1], 9);
      DetectionRequest req = DetectionRequest.of(c.frame(), FlowRegion.of(c.mask()), c.optics(), s, 0);
      WaveDetector d = WaveDetector.create();
      for (int i = 0; i < 15; i++) {
        d.detect(req);
      }
      double[] t = new double[40];
      for (int i = 0; i < t.length; i++) {
        long t0 = System.nanoTime();
        d.detect(req);
        t[i] = (System.nanoTime() - t0) / 1e6;
      }
      java.util.Arrays.sort(t);
      System.out.printf("speed %dx%d: median %.1f ms (min %.1f, max %.1f; target %d ms), %d waves%n", size[0], size[1], t[t.length / 2], t[0],
          t[t.length - 1], size[0] == 1024 ? 25 : 100, d.detect(req).size());
      if (size[0] == 1024) {
        int frames = 60;
        long t1 = System.nanoTime();
        for (int i = 0; i < frames; i++) {
          d.detect(req);
        }
        double one = frames / ((System.nanoTime() - t1) / 1e9);
        var pool = java.util.concurrent.Executors.newFixedThreadPool(2);
        long t2 = System.nanoTime();
        List<java.util.concurrent.Future<?>> fs = new ArrayList<>();
        for (int i = 0; i < frames; i++) {
          fs.add(pool.submit(() -> d.detect(req)));
        }
        for (var fu : fs) {
          fu.get();
        }
        double two = frames / ((System.nanoTime() - t2) / 1e9);
        pool.shutdown();
        System.out.printf("sequence: 1 thread %.1f frames/s, 2 threads %.1f frames/s, ratio %.2f (target >= 1.7)%n", one, two, two / one);
      }
    }
  }

  /**
   * A truth wave below {@value #FAINT_OWN_SNR} of its own signal-to-noise ratio per pixel
   * ({@link RenderedCase#ownSnr}): fainter than the noise of one pixel. The double ramp's reflected
   * wave carries a density step of 0.0001-0.002 of the freestream's against 0.8-0.9 across the
   * merged shock the picture's SNR is set on; no detector should be asked to find it, and none is
   * charged for what it finds on it. Our own rule, counted apart in the table, and for thin
   * lines only (shocks, slip lines): a fan's signal is spread over its width, so a fan boundary
   * with a peak below the noise can still be seen (the SNR-5 diamond fans are found) and always
   * counts.
   */
  static final double FAINT_OWN_SNR = 1;

  /**
   * A truth segment shorter than this inside the frame cannot be measured by design: a
   * secondary shock's profiles start {@link Secondary#SHORT_SKIP_PX} from its origin and need
   * {@link Secondary#SHORT_MIN_LENGTH_PX} of line (a 22 px piece would give about 0.2° at best).
   */
  static final double TOO_SHORT_PX = Secondary.SHORT_SKIP_PX + Secondary.SHORT_MIN_LENGTH_PX;

  /** Why a truth wave is set apart from the counted ones ("faint", "too short"), or null when it counts. */
  static String setApart(RenderedCase c, ExpectedWave t) {
    if (t.startPx().distanceTo(t.endPx()) < TOO_SHORT_PX) {
      return "too short";
    }
    boolean thin = t.kind().isShock() || t.kind() == WaveKind.SLIP_LINE;
    return thin && c.ownSnr(t) < FAINT_OWN_SNR ? "faint" : null;
  }

  /** The unused detection of family {@code k} closest in direction (within 1.5°, start within 120 px), or -1. */
  static int match(ExpectedWave t, String k, List<ObservedWave> found, boolean[] used) {
    int best = -1;
    double bestErr = Math.toRadians(1.5);
    for (int j = 0; j < found.size(); j++) {
      ObservedWave w = found.get(j);
      if (used[j] || !k.equals(family(w.kind()))) {
        continue;
      }
      double err = Math.abs(lineDiff(w.line().directionRad(), t.directionRad()));
      double startGap = w.line().startPx().distanceTo(t.startPx());
      if (err < bestErr && startGap < 120) {
        bestErr = err;
        best = j;
      }
    }
    return best;
  }

  static String family(WaveKind k) {
    return switch (k) {
      case OBLIQUE_SHOCK, CONICAL_SHOCK, REFLECTED_SHOCK, TRANSMITTED_SHOCK, MACH_STEM, BOW_SHOCK -> "shock";
      case EXPANSION_HEAD -> "fan-head";
      case EXPANSION_TAIL -> "fan-tail";
      case MACH_WAVE -> "mach-wave";
      case SLIP_LINE -> "slip-line";
    };
  }

  /**
   * A slip line counts as truth only when the renderer draws it with at least this density step
   * (over freestream density): our own threshold, about a fiftieth of the weakest shock here. Equal
   * twin generators make none by symmetry, and a diamond's or plate's trailing edge at a few degrees'
   * incidence one of a few thousandths, which no picture with noise shows.
   */
  static final double VISIBLE_SLIP_STEP = 0.01;

  /** The density step across each wave of the solved pattern, keyed by {@link #key}. */
  static Map<String, Double> densitySteps(BodyShape shape, double mach, double roll) {
    Map<String, Double> out = new TreeMap<>();
    try {
      for (WavePattern.Element e : WavePattern.solve(shape, mach, 1.4, roll, 1024, 768).elements()) {
        if (e instanceof WavePattern.Shock s) {
          out.put(key(s.wave()), s.after().density() - s.before().density());
        } else if (e instanceof WavePattern.Slip s) {
          out.put(key(s.wave()), s.left().density() - s.right().density());
        }
      }
    } catch (RuntimeException e) {
      // the renderer would have failed first
    }
    return out;
  }

  private static String key(ExpectedWave w) {
    return w.label() + String.format(java.util.Locale.ROOT, "@%.1f,%.1f", w.startPx().x(), w.startPx().y());
  }

  /** Difference of two undirected line directions, wrapped into (-pi/2, pi/2]. */
  static double lineDiff(double a, double b) {
    double d = ImageAngles.wrap(a - b);
    if (d > 0.5 * Math.PI) {
      d -= Math.PI;
    } else if (d <= -0.5 * Math.PI) {
      d += Math.PI;
    }
    return d;
  }
}
