package dev.wavemark.core.model;

import dev.wavemark.core.geom.ImageAngles;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.PatternBuilder.Turned;
import dev.wavemark.core.model.WavePattern.Element;
import dev.wavemark.core.model.WavePattern.State;
import java.util.List;
import org.jspecify.annotations.Nullable;

/**
 * Shock-expansion theory for plane bodies in a free stream: the wedge, the diamond airfoil and the
 * flat plate (Liepmann and Roshko, "Elements of Gasdynamics", 1957, sec. 4.15 and 8.6, from memory).
 * Incidence is positive nose up: the body axis points along flowDirection - incidence.
 */
final class PlanarBodies {
  private PlanarBodies() {}

  static void wedge(PatternBuilder b, BodyShape.Wedge w) {
    double axis = b.flowDir - w.incidenceRad();
    double h = w.halfAngleRad();
    Point2 le = w.leadingEdgePx();
    double face = w.chordPx() / Math.cos(h);
    Point2 su = le.plus(ImageAngles.unit(axis + h).times(face));
    Point2 sl = le.plus(ImageAngles.unit(axis - h).times(face));
    Point2 back = ImageAngles.unit(axis).times(b.far());
    b.solids.add(List.of(le, su, su.plus(back), sl.plus(back), sl));

    for (int sign : new int[] {+1, -1}) {
      String s = sign > 0 ? "upper" : "lower";
      Turned lead = b.turn(b.free, le, sign, h - sign * w.incidenceRad(), Feature.LEADING_EDGE, s + " leading-edge");
      Turned shoulder = b.turn(lead.after(), sign > 0 ? su : sl, sign, -h, Feature.SHOULDER, s + " shoulder");
      addInteracting(b, lead.element(), shoulder.element());
    }
    b.notes.add("leading-edge shocks are straight only up to where the shoulder expansion meets them; beyond, they weaken and curve");
  }

  static void diamond(PatternBuilder b, BodyShape.Diamond d) {
    double axis = b.flowDir - d.incidenceRad();
    double h = d.halfAngleRad();
    Point2 le = d.leadingEdgePx();
    double face = 0.5 * d.chordPx() / Math.cos(h);
    Point2 su = le.plus(ImageAngles.unit(axis + h).times(face));
    Point2 sl = le.plus(ImageAngles.unit(axis - h).times(face));
    Point2 te = le.plus(ImageAngles.unit(axis).times(d.chordPx()));
    b.solids.add(List.of(le, su, te, sl));

    State[] rear = new State[2];
    for (int sign : new int[] {+1, -1}) {
      String s = sign > 0 ? "upper" : "lower";
      Turned lead = b.turn(b.free, le, sign, h - sign * d.incidenceRad(), Feature.LEADING_EDGE, s + " leading-edge");
      Turned shoulder = b.turn(lead.after(), sign > 0 ? su : sl, sign, -2 * h, Feature.SHOULDER, s + " shoulder");
      addInteracting(b, lead.element(), shoulder.element());
      rear[sign > 0 ? 0 : 1] = shoulder.after();
    }
    TrailingEdge.solve(b, te, rear[0], rear[1], dev.wavemark.core.gas.Profile.diamond(h, d.chordPx()), d.incidenceRad());
  }

  static void flatPlate(PatternBuilder b, BodyShape.FlatPlate p) {
    double axis = b.flowDir - p.incidenceRad();
    Point2 le = p.leadingEdgePx();
    Point2 te = le.plus(ImageAngles.unit(axis).times(p.chordPx()));
    Point2 n = ImageAngles.unit(axis + 0.5 * Math.PI).times(1.0);
    b.solids.add(List.of(le.plus(n), te.plus(n), te.minus(n), le.minus(n)));
    State[] rear = new State[2];
    for (int sign : new int[] {+1, -1}) {
      String s = sign > 0 ? "upper" : "lower";
      Turned lead = b.turn(b.free, le, sign, -sign * p.incidenceRad(), Feature.LEADING_EDGE, s + " leading-edge");
      b.add(lead.element());
      rear[sign > 0 ? 0 : 1] = lead.after();
    }
    TrailingEdge.solve(b, te, rear[0], rear[1], dev.wavemark.core.gas.Profile.flatPlate(p.chordPx()), p.incidenceRad());
  }

  /** Adds a leading-edge wave and the shoulder fan behind it, each ended where it meets the other. */
  static void addInteracting(PatternBuilder b, @Nullable Element lead, @Nullable Element shoulder) {
    if (lead instanceof WavePattern.Shock && shoulder != null) {
      ExpectedWave shock = PatternBuilder.lead(lead);
      ExpectedWave head = PatternBuilder.lead(shoulder);
      lead = PatternBuilder.endAt(lead, head);
      shoulder = PatternBuilder.endAt(shoulder, shock);
    }
    b.add(lead);
    b.add(shoulder);
  }
}
