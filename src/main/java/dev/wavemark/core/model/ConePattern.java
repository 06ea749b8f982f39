package dev.wavemark.core.model;

import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;

/** The cone seen from the side: the conical shock of the Taylor-Maccoll solution. */
final class ConePattern {
  private ConePattern() {}

  static void cone(PatternBuilder b, BodyShape.Cone c) {
    throw new WavemarkException(Problem.NO_SOLUTION,
        "the cone pattern needs the Taylor-Maccoll solution of core.gas, which this build does not have yet");
  }
}
