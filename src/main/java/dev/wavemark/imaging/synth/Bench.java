package dev.wavemark.imaging.synth;

import dev.wavemark.core.model.Calibration;
import dev.wavemark.core.model.Optics;
import dev.wavemark.core.numeric.Checks;
import java.util.Optional;

/**
 * An optical bench and camera, in physical units: what a rendered picture depends on besides the
 * flow. Defaults ({@link #defaults}) describe a mid-size blow-down tunnel's Z-type schlieren system.
 *
 * @param optics knife-edge schlieren (vertical or horizontal edge) or shadowgraph
 * @param edgeSign +1 when the picture brightens where density rises along +x (vertical edge) or
 *     along +y, i.e. downward on screen (horizontal edge); -1 for the edge on the other side
 * @param cutFraction fraction of the source image the knife edge blocks with no flow, in (0, 1)
 * @param focalLengthM focal length of the schlieren head that focuses the source onto the edge
 * @param sourceImageM extent of the source image across the edge at the cut-off plane
 * @param screenDistanceM shadowgraph: distance from the test section to the recorded plane
 * @param spanM length of the line of sight through the flow (test-section width) for plane flows
 * @param gladstoneDale Gladstone-Dale constant K in n - 1 = K rho, m^3/kg (air, visible light: 2.26e-4)
 * @param freestreamDensityKgM3 freestream density
 * @param metersPerPixel scale in the test section
 * @param shockThicknessPx apparent thickness (Gaussian sigma) of a shock in the ideal image: the
 *     optical resolution and unsteadiness, not the molecular thickness
 * @param blurPx optical blur of the picture (finite source and diffraction), Gaussian sigma
 * @param defocusPx camera defocus, Gaussian sigma
 * @param bitDepth 12 or 16 significant bits (stored in 16-bit samples, most significant bits used)
 * @param fullWellE sensor full-well capacity, electrons, reached at full scale
 * @param readNoiseE read noise, electrons rms
 * @param exposure brightness of the fully open source image as a fraction of full scale
 * @param falloff illumination fall-off from centre to corner (vignetting and the source's profile), fraction
 * @param tilt illumination gradient across the picture, fraction
 * @param window the test-section window (dark outside), if any
 * @param lens the camera lens with its Brown distortion, if any
 * @param dustSpecks number of dust specks on the windows
 */
public record Bench(
    Optics optics, int edgeSign, double cutFraction, double focalLengthM, double sourceImageM,
    double screenDistanceM, double spanM, double gladstoneDale, double freestreamDensityKgM3,
    double metersPerPixel, double shockThicknessPx, double blurPx, double defocusPx, int bitDepth,
    double fullWellE, double readNoiseE, double exposure, double falloff, double tilt,
    Optional<Calibration.Window> window, Optional<Calibration.Lens> lens, int dustSpecks) {

  public Bench {
    if (optics == Optics.AUTO) {
      throw new dev.wavemark.core.WavemarkException(dev.wavemark.core.Problem.BAD_ARGUMENT,
          "a rendered bench needs a definite optics mode, not 'auto'");
    }
    if (edgeSign != 1 && edgeSign != -1) {
      throw new dev.wavemark.core.WavemarkException(dev.wavemark.core.Problem.OUT_OF_RANGE, "edgeSign", edgeSign, "{-1, +1}");
    }
    Checks.inOpen("cutFraction", cutFraction, 0, 1);
    Checks.positive("focalLengthM", focalLengthM);
    Checks.positive("sourceImageM", sourceImageM);
    Checks.inClosed("screenDistanceM", screenDistanceM, 0, 100);
    Checks.positive("spanM", spanM);
    Checks.positive("gladstoneDale", gladstoneDale);
    Checks.positive("freestreamDensityKgM3", freestreamDensityKgM3);
    Checks.positive("metersPerPixel", metersPerPixel);
    Checks.inClosed("shockThicknessPx", shockThicknessPx, 0.3, 50);
    Checks.inClosed("blurPx", blurPx, 0, 50);
    Checks.inClosed("defocusPx", defocusPx, 0, 50);
    if (bitDepth != 12 && bitDepth != 16) {
      throw new dev.wavemark.core.WavemarkException(dev.wavemark.core.Problem.OUT_OF_RANGE, "bitDepth", bitDepth, "{12, 16}");
    }
    Checks.positive("fullWellE", fullWellE);
    Checks.inClosed("readNoiseE", readNoiseE, 0, 1e6);
    Checks.inOpen("exposure", exposure, 0, 1.0001);
    Checks.inClosed("falloff", falloff, 0, 0.9);
    Checks.inClosed("tilt", tilt, -0.5, 0.5);
    Checks.inClosed("dustSpecks", dustSpecks, 0, 10000);
  }

  /** A typical bench for {@code optics}: no window, no lens, moderate noise, 12 bits. */
  public static Bench defaults(Optics optics) {
    return new Bench(optics, +1, 0.5, 1.5, 2.0e-3, 0.12, 0.10, 2.26e-4, 0.35, 1.25e-4, optics == Optics.SHADOWGRAPH ? 1.3 : 0.9,
        0.6, 0.4, 12,
        20000, 6, 0.85, 0.12, 0.04, Optional.empty(), Optional.empty(), 6);
  }

  /**
   * Light deflection, radians, per unit gradient of rho/rho_inf per pixel, for a plane flow: the
   * Gladstone-Dale relation integrated over the span, eps = K * span * d(rho)/dx (the ambient
   * refractive index taken as 1).
   */
  public double deflectionPerGradient() {
    return gladstoneDale * spanM * freestreamDensityKgM3 / metersPerPixel;
  }

  /** The same bench with a different optics mode and edge sense. */
  public Bench withOptics(Optics o, int sign) {
    return new Bench(o, sign, cutFraction, focalLengthM, sourceImageM, screenDistanceM, spanM, gladstoneDale,
        freestreamDensityKgM3, metersPerPixel, shockThicknessPx, blurPx, defocusPx, bitDepth, fullWellE, readNoiseE,
        exposure, falloff, tilt, window, lens, dustSpecks);
  }

  /** The same bench without noise, blur, unevenness, dust, window and lens: the clean picture tests use. */
  public Bench clean() {
    return new Bench(optics, edgeSign, cutFraction, focalLengthM, sourceImageM, screenDistanceM, spanM, gladstoneDale,
        freestreamDensityKgM3, metersPerPixel, shockThicknessPx, 0, 0, 16, 1e12, 0, exposure, 0, 0,
        Optional.empty(), Optional.empty(), 0);
  }

  /** The same bench with another sensitivity (source image size at the edge). */
  public Bench withSourceImage(double m) {
    return new Bench(optics, edgeSign, cutFraction, focalLengthM, m, screenDistanceM, spanM, gladstoneDale,
        freestreamDensityKgM3, metersPerPixel, shockThicknessPx, blurPx, defocusPx, bitDepth, fullWellE, readNoiseE,
        exposure, falloff, tilt, window, lens, dustSpecks);
  }
}
