package dev.wavemark.files;

import com.fasterxml.jackson.annotation.JsonInclude;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.ExpectedWave;
import java.nio.file.Path;
import java.util.List;
import java.util.function.UnaryOperator;
import org.jspecify.annotations.Nullable;

/**
 * The truth file ({@code *.truth.json}) written beside a rendered picture: what the picture
 * shows, exactly. Angles in degrees. {@code startPx}/{@code endPx} are in the ideal
 * (lens-corrected) image; {@code startSensorPx}/{@code endSensorPx} are the same points as
 * photographed (through the lens distortion). Where the geometry is approximate, {@code notes} says so.
 *
 * @param frames one entry per rendered frame (one for a single picture)
 */
@JsonInclude(JsonInclude.Include.NON_NULL)
public record TruthFile(
    @Nullable String label, String tool, String image, @Nullable String noFlowReference, int[] sizePx,
    double gamma, double mach, double flowDirectionDeg, ModelJson model, String optics,
    SceneFile.BenchJson bench, NoiseJson noise, @Nullable CalibrationFile calibration,
    String reflection, List<WaveJson> waves, List<FrameJson> frames, List<String> notes) {

  /** The sensor and its noise. */
  public record NoiseJson(int bitDepth, String storage, double fullWellE, double readNoiseE, String model, long seed) {}

  /** One wave's truth. */
  @JsonInclude(JsonInclude.Include.NON_NULL)
  public record WaveJson(
      String kind, String side, double angleDeg, double localFlowDirectionDeg, double directionDeg,
      double[] startPx, double[] endPx, double[] startSensorPx, double[] endSensorPx, String feature, String label,
      double machUpstream, double machDownstream, double densityRatioUpstream, double densityRatioDownstream) {

    /** The wire form of an expected wave; {@code toSensor} maps ideal pixels to photographed ones. */
    public static WaveJson of(ExpectedWave w, double mUp, double mDown, double rhoUp, double rhoDown, UnaryOperator<Point2> toSensor) {
      return new WaveJson(w.kind().contractName(), w.side().contractName(), Math.toDegrees(w.angleToFlowRad()),
          Math.toDegrees(w.localFlowDirectionRad()), Math.toDegrees(w.directionRad()), xy(w.startPx()), xy(w.endPx()),
          xy(toSensor.apply(w.startPx())), xy(toSensor.apply(w.endPx())), w.feature().contractName(), w.label(),
          mUp, mDown, rhoUp, rhoDown);
    }
  }

  /** One frame of a sequence: its Mach number, seed and the truth angles that changed with it. */
  public record FrameJson(int index, double mach, long seed, List<Double> angleDeg) {}

  static double[] xy(Point2 p) {
    return new double[] {p.x(), p.y()};
  }

  public static TruthFile read(Path file) {
    return Json.read(file, TruthFile.class, "truth file");
  }

  public void write(Path file) {
    Json.write(file, this);
  }
}
