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
   * inferred and at the nominal Mach number.
   */
  @JsonPropertyOrder({"kind", "side", "angleDeg", "uncertaintyDeg", "startPx", "endPx", "support", "rmsResidualPx"})
  public record Wave(
      String kind, @Nullable String side, double angleDeg, double uncertaintyDeg, double[] startPx, double[] endPx,
      int support, double rmsResidualPx,
      @JsonInclude(JsonInclude.Include.NON_NULL) @Nullable String label,
      @JsonInclude(JsonInclude.Include.NON_NULL) @Nullable Boolean curved,
      @JsonInclude(JsonInclude.Include.NON_NULL) @Nullable Double deflectionDeg,
      @JsonInclude(JsonInclude.Include.NON_NULL) @Nullable Double theoryAngleDeg,
      @JsonInclude(JsonInclude.Include.NON_NULL) @Nullable Double nominalTheoryAngleDeg) {}

  /**
   * The frame's Mach number and the estimates it combines. Extension: {@code consistent} is false
   * when the estimates disagree beyond their uncertainties.
   */
  @JsonPropertyOrder({"value", "uncertainty", "estimates"})
  public record Mach(
      double value, double uncertainty, List<Estimate> estimates,
      @JsonInclude(JsonInclude.Include.NON_NULL) @Nullable Boolean consistent) {
    public Mach {
      estimates = List.copyOf(estimates);
    }
  }

  /** One Mach estimate and the wave(s) it came {@code from}, e.g. "oblique-shock upper". */
  public record Estimate(String from, double value, double uncertainty) {}

  /** The reflection verdict: {@code regular}, {@code mach} or {@code none}, predicted and observed. */
  public record Reflection(String verdict, String predicted, String observed, String reason) {}

  /** Why a frame could not be analysed: the problem's stable code and the one-line message. */
  public record FrameError(String code, String message) {}

  /**
   * One line of the uncertainty budget: the {@code source} (e.g. "angle fit"), the standard
   * uncertainty of that input in its {@code unit}, and the standard uncertainty it causes in the
   * frame's Mach number. {@code systematic} sources are shared by every frame of the run and do not
   * average out over a sequence.
   */
  public record BudgetItem(String source, double inputUncertainty, String unit, double machUncertainty, boolean systematic) {}

  /** The waves theory predicts at one Mach number ({@code basis}: "inferred" or "nominal"). */
  public record Prediction(String basis, double mach, List<PredictedWave> waves) {
    public Prediction {
      waves = List.copyOf(waves);
    }
  }

  /** A theory-predicted wave placed in the picture. */
  public record PredictedWave(String kind, String side, String label, double angleDeg, double[] startPx, double[] endPx) {}

  /**
   * The tunnel check: the measured Mach number against the nominal Mach number and against the
   * Mach number from the pitot readings, each passed or failed against the tolerance. Absent parts
   * are null.
   */
  @JsonInclude(JsonInclude.Include.NON_NULL)
  public record TunnelCheck(
      double measuredMach, @Nullable Double nominalMach, @Nullable Double machTolerance,
      @Nullable Double nominalDeviation, @Nullable Boolean nominalPass,
      @Nullable Double pitotMach, @Nullable String pitotFrom, @Nullable Double pitotDeviation, @Nullable Boolean pitotPass,
      String verdict) {}

  /**
   * The run as a whole. Contract fields first ({@code mach} is null when no frame was analysed;
   * {@code nominalMach} when the run file gives none). Extension: the tolerance, the frame-to-frame
   * scatter, and the tunnel check of the summary Mach number.
   */
  @JsonPropertyOrder({"mach", "nominalMach", "frames", "failedFrames"})
  public record Summary(
      @Nullable Measure mach, @Nullable Double nominalMach, int frames, int failedFrames,
      @JsonInclude(JsonInclude.Include.NON_NULL) @Nullable Double machTolerance,
      @JsonInclude(JsonInclude.Include.NON_NULL) @Nullable Double machScatter,
      @JsonInclude(JsonInclude.Include.NON_NULL) @Nullable TunnelCheck tunnel) {}

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
