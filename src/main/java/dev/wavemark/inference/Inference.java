package dev.wavemark.inference;

import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import dev.wavemark.core.model.ObservedWave;
import dev.wavemark.core.model.RunSpec;
import dev.wavemark.core.model.Tunnel;
import dev.wavemark.core.model.WavePattern;
import dev.wavemark.core.numeric.Checks;
import dev.wavemark.core.numeric.Measured;
import java.util.List;

/**
 * The inference entry points: one frame's observed waves to a Mach number with its budget and
 * verdicts, a run's frames to one Mach number, and the tunnel check.
 *
 * <p>None of them throws for what a picture may lack (no wave found, a wave that admits no Mach
 * number, inconsistent estimates): those come back as warnings in the result. They throw
 * {@link WavemarkException} only for arguments no picture can cause (a non-positive frame size).
 */
public final class Inference {
  /** The production theory: the model's full pattern, or its incident shocks where no regular reflection exists. */
  private static final PatternSource PRODUCTION = Fallbacks.incidentShocksWhenNoRegularReflection(WavePattern::of);

  private Inference() {}

  /**
   * Tuning of the inference, with documented defaults ({@link #DEFAULTS}).
   *
   * @param gammaUncertainty standard uncertainty assumed for gamma in the budget. Default 0.002:
   *     the run file gives none; dry air's ideal-gas gamma changes by about that much between
   *     200 K and 300 K (from memory), and humidity adds a little more
   * @param testLevel the consistency test fails when the chi-square p-value is below this (default 0.01)
   * @param scaleByBirgeRatio scale the uncertainty by the Birge ratio when it exceeds 1 (default
   *     true, Particle Data Group practice)
   * @param maxIterations match, invert, re-predict cycles at most (default 8)
   * @param initialAngleWindowRad angle window of the first match from the starting Mach number
   *     (default 10°: a 10% error in Mach moves a wedge shock by about 5° at M = 2)
   * @param refinedAngleWindowRad angle window once re-predicted at the inferred Mach number (default 3°)
   */
  public record Options(
      double gammaUncertainty, double testLevel, boolean scaleByBirgeRatio,
      int maxIterations, double initialAngleWindowRad, double refinedAngleWindowRad) {
    public static final Options DEFAULTS = new Options(0.002, 0.01, true, 8, Math.toRadians(10), Math.toRadians(3));

    public Options {
      Checks.inClosed("gammaUncertainty", gammaUncertainty, 0, 0.2);
      Checks.inOpen("testLevel", testLevel, 0, 1);
      Checks.inClosed("maxIterations", maxIterations, 1, 100);
      Checks.inOpen("initialAngleWindowRad", initialAngleWindowRad, 0, 0.5 * Math.PI);
      Checks.inOpen("refinedAngleWindowRad", refinedAngleWindowRad, 0, 0.5 * Math.PI);
    }
  }

  /**
   * Infers one frame: matches the observed waves to those the model makes (theory from
   * {@link WavePattern}), inverts each to a Mach number, combines them with a budget and a
   * consistency test, and judges reflection, detachment, curved and missing waves.
   *
   * @param run the run: model, gas, calibration (flow direction and its uncertainty), model angle
   *     tolerance and tunnel (its nominal Mach number is the starting point, when given)
   * @param observed the detector's waves, lines in lens-corrected image pixels
   * @param widthPx picture width, for where theory waves leave the picture
   * @param heightPx picture height
   * @throws WavemarkException bad-argument for a non-positive picture size; nothing a picture can cause
   */
  public static FrameInference ofFrame(RunSpec run, List<ObservedWave> observed, int widthPx, int heightPx) {
    return ofFrame(run, observed, widthPx, heightPx, Options.DEFAULTS, PRODUCTION);
  }

  /** As {@link #ofFrame(RunSpec, List, int, int)} with explicit options. */
  public static FrameInference ofFrame(RunSpec run, List<ObservedWave> observed, int widthPx, int heightPx, Options options) {
    return ofFrame(run, observed, widthPx, heightPx, options, PRODUCTION);
  }

  static FrameInference ofFrame(RunSpec run, List<ObservedWave> observed, int widthPx, int heightPx, PatternSource patterns) {
    return ofFrame(run, observed, widthPx, heightPx, Options.DEFAULTS, patterns);
  }

  static FrameInference ofFrame(
      RunSpec run, List<ObservedWave> observed, int widthPx, int heightPx, Options options, PatternSource patterns) {
    if (widthPx <= 0 || heightPx <= 0) {
      throw new WavemarkException(Problem.BAD_ARGUMENT, "frame size " + widthPx + " x " + heightPx + " px must be positive");
    }
    return new FrameAnalysis(run, List.copyOf(observed), widthPx, heightPx, options, patterns).run();
  }

  /**
   * One Mach number for a run from its analysed frames, the frame-to-frame scatter and the
   * tunnel check (see {@link RunSummary} for how the uncertainty is formed).
   *
   * @param frames the frames that were analysed (frames without a Mach number are counted, not used)
   * @param failedFrames frames that could not be analysed at all
   */
  public static RunSummary summarise(RunSpec run, List<FrameInference> frames, int failedFrames) {
    return RunSummaries.of(run, frames, failedFrames);
  }

  /**
   * The tunnel check of a Mach number against the tunnel's nominal Mach number and its pitot
   * readings.
   *
   * @param gamma ratio of specific heats for the pitot relations
   */
  public static TunnelCheck checkTunnel(Tunnel tunnel, double gamma, Measured inferred) {
    return TunnelChecks.of(tunnel, gamma, inferred);
  }
}
