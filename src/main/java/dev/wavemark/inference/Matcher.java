package dev.wavemark.inference;

import dev.wavemark.core.geom.FittedLine;
import dev.wavemark.core.geom.ImageAngles;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.ExpectedWave;
import dev.wavemark.core.model.ObservedWave;
import dev.wavemark.core.model.WaveKind;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * Pairs observed lines with theory waves by kind, side, origin and angle. Each theory wave takes
 * at most one line, except a Mach wave, which stands for its whole family. The assignment is
 * greedy by cost: with a handful of waves per frame and windows far narrower than the angles
 * between waves, greedy and optimal assignment agree, and greedy needs no library.
 */
final class Matcher {
  private Matcher() {}

  /** A pairing: indices into the observed and expected lists. */
  record Pair(int observed, int expected, double cost) {}

  /**
   * @param angleWindowRad largest angle between an observed line and a theory wave to pair them
   * @param originWindowPx largest distance from the theory wave's start to the observed line
   */
  static List<Pair> match(List<ObservedWave> observed, List<ExpectedWave> expected, double angleWindowRad, double originWindowPx) {
    List<Pair> candidates = new ArrayList<>();
    for (int i = 0; i < observed.size(); i++) {
      for (int j = 0; j < expected.size(); j++) {
        double c = cost(observed.get(i), expected.get(j), angleWindowRad, originWindowPx);
        if (Double.isFinite(c)) {
          candidates.add(new Pair(i, j, c));
        }
      }
    }
    candidates.sort(Comparator.comparingDouble(Pair::cost).thenComparingInt(Pair::observed).thenComparingInt(Pair::expected));
    boolean[] usedObs = new boolean[observed.size()];
    boolean[] usedExp = new boolean[expected.size()];
    List<Pair> out = new ArrayList<>();
    for (Pair p : candidates) {
      boolean family = expected.get(p.expected).kind() == WaveKind.MACH_WAVE;
      if (usedObs[p.observed] || (usedExp[p.expected] && !family)) {
        continue;
      }
      usedObs[p.observed] = true;
      usedExp[p.expected] = true;
      out.add(p);
    }
    out.sort(Comparator.comparingInt(Pair::observed));
    return out;
  }

  /** Total cost of a matching plus a penalty per observed line left unmatched (for the start search). */
  static double score(List<Pair> pairs, int observedCount) {
    double s = 0;
    for (Pair p : pairs) {
      s += p.cost;
    }
    return s + 4.0 * (observedCount - pairs.size());
  }

  /** The cost of pairing o with e, or +infinity when they cannot be the same wave. */
  static double cost(ObservedWave o, ExpectedWave e, double angleWindowRad, double originWindowPx) {
    double kindCost = kindCost(o.kind(), e.kind());
    if (!Double.isFinite(kindCost)) {
      return kindCost;
    }
    if (o.side().isPresent() && o.side().get() != e.side()) {
      return Double.POSITIVE_INFINITY;
    }
    FittedLine line = o.line();
    double window = Math.max(angleWindowRad, 4 * line.directionUncertaintyRad());
    double dAngle = Math.abs(lineDifference(line.directionRad(), e.directionRad()));
    if (dAngle > window) {
      return Double.POSITIVE_INFINITY;
    }
    double cost = kindCost + 4 * (dAngle / window) * (dAngle / window);
    if (o.feature().isPresent() && o.feature().get() != e.feature()) {
      cost += 1;
    }
    if (e.kind() != WaveKind.MACH_WAVE) {
      Point2 u = ImageAngles.unit(line.directionRad());
      double dist = Math.abs(u.cross(e.startPx().minus(line.centroid())));
      if (dist > originWindowPx) {
        return Double.POSITIVE_INFINITY;
      }
      // The observed line must lie downstream of the theory wave's start, along the wave.
      double along = line.centroid().minus(e.startPx()).dot(ImageAngles.unit(e.directionRad()));
      if (along < -originWindowPx) {
        return Double.POSITIVE_INFINITY;
      }
      cost += (dist / originWindowPx) * (dist / originWindowPx);
    }
    return cost;
  }

  /** 0 for the same kind, 1 for a near relative the detector may confuse, infinity otherwise. */
  static double kindCost(WaveKind observed, WaveKind expected) {
    if (observed == expected) {
      return 0;
    }
    if (observed == WaveKind.SLIP_LINE || expected == WaveKind.SLIP_LINE) {
      return Double.POSITIVE_INFINITY;
    }
    return observed.isShock() == expected.isShock() ? 1 : Double.POSITIVE_INFINITY;
  }

  /** Signed angle between two undirected lines, in (-pi/2, pi/2]. */
  static double lineDifference(double aRad, double bRad) {
    double d = ImageAngles.wrap(aRad - bRad);
    if (d > 0.5 * Math.PI) {
      d -= Math.PI;
    } else if (d <= -0.5 * Math.PI) {
      d += Math.PI;
    }
    return d;
  }
}
