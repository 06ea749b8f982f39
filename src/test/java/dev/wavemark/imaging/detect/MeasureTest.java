package dev.wavemark.imaging.detect;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import boofcv.struct.image.GrayF32;
import dev.wavemark.core.geom.ImageAngles;
import dev.wavemark.core.model.Optics;
import org.junit.jupiter.api.Test;

/** The accurate stage alone, on synthetic lines of exactly known position. */
class MeasureTest {

  /**
   * Angle tolerance for a 500-px line at SNR 20: the scatter of a sub-pixel centre is about
   * 0.05 px per normal, which over 500 normals and 500 px gives a few thousandths of a degree;
   * 0.01 deg leaves room for the correlated part.
   */
  static final double TOL_DEG = 0.01;

  private static Measure.Result measureShock(Optics optics, Signature sig, double dirDeg, double noise) {
    SyntheticScene sc = new SyntheticScene(640, 480);
    sc.blurPx = 1.5;
    double dir = Math.toRadians(dirDeg);
    sc.shock(60.3, 420.7, dir, 2000, 1.0, -1);
    GrayF32 img = sc.render(optics, 1.0, noise, 7);
    Raster r = Raster.of(img, FlowRegion.all()).eroded(2);
    // candidate deliberately 0.8 deg and 1.5 px off
    double a = dir + Math.toRadians(0.8);
    double ux = Math.cos(a);
    double uy = -Math.sin(a);
    Measure.Candidate c = new Measure.Candidate(60.3 - 1.5 * uy, 420.7 + 1.5 * ux, ux, uy, 20, 480);
    Measure.Result m = Measure.measure(r, c, sig, 8, 0, noise, null, 50);
    assertNotNull(m);
    Measure.Result m2 = Measure.measure(r, c.recentred(m.distortedFit()), sig, 8, 0, noise, null, 50);
    assertNotNull(m2);
    return m2;
  }

  private static double dirDeg(LineFit.Result f) {
    double d = Math.toDegrees(ImageAngles.direction(f.ux(), f.uy()));
    return d;
  }

  @Test
  void schlierenLineAngleWithinTolerance() {
    // peak amplitude of the d/dx image of a unit step blurred 1.5 px is about 0.27 * cos
    Measure.Result m = measureShock(Optics.SCHLIEREN_VERTICAL_EDGE, Signature.PEAK, 33.3, 0.2 * 0.27 / 20 * 5);
    assertEquals(33.3, dirDeg(m.fit()), TOL_DEG, "direction of a 33.3 deg line");
    assertTrue(m.fit().support() > 300, "support " + m.fit().support());
    assertTrue(m.fit().rmsPx() < 0.3, "rms " + m.fit().rmsPx());
    assertTrue(m.fit().sigmaThetaRad() > 0, "positive uncertainty");
  }

  @Test
  void shadowgraphZeroCrossingOnTheShockWithDarkLobeUpstream() {
    Measure.Result m = measureShock(Optics.SHADOWGRAPH, Signature.DIPOLE, 41.7, 0.005);
    assertEquals(41.7, dirDeg(m.fit()), TOL_DEG, "direction of a 41.7 deg shadowgraph pair");
    // the fitted line passes through the shock origin (the step's midpoint), not through a lobe
    LineFit.Result f = m.fit();
    double dist = Math.abs(-(60.3 - f.cx()) * f.uy() + (420.7 - f.cy()) * f.ux());
    assertTrue(dist < 0.1, "zero crossing " + dist + " px from the true shock");
    // minus the Laplacian of a rising density step is dark on the low-density side (the
    // shadowgraph's dark band ahead of the bright one, a fact of shadowgraph optics); the
    // profiles run from the low- to the high-density side here, so the dark lobe comes first
    assertEquals(1, m.sign(), "polarity: dark lobe upstream");
  }

  @Test
  void aCrossingWaveDoesNotSetAShadowgraphFansDisplacement() {
    // the ray displacement of a centred fan's boundary falls as 1/s (geometric optics: the
    // deflection is the density gradient, which falls as 1/s across a centred fan), so each
    // profile's light area times s is one constant alpha; 30 of 200 profiles where another wave
    // crosses carry five times their share and must be left out
    double alpha = 3.0;
    int m = 49;
    double s0 = 40;
    double[][] prof = new double[200][];
    for (int k = 0; k < prof.length; k++) {
      double s = s0 + k * Measure.NORMAL_STEP_PX;
      prof[k] = new double[m];
      prof[k][m / 2] = alpha / (Measure.SAMPLE_PX * s) * (k >= 50 && k < 80 ? 5 : 1);
    }
    assertEquals(alpha, Measure.displacementScale(prof, s0), 1e-9 * alpha);
  }
}
