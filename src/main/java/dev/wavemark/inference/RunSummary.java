package dev.wavemark.inference;

import dev.wavemark.core.numeric.Measured;
import java.util.List;
import java.util.Optional;

/**
 * One Mach number for a run from its frames.
 *
 * <p>The frames' angle-fit errors are independent and average down; the flow direction, model
 * angle and gamma are common to every frame and do not. The run's uncertainty is therefore the
 * larger of the averaged angle-fit part and the frame-to-frame standard error, added in
 * quadrature to the frame-averaged common parts; {@link #budget} lists them.
 *
 * @param mach the run's Mach number; empty when no frame gave one
 * @param frameScatter sample standard deviation of the frames' Mach numbers about their plain mean (0 for one frame)
 * @param frames frames given (analysed and failed)
 * @param framesWithMach frames that gave a Mach number
 * @param failedFrames frames that could not be analysed at all
 * @param budget the run's uncertainty budget; its contributions add in quadrature to mach's uncertainty
 * @param tunnel the tunnel check, when the run has a Mach number and the tunnel gives a reference
 * @param warnings run-level warnings
 */
public record RunSummary(
    Optional<Measured> mach, double frameScatter, int frames, int framesWithMach, int failedFrames,
    List<BudgetLine> budget, Optional<TunnelCheck> tunnel, List<Warning> warnings) {

  public RunSummary {
    budget = List.copyOf(budget);
    warnings = List.copyOf(warnings);
  }
}
