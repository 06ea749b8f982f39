package dev.wavemark.inference;

import dev.wavemark.core.WavemarkException;
import dev.wavemark.core.gas.ShockReflection;
import dev.wavemark.core.model.BodyShape;
import dev.wavemark.core.model.WaveKind;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;

/**
 * The reflection verdict: theory's prediction from the detachment and von Neumann criteria at
 * the Mach number judged ({@link ShockReflection#judge}), against what the picture shows (a Mach stem, or a reflected or
 * transmitted shock without one).
 *
 * <p>Crossing shocks from twin generators are judged on the criteria of a symmetric reflection
 * with the larger deflection (exact for equal deflections, an approximation otherwise).
 */
final class ReflectionJudge {
  private ReflectionJudge() {}

  static ReflectionVerdict judge(BodyShape shape, Optional<Double> mach, String basis, double gamma, Set<WaveKind> seen) {
    double deflection;
    boolean wall;
    if (shape instanceof BodyShape.ShockGenerator g) {
      deflection = g.deflectionRad();
      wall = true;
    } else if (shape instanceof BodyShape.TwinGenerators t) {
      deflection = Math.max(t.upperDeflectionRad(), t.lowerDeflectionRad());
      wall = false;
    } else {
      return new ReflectionVerdict(ReflectionVerdict.Kind.NONE, ReflectionVerdict.Kind.NONE, ReflectionVerdict.Kind.NONE,
          "the " + shape.contractName() + " model makes no shock reflection", Optional.empty());
    }
    ReflectionVerdict.Kind observed = seen.contains(WaveKind.MACH_STEM) ? ReflectionVerdict.Kind.MACH
        : seen.contains(WaveKind.REFLECTED_SHOCK) || (!wall && seen.contains(WaveKind.TRANSMITTED_SHOCK))
            ? ReflectionVerdict.Kind.REGULAR : ReflectionVerdict.Kind.NONE;
    String seenText = switch (observed) {
      case MACH -> "a Mach stem was found";
      case REGULAR -> (wall ? "a reflected" : "a transmitted") + " shock and no Mach stem were found";
      case NONE, DUAL_SOLUTION -> "no reflected shock or Mach stem is in view";
    };
    if (mach.isEmpty()) {
      return new ReflectionVerdict(observed, ReflectionVerdict.Kind.NONE, observed,
          "no Mach number to judge the reflection at; " + seenText, Optional.empty());
    }
    double m = mach.get();
    double vonNeumann;
    double detachment;
    ReflectionVerdict.Kind predicted;
    try {
      ShockReflection.Judgement j = ShockReflection.judge(m, deflection, gamma);
      detachment = j.detachmentDeflectionRad();
      vonNeumann = j.vonNeumannDeflectionRad().orElse(detachment);
      predicted = switch (j.verdict()) {
        case REGULAR -> ReflectionVerdict.Kind.REGULAR;
        case DUAL_SOLUTION -> ReflectionVerdict.Kind.DUAL_SOLUTION;
        case MACH -> ReflectionVerdict.Kind.MACH;
      };
    } catch (WavemarkException e) {
      return new ReflectionVerdict(observed, ReflectionVerdict.Kind.NONE, observed,
          "the reflection criteria at the " + basis + " M = " + WavemarkException.num(m) + " could not be formed ("
              + e.getMessage() + "); " + seenText, Optional.empty());
    }
    String rule = switch (predicted) {
      case MACH -> "beyond the detachment criterion %.2f° (von Neumann %.2f°): Mach reflection";
      case REGULAR -> vonNeumann < detachment ? "below the von Neumann criterion %2$.2f° (detachment %1$.2f°): regular reflection"
          : "below the detachment criterion %.2f° (no von Neumann criterion below it at this Mach number): regular reflection";
      case DUAL_SOLUTION -> "between the von Neumann criterion %2$.2f° and the detachment criterion %1$.2f°: either reflection may occur";
      case NONE -> "";
    };
    String reason = String.format(Locale.ROOT, "at the %s M = %.3f the deflection %.2f° is ", basis, m, Math.toDegrees(deflection))
        + String.format(Locale.ROOT, rule, Math.toDegrees(detachment), Math.toDegrees(vonNeumann)) + "; " + seenText;
    return new ReflectionVerdict(observed, predicted, observed, reason,
        Optional.of(new ReflectionVerdict.Limits(m, basis, deflection, vonNeumann, detachment)));
  }
}
