package dev.wavemark.inference;

import dev.wavemark.core.WavemarkException;
import dev.wavemark.core.gas.ConicalFlow;
import dev.wavemark.core.gas.MachAngle;
import dev.wavemark.core.gas.ObliqueShock;
import dev.wavemark.core.gas.PrandtlMeyer;
import dev.wavemark.core.geom.ImageAngles;
import dev.wavemark.core.model.BodyShape;
import dev.wavemark.core.model.ExpectedWave;
import dev.wavemark.core.model.Feature;
import dev.wavemark.core.model.ObservedWave;
import dev.wavemark.core.model.WaveKind;
import dev.wavemark.core.numeric.Roots;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.ToDoubleFunction;

/**
 * Turns matched waves into linearised Mach estimates.
 *
 * <p>Waves met by the undisturbed freestream are inverted in closed form: an oblique shock by
 * theta-beta-M (weak branch) with the surface deflection the model sets, a Mach-wave family and
 * an expansion head by the Mach angle, an expansion tail by its Mach angle and the
 * Prandtl-Meyer function with the known turn, a conical shock by the Taylor-Maccoll inverse. The deflection and the turn are read from the
 * theory pattern itself (theta(M, beta) of its shock, the change in its local flow direction), so
 * that the model's incidence convention lives in one place. Every other wave (behind a first shock
 * or fan, reflected, transmitted, conical) is inverted through the pattern: the Mach number at
 * which theory puts the wave at the measured angle, found by a bracketed root search.
 *
 * <p>Sensitivities are central differences: steps of {@value #STEP} rad or {@value #STEP} in
 * gamma for the closed forms, and implicit differentiation of the root for pattern inversions.
 */
final class Estimators {
  static final double STEP = 1e-6;
  /** Step for derivatives through the pattern, whose own solvers are converged to ~1e-12. */
  private static final double PATTERN_STEP = 1e-5;
  private static final double FREESTREAM_TOL = 1e-7;

  private final PatternSource patterns;
  private final BodyShape shape;
  private final double gamma;
  private final double flowRad;
  private final int widthPx;
  private final int heightPx;
  private final List<ObservedWave> observed;
  private final int modelAngles;
  private final double modelStepRad;

  /** Estimates made and the warnings of those that failed. */
  record Built(List<Linear> estimates, List<Warning> warnings) {}

  Estimators(PatternSource patterns, BodyShape shape, double gamma, double flowRad, int widthPx, int heightPx,
      List<ObservedWave> observed, double modelToleranceRad) {
    this.patterns = patterns;
    this.shape = shape;
    this.gamma = gamma;
    this.flowRad = flowRad;
    this.widthPx = widthPx;
    this.heightPx = heightPx;
    this.observed = observed;
    this.modelAngles = ModelAngles.names(shape).size();
    this.modelStepRad = modelToleranceRad > 0 ? Math.min(modelToleranceRad, 1e-3) : 1e-4;
  }

  Built build(double mRef, List<ExpectedWave> expected, List<Matcher.Pair> pairs) {
    List<Linear> out = new ArrayList<>();
    List<Warning> warnings = new ArrayList<>();
    Map<Integer, List<Integer>> families = new LinkedHashMap<>();
    for (Matcher.Pair p : pairs) {
      ExpectedWave e = expected.get(p.expected());
      WaveKey key = WaveKey.of(expected, p.expected());
      try {
        if (e.kind() == WaveKind.MACH_WAVE && freestream(e)) {
          families.computeIfAbsent(0, k -> new ArrayList<>()).add(p.observed());
        } else if (e.kind() == WaveKind.BOW_SHOCK && shape instanceof BodyShape.Blunt b && observed.get(p.observed()).bow().isPresent()) {
          out.add(bowShock(key, b, p.observed()));
        } else if (!informative(e.kind())) {
          continue;
        } else if (e.kind() == WaveKind.OBLIQUE_SHOCK && freestream(e)) {
          out.add(obliqueShock(mRef, key, e, p.observed()));
        } else if (e.kind() == WaveKind.CONICAL_SHOCK && freestream(e)) {
          out.add(conicalShock(mRef, key, e, p.observed()));
        } else if (e.kind() == WaveKind.EXPANSION_HEAD && freestream(e)) {
          out.add(closedForm(key, MachEstimate.Method.MACH_ANGLE, List.of(p.observed()), List.of(),
              off -> MachAngle.machFrom(angle(p.observed(), e.localFlowDirectionRad(), off))));
        } else if (e.kind() == WaveKind.EXPANSION_TAIL && freestreamHead(expected, e).isPresent()) {
          out.add(expansionTail(mRef, key, e, freestreamHead(expected, e).get(), p.observed()));
        } else {
          out.add(throughPattern(mRef, key, e, p.observed()));
        }
      } catch (WavemarkException ex) {
        warnings.add(new Warning(Warning.Code.INVERSION_FAILED,
            key.label() + " (wave #" + p.observed() + "): " + ex.getMessage()));
      }
    }
    for (List<Integer> family : families.values()) {
      try {
        out.add(machWaveFamily(family));
      } catch (WavemarkException ex) {
        warnings.add(new Warning(Warning.Code.INVERSION_FAILED, "mach-wave family: " + ex.getMessage()));
      }
    }
    return new Built(out, warnings);
  }

  /**
   * Kinds whose angle carries the Mach number; slip lines, stems and bow shocks are checks only
   * (a bow shock's Mach number comes from its stand-off, {@link #bowShock}, not its angle).
   */
  static boolean informative(WaveKind k) {
    return switch (k) {
      case OBLIQUE_SHOCK, CONICAL_SHOCK, EXPANSION_HEAD, EXPANSION_TAIL, MACH_WAVE, REFLECTED_SHOCK, TRANSMITTED_SHOCK -> true;
      case MACH_STEM, SLIP_LINE, BOW_SHOCK -> false;
    };
  }

  private boolean freestream(ExpectedWave e) {
    return Math.abs(ImageAngles.wrap(e.localFlowDirectionRad() - flowRad)) < FREESTREAM_TOL;
  }

  private Optional<ExpectedWave> freestreamHead(List<ExpectedWave> expected, ExpectedWave tail) {
    for (ExpectedWave h : expected) {
      if (h.kind() == WaveKind.EXPANSION_HEAD && h.side() == tail.side() && h.feature() == tail.feature() && freestream(h)) {
        return Optional.of(h);
      }
    }
    return Optional.empty();
  }

  /**
   * Standard uncertainty of the error all fan boundaries of a frame share, 0.06 deg. Measured with
   * the detector benchmark (DetectorBenchmark#accuracy, which prints it as "fan bias"; 35 pictures
   * with fans, 109 matched boundaries, one boundary more than 0.5 deg off left out): after the
   * detector's correction of the 1/s pull on fan boundaries the mean of a picture's boundary
   * errors, in angle to the local flow, is -0.017 deg on average (-0.067 deg before it) and
   * 0.069 deg rms over the pictures, against 0.061 deg rms about that mean within a picture; with
   * 3.1 boundaries a picture, sqrt(0.069^2 - 0.061^2 / 3.1) = 0.060 deg of each boundary's error
   * is common to the picture (0.10 deg before the correction, on the same pictures). It is added on
   * top of each boundary's own fit uncertainty (which the benchmark calibrated on the total error,
   * so this errs on the safe side), and it keeps several fans from out-voting one shock by
   * averaging an error they share.
   */
  static final double FAN_LOCATOR_SIGMA_RAD = Math.toRadians(0.06);

  /** The measured acute angle of observed line i to a local flow, with the offsets applied. */
  private double angle(int i, double localFlowRad, Map<Linear.Input, Double> off) {
    double dir = observed.get(i).line().directionRad() + off.getOrDefault(Linear.Input.angle(i), 0.0);
    double acute = ImageAngles.acuteToFlow(dir, localFlowRad + off.getOrDefault(Linear.Input.FLOW, 0.0));
    return isFan(i) ? acute + off.getOrDefault(Linear.Input.FAN, 0.0) : acute;
  }

  private boolean isFan(int i) {
    WaveKind k = observed.get(i).kind();
    return k == WaveKind.EXPANSION_HEAD || k == WaveKind.EXPANSION_TAIL;
  }

  /** +1 where turning line i counter-clockwise in the picture opens its angle to the local flow, else -1. */
  private double openingSign(int i, double localFlowRad) {
    double d = observed.get(i).line().directionRad();
    return ImageAngles.acuteToFlow(d + 1e-6, localFlowRad) > ImageAngles.acuteToFlow(d, localFlowRad) ? 1 : -1;
  }

  private double gammaOf(Map<Linear.Input, Double> off) {
    return gamma + off.getOrDefault(Linear.Input.GAMMA, 0.0);
  }

  private Linear obliqueShock(double mRef, WaveKey key, ExpectedWave e, int obs) {
    double theta0 = ObliqueShock.theta(mRef, e.angleToFlowRad(), gamma);
    double[] dTheta = modelDerivatives(mRef, pat -> ObliqueShock.theta(mRef, need(key, pat).angleToFlowRad(), gamma));
    return closedForm(key, MachEstimate.Method.THETA_BETA_M, List.of(obs), modelInputs(dTheta), off -> {
      double theta = theta0;
      for (int k = 0; k < dTheta.length; k++) {
        theta += dTheta[k] * off.getOrDefault(Linear.Input.model(k), 0.0);
      }
      return ObliqueShock.machFromAngles(angle(obs, e.localFlowDirectionRad(), off), theta, gammaOf(off));
    });
  }

  /**
   * A conical shock: the Taylor-Maccoll inverse (core.gas.ConicalFlow) with the cone angle the
   * pattern's shock implies (exact at zero incidence; at incidence the side-view silhouette is
   * taken as a cone of that effective angle).
   */
  private Linear conicalShock(double mRef, WaveKey key, ExpectedWave e, int obs) {
    double cone0 = ConicalFlow.of(gamma).coneAngle(mRef, e.angleToFlowRad());
    double[] dCone = modelDerivatives(mRef, pat -> ConicalFlow.of(gamma).coneAngle(mRef, need(key, pat).angleToFlowRad()));
    return closedForm(key, MachEstimate.Method.TAYLOR_MACCOLL, List.of(obs), modelInputs(dCone), off -> {
      double cone = cone0;
      for (int k = 0; k < dCone.length; k++) {
        cone += dCone[k] * off.getOrDefault(Linear.Input.model(k), 0.0);
      }
      return ConicalFlow.of(gammaOf(off)).machFromShockAngle(angle(obs, e.localFlowDirectionRad(), off), cone);
    });
  }

  private Linear expansionTail(double mRef, WaveKey key, ExpectedWave tail, ExpectedWave head, int obs) {
    WaveKey headKey = new WaveKey(head.kind(), head.side(), head.feature(), 0);
    double turn0 = Math.abs(ImageAngles.wrap(tail.localFlowDirectionRad() - head.localFlowDirectionRad()));
    double[] dTurn = modelDerivatives(mRef,
        pat -> Math.abs(ImageAngles.wrap(need(key, pat).localFlowDirectionRad() - need(headKey, pat).localFlowDirectionRad())));
    return closedForm(key, MachEstimate.Method.PRANDTL_MEYER, List.of(obs), modelInputs(dTurn), off -> {
      double turn = turn0;
      for (int k = 0; k < dTurn.length; k++) {
        turn += dTurn[k] * off.getOrDefault(Linear.Input.model(k), 0.0);
      }
      double g = gammaOf(off);
      double m2 = MachAngle.machFrom(angle(obs, tail.localFlowDirectionRad(), off));
      return PrandtlMeyer.inverse(PrandtlMeyer.nu(m2, g) - turn, g);
    });
  }

  private Linear machWaveFamily(List<Integer> family) {
    ToDoubleFunction<Map<Linear.Input, Double>> f = off -> {
      double sw = 0;
      double swx = 0;
      for (int i : family) {
        double s = observed.get(i).line().directionUncertaintyRad();
        double w = s > 0 ? 1 / (s * s) : 1;
        sw += w;
        swx += w * angle(i, flowRad, off);
      }
      return MachAngle.machFrom(swx / sw);
    };
    List<Linear.Input> inputs = new ArrayList<>();
    for (int i : family) {
      inputs.add(Linear.Input.angle(i));
    }
    inputs.add(Linear.Input.FLOW);
    double m = f.applyAsDouble(Map.of());
    Map<Linear.Input, Double> sens = differentiate(f, inputs, STEP);
    return new Linear("mach-wave family (" + family.size() + ")", MachEstimate.Method.MACH_ANGLE, WaveKind.MACH_WAVE,
        Optional.empty(), family, m, sens);
  }

  /**
   * A blunt body's bow shock: the Mach number from the measured stand-off over the nose radius
   * through the inverse of Billig's correlation (core.gas.BowShock). Inputs: the stand-off fit
   * (the shock's position on the stagnation line, measured from the nose centre, is what the
   * picture gives, so a larger nose radius means a smaller stand-off), the nose radius's stated
   * tolerance and the correlation's own scatter (relative, on delta/R). The correlation is for
   * air and does not depend on gamma within the band it accepts, so gamma is no input.
   */
  private Linear bowShock(WaveKey key, BodyShape.Blunt b, int obs) {
    dev.wavemark.core.model.BowShockFit fit = observed.get(obs).bow().orElseThrow();
    double shockFromCentre = fit.standoffPx() + fit.noseRadiusPx();
    ToDoubleFunction<Map<Linear.Input, Double>> f = off -> {
      double r = fit.noseRadiusPx() + off.getOrDefault(Linear.Input.NOSE_RADIUS, 0.0);
      double delta = shockFromCentre + off.getOrDefault(Linear.Input.standoff(obs), 0.0) - r;
      double ratio = delta / r * (1 + off.getOrDefault(Linear.Input.CORRELATION, 0.0));
      return dev.wavemark.core.gas.BowShock.machFromStandoff(b.nose(), ratio, gamma);
    };
    List<Linear.Input> inputs = List.of(Linear.Input.standoff(obs), Linear.Input.NOSE_RADIUS, Linear.Input.CORRELATION);
    double m = f.applyAsDouble(Map.of());
    return new Linear(key.label(), MachEstimate.Method.BOW_SHOCK_STANDOFF, WaveKind.BOW_SHOCK, Optional.empty(), List.of(obs), m,
        differentiate(f, inputs, STEP));
  }

  private Linear closedForm(WaveKey key, MachEstimate.Method method, List<Integer> obs, List<Linear.Input> model,
      ToDoubleFunction<Map<Linear.Input, Double>> f) {
    List<Linear.Input> inputs = new ArrayList<>();
    for (int i : obs) {
      inputs.add(Linear.Input.angle(i));
    }
    if (obs.stream().anyMatch(this::isFan)) {
      inputs.add(Linear.Input.FAN);
    }
    inputs.add(Linear.Input.FLOW);
    inputs.addAll(model);
    inputs.add(Linear.Input.GAMMA);
    double m = f.applyAsDouble(Map.of());
    return new Linear(key.label(), method, key.kind(), Optional.of(key.side()), obs, m, differentiate(f, inputs, STEP));
  }

  /** Central differences of f about zero offsets; one-sided where one side has no solution. */
  static Map<Linear.Input, Double> differentiate(ToDoubleFunction<Map<Linear.Input, Double>> f, List<Linear.Input> inputs, double h) {
    double f0 = f.applyAsDouble(Map.of());
    Map<Linear.Input, Double> out = new LinkedHashMap<>();
    for (Linear.Input in : inputs) {
      double plus = safe(f, Map.of(in, h));
      double minus = safe(f, Map.of(in, -h));
      double d;
      if (Double.isFinite(plus) && Double.isFinite(minus)) {
        d = (plus - minus) / (2 * h);
      } else if (Double.isFinite(plus)) {
        d = (plus - f0) / h;
      } else if (Double.isFinite(minus)) {
        d = (f0 - minus) / h;
      } else {
        d = 0;
      }
      out.put(in, d);
    }
    return out;
  }

  private static double safe(ToDoubleFunction<Map<Linear.Input, Double>> f, Map<Linear.Input, Double> off) {
    try {
      return f.applyAsDouble(off);
    } catch (WavemarkException e) {
      return Double.NaN;
    }
  }

  private List<Linear.Input> modelInputs(double[] d) {
    List<Linear.Input> l = new ArrayList<>();
    for (int k = 0; k < d.length; k++) {
      if (d[k] != 0) {
        l.add(Linear.Input.model(k));
      }
    }
    return l;
  }

  /** d(quantity)/d(model angle k) through patterns of the perturbed model at mRef. */
  private double[] modelDerivatives(double mRef, ToDoubleFunction<List<ExpectedWave>> quantity) {
    double[] d = new double[modelAngles];
    for (int k = 0; k < modelAngles; k++) {
      double plus = quantityAt(mRef, ModelAngles.perturbed(shape, k, modelStepRad), quantity);
      double minus = quantityAt(mRef, ModelAngles.perturbed(shape, k, -modelStepRad), quantity);
      d[k] = Double.isFinite(plus) && Double.isFinite(minus) ? (plus - minus) / (2 * modelStepRad) : 0;
    }
    return d;
  }

  private double quantityAt(double m, BodyShape s, ToDoubleFunction<List<ExpectedWave>> q) {
    try {
      return q.applyAsDouble(patternAt(m, s, gamma));
    } catch (WavemarkException | IllegalArgumentException e) {
      return Double.NaN;
    }
  }

  private final Map<List<Object>, List<ExpectedWave>> cache = new HashMap<>();

  private List<ExpectedWave> patternAt(double m, BodyShape s, double g) {
    return cache.computeIfAbsent(List.of(m, s, g), k -> patterns.of(s, m, g, flowRad, widthPx, heightPx));
  }

  // ---- inversion through the pattern ------------------------------------------------------------

  /** Signed angle between the observed line (with offsets) and the theory wave; NaN where theory has no such wave. */
  private double residual(int obs, WaveKey key, double m, BodyShape s, double g, double obsOffset, double flowOffset) {
    if (!(m > 1)) {
      return Double.NaN;
    }
    try {
      Optional<ExpectedWave> w = key.find(patternAt(m, s, g));
      if (w.isEmpty()) {
        return Double.NaN;
      }
      return Matcher.lineDifference(observed.get(obs).line().directionRad() + obsOffset, w.get().directionRad() + flowOffset);
    } catch (WavemarkException | IllegalArgumentException e) {
      return Double.NaN;
    }
  }

  private Linear throughPattern(double mRef, WaveKey key, ExpectedWave e, int obs) {
    double m = solveMach(mRef, key, obs);
    double dm = PATTERN_STEP * m;
    double rM = (residual(obs, key, m + dm, shape, gamma, 0, 0) - residual(obs, key, m - dm, shape, gamma, 0, 0)) / (2 * dm);
    if (!Double.isFinite(rM) || rM == 0) {
      throw new WavemarkException(dev.wavemark.core.Problem.NO_SOLUTION,
          "theory angle of " + key.label() + " does not change with Mach number near M = " + WavemarkException.num(m));
    }
    Map<Linear.Input, Double> sens = new LinkedHashMap<>();
    double h = PATTERN_STEP;
    sens.put(Linear.Input.angle(obs), -((residual(obs, key, m, shape, gamma, h, 0) - residual(obs, key, m, shape, gamma, -h, 0)) / (2 * h)) / rM);
    if (isFan(obs)) {
      // the shared offset opens the angle to the flow; in the picture that turns the line one way or the other
      sens.put(Linear.Input.FAN, sens.get(Linear.Input.angle(obs)) * openingSign(obs, e.localFlowDirectionRad()));
    }
    sens.put(Linear.Input.FLOW, -((residual(obs, key, m, shape, gamma, 0, h) - residual(obs, key, m, shape, gamma, 0, -h)) / (2 * h)) / rM);
    for (int k = 0; k < modelAngles; k++) {
      double rp = residual(obs, key, m, ModelAngles.perturbed(shape, k, modelStepRad), gamma, 0, 0);
      double rn = residual(obs, key, m, ModelAngles.perturbed(shape, k, -modelStepRad), gamma, 0, 0);
      if (Double.isFinite(rp) && Double.isFinite(rn)) {
        sens.put(Linear.Input.model(k), -((rp - rn) / (2 * modelStepRad)) / rM);
      }
    }
    double rgp = residual(obs, key, m, shape, gamma + h, 0, 0);
    double rgn = residual(obs, key, m, shape, gamma - h, 0, 0);
    if (Double.isFinite(rgp) && Double.isFinite(rgn)) {
      sens.put(Linear.Input.GAMMA, -((rgp - rgn) / (2 * h)) / rM);
    }
    return new Linear(key.label(), methodFor(e), e.kind(), Optional.of(e.side()), List.of(obs), m, sens);
  }

  /** The Mach number at which theory puts the wave along the observed line, searched outward from mRef. */
  private double solveMach(double mRef, WaveKey key, int obs) {
    double r0 = residual(obs, key, mRef, shape, gamma, 0, 0);
    if (r0 == 0) {
      return mRef;
    }
    if (!Double.isFinite(r0)) {
      throw new WavemarkException(dev.wavemark.core.Problem.NO_SOLUTION,
          "theory has no " + key.label() + " at M = " + WavemarkException.num(mRef));
    }
    for (int dir : new int[] {+1, -1}) {
      double a = mRef;
      for (int step = 1; step <= 20; step++) {
        double b = dir > 0 ? mRef * Math.pow(1.03, step) : 1 + (mRef - 1) * Math.pow(0.97, step);
        double rb = residual(obs, key, b, shape, gamma, 0, 0);
        if (!Double.isFinite(rb)) {
          break;
        }
        if (Math.signum(rb) != Math.signum(r0)) {
          double lo = Math.min(a, b);
          double hi = Math.max(a, b);
          return Roots.solve("Mach number of " + key.label() + " through theory",
              x -> {
                double r = residual(obs, key, x, shape, gamma, 0, 0);
                if (!Double.isFinite(r)) {
                  throw new WavemarkException(dev.wavemark.core.Problem.NO_SOLUTION,
                      "theory loses " + key.label() + " at M = " + WavemarkException.num(x));
                }
                return r;
              }, lo, hi, 1e-10 * hi);
        }
        a = b;
      }
    }
    throw new WavemarkException(dev.wavemark.core.Problem.NO_SOLUTION,
        "no Mach number within the searched range puts " + key.label() + " at the measured angle (started from M = "
            + WavemarkException.num(mRef) + ")");
  }

  private MachEstimate.Method methodFor(ExpectedWave e) {
    if (e.kind() == WaveKind.CONICAL_SHOCK) {
      return MachEstimate.Method.TAYLOR_MACCOLL;
    }
    if (e.kind() == WaveKind.REFLECTED_SHOCK || e.feature() == Feature.IMPINGEMENT) {
      return MachEstimate.Method.SHOCK_REFLECTION;
    }
    if (e.kind() == WaveKind.TRANSMITTED_SHOCK || e.feature() == Feature.INTERSECTION || e.feature() == Feature.TRIPLE_POINT) {
      return MachEstimate.Method.SHOCK_INTERSECTION;
    }
    if (e.kind() == WaveKind.OBLIQUE_SHOCK && e.feature() == Feature.SECOND_CORNER) {
      return MachEstimate.Method.THETA_BETA_M;
    }
    return MachEstimate.Method.SHOCK_EXPANSION;
  }

  private static ExpectedWave need(WaveKey key, List<ExpectedWave> pattern) {
    return key.find(pattern).orElseThrow(() -> new WavemarkException(dev.wavemark.core.Problem.NO_SOLUTION,
        "theory has no " + key.label() + " for the perturbed model"));
  }
}
