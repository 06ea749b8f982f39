package dev.wavemark.inference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.wavemark.core.gas.ShockReflection;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.BodyShape;
import dev.wavemark.core.model.ExpectedWave;
import dev.wavemark.core.model.ObservedWave;
import dev.wavemark.core.model.RunSpec;
import dev.wavemark.core.model.Side;
import dev.wavemark.core.model.WaveKind;
import dev.wavemark.core.model.WavePattern;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;

/**
 * Reflection criteria and verdicts. Reference: for gamma = 1.4 at M = 5 the dual-solution domain
 * of a wall reflection spans incident deflections from 20.9° (von Neumann) to 27.7°-27.8°
 * (detachment) (Ben-Dor, "Shock Wave Reflection Phenomena", 2007, and the M = 5 dual-solution
 * experiments and simulations it reviews; from memory). Below M of about 2.2 the two criteria
 * coincide (same source, from memory).
 */
class ReflectionTest {
  /** The references are recalled to 0.1°. */
  private static final double CRITERIA_TOL_DEG = 0.1;
  private static final BodyShape.Wall WALL = new BodyShape.Wall(new Point2(0, 600), new Point2(1000, 600), Side.LOWER);

  private static BodyShape.ShockGenerator generator(double deg) {
    return new BodyShape.ShockGenerator(Math.toRadians(deg), new Point2(150, 250), WALL);
  }

  @Test
  void criteriaAtMachFiveMatchThePublishedDualSolutionDomain() {
    assertEquals(20.9, Math.toDegrees(ShockReflection.vonNeumann(5, 1.4).deflectionRad()), CRITERIA_TOL_DEG);
    assertEquals(27.75, Math.toDegrees(ShockReflection.detachment(5, 1.4).deflectionRad()), CRITERIA_TOL_DEG);
  }

  @Test
  void belowMachTwoPointTwoThereIsNoDualSolutionDomain() {
    ReflectionVerdict v = ReflectionJudge.judge(generator(12.8), Optional.of(2.0), "inferred", 1.4, EnumSet.of(WaveKind.REFLECTED_SHOCK));
    assertEquals(ReflectionVerdict.Kind.REGULAR, v.predicted());
    ReflectionVerdict.Limits l = v.limits().orElseThrow();
    assertEquals(l.detachmentDeflectionRad(), l.vonNeumannDeflectionRad(), 0.0);
  }

  @Test
  void regular() {
    ReflectionVerdict v = ReflectionJudge.judge(generator(8), Optional.of(2.5), "inferred", 1.4, EnumSet.of(WaveKind.REFLECTED_SHOCK));
    assertEquals(ReflectionVerdict.Kind.REGULAR, v.predicted());
    assertEquals(ReflectionVerdict.Kind.REGULAR, v.observed());
    assertEquals(ReflectionVerdict.Kind.REGULAR, v.verdict());
  }

  @Test
  void mach() {
    ReflectionVerdict v = ReflectionJudge.judge(generator(20), Optional.of(2.5), "nominal", 1.4,
        EnumSet.of(WaveKind.OBLIQUE_SHOCK, WaveKind.MACH_STEM, WaveKind.REFLECTED_SHOCK));
    assertEquals(ReflectionVerdict.Kind.MACH, v.predicted());
    assertEquals(ReflectionVerdict.Kind.MACH, v.observed());
    assertEquals(ReflectionVerdict.Kind.MACH, v.verdict());
  }

  @Test
  void dualSolutionDomain() {
    ReflectionVerdict v = ReflectionJudge.judge(generator(23), Optional.of(5.0), "inferred", 1.4, EnumSet.of(WaveKind.REFLECTED_SHOCK));
    assertEquals(ReflectionVerdict.Kind.DUAL_SOLUTION, v.predicted());
    assertEquals(ReflectionVerdict.Kind.REGULAR, v.verdict());
    assertTrue(v.reason().contains("either"), v.reason());
  }

  @Test
  void noneWhenTheModelMakesNoReflectionOrNoneIsInView() {
    ReflectionVerdict wedge = ReflectionJudge.judge(new BodyShape.Wedge(0.1, 0, Fixtures.LE, 100), Optional.of(2.0), "inferred", 1.4,
        EnumSet.of(WaveKind.OBLIQUE_SHOCK));
    assertEquals(ReflectionVerdict.Kind.NONE, wedge.verdict());
    assertEquals(ReflectionVerdict.Kind.NONE, wedge.predicted());
    ReflectionVerdict unseen = ReflectionJudge.judge(generator(8), Optional.of(2.5), "inferred", 1.4, EnumSet.of(WaveKind.OBLIQUE_SHOCK));
    assertEquals(ReflectionVerdict.Kind.NONE, unseen.verdict());
    assertEquals(ReflectionVerdict.Kind.REGULAR, unseen.predicted());
  }

  /**
   * At M = 2 (gamma = 1.4) a wall reflection is regular up to an incident deflection of about
   * 12.9° (from memory; the oblique-shock relations of NACA Report 1135 solved independently of
   * this code, with a reflected shock that just reaches the maximum deflection behind the
   * incident one, give 12.90°), and there is no von Neumann criterion below it (Ben-Dor, as
   * above: no dual-solution domain below M of about 2.2; from memory).
   */
  private static final double DETACHMENT_M2_DEG = 12.90;

  @Test
  void regularAtMachTwoBelowTheDetachmentCriterion() {
    // 8° at M = 2, the conditions of the regular-reflection sample: below 12.9°
    ReflectionVerdict v = ReflectionJudge.judge(generator(8), Optional.of(2.0), "inferred", 1.4,
        EnumSet.of(WaveKind.OBLIQUE_SHOCK, WaveKind.REFLECTED_SHOCK));
    assertEquals(DETACHMENT_M2_DEG, Math.toDegrees(v.limits().orElseThrow().detachmentDeflectionRad()), CRITERIA_TOL_DEG);
    assertEquals(ReflectionVerdict.Kind.REGULAR, v.predicted());
    assertEquals(ReflectionVerdict.Kind.REGULAR, v.observed());
    assertEquals(ReflectionVerdict.Kind.REGULAR, v.verdict());
  }

  @Test
  void machAtMachTwoBeyondTheDetachmentCriterion() {
    // 14° at M = 2, the conditions of the Mach-reflection sample: beyond 12.9°
    ReflectionVerdict v = ReflectionJudge.judge(generator(14), Optional.of(2.0), "inferred", 1.4,
        EnumSet.of(WaveKind.OBLIQUE_SHOCK, WaveKind.MACH_STEM, WaveKind.REFLECTED_SHOCK));
    assertEquals(DETACHMENT_M2_DEG, Math.toDegrees(v.limits().orElseThrow().detachmentDeflectionRad()), CRITERIA_TOL_DEG);
    assertEquals(ReflectionVerdict.Kind.MACH, v.predicted());
    assertEquals(ReflectionVerdict.Kind.MACH, v.observed());
    assertEquals(ReflectionVerdict.Kind.MACH, v.verdict());
  }

  @Test
  void dualSolutionDomainAtMachFiveBetweenThePublishedCriteria() {
    // 21.5° and 27.0° lie inside 20.9°-27.75° at M = 5 (Ben-Dor, as above); 20.0° below, 28.5° beyond
    assertEquals(ReflectionVerdict.Kind.DUAL_SOLUTION, predicted(21.5, 5.0));
    assertEquals(ReflectionVerdict.Kind.DUAL_SOLUTION, predicted(27.0, 5.0));
    assertEquals(ReflectionVerdict.Kind.REGULAR, predicted(20.0, 5.0));
    assertEquals(ReflectionVerdict.Kind.MACH, predicted(28.5, 5.0));
    // either reflection may be seen there; the verdict is what the picture shows
    ReflectionVerdict seenMach = ReflectionJudge.judge(generator(24), Optional.of(5.0), "inferred", 1.4,
        EnumSet.of(WaveKind.MACH_STEM, WaveKind.REFLECTED_SHOCK));
    assertEquals(ReflectionVerdict.Kind.MACH, seenMach.verdict());
  }

  private static ReflectionVerdict.Kind predicted(double deflectionDeg, double mach) {
    return ReflectionJudge.judge(generator(deflectionDeg), Optional.of(mach), "inferred", 1.4, EnumSet.noneOf(WaveKind.class)).predicted();
  }

  @Test
  void noneWhenAMachReflectionIsPredictedButNothingIsInView() {
    ReflectionVerdict v = ReflectionJudge.judge(generator(14), Optional.of(2.0), "inferred", 1.4, EnumSet.of(WaveKind.OBLIQUE_SHOCK));
    assertEquals(ReflectionVerdict.Kind.MACH, v.predicted());
    assertEquals(ReflectionVerdict.Kind.NONE, v.observed());
    assertEquals(ReflectionVerdict.Kind.NONE, v.verdict());
    ReflectionVerdict noMach = ReflectionJudge.judge(generator(14), Optional.empty(), "inferred", 1.4, EnumSet.of(WaveKind.MACH_STEM));
    assertEquals(ReflectionVerdict.Kind.NONE, noMach.predicted());
    assertEquals(ReflectionVerdict.Kind.MACH, noMach.verdict());
  }

  @Test
  void endToEndRegularReflectionAndADisagreementWarning() {
    BodyShape shape = generator(8);
    RunSpec run = Fixtures.run(shape, 0, 0, 0, Fixtures.nominal(2.4));
    List<ObservedWave> obs = new ArrayList<>();
    for (ExpectedWave e : WavePattern.of(shape, 2.5, 1.4, 0, Fixtures.W, Fixtures.H)) {
      obs.add(Fixtures.along(e, 0, Math.toRadians(0.05)));
    }
    FrameInference f = Inference.ofFrame(run, obs, Fixtures.W, Fixtures.H);
    assertEquals(ReflectionVerdict.Kind.REGULAR, f.reflection().verdict(), f.reflection().reason());
    assertFalse(f.warnings().stream().anyMatch(w -> w.code() == Warning.Code.REFLECTION_DISAGREES));

    // A Mach stem where theory predicts a regular reflection.
    ObservedWave reflected = obs.get(obs.size() - 1);
    ObservedWave stem = new ObservedWave(WaveKind.MACH_STEM, Optional.empty(), reflected.line(), 0.3, 3, Optional.empty());
    List<ObservedWave> withStem = new ArrayList<>(obs);
    withStem.set(obs.size() - 1, stem);
    FrameInference g = Inference.ofFrame(run, withStem, Fixtures.W, Fixtures.H);
    assertEquals(ReflectionVerdict.Kind.MACH, g.reflection().verdict());
    assertEquals(ReflectionVerdict.Kind.REGULAR, g.reflection().predicted());
    assertTrue(g.warnings().stream().anyMatch(w -> w.code() == Warning.Code.REFLECTION_DISAGREES), g.warnings().toString());
  }

  @Test
  void endToEndMachReflection() {
    // 20° at M = 2.5 lies beyond the detachment criterion (about 18°): a Mach reflection.
    BodyShape shape = generator(20);
    RunSpec run = Fixtures.run(shape, 0, 0, 0, Fixtures.nominal(2.3));
    List<ObservedWave> obs = new ArrayList<>();
    for (ExpectedWave e : WavePattern.of(shape, 2.5, 1.4, 0, Fixtures.W, Fixtures.H)) {
      obs.add(Fixtures.along(e, 0, Math.toRadians(0.05)));
    }
    FrameInference f = Inference.ofFrame(run, obs, Fixtures.W, Fixtures.H);
    assertEquals(2.5, f.mach().orElseThrow(() -> new AssertionError(f.warnings().toString())).value(), 1e-6, f.estimates().toString());
    assertEquals(ReflectionVerdict.Kind.MACH, f.reflection().verdict(), f.reflection().reason());
    assertEquals(ReflectionVerdict.Kind.MACH, f.reflection().predicted());
    assertFalse(f.warnings().stream().anyMatch(w -> w.code() == Warning.Code.REFLECTION_DISAGREES), f.warnings().toString());
  }

  @Test
  void incidentShockAloneWhenTheoryHasNoPattern() {
    // A pattern source that, like an older pattern, has no solution beyond detachment.
    BodyShape shape = generator(20);
    PatternSource strict = (sh, m, g, fl, w, h) -> {
      if (sh instanceof BodyShape.ShockGenerator) {
        throw new dev.wavemark.core.WavemarkException(dev.wavemark.core.Problem.SHOCK_DETACHED, "20", "18", "2.5");
      }
      return WavePattern.of(sh, m, g, fl, w, h);
    };
    PatternSource withFallback = Fallbacks.incidentShocksWhenNoRegularReflection(strict);
    RunSpec run = Fixtures.run(shape, 0, 0, 0, Fixtures.nominal(2.3));
    ExpectedWave incident = WavePattern.of(shape, 2.5, 1.4, 0, Fixtures.W, Fixtures.H).get(0);
    ObservedWave shock = Fixtures.along(incident, 0, Math.toRadians(0.05));
    ObservedWave stem = new ObservedWave(WaveKind.MACH_STEM, Optional.empty(),
        new dev.wavemark.core.geom.FittedLine(new Point2(560, 560), Math.toRadians(90), 0.01, new Point2(560, 520),
            new Point2(560, 600), 80, 0.4, false), 0.3, 3, Optional.empty());
    FrameInference f = Inference.ofFrame(run, List.of(shock, stem), Fixtures.W, Fixtures.H, withFallback);
    assertEquals(2.5, f.mach().orElseThrow(() -> new AssertionError(f.warnings().toString())).value(), 1e-6);
    assertEquals(ReflectionVerdict.Kind.MACH, f.reflection().verdict(), f.reflection().reason());
    assertTrue(f.warnings().isEmpty(), f.warnings().toString());
  }
}
