package dev.wavemark.files;

import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.annotation.JsonPropertyOrder;
import com.fasterxml.jackson.core.JsonProcessingException;
import java.nio.file.Path;
import java.util.List;
import org.jspecify.annotations.Nullable;

/**
 * The contract's result file ({@code result.json}), the output of {@code analyze}, with the
 * contract's field names and meanings, extended additively with what the report shows: the run's
 * settings, the uncertainty budget, the theory-predicted waves, per-wave theory values and the
 * tunnel check.
 *
 * <p>Angles in degrees, positions in image pixels, uncertainties are standard uncertainties. A
 * number that is not known (NaN) is written as JSON {@code null}, never as the string "NaN";
 * reading maps such a null back to NaN for plain numbers. Optional extension fields are left out
 * when absent; a failed frame keeps its entry, with {@code error} set and {@code mach} and
 * {@code reflection} null.
 */
@JsonPropertyOrder({"label", "tool", "frames", "summary", "settings"})
public record ResultFile(
    String label, Tool tool, List<Frame> frames, Summary summary,
    @JsonInclude(JsonInclude.Include.NON_NULL) @Nullable Settings settings) {

  public ResultFile {
    frames = List.copyOf(frames);
  }

  /** Which program wrote the file. */
  public record Tool(String name, String version) {}

  /**
   * One frame. {@code index} is the 0-based frame number in the run; {@code file} the image file
   * name (with {@code #page} for a page of a multi-page TIFF).
   */
  @JsonPropertyOrder({"index", "file", "waves", "mach", "reflection", "warnings", "error"})
  public record Frame(
      int index, String file, List<Wave> waves, @Nullable Mach mach, @Nullable Reflection reflection,
      List<String> warnings,
      @JsonInclude(JsonInclude.Include.NON_NULL) @Nullable FrameError error,
      @JsonInclude(JsonInclude.Include.NON_EMPTY) @Nullable List<BudgetItem> budget,
      @JsonInclude(JsonInclude.Include.NON_EMPTY) @Nullable List<Prediction> predicted,
      @JsonInclude(JsonInclude.Include.NON_NULL) @Nullable TunnelCheck tunnel) {
    public Frame {
      waves = List.copyOf(waves);
      warnings = List.copyOf(warnings);
      budget = budget == null ? null : List.copyOf(budget);
      predicted = predicted == null ? null : List.copyOf(predicted);
    }

    /** True when the frame could not be analysed. */
    public boolean failed() {
      return error != null;
    }
  }

  /**
   * A measured wave. Contract fields first; then the extension: the matched theoretical wave's
   * {@code label}, whether the straightness test found it {@code curved}, the body
   * {@code deflectionDeg} that theory used for it, and the wave angle theory predicts at the
   * inferred and at the nominal Mach number; for a wave checked by its direction (a slip line),
   * the {@code check} of that direction against theory.
   */
  @JsonPropertyOrder({"kind", "side", "angleDeg", "uncertaintyDeg", "startPx", "endPx", "support", "rmsResidualPx"})
  public record Wave(
      String kind, @Nullable String side, double angleDeg, double uncertaintyDeg, double[] startPx, double[] endPx,
      int support, double rmsResidualPx,
      @JsonInclude(JsonInclude.Include.NON_NULL) @Nullable String label,
      @JsonInclude(JsonInclude.Include.NON_NULL) @Nullable Boolean curved,
      @JsonInclude(JsonInclude.Include.NON_NULL) @Nullable Double deflectionDeg,
      @JsonInclude(JsonInclude.Include.NON_NULL) @Nullable Double theoryAngleDeg,
      @JsonInclude(JsonInclude.Include.NON_NULL) @Nullable Double nominalTheoryAngleDeg,
      @JsonInclude(JsonInclude.Include.NON_NULL) @Nullable DirectionCheck check,
      @JsonInclude(JsonInclude.Include.NON_NULL) @Nullable BowJson bow) {

    /** A wave without a direction check or a bow-shock measurement. */
    public Wave(String kind, @Nullable String side, double angleDeg, double uncertaintyDeg, double[] startPx, double[] endPx,
        int support, double rmsResidualPx, @Nullable String label, @Nullable Boolean curved, @Nullable Double deflectionDeg,
        @Nullable Double theoryAngleDeg, @Nullable Double nominalTheoryAngleDeg) {
      this(kind, side, angleDeg, uncertaintyDeg, startPx, endPx, support, rmsResidualPx, label, curved, deflectionDeg,
          theoryAngleDeg, nominalTheoryAngleDeg, null, null);
    }
  }

  /**
   * Extension: a measured direction against theory's, both counter-clockwise on screen from the
   * freestream direction, degrees; the difference (measured minus theory) in degrees and in the
   * line's standard uncertainties ({@code differenceSigma}, absent without an uncertainty).
   */
  public record DirectionCheck(
      double measuredDirectionDeg, double theoryDirectionDeg, double differenceDeg,
      @JsonInclude(JsonInclude.Include.NON_NULL) @Nullable Double differenceSigma) {}

  /**
   * Extension: a bow shock's measurement near its vertex. For a bow shock the wave's
   * {@code startPx}-{@code endPx} is its tangent at the vertex and {@code angleDeg} that
   * tangent's angle to the flow (90 for a shock square to the stagnation line).
   *
   * @param standoffPx the shock's distance ahead of the nose on the stagnation line
   * @param standoffUncertaintyPx its standard uncertainty (the fit's, with the detector's floor)
   * @param standoffNoseRadii standoffPx over noseRadiusPx (the nose radius's own uncertainty is
   *     a line of the Mach budget, not part of this)
   * @param vertexRadiusPx the shock's radius of curvature at the vertex
   * @param noseRadiusPx the nose radius from the run file (lens-corrected)
   * @param vertexPx where the shock crosses the stagnation line
   * @param curvePx the fitted shock shape near the nose, sampled (lens-corrected px)
   */
  public record BowJson(double standoffPx, double standoffUncertaintyPx, double standoffNoseRadii, double vertexRadiusPx,
      double vertexRadiusUncertaintyPx, double noseRadiusPx, double[] vertexPx, double[][] curvePx) {}

  /**
   * The frame's Mach number and the estimates it combines. Extension: the consistency test
   * between the estimates ({@code consistent} is false when they disagree beyond their
   * uncertainties; {@code pValue} of the chi-square, {@code birgeRatio} sqrt(chi-square / dof));
   * all three are absent with fewer than two estimates.
   */
  @JsonPropertyOrder({"value", "uncertainty", "estimates"})
  public record Mach(
      double value, double uncertainty, List<Estimate> estimates,
      @JsonInclude(JsonInclude.Include.NON_NULL) @Nullable Boolean consistent,
      @JsonInclude(JsonInclude.Include.NON_NULL) @Nullable Double pValue,
      @JsonInclude(JsonInclude.Include.NON_NULL) @Nullable Double birgeRatio) {
    public Mach {
      estimates = List.copyOf(estimates);
    }
  }

  /**
   * One Mach estimate and the wave(s) it came {@code from}, e.g. "oblique-shock upper
   * leading-edge". Extension: the theory inverted ({@code method}), its {@code weight} in the
   * frame's Mach number, and the positions in {@code waves[]} of the waves it used.
   */
  @JsonPropertyOrder({"from", "value", "uncertainty"})
  public record Estimate(
      String from, double value, double uncertainty,
      @JsonInclude(JsonInclude.Include.NON_NULL) @Nullable String method,
      @JsonInclude(JsonInclude.Include.NON_NULL) @Nullable Double weight,
      @JsonInclude(JsonInclude.Include.NON_NULL) @Nullable List<Integer> waves) {}

  /** The reflection verdict: {@code regular}, {@code mach} or {@code none}, predicted and observed. */
  public record Reflection(String verdict, String predicted, String observed, String reason) {}

  /** Why a frame could not be analysed: the problem's stable code and the one-line message. */
  public record FrameError(String code, String message) {}

  /**
   * One line of the uncertainty budget: the {@code source} code (e.g. "angle-fit"), what it
   * covers ({@code description}), the standard uncertainty of that input in its {@code unit}
   * (angles in degrees), and the standard uncertainty it causes in the Mach number. The lines add
   * in quadrature to the Mach number's uncertainty. {@code systematic} sources are common to every
   * frame of a run and do not average out over a sequence.
   */
  public record BudgetItem(
      String source, String description, double inputUncertainty, String unit, double machUncertainty, boolean systematic) {}

  /** The waves theory predicts at one Mach number ({@code basis}: "inferred" or "nominal"). */
  public record Prediction(String basis, double mach, List<PredictedWave> waves) {
    public Prediction {
      waves = List.copyOf(waves);
    }
  }

  /** A theory-predicted wave placed in the picture. */
  public record PredictedWave(String kind, String side, String label, double angleDeg, double[] startPx, double[] endPx) {}

  /**
   * The tunnel check: the measured Mach number held against each reference the run file allows
   * (the nominal Mach number, and the Mach numbers the pitot readings imply), each judged against
   * the tolerance with twice the measured standard uncertainty as a guard band. {@code verdict}:
   * {@code pass} (every comparison with a tolerance passes), {@code fail} (one fails),
   * {@code inconclusive} (none fails, one cannot be decided), or {@code no-tolerance}.
   */
  public record TunnelCheck(double measuredMach, double measuredUncertainty, List<Comparison> comparisons, List<String> notes,
      String verdict) {
    public TunnelCheck {
      comparisons = List.copyOf(comparisons);
      notes = List.copyOf(notes);
    }
  }

  /**
   * One reference against the measured Mach number: {@code reference} is {@code nominal},
   * {@code pitot/static}, {@code pitot/total} or {@code static/total}; {@code difference} is measured
   * minus reference, {@code differenceInSigma} that over the combined standard uncertainty;
   * {@code outcome} {@code pass} (|difference| + 2u &le; tolerance), {@code fail} (|difference| - 2u
   * &gt; tolerance), {@code inconclusive} (in between) or {@code no-tolerance}.
   */
  public record Comparison(String reference, double referenceMach, double difference, double differenceInSigma,
      @Nullable Double tolerance, String outcome) {}

  /**
   * The run as a whole. Contract fields first ({@code mach} is null when no frame gave a Mach
   * number; {@code nominalMach} when the run file gives none). Extension: the tolerance, the
   * frame-to-frame scatter (sample standard deviation), the run's uncertainty budget, the tunnel
   * check of the run's Mach number, and run-level warnings.
   */
  @JsonPropertyOrder({"mach", "nominalMach", "frames", "failedFrames"})
  public record Summary(
      @Nullable Measure mach, @Nullable Double nominalMach, int frames, int failedFrames,
      @JsonInclude(JsonInclude.Include.NON_NULL) @Nullable Double machTolerance,
      @JsonInclude(JsonInclude.Include.NON_NULL) @Nullable Double machScatter,
      @JsonInclude(JsonInclude.Include.NON_EMPTY) @Nullable List<BudgetItem> budget,
      @JsonInclude(JsonInclude.Include.NON_NULL) @Nullable TunnelCheck tunnel,
      @JsonInclude(JsonInclude.Include.NON_EMPTY) @Nullable List<String> warnings) {
    public Summary {
      budget = budget == null ? null : List.copyOf(budget);
      warnings = warnings == null ? null : List.copyOf(warnings);
    }
  }

  /** A value and its standard uncertainty. */
  public record Measure(double value, double uncertainty) {}

  /**
   * What the run asked for, echoed so that the result file stands alone: the run file, gas, optics,
   * model (as the run file gave it), the resolved calibration, the tunnel, the frames, and which
   * frames the report pictures.
   */
  @JsonInclude(JsonInclude.Include.NON_NULL)
  public record Settings(
      @Nullable String runFile, double gamma, String optics, @Nullable ModelJson model,
      @Nullable CalibrationFile calibration, RunFile.@Nullable TunnelJson tunnel, List<String> images,
      @Nullable String noFlowReference, @Nullable String frameRange, double modelAngleToleranceDeg,
      @Nullable List<Integer> annotatedFrames) {}

  /** Reads a result file, with a one-line error naming the file. */
  public static ResultFile read(Path file) {
    return ResultJson.read(file);
  }

  /** Writes this result atomically (temporary file, then a move). */
  public void write(Path file) {
    Json.writeAtomically(file, toBytes());
  }

  /** The JSON text of this result, UTF-8. */
  public byte[] toBytes() {
    try {
      return ResultJson.MAPPER.writeValueAsBytes(this);
    } catch (JsonProcessingException e) {
      throw new IllegalStateException("a result record could not be serialised", e);
    }
  }
}
