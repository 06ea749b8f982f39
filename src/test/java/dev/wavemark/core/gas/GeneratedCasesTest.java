package dev.wavemark.core.gas;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Generated cases over M 1.05-10 and gamma in {1.2, 1.3, 1.4, 5/3}: the closed forms of
 * {@link ObliqueShock} and {@link PrandtlMeyer} against the slow bisection and golden-section
 * versions in {@link SlowGas}, round trips, and the entropy rise across every shock.
 */
class GeneratedCasesTest {
  /** Round trips and closed form against bisection: the arithmetic keeps ~1e-12; 1e-9 is the bar. */
  private static final double ROUND_TRIP = 1e-9;
  /** Golden-section search finds the maximum's value to ~eps but its position only to ~sqrt(eps). */
  private static final double ARGMAX = 1e-6;

  static final double[] GAMMAS = {1.2, 1.3, 1.4, 5.0 / 3.0};
  static final double[] FRACTIONS = {0.02, 0.25, 0.5, 0.75, 0.95, 0.999};

  /** 24 Mach numbers spaced geometrically from 1.05 to 10. */
  static double[] machs() {
    double[] m = new double[24];
    for (int i = 0; i < m.length; i++) {
      m[i] = 1.05 * Math.pow(10 / 1.05, i / (m.length - 1.0));
    }
    return m;
  }

  /** 24 x 4 x 6 = 576 cases (M, theta as a fraction of thetaMax, gamma). */
  static Stream<Arguments> deflectionCases() {
    List<Arguments> cases = new ArrayList<>();
    for (double g : GAMMAS) {
      for (double m : machs()) {
        for (double f : FRACTIONS) {
          cases.add(Arguments.of(m, f, g));
        }
      }
    }
    return cases.stream();
  }

  static Stream<Arguments> machCases() {
    List<Arguments> cases = new ArrayList<>();
    for (double g : GAMMAS) {
      for (double m : machs()) {
        cases.add(Arguments.of(m, g));
      }
    }
    return cases.stream();
  }

  @ParameterizedTest(name = "M={0} theta={1} thetaMax gamma={2}")
  @MethodSource("deflectionCases")
  void betaMatchesBisectionAndRoundTrips(double m, double fraction, double gamma) {
    double theta = fraction * ObliqueShock.maxDeflection(m, gamma);
    String at = "M=" + m + " theta=" + Math.toDegrees(theta) + "deg gamma=" + gamma;
    double previousEntropy = 0;
    for (ShockBranch b : ShockBranch.values()) {
      double beta = ObliqueShock.beta(m, theta, b, gamma);
      assertEquals(SlowGas.beta(m, theta, b, gamma), beta, ROUND_TRIP, "beta vs bisection " + b + " " + at);
      assertEquals(m, ObliqueShock.machFromAngles(beta, theta, gamma), ROUND_TRIP, "M(beta(M,theta),theta) " + b + " " + at);
      assertEquals(SlowGas.mach(beta, theta, gamma), ObliqueShock.machFromAngles(beta, theta, gamma), ROUND_TRIP * m,
          "M(beta, theta) vs bisection " + b + " " + at);
      assertEquals(theta, ObliqueShock.theta(m, beta, gamma), ROUND_TRIP, "theta(beta) " + b + " " + at);
      ObliqueShock.Solution s = ObliqueShock.fromWaveAngle(m, beta, gamma);
      double entropy = -Math.log(s.totalPressureRatio());
      assertTrue(entropy > 0, "entropy rises " + b + " " + at + ": " + entropy);
      assertTrue(entropy > previousEntropy, "strong shock makes more entropy than weak " + at);
      assertTrue(s.pressureRatio() > 1 && s.densityRatio() > 1 && s.temperatureRatio() > 1, "compression " + b + " " + at);
      previousEntropy = entropy;
    }
  }

  @ParameterizedTest(name = "M={0} gamma={1}")
  @MethodSource("machCases")
  void detachmentAndSonicLimitsMatchSearch(double m, double gamma) {
    String at = "M=" + m + " gamma=" + gamma;
    assertEquals(SlowGas.thetaMax(m, gamma), ObliqueShock.maxDeflection(m, gamma), ROUND_TRIP, "thetaMax " + at);
    assertEquals(SlowGas.betaAtMax(m, gamma), ObliqueShock.betaAtMaxDeflection(m, gamma), ARGMAX, "beta at thetaMax " + at);
    double sonic = ObliqueShock.sonicDeflection(m, gamma);
    assertTrue(sonic < ObliqueShock.maxDeflection(m, gamma), "sonic below detachment " + at);
    assertEquals(1.0, ObliqueShock.m2(m, ObliqueShock.sonicBeta(m, gamma), gamma), ROUND_TRIP, "M2 = 1 at sonic beta " + at);
    assertTrue(ObliqueShock.sonicBeta(m, gamma) < ObliqueShock.betaAtMaxDeflection(m, gamma), "sonic beta below beta* " + at);
  }

  @ParameterizedTest(name = "M={0} gamma={1}")
  @MethodSource("machCases")
  void branchesMeetAtDetachment(double m, double gamma) {
    double max = ObliqueShock.maxDeflection(m, gamma);
    double star = ObliqueShock.betaAtMaxDeflection(m, gamma);
    assertEquals(star, ObliqueShock.beta(m, max, ShockBranch.WEAK, gamma), 0, "weak at thetaMax M=" + m);
    assertEquals(star, ObliqueShock.beta(m, max, ShockBranch.STRONG, gamma), 0, "strong at thetaMax M=" + m);
    // Just below the limit the two branches are sqrt(1e-10) ~ 1e-5 apart, around beta*.
    double near = max * (1 - 1e-10);
    double weak = ObliqueShock.beta(m, near, ShockBranch.WEAK, gamma);
    double strong = ObliqueShock.beta(m, near, ShockBranch.STRONG, gamma);
    assertTrue(weak <= star && star <= strong, "weak <= beta* <= strong M=" + m);
    assertTrue(strong - weak < 1e-3, "branches meet M=" + m + ": " + (strong - weak));
  }

  @ParameterizedTest(name = "M={0} gamma={1}")
  @MethodSource("machCases")
  void prandtlMeyerInverts(double m, double gamma) {
    double nu = PrandtlMeyer.nu(m, gamma);
    assertEquals(SlowGas.nuSlow(m, gamma), nu, 1e-13, "nu vs its asin/acos form M=" + m);
    assertEquals(m, PrandtlMeyer.inverse(nu, gamma), ROUND_TRIP * m, "nu^-1(nu(M)) M=" + m + " gamma=" + gamma);
    assertEquals(SlowGas.nuInverse(nu, gamma), PrandtlMeyer.inverse(nu, gamma), ROUND_TRIP * m, "nu^-1 vs bisection M=" + m);
  }

  @ParameterizedTest(name = "M={0} gamma={1}")
  @MethodSource("machCases")
  void machWaveAndNormalShockEnds(double m, double gamma) {
    double mu = MachAngle.of(m);
    assertEquals(0.0, ObliqueShock.theta(m, mu, gamma), 1e-12, "beta = mu gives theta = 0, M=" + m);
    assertEquals(mu, ObliqueShock.beta(m, 0, ShockBranch.WEAK, gamma), 0, "theta = 0 weak is the Mach wave");
    ObliqueShock.Solution n = ObliqueShock.fromWaveAngle(m, 0.5 * Math.PI, gamma);
    assertEquals(0.0, n.thetaRad(), 1e-12, "beta = 90 deg gives theta = 0");
    assertEquals(NormalShock.m2(m, gamma), n.m2(), 1e-12, "beta = 90 deg is the normal shock M2");
    assertEquals(NormalShock.pressureRatio(m, gamma), n.pressureRatio(), 1e-12 * n.pressureRatio(), "p2/p1");
    assertEquals(NormalShock.totalPressureRatio(m, gamma), n.totalPressureRatio(), 1e-12, "p02/p01");
    assertTrue(NormalShock.entropyRise(m, gamma) > 0, "entropy rises across the normal shock M=" + m);
    assertEquals(m, MachAngle.machFrom(mu), 1e-12 * m, "Mach angle inverts");
  }
}
