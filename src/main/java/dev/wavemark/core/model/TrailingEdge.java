package dev.wavemark.core.model;

import dev.wavemark.core.gas.Profile;
import dev.wavemark.core.gas.ShockExpansion;
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

  /**
   * The trailing-edge waves of {@code profile} by {@link ShockExpansion}: each stream turns to the
   * pressure-matched direction of the slip line.
   */
  static void solve(PatternBuilder b, Point2 te, State upper, State lower, Profile profile, double incidenceRad) {
    ShockExpansion.Solution sol = ShockExpansion.solve(profile, b.free.mach(), incidenceRad, b.gamma);
    if (!(sol.trailingEdge() instanceof ShockExpansion.Sharp sharp)) {
      return;
    }
    double out = ImageAngles.wrap(b.flowDir + sharp.slipLine().directionRad());
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
