package dev.wavemark.imaging.calib;

import boofcv.struct.calib.CameraPinholeBrown;
import dev.wavemark.core.model.Calibration;

/**
 * Conversion between the contract's lens ({@link Calibration.Lens}: fx, fy, cx, cy in pixels,
 * radial [k1, k2, ...], tangential [t1, t2]) and BoofCV's {@link CameraPinholeBrown}, which uses
 * the same Brown model with the same meaning of every coefficient. The contract has no skew; a
 * BoofCV skew is dropped (zero-skew calibration is what {@code calibrate} asks for).
 */
public final class Lenses {
  private Lenses() {}

  /** The BoofCV camera of a contract lens, for pictures of {@code width} x {@code height} pixels. */
  public static CameraPinholeBrown toBoof(Calibration.Lens lens, int width, int height) {
    CameraPinholeBrown cam = new CameraPinholeBrown();
    cam.fsetK(lens.fx(), lens.fy(), 0, lens.cx(), lens.cy(), width, height);
    double[] radial = lens.radial();
    cam.fsetRadial(radial);
    double[] t = lens.tangential();
    cam.fsetTangential(t.length > 0 ? t[0] : 0, t.length > 1 ? t[1] : 0);
    return cam;
  }

  /** The contract lens of a BoofCV camera. */
  public static Calibration.Lens fromBoof(CameraPinholeBrown cam) {
    double[] radial = cam.radial == null ? new double[0] : cam.radial.clone();
    return new Calibration.Lens(cam.fx, cam.fy, cam.cx, cam.cy, radial, new double[] {cam.t1, cam.t2});
  }
}
