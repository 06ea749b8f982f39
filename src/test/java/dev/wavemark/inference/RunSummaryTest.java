package dev.wavemark.inference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.wavemark.core.model.BodyShape;
import dev.wavemark.core.model.ExpectedWave;
import dev.wavemark.core.model.ObservedWave;
import dev.wavemark.core.model.RunSpec;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/** A run of noisy frames of a wedge (theta-beta-M, NACA Report 1135 eq. 138) summarised to one Mach number. */
class RunSummaryTest {
  private static final BodyShape.Wedge WEDGE = new BodyShape.Wedge(Math.toRadians(10), 0, Fixtures.LE, 400);

  private static List<FrameInference> frames(RunSpec run, double truth, int n, double sigma, long seed) {
    Random rnd = new Random(seed);
    List<FrameInference> out = new ArrayList<>();
    for (int k = 0; k < n; k++) {
      List<ObservedWave> obs = new ArrayList<>();
      for (ExpectedWave e : Fixtures.WEDGE_SHOCKS.of(WEDGE, truth, 1.4, 0, Fixtures.W, Fixtures.H)) {
        obs.add(Fixtures.along(e, sigma * rnd.nextGaussian(), sigma));
      }
      out.add(Inference.ofFrame(run, obs, Fixtures.W, Fixtures.H, Fixtures.WEDGE_SHOCKS));
    }
    return out;
  }

  @Test
  void framesAverageDownButTheCommonPartsDoNot() {
    double sigma = Math.toRadians(0.05);
    RunSpec run = Fixtures.run(WEDGE, 0, Math.toRadians(0.05), Math.toRadians(0.05), Fixtures.nominal(2.0));
    List<FrameInference> frames = frames(run, 2.0, 16, sigma, 7L);
    RunSummary s = Inference.summarise(run, frames, 1);
    assertEquals(17, s.frames());
    assertEquals(16, s.framesWithMach());
    assertEquals(1, s.failedFrames());
    double u = s.mach().orElseThrow().uncertainty();
    assertEquals(u, BudgetLine.total(s.budget()), 1e-12);
    double fit = line(s, BudgetLine.Source.ANGLE_FIT);
    double frameFit = line(frames.get(0), BudgetLine.Source.ANGLE_FIT);
    assertEquals(frameFit / 4, fit, 0.02 * frameFit, "angle fit over 16 frames: 1/sqrt(16) of one frame's");
    assertEquals(line(frames.get(0), BudgetLine.Source.MODEL_ANGLE), line(s, BudgetLine.Source.MODEL_ANGLE),
        0.01 * line(frames.get(0), BudgetLine.Source.MODEL_ANGLE),
        "the model angle is common to every frame: it does not average down");
    assertEquals(2.0, s.mach().get().value(), 3 * u);
    double mean = frames.stream().mapToDouble(f -> f.mach().get().value()).average().orElseThrow();
    double ss = frames.stream().mapToDouble(f -> Math.pow(f.mach().get().value() - mean, 2)).sum();
    assertEquals(Math.sqrt(ss / 15), s.frameScatter(), 1e-12);
    assertTrue(s.tunnel().isPresent());
    assertTrue(s.tunnel().get().passes(), s.tunnel().get().toString());
  }

  @Test
  void noFrameWithAMachGivesAWarning() {
    RunSpec run = Fixtures.run(WEDGE, 0, 0, 0, Fixtures.nominal(2.0));
    FrameInference empty = Inference.ofFrame(run, List.of(), Fixtures.W, Fixtures.H, Fixtures.WEDGE_SHOCKS);
    RunSummary s = Inference.summarise(run, List.of(empty), 2);
    assertFalse(s.mach().isPresent());
    assertEquals(3, s.frames());
    assertTrue(s.warnings().stream().anyMatch(w -> w.code() == Warning.Code.NO_MACH_ESTIMATE));
  }

  private static double line(RunSummary s, BudgetLine.Source src) {
    return s.budget().stream().filter(l -> l.source() == src).mapToDouble(BudgetLine::machContribution).sum();
  }

  private static double line(FrameInference f, BudgetLine.Source src) {
    return f.budget().stream().filter(l -> l.source() == src).mapToDouble(BudgetLine::machContribution).sum();
  }
}
