package dev.wavemark.core.gas;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvFileSource;

/**
 * The basic relations against NACA Report 1135 (Ames Research Staff, 1953), gamma = 1.4. The
 * tables' values were recalled, not read ("(from memory)" in each file's header line).
 */
class ReferenceTablesTest {
  private static final double GAMMA = 1.4;
  /** Tables I and II print 4 significant digits: half a unit in the 4th digit is at most 5e-4 relative. */
  private static final double FOUR_DIGITS = 5.01e-4;
  /** Angles in Table I are printed to 0.01 deg. */
  private static final double HUNDREDTH_DEG = 0.00501;
  /** The oblique-shock values are quoted to 0.01 deg. */
  private static final double CHART_DEG = 0.00501;

  private static void assertRelative(double expected, double actual, String what) {
    assertEquals(expected, actual, FOUR_DIGITS * Math.abs(expected), what);
  }

  @ParameterizedTest(name = "M = {0}")
  @CsvFileSource(resources = "/gas/naca1135-table1-isentropic.csv")
  void tableOneIsentropic(double m, double p, double rho, double t, double area, Double nuDeg, Double muDeg) {
    String at = "NACA 1135 Table I, M = " + m;
    assertRelative(p, Isentropic.pressureRatio(m, GAMMA), at + " p/p0");
    assertRelative(rho, Isentropic.densityRatio(m, GAMMA), at + " rho/rho0");
    assertRelative(t, Isentropic.temperatureRatio(m, GAMMA), at + " T/T0");
    assertRelative(area, Isentropic.areaRatio(m, GAMMA), at + " A/A*");
    assertEquals(m, Isentropic.machFromAreaRatio(Isentropic.areaRatio(m, GAMMA), GAMMA, m >= 1), 1e-9 * m, at + " A/A* inverse");
    assertEquals(m, Isentropic.machFromPressureRatio(Isentropic.pressureRatio(m, GAMMA), GAMMA), 1e-9 * m, at + " p/p0 inverse");
    if (nuDeg != null) {
      assertEquals(nuDeg, Math.toDegrees(PrandtlMeyer.nu(m, GAMMA)), HUNDREDTH_DEG, at + " nu");
      assertEquals(m, PrandtlMeyer.inverse(Math.toRadians(nuDeg), GAMMA), m > 1 ? 2e-3 * m : 1e-9,
          at + " nu^-1 of the printed nu (printed digits only)");
    }
    if (muDeg != null && m > 1) {
      assertEquals(muDeg, Math.toDegrees(MachAngle.of(m)), HUNDREDTH_DEG, at + " mu");
    }
  }

  @ParameterizedTest(name = "M1 = {0}")
  @CsvFileSource(resources = "/gas/naca1135-table2-normal-shock.csv")
  void tableTwoNormalShock(double m, double m2, double p, double rho, double t, double p0, double pitot) {
    String at = "NACA 1135 Table II, M1 = " + m;
    assertRelative(m2, NormalShock.m2(m, GAMMA), at + " M2");
    assertRelative(p, NormalShock.pressureRatio(m, GAMMA), at + " p2/p1");
    assertRelative(rho, NormalShock.densityRatio(m, GAMMA), at + " rho2/rho1");
    assertRelative(t, NormalShock.temperatureRatio(m, GAMMA), at + " T2/T1");
    assertRelative(p0, NormalShock.totalPressureRatio(m, GAMMA), at + " p02/p01");
    assertRelative(pitot, NormalShock.pitotOverStatic(m, GAMMA), at + " p02/p1");
    // The tunnel-calibration inversions from the printed ratios: their 4 digits bound the Mach error.
    assertEquals(m, NormalShock.machFromPitotOverStatic(pitot, GAMMA), 1e-3 * m, at + " M from p02/p1");
    assertEquals(m, NormalShock.machFromPitotOverStatic(NormalShock.pitotOverStatic(m, GAMMA), GAMMA), 1e-10 * m, at + " p02/p1 round trip");
    assertEquals(m, NormalShock.machFromTotalPressureRatio(NormalShock.totalPressureRatio(m, GAMMA), GAMMA), 1e-9 * m,
        at + " p02/p01 round trip");
  }

  @ParameterizedTest(name = "M1 = {0}, theta = {1} deg")
  @CsvFileSource(resources = "/gas/naca1135-oblique-shock.csv")
  void obliqueShockCharts(double m, double thetaDeg, double weakDeg, Double strongDeg) {
    String at = "NACA 1135 oblique shock, M1 = " + m + ", theta = " + thetaDeg;
    double theta = Math.toRadians(thetaDeg);
    assertEquals(weakDeg, Math.toDegrees(ObliqueShock.beta(m, theta, ShockBranch.WEAK, GAMMA)), CHART_DEG, at + " weak");
    if (strongDeg != null) {
      assertEquals(strongDeg, Math.toDegrees(ObliqueShock.beta(m, theta, ShockBranch.STRONG, GAMMA)), CHART_DEG, at + " strong");
    }
  }

  @ParameterizedTest(name = "M1 = {0}")
  @CsvFileSource(resources = "/gas/naca1135-detachment.csv")
  void detachment(double m, double thetaMaxDeg, Double betaDeg) {
    String at = "NACA 1135 maximum deflection, M1 = " + m;
    assertEquals(thetaMaxDeg, Math.toDegrees(ObliqueShock.maxDeflection(m, GAMMA)), CHART_DEG, at);
    if (betaDeg != null) {
      assertEquals(betaDeg, Math.toDegrees(ObliqueShock.betaAtMaxDeflection(m, GAMMA)), CHART_DEG, at + " beta*");
    }
  }
}
