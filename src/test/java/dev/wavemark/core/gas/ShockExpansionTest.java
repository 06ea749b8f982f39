package dev.wavemark.core.gas;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class ShockExpansionTest {
  /** The textbook quotes its coefficients to 3 significant figures. */
  private static final double THREE_FIGURES = 0.0005;
  /** Matching at the trailing edge: the promise is 1e-9. */
  private static final double MATCH = 1e-9;

  private static double rad(double deg) {
    return Math.toRadians(deg);
  }

  @Test
  void flatPlateMatchesTheTextbookExample() {
    // Anderson, Fundamentals of Aerodynamics, ch. 9, shock-expansion example for a flat plate at
    // alpha = 5 deg in M = 3 (from memory): cl = 0.125, cd = 0.011; lower-surface p/p_inf = 1.45,
    // upper 0.668 (NACA 1135 oblique-shock and Prandtl-Meyer tables, 3 figures).
    ShockExpansion.Solution s = ShockExpansion.solve(Profile.flatPlate(1), 3.0, rad(5), 1.4);
    assertEquals(0.125, s.coefficients().cl(), 0.001);
    assertEquals(0.011, s.coefficients().cd(), THREE_FIGURES);
    assertEquals(1.45, s.lower().get(0).pressureRatio(), 0.005);
    assertEquals(0.668, s.upper().get(0).pressureRatio(), 0.002);
    assertEquals(s.coefficients().cl() * Math.tan(rad(5)), s.coefficients().cd(), 1e-12, "a flat plate's force is normal to it");
  }

  @Test
  void flatPlateLiftApproachesAckeretAtSmallIncidence() {
    double m = 2.5;
    double previous = Double.MAX_VALUE;
    for (double a : new double[] {4, 2, 1, 0.5, 0.25}) {
      ShockExpansion.Solution s = ShockExpansion.solve(Profile.flatPlate(1), m, rad(a), 1.4);
      double err = Math.abs(s.coefficients().cl() / Ackeret.liftCoefficient(rad(a), m) - 1);
      assertTrue(err < previous, "error shrinks with alpha, alpha=" + a);
      previous = err;
    }
    assertTrue(previous < 0.005, "within 0.5% at 0.25 deg, was " + previous);
  }

  @ParameterizedTest(name = "M={0} half-angle={1} gamma={2}")
  @CsvSource({"2.0,10,1.4", "3.0,5,1.4", "1.6,3,1.3", "5.0,12,1.6667", "2.5,8,1.2"})
  void diamondAtZeroIncidenceHasNoLiftAndMatchedTrailingEdge(double m, double eps, double g) {
    ShockExpansion.Solution s = ShockExpansion.solve(Profile.diamond(rad(eps), 2.0), m, 0, g);
    assertEquals(0.0, s.coefficients().cl(), 1e-12);
    assertEquals(0.0, s.coefficients().cmAbout(0.5), 1e-12, "symmetric: no moment about mid-chord");
    assertTrue(s.coefficients().cd() > 0);
    ShockExpansion.Sharp te = assertInstanceOf(ShockExpansion.Sharp.class, s.trailingEdge());
    assertEquals(0.0, te.slipLine().directionRad(), 1e-12);
    assertEquals(TurnKind.SHOCK, te.upperWave().turn().kind());
    assertEquals(TurnKind.SHOCK, te.lowerWave().turn().kind());
    assertEquals(rad(eps), te.upperWave().turn().compressionRad(), 1e-9, "the TE shock turns the flow back to the axis");
  }

  @Test
  void diamondDragApproachesAckeretAtSmallThickness() {
    double m = 2.0;
    double previous = Double.MAX_VALUE;
    for (double eps : new double[] {8, 4, 2, 1, 0.5}) {
      ShockExpansion.Solution s = ShockExpansion.solve(Profile.diamond(rad(eps), 1), m, 0, 1.4);
      double ackeret = Ackeret.diamondDragCoefficient(0, Math.tan(rad(eps)), m);
      double err = Math.abs(s.coefficients().cd() / ackeret - 1);
      assertTrue(err < previous, "error shrinks with thickness, eps=" + eps);
      previous = err;
      assertEquals(ackeret, s.linear().cd(), 0.01 * ackeret, "panel Ackeret vs closed form, eps=" + eps);
    }
    assertTrue(previous < 0.01, "within 1% at 0.5 deg, was " + previous);
  }

  @Test
  void diamondFrontPanelsAreTheNacaObliqueShock() {
    // NACA Report 1135 oblique-shock values for M = 2, theta = 10 deg (from memory, 4 figures):
    // beta = 39.31 deg, p2/p1 = 1.707, M2 = 1.641; the fan to the rear panel keeps p0 (no entropy).
    ShockExpansion.Solution s = ShockExpansion.solve(Profile.diamond(rad(10), 1), 2.0, 0, 1.4);
    assertEquals(1.707, s.upper().get(0).pressureRatio(), 0.001);
    assertEquals(1.641, s.upper().get(0).mach(), 0.001);
    ShockExpansion.VertexWave le = s.waves().get(0);
    assertEquals(TurnKind.SHOCK, le.turn().kind());
    assertEquals(39.31, Math.toDegrees(le.headDirectionFreestreamRad()), 0.01);
    ShockExpansion.VertexWave shoulder = s.waves().get(1);
    assertEquals(TurnKind.EXPANSION_FAN, shoulder.turn().kind());
    assertEquals(s.upper().get(0).totalPressureRatio(), s.upper().get(1).totalPressureRatio(), 0.0, "isentropic fan");
    assertEquals(PrandtlMeyer.nu(s.upper().get(0).mach(), 1.4) + rad(20), PrandtlMeyer.nu(s.upper().get(1).mach(), 1.4), 1e-12);
    assertEquals(rad(10) + MachAngle.of(s.upper().get(0).mach()), shoulder.headDirectionBodyRad(), 1e-12);
    assertEquals(rad(-10) + MachAngle.of(s.upper().get(1).mach()), shoulder.tailDirectionBodyRad(), 1e-12);
  }

  @ParameterizedTest(name = "M={0} half-angle={1} alpha={2}")
  @CsvSource({"3.0,5,3", "2.0,5,2", "4.0,8,-6", "2.5,3,8", "6.0,10,10"})
  void diamondAtIncidence(double m, double eps, double a) {
    ShockExpansion.Solution s = ShockExpansion.solve(Profile.diamond(rad(eps), 1), m, rad(a), 1.4);
    assertEquals(Math.signum(a), Math.signum(s.coefficients().cl()), "lift follows incidence");
    ShockExpansion.Sharp te = assertInstanceOf(ShockExpansion.Sharp.class, s.trailingEdge());
    SlipLine slip = te.slipLine();
    assertEquals(0.0, slip.pressureMismatch() / slip.pressureRatio(), MATCH);
    assertEquals(0.0, slip.directionMismatch(), MATCH);
    for (ShockExpansion.VertexWave w : s.waves()) {
      switch (w.turn().kind()) {
        case SHOCK -> assertTrue(w.turn().entropyRise() > 0, "entropy rises across a shock");
        case EXPANSION_FAN -> assertEquals(0.0, w.turn().entropyRise(), 0.0, "no entropy across a fan");
        case NONE -> assertEquals(0.0, w.turn().compressionRad(), 0.0);
      }
    }
    // Lift to first order is Ackeret's, while the hypersonic similarity parameter M (eps + |alpha|)
    // stays below 1 (common practice for where linear theory holds); beyond it, it is not compared.
    if (m * rad(eps + Math.abs(a)) < 1) {
      assertEquals(Ackeret.liftCoefficient(rad(a), m), s.coefficients().cl(), 0.15 * Math.abs(s.coefficients().cl()));
    }
  }

  @Test
  void flatPlateTrailingEdgeHasAShockAboveAndAFanBelow() {
    ShockExpansion.Solution s = ShockExpansion.solve(Profile.flatPlate(1), 3.0, rad(5), 1.4);
    ShockExpansion.Sharp te = assertInstanceOf(ShockExpansion.Sharp.class, s.trailingEdge());
    assertEquals(TurnKind.SHOCK, te.upperWave().turn().kind());
    assertEquals(TurnKind.EXPANSION_FAN, te.lowerWave().turn().kind());
    assertEquals(TurnKind.EXPANSION_FAN, s.waves().get(0).turn().kind());
    assertEquals(TurnKind.SHOCK, s.waves().get(1).turn().kind());
    // The wake leaves close to the freestream direction, slightly towards the side of higher entropy.
    assertTrue(Math.abs(te.slipLine().directionRad()) < rad(0.1));
  }

  @Test
  void wedgeWithAfterbodyHasABluntBase() {
    ShockExpansion.Solution s = ShockExpansion.solve(Profile.wedge(rad(10), 1, 1), 2.0, 0, 1.4);
    ShockExpansion.Blunt base = assertInstanceOf(ShockExpansion.Blunt.class, s.trailingEdge());
    assertEquals(2 * Math.tan(rad(10)), base.baseHeight(), 1e-12);
    assertEquals(4, s.waves().size());
    assertEquals(TurnKind.EXPANSION_FAN, s.waves().get(1).turn().kind(), "shoulder fan");
    // Only the front faces carry drag, 2 tan(eps) Cp_front / (2 chords); the afterbody is parallel to the flow.
    double cpFront = s.upper().get(0).cp();
    assertEquals(cpFront * Math.tan(rad(10)), s.coefficients().cd(), 1e-12);
  }

  @Test
  void detachedLeadingEdgeNamesThePanel() {
    WavemarkException e = assertThrows(WavemarkException.class,
        () -> ShockExpansion.solve(Profile.diamond(rad(20), 1), 2.0, rad(5), 1.4));
    assertEquals(Problem.SHOCK_DETACHED, e.problem());
    assertTrue(e.getMessage().contains("lower panel 1"), e.getMessage());
  }

  @Test
  void badGeometryIsRejected() {
    List<Profile.Vertex> up = List.of(new Profile.Vertex(0, 0), new Profile.Vertex(1, 0.1));
    List<Profile.Vertex> back = List.of(new Profile.Vertex(0, 0), new Profile.Vertex(-1, -0.1));
    assertEquals(Problem.GEOMETRY_IMPOSSIBLE, assertThrows(WavemarkException.class, () -> new Profile(up, back)).problem());
    List<Profile.Vertex> elsewhere = List.of(new Profile.Vertex(0, 0.5), new Profile.Vertex(1, 0));
    assertEquals(Problem.GEOMETRY_IMPOSSIBLE, assertThrows(WavemarkException.class, () -> new Profile(up, elsewhere)).problem());
  }
}
