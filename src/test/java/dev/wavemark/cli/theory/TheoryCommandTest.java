package dev.wavemark.cli.theory;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import dev.wavemark.cli.Main;
import dev.wavemark.files.Json;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Runs {@code wavemark theory ...} in-process. Reference values: NACA Report 1135 (Ames Research
 * Staff, 1953), Tables I/II and Chart 2, gamma = 1.4 (from memory, 4 printed digits).
 */
class TheoryCommandTest {
  /** What one run of the command line printed, and its exit code. */
  record Run(int rc, String out, String err) {
    String both() {
      return "exit " + rc + "\n--- stdout ---\n" + out + "--- stderr ---\n" + err;
    }

    JsonNode json() throws Exception {
      return Json.MAPPER.readTree(out);
    }
  }

  static Run run(String... args) {
    StringWriter out = new StringWriter();
    StringWriter err = new StringWriter();
    int rc = Main.commandLine(new PrintWriter(out, true), new PrintWriter(err, true)).execute(args);
    return new Run(rc, out.toString(), err.toString());
  }

  @Test
  void obliqueShockJsonGivesBothBranches() throws Exception {
    Run r = run("theory", "oblique-shock", "--mach", "2", "--theta", "10", "--json");
    assertEquals(0, r.rc(), r.both());
    JsonNode j = r.json();
    // NACA 1135 Chart 2 (from memory): M = 2, theta = 10 deg gives beta = 39.31 deg (weak).
    assertEquals(39.31, j.get("betaWeakDeg").asDouble(), 0.005, r.both());
    assertEquals(83.70, j.get("betaStrongDeg").asDouble(), 0.01, r.both());
    assertEquals(22.97, j.get("thetaMaxDeg").asDouble(), 0.01, r.both());
    assertEquals("oblique-shock", j.get("relation").asText(), r.both());
  }

  @Test
  void machFromMeasuredAnglesIsTheInverse() throws Exception {
    Run r = run("theory", "oblique-shock", "--beta", "39.3139318", "--theta", "10", "--json");
    assertEquals(0, r.rc(), r.both());
    assertEquals(2.0, r.json().get("mach").asDouble(), 1e-6, r.both());
    assertEquals("weak", r.json().get("branch").asText(), r.both());
  }

  @Test
  void humanTextNamesTheQuantities() {
    Run r = run("theory", "normal-shock", "--mach", "2");
    assertEquals(0, r.rc(), r.both());
    // NACA 1135 Table II (from memory): M1 = 2: M2 = 0.5774, p2/p1 = 4.500, p02/p01 = 0.7209.
    assertTrue(r.out().contains("0.57735"), r.both());
    assertTrue(r.out().contains("p2/p1") && r.out().contains("4.5"), r.both());
    assertTrue(r.out().contains("0.720874"), r.both());
  }

  @Test
  void pitotInversionRecoversMach() throws Exception {
    // NACA 1135 Table II (from memory): M = 2 gives p02/p1 = 5.640.
    Run r = run("theory", "pitot", "--pitot-over-static", "5.640", "--json");
    assertEquals(0, r.rc(), r.both());
    assertEquals(2.0, r.json().get("mach").asDouble(), 5e-4, r.both());
    Run t = run("theory", "pitot", "--pitot-over-total", "0.7209", "--json");
    assertEquals(2.0, t.json().get("mach").asDouble(), 5e-4, t.both());
  }

  @Test
  void prandtlMeyerBothDirections() throws Exception {
    // NACA 1135 Table I (from memory): nu(2) = 26.38 deg.
    Run r = run("theory", "prandtl-meyer", "--nu", "26.3798", "--json");
    assertEquals(0, r.rc(), r.both());
    assertEquals(2.0, r.json().get("mach").asDouble(), 1e-4, r.both());
    Run f = run("theory", "prandtl-meyer", "-m", "2", "--json");
    assertEquals(26.38, f.json().get("nuDeg").asDouble(), 0.005, f.both());
  }

  @Test
  void machRangeWritesCsvRows() {
    Run r = run("theory", "isentropic", "--mach-range", "1:3:0.5");
    assertEquals(0, r.rc(), r.both());
    List<String> lines = r.out().lines().toList();
    assertEquals(6, lines.size(), r.both());
    assertTrue(lines.get(0).startsWith("mach,pOverP0,tOverT0,rhoOverRho0,areaRatio"), r.both());
    assertTrue(lines.get(5).startsWith("3.0,"), r.both());
  }

  @Test
  void curveFamilyEndsEachMachAtDetachment() {
    Run r = run("theory", "oblique-shock", "--mach-range", "1.5:3:0.5", "--theta-step", "5");
    assertEquals(0, r.rc(), r.both());
    List<String> lines = r.out().lines().skip(1).toList();
    // Each Mach number's last row is thetaMax, where both branches meet.
    for (String m : List.of("1.5", "2.0", "2.5", "3.0")) {
      String last = lines.stream().filter(l -> l.startsWith(m + ",")).reduce((a, b) -> b).orElseThrow();
      String[] f = last.split(",");
      assertEquals(Double.parseDouble(f[2]), Double.parseDouble(f[3]), 1e-6, r.both());
    }
  }

  @Test
  void detachedDeflectionIsOneLineAndNonZero() {
    Run r = run("theory", "oblique-shock", "--mach", "2", "--theta", "30");
    assertEquals(1, r.rc(), r.both());
    assertEquals(1, r.err().lines().count(), r.both());
    assertTrue(r.err().contains("30") && r.err().contains("22.97") && r.err().contains("shock-detached"), r.both());
    assertFalse(r.err().contains("at dev."), r.both());
  }

  @Test
  void subsonicMachIsOneLine() {
    Run r = run("theory", "mach-angle", "--mach", "0.8");
    assertNotEquals(0, r.rc(), r.both());
    assertEquals(1, r.err().lines().count(), r.both());
    assertTrue(r.err().contains("0.8"), r.both());
  }

  @Test
  void conflictingFormsAreAUsageError() {
    Run r = run("theory", "isentropic", "--mach", "2", "--area-ratio", "1.6875");
    assertEquals(2, r.rc(), r.both());
    assertTrue(r.err().contains("give one of"), r.both());
  }

  @Test
  void badGammaNamesTheValue() {
    Run r = run("theory", "normal-shock", "--mach", "2", "--gamma", "0.9");
    assertEquals(1, r.rc(), r.both());
    assertTrue(r.err().contains("0.9") && r.err().contains("greater than 1"), r.both());
  }

  @Test
  void coneShockAngleAndInverse() throws Exception {
    Run r = run("theory", "cone", "--mach", "2", "--cone", "10", "--json");
    assertEquals(0, r.rc(), r.both());
    // Sims (NASA SP-3004) / NACA 1135 Chart 5 (from memory): 10 deg cone at M = 2, shock 31.2 deg.
    double shock = r.json().get("shockDeg").asDouble();
    assertEquals(31.2, shock, 0.05, r.both());
    Run inv = run("theory", "cone", "--shock", Double.toString(shock), "--cone", "10", "--json");
    assertEquals(0, inv.rc(), inv.both());
    assertEquals(2.0, inv.json().get("mach").asDouble(), 1e-6, inv.both());
  }

  @Test
  void coneFieldRaysAreCsvFromConeToShock() {
    Run r = run("theory", "cone", "--mach", "2", "--cone", "20", "--rays", "8");
    assertEquals(0, r.rc(), r.both());
    List<String> lines = r.out().lines().toList();
    assertEquals(10, lines.size(), r.both());
    assertTrue(lines.get(0).startsWith("rayDeg,mach,pressureRatio,densityRatio"), r.both());
    assertEquals(20.0, Double.parseDouble(lines.get(1).split(",")[0]), 1e-6, r.both());
  }

  @Test
  void detachedConeIsOneLine() {
    Run r = run("theory", "cone", "--mach", "2", "--cone", "45");
    assertEquals(1, r.rc(), r.both());
    assertEquals(1, r.err().lines().count(), r.both());
    assertTrue(r.err().contains("45") && r.err().contains("shock-detached"), r.both());
  }

  @Test
  void standoffIsLabelledAndRangeChecked() throws Exception {
    Run r = run("theory", "standoff", "--mach", "3", "--nose", "sphere", "--json");
    assertEquals(0, r.rc(), r.both());
    // Billig (1967): delta/R = 0.143 exp(3.24 / M^2) for a sphere.
    assertEquals(0.143 * Math.exp(3.24 / 9), r.json().get("standoffRatio").asDouble(), 1e-12, r.both());
    assertTrue(r.json().get("basis").asText().contains("correlation"), r.both());
    Run back = run("theory", "standoff", "--standoff-ratio", r.json().get("standoffRatio").asText(), "--json");
    assertEquals(3.0, back.json().get("mach").asDouble(), 1e-9, back.both());
    Run out = run("theory", "standoff", "--mach", "25");
    assertEquals(1, out.rc(), out.both());
    assertTrue(out.err().contains("25") && out.err().contains("[1.2, 20]"), out.both());
  }
}
