package dev.wavemark.files;

import com.fasterxml.jackson.annotation.JsonInclude;
import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import dev.wavemark.core.model.Calibration;
import java.nio.file.Path;
import java.util.Optional;
import org.jspecify.annotations.Nullable;

/** The contract's calibration file ({@code calibration/*.json}); every field optional. */
@JsonInclude(JsonInclude.Include.NON_NULL)
public record CalibrationFile(
    @Nullable Double flowDirectionDeg, @Nullable Double flowDirectionUncertaintyDeg, @Nullable Double metersPerPixel,
    @Nullable LensJson lens, @Nullable WindowJson window) {

  @JsonInclude(JsonInclude.Include.NON_NULL)
  public record LensJson(double fx, double fy, double cx, double cy, double @Nullable [] radial, double @Nullable [] tangential) {}

  /** {@code shape}: {@code circle} (centerPx, radiusPx) or {@code rectangle} (centerPx, sizePx = [w, h]). */
  @JsonInclude(JsonInclude.Include.NON_NULL)
  public record WindowJson(String shape, double[] centerPx, @Nullable Double radiusPx, double @Nullable [] sizePx) {}

  public static CalibrationFile read(Path file) {
    return Json.read(file, CalibrationFile.class, "calibration file");
  }

  public void write(Path file) {
    Json.write(file, this);
  }

  /** Converts to the domain record; {@code source} names the file in messages. */
  public Calibration toDomain(String source) {
    try {
      Optional<Calibration.Lens> l = Optional.ofNullable(lens).map(j -> new Calibration.Lens(
          j.fx, j.fy, j.cx, j.cy, j.radial == null ? new double[0] : j.radial,
          j.tangential == null ? new double[0] : j.tangential));
      Optional<Calibration.Window> w = Optional.ofNullable(window).map(j -> toWindow(j, source));
      return new Calibration(
          Math.toRadians(flowDirectionDeg == null ? 0 : flowDirectionDeg),
          Math.toRadians(flowDirectionUncertaintyDeg == null ? 0 : flowDirectionUncertaintyDeg),
          Optional.ofNullable(metersPerPixel), l, w);
    } catch (WavemarkException e) {
      throw new WavemarkException(e, Problem.JSON_INVALID, source, e.getMessage());
    }
  }

  private static Calibration.Window toWindow(WindowJson j, String source) {
    if (j.centerPx == null || j.centerPx.length != 2) {
      throw new WavemarkException(Problem.JSON_INVALID, source, "window.centerPx must be [x, y]");
    }
    switch (j.shape == null ? "" : j.shape) {
      case "circle":
        if (j.radiusPx == null) {
          throw new WavemarkException(Problem.JSON_INVALID, source, "window.radiusPx is required for a circle");
        }
        return new Calibration.Window.Circle(j.centerPx[0], j.centerPx[1], j.radiusPx);
      case "rectangle":
        if (j.sizePx == null || j.sizePx.length != 2) {
          throw new WavemarkException(Problem.JSON_INVALID, source, "window.sizePx must be [width, height] for a rectangle");
        }
        return new Calibration.Window.Rectangle(j.centerPx[0], j.centerPx[1], j.sizePx[0], j.sizePx[1]);
      default:
        throw new WavemarkException(Problem.JSON_INVALID, source, "window.shape must be 'circle' or 'rectangle', got '" + j.shape + "'");
    }
  }

  /** The wire form of a domain calibration. */
  public static CalibrationFile fromDomain(Calibration c) {
    LensJson l = c.lens().map(x -> new LensJson(x.fx(), x.fy(), x.cx(), x.cy(), x.radial(), x.tangential())).orElse(null);
    WindowJson w = c.window().map(CalibrationFile::windowJson).orElse(null);
    return new CalibrationFile(
        Math.toDegrees(c.flowDirectionRad()), Math.toDegrees(c.flowDirectionUncertaintyRad()),
        c.metersPerPixel().orElse(null), l, w);
  }

  private static WindowJson windowJson(Calibration.Window w) {
    if (w instanceof Calibration.Window.Circle c) {
      return new WindowJson("circle", new double[] {c.centerXPx(), c.centerYPx()}, c.radiusPx(), null);
    }
    Calibration.Window.Rectangle r = (Calibration.Window.Rectangle) w;
    return new WindowJson("rectangle", new double[] {r.centerXPx(), r.centerYPx()}, null, new double[] {r.widthPx(), r.heightPx()});
  }
}
