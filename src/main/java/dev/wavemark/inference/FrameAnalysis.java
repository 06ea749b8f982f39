package dev.wavemark.inference;

import dev.wavemark.core.WavemarkException;
import dev.wavemark.core.gas.BowShock;
import dev.wavemark.core.gas.ConicalFlow;
import dev.wavemark.core.gas.ObliqueShock;
import dev.wavemark.core.gas.ShockBranch;
import dev.wavemark.core.geom.ImageAngles;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.BodyShape;
import dev.wavemark.core.model.ExpectedWave;
import dev.wavemark.core.model.ObservedWave;
import dev.wavemark.core.model.RunSpec;
import dev.wavemark.core.model.WaveKind;
import dev.wavemark.core.numeric.Measured;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;

/** One frame: start, then match, invert and re-predict until the matching settles; then the verdicts. */
final class FrameAnalysis {
  /** Mach numbers tried when the tunnel gives no nominal Mach number to start from. */
  private static final int SCAN_POINTS = 60;
  private static final double SCAN_LO = 1.1;
  private static final double SCAN_HI = 5.0;
  /** A check-only wave further than this many standard uncertainties from theory is reported. */
  private static final double RESIDUAL_LIMIT = 3.0;
  /** Shortest visible length for a theory wave to count as missing when not found. */
  private static final double MIN_VISIBLE_PX = 20;

  private final RunSpec run;
  private final List<ObservedWave> observed;
  private final int widthPx;
  private final int heightPx;
  private final Inference.Options options;
  private final PatternSource patterns;
  private final double gamma;
  private final double flowRad;
  private final double originWindowPx;
  private final List<Warning> warnings = new ArrayList<>();

  FrameAnalysis(RunSpec run, List<ObservedWave> observed, int widthPx, int heightPx, Inference.Options options, PatternSource patterns) {
    this.run = run;
    this.observed = observed;
    this.widthPx = widthPx;
    this.heightPx = heightPx;
    this.options = options;
    this.patterns = patterns;
    this.gamma = run.gas().gamma();
    this.flowRad = run.calibration().flowDirectionRad();
    this.originWindowPx = Math.max(15, 0.04 * Math.hypot(widthPx, heightPx));
  }

  FrameInference run() {
    Optional<Double> nominal = run.tunnel().nominalMach().filter(m -> m > 1);
    Optional<Double> start = nominal.isPresent() ? nominal : scanStart();
    Estimators estimators = new Estimators(patterns, run.model(), gamma, flowRad, widthPx, heightPx, observed, run.modelAngleToleranceRad());
    Iterated result = start.isPresent() && !observed.isEmpty() ? iterate(start.get(), estimators) : Iterated.EMPTY;
    if (result.combined().isEmpty() && nominal.isPresent() && !observed.isEmpty()) {
      // Nothing matched near the nominal Mach number: search the whole range instead.
      Optional<Double> scanned = scanStart();
      if (scanned.isPresent()) {
        start = scanned;
        Iterated again = iterate(scanned.get(), estimators);
        result = again.combined().isPresent() ? again : result;
      }
    }
    Optional<Combiner.Combined> combined = result.combined();
    List<Matcher.Pair> pairs = result.pairs();
    List<Warning> inversionWarnings = result.warnings();
    int iterations = result.iterations();
    warnings.addAll(inversionWarnings);
    Optional<Measured> mach = combined.map(Combiner.Combined::mach);
    Optional<Double> judgeMach = mach.map(Measured::value).or(() -> nominal);
    String basis = mach.isPresent() ? "inferred" : "nominal";

    List<ExpectedWave> atInferred = mach.flatMap(mm -> pattern(mm.value())).orElse(List.of());
    List<ExpectedWave> atNominal = nominal.flatMap(this::pattern).orElse(List.of());
    List<ExpectedWave> reference = !atInferred.isEmpty() ? atInferred : atNominal;
    List<Matcher.Pair> finalPairs = reference.isEmpty() ? pairs
        : Matcher.match(observed, reference, options.refinedAngleWindowRad(), originWindowPx);
    if (reference.isEmpty() && !pairs.isEmpty()) {
      finalPairs = List.of();
    }
    Set<Integer> used = new HashSet<>();
    combined.ifPresent(c -> c.estimates().forEach(e -> used.addAll(e.observedIndices())));
    List<WaveMatch> matches = matches(finalPairs, reference, used);

    if (combined.isPresent() && !combined.get().consistency().consistent()) {
      Consistency k = combined.get().consistency();
      warnings.add(new Warning(Warning.Code.INCONSISTENT_ESTIMATES, String.format(Locale.ROOT,
          "Mach estimates disagree beyond their uncertainties (chi-square %.1f for %d degrees of freedom, p = %.2g, Birge ratio %.2f): %s",
          k.chiSquare(), k.degreesOfFreedom(), k.pValue(), k.birgeRatio(), String.join(", ", k.disagreeing()))));
    }
    if (mach.isEmpty()) {
      warnings.add(new Warning(Warning.Code.NO_MACH_ESTIMATE, "no Mach number: " + (observed.isEmpty() ? "no wave was found in the frame"
          : start.isEmpty() ? "no Mach number makes the model's waves match the " + observed.size() + " wave(s) found"
          : finalPairs.size() + " of " + observed.size() + " wave(s) matched the model, none gave an estimate")));
    }
    ReflectionVerdict reflection = ReflectionJudge.judge(run.model(), judgeMach, basis, gamma, observedKinds(finalPairs, reference));
    if (reflection.predicted() != ReflectionVerdict.Kind.DUAL_SOLUTION && reflection.predicted() != ReflectionVerdict.Kind.NONE
        && reflection.observed() != ReflectionVerdict.Kind.NONE && reflection.predicted() != reflection.observed()) {
      warnings.add(new Warning(Warning.Code.REFLECTION_DISAGREES, "reflection: theory predicts " + reflection.predicted().contractName()
          + " but the picture shows " + reflection.observed().contractName() + "; " + reflection.reason()));
    }
    List<Finding> findings = findings(judgeMach, basis, finalPairs, reference);
    for (Finding f : findings) {
      warnings.add(Warning.of(f));
    }
    for (WaveMatch w : matches) {
      if (!w.usedForMach() && Math.abs(w.residualSigma()) > RESIDUAL_LIMIT) {
        warnings.add(new Warning(Warning.Code.LARGE_RESIDUAL, String.format(Locale.ROOT,
            "%s (wave #%d) lies %.1f standard uncertainties from theory (measured %.3f°, theory %.3f°)", w.expected().label(),
            w.observedIndex(), w.residualSigma(), Math.toDegrees(w.measuredAngleRad()), Math.toDegrees(w.predictedAngleRad()))));
      }
    }
    Set<Integer> matchedObs = new HashSet<>();
    finalPairs.forEach(p -> matchedObs.add(p.observed()));
    List<Integer> unmatched = new ArrayList<>();
    for (int i = 0; i < observed.size(); i++) {
      if (!matchedObs.contains(i)) {
        unmatched.add(i);
      }
    }
    return new FrameInference(mach,
        combined.map(Combiner.Combined::estimates).orElse(List.of()),
        combined.map(Combiner.Combined::consistency).orElse(Consistency.UNTESTED),
        combined.map(Combiner.Combined::budget).orElse(List.of()),
        matches, unmatched, atInferred, atNominal, reflection, findings, warnings, options.gammaUncertainty(), iterations);
  }

  private record Iterated(Optional<Combiner.Combined> combined, List<Matcher.Pair> pairs, List<Warning> warnings, int iterations) {
    static final Iterated EMPTY = new Iterated(Optional.empty(), List.of(), List.of(), 0);
  }

  /** Match, invert and re-predict from {@code m} until the matching and the Mach number settle. */
  private Iterated iterate(double m, Estimators estimators) {
    Optional<Combiner.Combined> combined = Optional.empty();
    List<Matcher.Pair> pairs = List.of();
    List<Warning> inversionWarnings = List.of();
    int iterations = 0;
    List<String> previous = null;
    for (int it = 1; it <= options.maxIterations(); it++) {
      Optional<List<ExpectedWave>> exp = pattern(m);
      if (exp.isEmpty()) {
        break;
      }
      iterations = it;
      double window = it == 1 ? options.initialAngleWindowRad() : options.refinedAngleWindowRad();
      List<Matcher.Pair> found = Matcher.match(observed, exp.get(), window, originWindowPx);
      List<String> now = keys(found, exp.get());
      Estimators.Built built = estimators.build(m, exp.get(), found);
      Optional<Combiner.Combined> c = Combiner.combine(built.estimates(), this::sigma, options.testLevel(),
          options.scaleByBirgeRatio(), new Describe());
      inversionWarnings = built.warnings();
      pairs = found;
      if (c.isEmpty()) {
        break;
      }
      combined = c;
      double next = c.get().mach().value();
      boolean settled = now.equals(previous) && Math.abs(next - m) <= 1e-7 * m;
      previous = now;
      m = next;
      if (settled) {
        break;
      }
    }
    return new Iterated(combined, pairs, inversionWarnings, iterations);
  }

  /** Pairs re-expressed by theory-wave key, so that matchings at different Mach numbers compare. */
  private static List<String> keys(List<Matcher.Pair> pairs, List<ExpectedWave> exp) {
    List<String> out = new ArrayList<>();
    for (Matcher.Pair p : pairs) {
      out.add(p.observed() + "=" + WaveKey.of(exp, p.expected()).label());
    }
    return out;
  }

  private double sigma(Linear.Input in) {
    return switch (in.source()) {
      case ANGLE_FIT -> observed.get(in.index()).line().directionUncertaintyRad();
      case FLOW_DIRECTION -> run.calibration().flowDirectionUncertaintyRad();
      case MODEL_ANGLE -> run.modelAngleToleranceRad();
      case GAMMA -> options.gammaUncertainty();
      case SCATTER -> 0;
      case STANDOFF -> observed.get(in.index()).bow().map(b -> b.standoffSigmaPx()).orElse(0.0);
      case NOSE_RADIUS -> run.model() instanceof BodyShape.Blunt b ? b.noseRadiusSigmaPx() : 0;
      case CORRELATION -> BowShock.STANDOFF_SCATTER;
      case FAN_LOCATOR -> Estimators.FAN_LOCATOR_SIGMA_RAD;
    };
  }

  private final class Describe implements Combiner.Describer {
    @Override
    public String describe(BudgetLine.Source source, int count, double in) {
      return switch (source) {
        case ANGLE_FIT -> String.format(Locale.ROOT, "angle fit of %d wave(s), rms %.4f°", count, Math.toDegrees(in));
        case FLOW_DIRECTION -> String.format(Locale.ROOT, "flow direction ± %.4f° (calibration)", Math.toDegrees(in));
        case MODEL_ANGLE -> String.format(Locale.ROOT, "model angle ± %.4f° (%s)", Math.toDegrees(run.modelAngleToleranceRad()),
            ModelAngles.names(run.model()).isEmpty() ? "no model angle" : String.join(", ", ModelAngles.names(run.model())));
        case GAMMA -> String.format(Locale.ROOT, "gamma %.4f ± %.4f (assumed)", gamma, options.gammaUncertainty());
        case SCATTER -> "scatter";
        case STANDOFF -> String.format(Locale.ROOT, "bow-shock stand-off fit of %d wave(s), rms %.3f px", count, in);
        case NOSE_RADIUS -> String.format(Locale.ROOT, "nose radius ± %.3f px (%s)", in,
            run.model() instanceof BodyShape.Blunt b && b.noseRadiusSigmaPx() == BodyShape.Blunt.DEFAULT_RADIUS_SIGMA * b.noseRadiusPx()
                ? "default, 1 % of the radius" : "run file");
        case CORRELATION -> String.format(Locale.ROOT,
            "Billig stand-off correlation ± %.0f %% of delta/R (assumed scatter, not a published figure)", 100 * in);
        case FAN_LOCATOR -> String.format(Locale.ROOT,
            "fan-boundary locator ± %.3f°, common to the frame's fan boundaries (detector benchmark)", Math.toDegrees(in));
      };
    }

    @Override
    public String unit(BudgetLine.Source source) {
      return switch (source) {
        case ANGLE_FIT, FLOW_DIRECTION, MODEL_ANGLE, FAN_LOCATOR -> "rad";
        case GAMMA -> "1";
        case SCATTER -> "Birge ratio";
        case STANDOFF, NOSE_RADIUS -> "px";
        case CORRELATION -> "1";
      };
    }
  }

  private Optional<List<ExpectedWave>> pattern(double m) {
    try {
      return Optional.of(patterns.of(run.model(), m, gamma, flowRad, widthPx, heightPx));
    } catch (WavemarkException e) {
      return Optional.empty();
    }
  }

  /** The starting Mach number when no nominal is given: the best-matching of a log-spaced scan. */
  private Optional<Double> scanStart() {
    double best = Double.POSITIVE_INFINITY;
    Optional<Double> bestM = Optional.empty();
    if (observed.isEmpty()) {
      return bestM;
    }
    for (int i = 0; i < SCAN_POINTS; i++) {
      double m = SCAN_LO * Math.pow(SCAN_HI / SCAN_LO, i / (double) (SCAN_POINTS - 1));
      Optional<List<ExpectedWave>> exp = pattern(m);
      if (exp.isEmpty()) {
        continue;
      }
      List<Matcher.Pair> p = Matcher.match(observed, exp.get(), options.refinedAngleWindowRad(), originWindowPx);
      double s = Matcher.score(p, observed.size());
      if (!p.isEmpty() && s < best) {
        best = s;
        bestM = Optional.of(m);
      }
    }
    return bestM;
  }

  private List<WaveMatch> matches(List<Matcher.Pair> pairs, List<ExpectedWave> reference, Set<Integer> used) {
    List<WaveMatch> out = new ArrayList<>();
    for (Matcher.Pair p : pairs) {
      ExpectedWave e = reference.get(p.expected());
      ObservedWave o = observed.get(p.observed());
      double measured = ImageAngles.acuteToFlow(o.line().directionRad(), e.localFlowDirectionRad());
      double s = o.line().directionUncertaintyRad();
      double res = s > 0 ? (measured - e.angleToFlowRad()) / s : Double.NaN;
      out.add(new WaveMatch(p.observed(), e, measured, s, e.angleToFlowRad(), res, used.contains(p.observed())));
    }
    return out;
  }

  /** Kinds seen: those the detector named and those of the theory waves its lines matched. */
  private Set<WaveKind> observedKinds(List<Matcher.Pair> pairs, List<ExpectedWave> reference) {
    Set<WaveKind> kinds = EnumSet.noneOf(WaveKind.class);
    for (ObservedWave o : observed) {
      kinds.add(o.kind());
    }
    for (Matcher.Pair p : pairs) {
      kinds.add(reference.get(p.expected()).kind());
    }
    return kinds;
  }

  private List<Finding> findings(Optional<Double> mach, String basis, List<Matcher.Pair> pairs, List<ExpectedWave> reference) {
    List<Finding> out = new ArrayList<>();
    mach.ifPresent(m -> out.addAll(detached(run.model(), m, basis, gamma)));
    if (run.model() instanceof BodyShape.Blunt b && mach.isPresent()) {
      for (int i = 0; i < observed.size(); i++) {
        var bow = observed.get(i).bow();
        if (bow.isPresent()) {
          // a blunt nose turns its stagnation streamline square to the flow: always beyond thetaMax
          double m = mach.get();
          double max = b.nose() == BowShock.Nose.SPHERE ? ConicalFlow.of(gamma).maxConeAngle(m).coneRad()
              : ObliqueShock.maxDeflection(m, gamma);
          out.add(new Finding.Detached(b.contractName() + " nose", 0.5 * Math.PI, max, m, basis, String.format(Locale.ROOT,
              "bow shock measured (wave #%d): stand-off %.2f ± %.2f px = %.3f nose radii, vertex radius of curvature %.1f px",
              i, bow.get().standoffPx(), bow.get().standoffSigmaPx(), bow.get().standoffRatio(), bow.get().vertexRadiusPx())));
        }
      }
    }
    for (int i = 0; i < observed.size(); i++) {
      if (observed.get(i).line().curved()) {
        int idx = i;
        String label = pairs.stream().filter(p -> p.observed() == idx).findFirst()
            .map(p -> reference.get(p.expected()).label()).orElse(observed.get(i).kind().contractName());
        out.add(new Finding.CurvedWave(i, observed.get(i).kind(), label));
      }
    }
    Set<Integer> matchedExp = new HashSet<>();
    Set<Integer> matchedObs = new HashSet<>();
    for (Matcher.Pair p : pairs) {
      matchedExp.add(p.expected());
      matchedObs.add(p.observed());
    }
    boolean machWaveSeen = pairs.stream().anyMatch(p -> reference.get(p.expected()).kind() == WaveKind.MACH_WAVE);
    boolean machWaveReported = false;
    for (int j = 0; j < reference.size(); j++) {
      ExpectedWave e = reference.get(j);
      if (matchedExp.contains(j) || !visible(e)) {
        continue;
      }
      if (e.kind() == WaveKind.MACH_WAVE) {
        // Weak waves from the walls stand for a family: one seen is enough, none seen is one warning.
        if (machWaveSeen || machWaveReported) {
          continue;
        }
        machWaveReported = true;
      }
      out.add(new Finding.MissingWave(e));
    }
    for (int i = 0; i < observed.size(); i++) {
      boolean stemOfAReflection = observed.get(i).kind() == WaveKind.MACH_STEM
          && (run.model() instanceof BodyShape.ShockGenerator || run.model() instanceof BodyShape.TwinGenerators);
      if (!matchedObs.contains(i) && !reference.isEmpty() && !stemOfAReflection) {
        out.add(new Finding.UnmatchedWave(i, observed.get(i).kind()));
      }
    }
    return out;
  }

  /** Detached shocks: surfaces turning the flow beyond thetaMax at the Mach number judged. */
  static List<Finding> detached(BodyShape shape, double m, String basis, double gamma) {
    List<Finding> out = new ArrayList<>();
    for (ModelAngles.Surface s : ModelAngles.compressive(shape)) {
      double max;
      double mLocal = m;
      if (s.conical()) {
        max = ConicalFlow.of(gamma).maxConeAngle(m).coneRad();
      } else if (Double.isFinite(s.behindFirstShockOf())) {
        if (s.behindFirstShockOf() > ObliqueShock.maxDeflection(m, gamma)) {
          continue; // the first ramp already detaches; reported on its own
        }
        mLocal = ObliqueShock.fromDeflection(m, s.behindFirstShockOf(), ShockBranch.WEAK, gamma).m2();
        max = mLocal > 1 ? ObliqueShock.maxDeflection(mLocal, gamma) : 0;
      } else {
        max = ObliqueShock.maxDeflection(m, gamma);
      }
      if (s.deflectionRad() > max) {
        out.add(new Finding.Detached(s.name(), s.deflectionRad(), max, mLocal, mLocal == m ? basis : basis + ", behind the first shock"));
      }
    }
    return out;
  }

  private boolean visible(ExpectedWave e) {
    Point2 a = e.startPx();
    Point2 b = e.endPx();
    int inside = 0;
    int samples = 32;
    for (int k = 0; k <= samples; k++) {
      double t = k / (double) samples;
      double x = a.x() + t * (b.x() - a.x());
      double y = a.y() + t * (b.y() - a.y());
      if (x >= 0 && y >= 0 && x <= widthPx - 1 && y <= heightPx - 1) {
        inside++;
      }
    }
    return a.distanceTo(b) * inside / (samples + 1) >= MIN_VISIBLE_PX;
  }
}
