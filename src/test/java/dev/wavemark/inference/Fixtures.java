package dev.wavemark.inference;

import dev.wavemark.core.gas.Gas;
import dev.wavemark.core.gas.ObliqueShock;
import dev.wavemark.core.gas.ShockBranch;
import dev.wavemark.core.geom.FittedLine;
import dev.wavemark.core.geom.ImageAngles;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.BodyShape;
import dev.wavemark.core.model.Calibration;
import dev.wavemark.core.model.ExpectedWave;
import dev.wavemark.core.model.Feature;
import dev.wavemark.core.model.ObservedWave;
import dev.wavemark.core.model.Optics;
import dev.wavemark.core.model.RunSpec;
import dev.wavemark.core.model.Side;
import dev.wavemark.core.model.Tunnel;
import dev.wavemark.core.model.WaveKind;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/** Test fixtures: runs, theory waves built by hand from core.gas, and observed lines made from them. */
final class Fixtures {
  static final int W = 1024;
  static final int H = 768;
  static final Point2 LE = new Point2(300, 384);

  private Fixtures() {}

  static RunSpec run(BodyShape shape, double flowRad, double flowU, double modelTolRad, Tunnel tunnel) {
    Calibration cal = new Calibration(flowRad, flowU, Optional.empty(), Optional.empty(), Optional.empty());
    return new RunSpec("test", Gas.AIR, List.of(Path.of("frame.png")), Optional.empty(), Optional.empty(), cal,
        Optics.SCHLIEREN_VERTICAL_EDGE, shape, modelTolRad, tunnel);
  }

  static Tunnel nominal(double m) {
    return new Tunnel(Optional.of(m), Optional.of(0.02), Optional.empty());
  }

  /**
   * A wedge's two leading-edge shocks built by hand from theta-beta-M (weak branch), with the
   * incidence convention of the pattern (nose up: the upper surface turns the flow by
   * half-angle - incidence).
   */
  static final PatternSource WEDGE_SHOCKS = (shape, m, g, flow, w, h) -> {
    BodyShape.Wedge wedge = (BodyShape.Wedge) shape;
    List<ExpectedWave> out = new ArrayList<>();
    for (Side side : Side.values()) {
      double theta = wedge.halfAngleRad() - side.sign() * wedge.incidenceRad();
      double beta = ObliqueShock.beta(m, theta, ShockBranch.WEAK, g);
      double dir = ImageAngles.wrap(flow + side.sign() * beta);
      Point2 end = wedge.leadingEdgePx().plus(ImageAngles.unit(dir).times(300));
      out.add(new ExpectedWave(WaveKind.OBLIQUE_SHOCK, side, beta, flow, dir, wedge.leadingEdgePx(), end,
          Feature.LEADING_EDGE, side.contractName() + " leading-edge shock"));
    }
    return out;
  };

  /** An observed line along a theory wave, its direction shifted by {@code errorRad}, with stated uncertainty. */
  static ObservedWave along(ExpectedWave e, double errorRad, double sigmaRad) {
    double dir = e.directionRad() + errorRad;
    Point2 start = e.startPx().plus(ImageAngles.unit(e.directionRad()).times(10));
    Point2 end = start.plus(ImageAngles.unit(dir).times(250));
    Point2 mid = start.plus(end.minus(start).times(0.5));
    FittedLine line = new FittedLine(mid, dir, sigmaRad, start, end, 500, 0.3, false);
    return new ObservedWave(e.kind(), Optional.of(e.side()), line, 0.2, 3.0, Optional.of(e.feature()));
  }

  static ObservedWave curved(ObservedWave o) {
    FittedLine l = o.line();
    return new ObservedWave(o.kind(), o.side(), new FittedLine(l.centroid(), l.directionRad(), l.directionUncertaintyRad(),
        l.startPx(), l.endPx(), l.support(), l.rmsResidualPx(), true), o.contrast(), o.widthPx(), o.feature());
  }
}
