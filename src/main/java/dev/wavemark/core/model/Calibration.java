package dev.wavemark.core.model;

import dev.wavemark.core.numeric.Checks;
import java.util.Optional;

/**
 * The optical bench: where the freestream points in the picture, the scale, the lens and the
 * window. Every part is optional in the contract; absent means flow along +x, no correction.
 *
 * @param flowDirectionRad freestream direction in the image (contract sense)
 * @param flowDirectionUncertaintyRad its standard uncertainty
 * @param metersPerPixel scale, if known
 * @param lens lens model, if calibrated
 * @param window the test-section window, if known
 */
public record Calibration(
    double flowDirectionRad, double flowDirectionUncertaintyRad, Optional<Double> metersPerPixel,
    Optional<Lens> lens, Optional<Window> window) {

  /** No calibration: flow along +x, known exactly, no lens correction, no window. */
  public static final Calibration NONE = new Calibration(0, 0, Optional.empty(), Optional.empty(), Optional.empty());

  public Calibration {
    Checks.finite("flowDirection (rad)", flowDirectionRad);
    Checks.inClosed("flowDirectionUncertainty (rad)", flowDirectionUncertaintyRad, 0, 0.5);
  }

  /**
   * A pinhole lens with Brown radial and tangential distortion, in pixels (the model BoofCV's
   * CameraPinholeBrown uses): radial = [k1, k2, ...], tangential = [t1, t2].
   */
  public record Lens(double fx, double fy, double cx, double cy, double[] radial, double[] tangential) {
    public Lens {
      Checks.positive("lens fx", fx);
      Checks.positive("lens fy", fy);
      Checks.finite("lens cx", cx);
      Checks.finite("lens cy", cy);
      radial = radial.clone();
      tangential = tangential.length == 0 ? new double[] {0, 0} : tangential.clone();
    }

    @Override
    public double[] radial() {
      return radial.clone();
    }

    @Override
    public double[] tangential() {
      return tangential.clone();
    }
  }

  /** The window through which the flow is seen; outside it the picture is dark. */
  public sealed interface Window {
    /** True when the image point lies inside the window. */
    boolean contains(double xPx, double yPx);

    record Circle(double centerXPx, double centerYPx, double radiusPx) implements Window {
      public Circle {
        Checks.positive("window radiusPx", radiusPx);
      }

      @Override
      public boolean contains(double x, double y) {
        double dx = x - centerXPx;
        double dy = y - centerYPx;
        return dx * dx + dy * dy <= radiusPx * radiusPx;
      }
    }

    record Rectangle(double centerXPx, double centerYPx, double widthPx, double heightPx) implements Window {
      public Rectangle {
        Checks.positive("window widthPx", widthPx);
        Checks.positive("window heightPx", heightPx);
      }

      @Override
      public boolean contains(double x, double y) {
        return Math.abs(x - centerXPx) <= 0.5 * widthPx && Math.abs(y - centerYPx) <= 0.5 * heightPx;
      }
    }
  }
}
