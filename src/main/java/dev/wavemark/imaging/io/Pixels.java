package dev.wavemark.imaging.io;

import boofcv.struct.image.GrayF32;
import ij.ImagePlus;
import ij.measure.Calibration;
import ij.process.ByteProcessor;
import ij.process.ColorProcessor;
import ij.process.FloatProcessor;
import ij.process.ImageProcessor;
import ij.process.ShortProcessor;
import org.jspecify.annotations.Nullable;

/** ImageJ processors to calibrated BoofCV floats. */
final class Pixels {
  private Pixels() {}

  /**
   * Copies a processor into a new GrayF32, mapping every raw 8- or 16-bit value through the
   * value calibration (ImageJ keeps raw pixels uncalibrated: signed 16-bit data is stored offset by
   * +32768 with a linear calibration, and a TIFF may carry a calibration function). Colour
   * pixels become the unweighted mean of red, green and blue.
   */
  static GrayF32 toGray(ImageProcessor ip, @Nullable Calibration cal) {
    int w = ip.getWidth();
    int h = ip.getHeight();
    GrayF32 out = new GrayF32(w, h);
    float[] dst = out.data;
    float[] table = cal != null && cal.calibrated() && !(ip instanceof FloatProcessor) ? cal.getCTable() : null;
    if (ip instanceof ByteProcessor) {
      byte[] src = (byte[]) ip.getPixels();
      for (int i = 0; i < src.length; i++) {
        int v = src[i] & 0xff;
        dst[i] = table != null && v < table.length ? table[v] : v;
      }
    } else if (ip instanceof ShortProcessor) {
      short[] src = (short[]) ip.getPixels();
      for (int i = 0; i < src.length; i++) {
        int v = src[i] & 0xffff;
        dst[i] = table != null && v < table.length ? table[v] : v;
      }
    } else if (ip instanceof FloatProcessor) {
      System.arraycopy((float[]) ip.getPixels(), 0, dst, 0, w * h);
    } else if (ip instanceof ColorProcessor) {
      int[] src = (int[]) ip.getPixels();
      for (int i = 0; i < src.length; i++) {
        int c = src[i];
        dst[i] = (((c >> 16) & 0xff) + ((c >> 8) & 0xff) + (c & 0xff)) / 3f;
      }
    } else {
      throw new IllegalArgumentException("unsupported processor " + ip.getClass().getSimpleName());
    }
    return out;
  }

  /** The calibration ImageJ would attach, built for this processor's bit depth. */
  static Calibration calibrationFor(ImageProcessor ip, boolean signed16, int function, double @Nullable [] coefficients,
      @Nullable String valueUnit) {
    ImagePlus imp = new ImagePlus("", ip);
    Calibration cal = imp.getCalibration();
    if (signed16 && ip instanceof ShortProcessor) {
      cal.setSigned16BitCalibration();
    } else if (valueUnit != null && coefficients != null && function >= Calibration.STRAIGHT_LINE
        && function <= Calibration.EXP_RECOVERY) {
      cal.setFunction(function, coefficients, valueUnit);
    }
    return cal;
  }

  /** True when every pixel holds the same value (or the picture has no pixel). */
  static boolean isFlat(GrayF32 g) {
    if (g.width == 0 || g.height == 0) {
      return true;
    }
    float first = g.data[g.startIndex];
    for (int y = 0; y < g.height; y++) {
      int row = g.startIndex + y * g.stride;
      for (int x = 0; x < g.width; x++) {
        if (g.data[row + x] != first) {
          return false;
        }
      }
    }
    return true;
  }
}
