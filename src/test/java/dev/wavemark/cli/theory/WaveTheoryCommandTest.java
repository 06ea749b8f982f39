package dev.wavemark.cli.theory;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Runs the wave-interaction and shock-expansion relations of {@code wavemark theory} in-process.
 * Reference values are named beside each check.
 */
class WaveTheoryCommandTest {
  private static TheoryCommandTest.Run run(String... args) {
    return TheoryCommandTest.run(args);
  }

  @Test
  void reflectionOfTheTextbookExample() throws Exception {
    // Anderson, Modern Compressible Flow, 3rd ed., sec. 4.9 example (from memory): M1 = 2.8,
    // theta = 16 deg: reflected shock at 29 deg to the wall, M3 = 1.45 (chart readings).
    TheoryCommandTest.Run r = run("theory", "reflection", "--mach", "2.8", "--theta", "16", "--json");
    assertEquals(0, r.rc(), r.both());
    JsonNode j = r.json();
    assertEquals("regular", j.get("verdict").asText(), r.both());
    assertEquals(29.0, j.get("reflectedAngleToWallDeg").asDouble(), 0.5, r.both());
    assertEquals(1.45, j.get("m3").asDouble(), 0.02, r.both());
    assertEquals("reflection", j.get("relation").asText());
  }

  @Test
  void reflectionInTheDualDomainPrintsTheTriplePoint() {
    // Ben-Dor (2007), ch. 1 (from memory): at M = 5, gamma = 1.4 the dual-solution domain spans
    // generator deflections of about 20.9 to 27.7 deg.
    TheoryCommandTest.Run r = run("theory", "reflection", "--mach", "5", "--theta", "25");
    assertEquals(0, r.rc(), r.both());
    assertTrue(r.out().contains("dual-solution"), r.both());
    assertTrue(r.out().contains("Mach stem"), r.both());
    assertEquals(1, r.out().lines().filter(l -> l.trim().startsWith("M1 ")).count(), "M1 once: " + r.both());
  }

  @Test
  void criteriaTableHasEmptyVonNeumannCellsBelowTheThreshold() {
    TheoryCommandTest.Run r = run("theory", "reflection", "--mach-range", "2:3:0.5");
    assertEquals(0, r.rc(), r.both());
    List<String> lines = r.out().lines().toList();
    assertEquals(4, lines.size(), r.both());
    assertTrue(lines.get(0).startsWith("mach,detachmentIncidentDeg"), r.both());
    // Below the threshold M = 2.202 (gamma = 1.4) the von Neumann condition has no solution.
    assertTrue(lines.get(1).endsWith(",,"), r.both());
    assertFalse(lines.get(3).endsWith(","), r.both());
  }

  @Test
  void detachedReflectionIsOneLine() {
    TheoryCommandTest.Run r = run("theory", "reflection", "--mach", "2", "--theta", "25");
    assertEquals(1, r.rc(), r.both());
    assertEquals(1, r.err().lines().count(), r.both());
    assertTrue(r.err().contains("shock-detached"), r.both());
  }

  @Test
  void symmetricShockCrossingHasAStraightSlipLine() throws Exception {
    TheoryCommandTest.Run r = run("theory", "shock-crossing", "--mach", "2.8", "--upper", "16", "--lower", "16", "--json");
    assertEquals(0, r.rc(), r.both());
    JsonNode j = r.json();
    assertEquals(0.0, j.get("slipLineDirectionDeg").asDouble(), 1e-9, r.both());
    assertEquals("shock", j.get("upperTransmittedKind").asText(), r.both());
    // Equals the regular reflection of the same example: 29 deg to the axis (from memory, chart reading).
    assertEquals(29.0, j.get("upperTransmittedDirectionDeg").asDouble(), 0.5, r.both());
  }

  @Test
  void doubleRampNamesTheReflectedWave() throws Exception {
    TheoryCommandTest.Run r = run("theory", "double-ramp", "--mach", "3", "--first", "10", "--second", "10", "--json");
    assertEquals(0, r.rc(), r.both());
    JsonNode j = r.json();
    String kind = j.get("reflectedKind").asText();
    assertTrue(kind.equals("expansion-fan") || kind.equals("shock"), r.both());
    assertEquals(kind.equals("shock"), j.get("reflectedPressureRatio").asDouble() > 1, r.both());
    assertEquals(j.get("mergedTurnDeg").asDouble(), j.get("slipLineDirectionDeg").asDouble(), 1e-9, r.both());
  }

  @Test
  void shockExpansionFlatPlate() throws Exception {
    // Anderson, Fundamentals of Aerodynamics, ch. 9 flat-plate example (from memory): M = 3,
    // alpha = 5 deg: cl = 0.125, cd = 0.011.
    TheoryCommandTest.Run r = run("theory", "shock-expansion", "--mach", "3", "--shape", "flat-plate", "--alpha", "5", "--json");
    assertEquals(0, r.rc(), r.both());
    JsonNode j = r.json();
    assertEquals(0.125, j.get("cl").asDouble(), 0.001, r.both());
    assertEquals(0.011, j.get("cd").asDouble(), 0.0005, r.both());
    assertEquals("expansion-fan", j.get("upperWave0Kind").asText(), r.both());
    assertEquals("shock", j.get("trailingUpperKind").asText(), r.both());
  }

  @Test
  void shockExpansionPolygonAndTable() {
    TheoryCommandTest.Run r = run("theory", "shock-expansion", "--mach", "2",
        "--upper", "0,0", "0.5,0.04", "1,0", "--lower", "0,0", "1,0");
    assertEquals(0, r.rc(), r.both());
    assertTrue(r.out().contains("lift cl"), r.both());
    TheoryCommandTest.Run t = run("theory", "shock-expansion", "--mach-range", "1.5:3:0.5", "--half-angle", "5", "--alpha", "2");
    assertEquals(0, t.rc(), t.both());
    assertEquals(5, t.out().lines().count(), t.both());
    assertTrue(t.out().startsWith("mach,alphaDeg,cl,cd"), t.both());
  }

  @Test
  void shockExpansionBadArguments() {
    TheoryCommandTest.Run r = run("theory", "shock-expansion", "--mach", "2", "--shape", "cone", "--half-angle", "5");
    assertEquals(2, r.rc(), r.both());
    assertTrue(r.err().contains("cone"), r.both());
    TheoryCommandTest.Run d = run("theory", "shock-expansion", "--mach", "2", "--half-angle", "25");
    assertEquals(1, d.rc(), d.both());
    assertEquals(1, d.err().lines().count(), d.both());
    assertTrue(d.err().contains("upper panel 1"), d.both());
  }
}
