package dev.wavemark.report;

import dev.wavemark.core.gas.ObliqueShock;
import dev.wavemark.core.gas.ShockBranch;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.BodyShape;
import dev.wavemark.files.ModelJson;
import dev.wavemark.files.ResultFile;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.List;

/**
 * Result records built from the physics core, not invented numbers: a 10 deg wedge at M 2 in air,
 * whose weak oblique shock stands at 39.31 deg (NACA Report 1135, chart 2, from memory; computed
 * here with {@link ObliqueShock}).
 */
final class Fixtures {
  static final double GAMMA = 1.4;
  static final double MACH = 2.0;
  static final double WEDGE_DEG = 10.0;
  static final double[] LEADING_EDGE = {160.0, 240.0};
  static final BodyShape WEDGE = new BodyShape.Wedge(Math.toRadians(WEDGE_DEG), 0, new Point2(LEADING_EDGE[0], LEADING_EDGE[1]), 200);

  private Fixtures() {}

  static double betaDeg(double mach) {
    return Math.toDegrees(ObliqueShock.beta(mach, Math.toRadians(WEDGE_DEG), ShockBranch.WEAK, GAMMA));
  }

  /** A wave of the wedge's shock on one side, drawn from the leading edge for {@code lengthPx}. */
  static ResultFile.Wave wave(String side, double angleDeg, double uDeg, double lengthPx) {
    double sign = side.equals("upper") ? 1 : -1;
    double a = Math.toRadians(angleDeg);
    double[] end = {LEADING_EDGE[0] + lengthPx * Math.cos(a), LEADING_EDGE[1] - sign * lengthPx * Math.sin(a)};
    return new ResultFile.Wave("oblique-shock", side, angleDeg, uDeg, LEADING_EDGE.clone(), end, 400, 0.3,
        side + " leading-edge shock", false, WEDGE_DEG, betaDeg(MACH), betaDeg(MACH), null, null);
  }

  /** An analysed frame whose two shocks both stand at the M = {@code mach} angle. */
  static ResultFile.Frame frame(int index, double mach, String file) {
    double beta = betaDeg(mach);
    List<ResultFile.Wave> waves = List.of(wave("upper", beta, 0.04, 220), wave("lower", beta, 0.05, 220));
    double m = ObliqueShock.machFromAngles(Math.toRadians(beta), Math.toRadians(WEDGE_DEG), GAMMA);
    List<ResultFile.Estimate> est = List.of(
        new ResultFile.Estimate("oblique-shock upper leading-edge", m, 0.008, "theta-beta-M", 0.56, List.of(0)),
        new ResultFile.Estimate("oblique-shock lower leading-edge", m, 0.009, "theta-beta-M", 0.44, List.of(1)));
    ResultFile.Mach mm = new ResultFile.Mach(m, 0.006, est, true, 0.8, 0.3);
    List<ResultFile.BudgetItem> budget = List.of(
        new ResultFile.BudgetItem("angle-fit", "angle fit, 2 waves", 0.04, "deg", 0.004, false),
        new ResultFile.BudgetItem("flow-direction", "flow direction", 0.05, "deg", 0.003, true),
        new ResultFile.BudgetItem("model-angle", "model angle", 0.05, "deg", 0.003, true));
    List<ResultFile.PredictedWave> pw = new ArrayList<>();
    for (ResultFile.Wave w : waves) {
      pw.add(new ResultFile.PredictedWave(w.kind(), w.side(), w.label(), w.theoryAngleDeg(), w.startPx(), w.endPx()));
    }
    return new ResultFile.Frame(index, file, waves, mm,
        new ResultFile.Reflection("none", "none", "none", "no reflecting wall in view"), List.of(), null, budget,
        List.of(new ResultFile.Prediction("inferred", m, pw)), null);
  }

  static ResultFile.Frame failed(int index, String file, String code, String message) {
    return new ResultFile.Frame(index, file, List.of(), null, null, List.of(), new ResultFile.FrameError(code, message), null, null, null);
  }

  static ResultFile result(String label, List<ResultFile.Frame> frames) {
    int failed = (int) frames.stream().filter(ResultFile.Frame::failed).count();
    ResultFile.Frame first = frames.stream().filter(f -> !f.failed()).findFirst().orElseThrow();
    double m = first.mach().value();
    ResultFile.TunnelCheck check = new ResultFile.TunnelCheck(m, 0.004,
        List.of(new ResultFile.Comparison("nominal", MACH, m - MACH, (m - MACH) / 0.004, 0.02, Math.abs(m - MACH) <= 0.02 ? "pass" : "fail")),
        List.of(), Math.abs(m - MACH) <= 0.02 ? "pass" : "fail");
    ResultFile.Summary s = new ResultFile.Summary(new ResultFile.Measure(m, 0.004), MACH, frames.size(), failed,
        0.02, null, frames.get(0).budget(), check, List.of());
    ModelJson model = new ModelJson("wedge", WEDGE_DEG, 0.0, LEADING_EDGE.clone(), 200.0, 0.05, null, null, null, null, null, null);
    ResultFile.Settings settings = new ResultFile.Settings("wedge.run.json", GAMMA, "schlieren-vertical-edge", model, null, null,
        List.of("frame-0001.png"), null, null, 0.05, null);
    return new ResultFile(label, new ResultFile.Tool("wavemark", "test"), frames, s, settings);
  }

  /** A plain grey test picture with a bright band along the upper shock, 640 x 480. */
  static Picture picture() {
    BufferedImage img = new BufferedImage(640, 480, BufferedImage.TYPE_BYTE_GRAY);
    Graphics2D g = img.createGraphics();
    g.setColor(new Color(110, 110, 110));
    g.fillRect(0, 0, 640, 480);
    g.dispose();
    return new Picture(img, 1.0);
  }
}
