package dev.wavemark.files;

import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.databind.JsonNode;
import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import dev.wavemark.core.model.Calibration;
import java.nio.file.Files;
import java.nio.file.Path;
import org.jspecify.annotations.Nullable;

/**
 * A scene file ({@code *.scene.json}), the input of {@code wavemark render}: the flow, the model
 * (the run file's {@code model} object, in ideal lens-free pixels), the optics and the bench.
 * Only {@code mach} and {@code model} are required; everything else has a bench default.
 *
 * @param label free text, copied into the truth and run files
 * @param seed the noise and jitter seed; the same seed gives the same picture
 * @param sizePx picture [width, height]
 * @param mach freestream Mach number
 * @param flowDirectionDeg freestream direction in the picture (the camera's roll), contract sense
 * @param optics the contract's optics name (not {@code auto})
 * @param calibration the bench's calibration: a path (relative to the scene file) or an inline object;
 *     its lens and window are rendered, its scale sets the pixel size
 * @param sequence when present, a multi-page sequence instead of one picture
 * @param reference true to render the no-flow reference frame beside the picture
 * @param tunnel copied into the run file as is
 */
@JsonInclude(JsonInclude.Include.NON_NULL)
public record SceneFile(
    @Nullable String label, @Nullable Long seed, int @Nullable [] sizePx, RunFile.@Nullable GasJson gas,
    @Nullable Double mach, @Nullable Double flowDirectionDeg, @Nullable ModelJson model, @Nullable String optics,
    @Nullable BenchJson bench, @Nullable JsonNode calibration, @Nullable SequenceJson sequence,
    @Nullable Boolean reference, RunFile.@Nullable TunnelJson tunnel) {

  /** Bench and camera parameters; each absent field keeps its default (see {@code Bench.defaults}). */
  @JsonInclude(JsonInclude.Include.NON_NULL)
  public record BenchJson(
      @Nullable Integer edgeSign, @Nullable Double cutFraction, @Nullable Double focalLengthM, @Nullable Double sourceImageM,
      @Nullable Double screenDistanceM, @Nullable Double spanM, @Nullable Double gladstoneDale,
      @Nullable Double freestreamDensityKgM3, @Nullable Double shockThicknessPx, @Nullable Double blurPx,
      @Nullable Double defocusPx, @Nullable Integer bitDepth, @Nullable Double fullWellE, @Nullable Double readNoiseE,
      @Nullable Double exposure, @Nullable Double falloff, @Nullable Double tilt, @Nullable Integer dustSpecks,
      @Nullable Long benchSeed) {}

  /**
   * A run of frames with small run-to-run variation.
   *
   * @param frames number of frames
   * @param machDriftPerFrame steady change of the Mach number from one frame to the next
   * @param machJitter standard deviation of the frame-to-frame Mach scatter
   * @param shockJitterPx standard deviation of each wave's position scatter, pixels
   */
  @JsonInclude(JsonInclude.Include.NON_NULL)
  public record SequenceJson(int frames, @Nullable Double machDriftPerFrame, @Nullable Double machJitter, @Nullable Double shockJitterPx) {}

  public static SceneFile read(Path file) {
    SceneFile s = Json.read(file, SceneFile.class, "scene file");
    if (s.mach == null) {
      throw new WavemarkException(Problem.JSON_INVALID, file, "the scene needs 'mach', the freestream Mach number");
    }
    if (s.model == null) {
      throw new WavemarkException(Problem.JSON_INVALID, file, "the scene needs a 'model' object (as in a run file)");
    }
    if (s.sizePx != null && s.sizePx.length != 2) {
      throw new WavemarkException(Problem.JSON_INVALID, file, "sizePx must be [width, height]");
    }
    if (s.sequence != null && (s.sequence.frames < 1 || s.sequence.frames > 100000)) {
      throw new WavemarkException(Problem.JSON_INVALID, file, "sequence.frames must be 1 to 100000");
    }
    return s;
  }

  public void write(Path file) {
    Json.write(file, this);
  }

  /** The calibration, read from its file or inline; NONE when absent. */
  public Calibration calibrationDomain(Path sceneFile) {
    CalibrationFile c = calibrationFile(sceneFile);
    return c == null ? Calibration.NONE : c.toDomain(sceneFile.toString());
  }

  /** The calibration as its wire record, or null. */
  public @Nullable CalibrationFile calibrationFile(Path sceneFile) {
    if (calibration == null || calibration.isNull()) {
      return null;
    }
    Path dir = sceneFile.toAbsolutePath().getParent();
    if (calibration.isTextual()) {
      Path p = dir.resolve(calibration.asText()).normalize();
      if (!Files.exists(p)) {
        throw new WavemarkException(Problem.FILE_MISSING, p, dir);
      }
      return CalibrationFile.read(p);
    }
    try {
      return Json.MAPPER.treeToValue(calibration, CalibrationFile.class);
    } catch (com.fasterxml.jackson.core.JsonProcessingException e) {
      throw new WavemarkException(Problem.JSON_INVALID, sceneFile, "calibration: " + e.getOriginalMessage());
    }
  }
}
