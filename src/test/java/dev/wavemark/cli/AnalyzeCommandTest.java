package dev.wavemark.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import dev.wavemark.files.Json;
import dev.wavemark.files.ResultFile;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The analyze command in-process: the main job on a rendered picture, and its failure paths. */
class AnalyzeCommandTest {
  @TempDir Path dir;

  private record Run(int rc, String out, String err) {
    String both() {
      return "rc=" + rc + "\nstdout:\n" + out + "\nstderr:\n" + err;
    }
  }

  private static Run run(String... args) {
    StringWriter out = new StringWriter();
    StringWriter err = new StringWriter();
    int rc = Main.commandLine(new PrintWriter(out, true), new PrintWriter(err, true)).execute(args);
    return new Run(rc, out.toString(), err.toString());
  }

  /**
   * The bundled 10 deg wedge picture, rendered at the Mach number in its truth file: the issue's
   * acceptance tolerance for wedges at M 1.5-2.5 is 0.005.
   */
  @Test
  void analysesTheRenderedWedgePictureToItsTrueMach() throws Exception {
    Path samples = Path.of("sample-images");
    JsonNode truth = Json.MAPPER.readTree(samples.resolve("run-2731-wedge-m20.truth.json").toFile());
    Run r = run("analyze", samples.resolve("run-2731-wedge-m20.run.json").toString(), "--out", dir.toString(), "--no-progress");
    assertEquals(0, r.rc(), r.both());
    ResultFile res = ResultFile.read(dir.resolve("result.json"));
    double trueMach = truth.get("mach").asDouble();
    assertEquals(trueMach, res.summary().mach().value(), 0.005, r.both());
    assertEquals(0, res.summary().failedFrames());
    assertTrue(Files.exists(dir.resolve("report.html")) && Files.exists(dir.resolve("result.csv")));
    assertTrue(r.out().contains("M = "), r.both());
  }

  @Test
  void aMissingCalibrationFileIsOneLine() throws Exception {
    Files.writeString(dir.resolve("x.run.json"), "{\"images\":{\"frames\":[\"a.png\"]},\"calibration\":\"nope/bench.json\","
        + "\"model\":{\"shape\":\"wedge\",\"deflectionDeg\":10,\"leadingEdgePx\":[10,10],\"chordPx\":20}}");
    Run r = run("analyze", dir.resolve("x.run.json").toString(), "--out", dir.resolve("out").toString());
    assertEquals(1, r.rc(), r.both());
    assertTrue(r.err().contains("[file-missing]") && r.err().contains("bench.json"), r.both());
    assertEquals(1, r.err().strip().lines().count(), r.both());
    assertFalse(Files.exists(dir.resolve("out/report.html")));
  }

  @Test
  void aRunWhoseOnlyFrameIsCorruptSaysWhyAndStillWritesItsReport() throws Exception {
    Path samples = Path.of("sample-images").toAbsolutePath();
    Path run = dir.resolve("w.run.json");
    String text = Files.readString(samples.resolve("run-2731-wedge-m20.run.json"))
        .replace("\"../calibration/bench.json\"", Json.MAPPER.writeValueAsString(samples.resolveSibling("calibration/bench.json").toString()));
    Files.writeString(run, text);
    byte[] png = Files.readAllBytes(samples.resolve("run-2731-wedge-m20.png"));
    Files.write(dir.resolve("run-2731-wedge-m20.png"), java.util.Arrays.copyOf(png, 1000)); // truncated
    Files.copy(samples.resolve("run-2731-wedge-m20.tare.png"), dir.resolve("run-2731-wedge-m20.tare.png"));
    Run r = run("analyze", run.toString(), "--out", dir.resolve("out").toString(), "--no-progress");
    assertEquals(1, r.rc(), r.both());
    assertEquals(1, r.err().strip().lines().count(), r.both());
    assertTrue(r.err().contains("run-2731-wedge-m20.png") && r.err().contains("[image-corrupt]"), r.both());
    assertTrue(Files.exists(dir.resolve("out/report.html")) && Files.exists(dir.resolve("out/result.json")), r.both());
  }

  /** Without optics in the run file one guess serves the run, and every frame says it was a guess. */
  @Test
  void aRunFileWithoutOpticsIsAnalysedOnAGuessThatTheResultAdmits() throws Exception {
    Path samples = Path.of("sample-images").toAbsolutePath();
    com.fasterxml.jackson.databind.node.ObjectNode rf =
        (com.fasterxml.jackson.databind.node.ObjectNode) Json.MAPPER.readTree(samples.resolve("run-2755-ramp-shadowgraph.run.json").toFile());
    rf.remove("optics");
    rf.put("calibration", samples.resolveSibling("calibration/bench.json").toString());
    Files.copy(samples.resolve("run-2755-ramp-shadowgraph.png"), dir.resolve("run-2755-ramp-shadowgraph.png"));
    Path run = dir.resolve("r.run.json");
    Json.MAPPER.writeValue(run.toFile(), rf);
    Run r = run("analyze", run.toString(), "--out", dir.resolve("out").toString(), "--no-progress");
    assertEquals(0, r.rc(), r.both());
    ResultFile res = ResultFile.read(dir.resolve("out/result.json"));
    JsonNode truth = Json.MAPPER.readTree(samples.resolve("run-2755-ramp-shadowgraph.truth.json").toFile());
    assertEquals(truth.get("mach").asDouble(), res.summary().mach().value(), 0.005, r.both());
    assertTrue(res.frames().get(0).warnings().stream().anyMatch(w -> w.startsWith("[optics-guessed]") && w.contains("shadowgraph")),
        res.frames().get(0).warnings().toString());
  }

  @Test
  void anUnknownShapeIsOneLine() throws Exception {
    Files.writeString(dir.resolve("y.run.json"), "{\"images\":{\"frames\":[\"a.png\"]},\"model\":{\"shape\":\"ogive\"}}");
    Run r = run("analyze", dir.resolve("y.run.json").toString(), "--out", dir.resolve("out").toString());
    assertEquals(1, r.rc(), r.both());
    assertTrue(r.err().contains("[shape-unknown]") && r.err().contains("ogive"), r.both());
    assertEquals(1, r.err().strip().lines().count(), r.both());
  }

  @Test
  void aMissingOutOptionIsAUsageError() {
    Run r = run("analyze", "whatever.run.json");
    assertEquals(2, r.rc(), r.both());
  }

  @Test
  void demoWithoutSamplesIsOneLine() {
    Run r = run("demo", "--samples", dir.resolve("none").toString(), "--out", dir.resolve("demo").toString());
    assertEquals(1, r.rc(), r.both());
    assertTrue(r.err().contains("[samples-missing]"), r.both());
  }
}
