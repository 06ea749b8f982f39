package dev.wavemark.core.model;

import dev.wavemark.core.geom.ImageAngles;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.PatternBuilder.Turned;
import dev.wavemark.core.model.WavePattern.Slip;
import dev.wavemark.core.model.WavePattern.State;

/**
 * The waves at a sharp trailing edge where an upper and a lower stream meet: each turns (through
 * a shock or a fan) to a common downstream direction, with a slip line between them.
 */
final class TrailingEdge {
  private TrailingEdge() {}

  static void solve(PatternBuilder b, Point2 te, State upper, State lower) {
    // Shock-expansion theory's usual closure: the wake leaves along the freestream direction.
    double out = b.flowDir;
    b.notes.add("trailing-edge waves assume the wake leaves along the freestream direction "
        + "(the usual shock-expansion closure); the pressure-matched direction differs by a fraction of a degree");
    Turned up = b.turn(upper, te, +1, ImageAngles.wrap(out - upper.directionRad()), Feature.TRAILING_EDGE, "upper trailing-edge");
    Turned lo = b.turn(lower, te, -1, -ImageAngles.wrap(out - lower.directionRad()), Feature.TRAILING_EDGE, "lower trailing-edge");
    b.add(up.element());
    b.add(lo.element());
    slip(b, te, out, up.after(), lo.after(), Feature.TRAILING_EDGE, "trailing-edge slip line");
  }

  /** Adds a slip line from {@code at} along {@code dir}, upper (left) and lower (right) states given. */
  static void slip(PatternBuilder b, Point2 at, double dir, State left, State right, Feature f, String label) {
    if (Math.abs(left.density() - right.density()) < 1e-9) {
      return;
    }
    ExpectedWave w = b.wave(WaveKind.SLIP_LINE, Side.UPPER, 0.0, dir, dir, at, f, label);
    b.add(new Slip(w, left, right));
  }
}
