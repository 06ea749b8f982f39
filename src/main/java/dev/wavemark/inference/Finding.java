package dev.wavemark.inference;

import dev.wavemark.core.model.ExpectedWave;
import dev.wavemark.core.model.WaveKind;

/** A verdict about one wave or one surface of the model, beyond the Mach number. */
public sealed interface Finding {

  /** A one-line human statement of the finding, with its numbers. */
  String message();

  /** The warning code this finding raises. */
  Warning.Code warningCode();

  /**
   * A surface whose deflection exceeds the largest an attached shock can make: the shock stands
   * detached (a bow shock).
   *
   * @param surface which surface, e.g. {@code lower surface (wedge)}
   * @param deflectionRad the surface's flow deflection
   * @param maxDeflectionRad thetaMax at {@code mach} (plane or conical, as the body is)
   * @param mach the Mach number judged at
   * @param machBasis {@code inferred} or {@code nominal}
   * @param bowShock what was measured of the bow shock, e.g. its stand-off; empty when none was
   */
  record Detached(String surface, double deflectionRad, double maxDeflectionRad, double mach, String machBasis, String bowShock)
      implements Finding {
    Detached(String surface, double deflectionRad, double maxDeflectionRad, double mach, String machBasis) {
      this(surface, deflectionRad, maxDeflectionRad, mach, machBasis, "");
    }

    @Override
    public Warning.Code warningCode() {
      return Warning.Code.DETACHED_SHOCK;
    }

    @Override
    public String message() {
      return String.format(java.util.Locale.ROOT,
          "%s: deflection %.2f° exceeds the maximum %.2f° for an attached shock at the %s M = %.3f; the shock detaches%s",
          surface, Math.toDegrees(deflectionRad), Math.toDegrees(maxDeflectionRad), machBasis, mach,
          bowShock.isEmpty() ? "" : "; " + bowShock);
    }
  }

  /** An observed wave that the detector found curved (only its straight part was fitted). */
  record CurvedWave(int observedIndex, WaveKind kind, String label) implements Finding {
    @Override
    public Warning.Code warningCode() {
      return Warning.Code.CURVED_WAVE;
    }

    @Override
    public String message() {
      return "wave #" + observedIndex + " (" + label + ") is curved; only its straight part was measured";
    }
  }

  /** A wave theory says must be in view that no observed line matched. */
  record MissingWave(ExpectedWave expected) implements Finding {
    @Override
    public Warning.Code warningCode() {
      return Warning.Code.MISSING_WAVE;
    }

    @Override
    public String message() {
      return "expected " + expected.label() + " (" + expected.kind().contractName() + ", "
          + expected.side().contractName() + ") was not found in the picture";
    }
  }

  /** An observed line that matches no wave the model makes. */
  record UnmatchedWave(int observedIndex, WaveKind kind) implements Finding {
    @Override
    public Warning.Code warningCode() {
      return Warning.Code.UNMATCHED_WAVE;
    }

    @Override
    public String message() {
      return "wave #" + observedIndex + " (" + kind.contractName() + ") matches no wave the model makes; not used";
    }
  }
}
