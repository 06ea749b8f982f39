package dev.wavemark.cli.render;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.wavemark.cli.Main;
import dev.wavemark.core.gas.ObliqueShock;
import dev.wavemark.core.gas.ShockBranch;
import dev.wavemark.core.model.RunSpec;
import dev.wavemark.files.RunFile;
import dev.wavemark.files.TruthFile;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The render command run in-process on a small scene. */
class RenderCommandTest {
  @TempDir Path dir;

  private int run(StringWriter out, StringWriter err, String... args) {
    int rc = Main.commandLine(new PrintWriter(out), new PrintWriter(err)).execute(args);
    return rc;
  }

  @Test
  void writesPictureTruthAndARunFileThatParses() throws Exception {
    Path scene = dir.resolve("w.scene.json");
    Files.writeString(scene, """
        { "seed": 3, "sizePx": [200, 150], "mach": 2.0, "optics": "schlieren-vertical-edge",
          "calibration": { "flowDirectionDeg": 0.5, "metersPerPixel": 2.0e-4,
                           "lens": {"fx": 600, "fy": 600, "cx": 100, "cy": 75, "radial": [-0.05, 0]} },
          "model": {"shape": "wedge", "deflectionDeg": 10, "leadingEdgePx": [50, 75], "chordPx": 50} }
        """);
    StringWriter out = new StringWriter();
    StringWriter err = new StringWriter();
    int rc = run(out, err, "render", scene.toString(), "--out", dir.resolve("out/w.png").toString());
    assertEquals(0, rc, out + "\n" + err);
    assertTrue(Files.size(dir.resolve("out/w.png")) > 1000);
    assertTrue(Files.exists(dir.resolve("out/w.tare.png")));
    TruthFile t = TruthFile.read(dir.resolve("out/w.truth.json"));
    TruthFile.WaveJson up = t.waves().stream().filter(w -> w.label().equals("upper leading-edge shock")).findFirst().orElseThrow();
    assertEquals(Math.toDegrees(ObliqueShock.beta(2.0, Math.toRadians(10), ShockBranch.WEAK, 1.4)), up.angleDeg(), 1e-9);
    Path runFile = dir.resolve("out/w.run.json");
    RunSpec spec = RunFile.read(runFile).toDomain(runFile);
    assertEquals(1, spec.frames().size());
    assertTrue(Files.exists(spec.frames().get(0)));
    assertTrue(spec.calibration().lens().isPresent());
  }

  @Test
  void missingSceneIsOneLineWithACode() {
    StringWriter out = new StringWriter();
    StringWriter err = new StringWriter();
    int rc = run(out, err, "render", dir.resolve("nope.json").toString(), "--out", dir.resolve("x.png").toString());
    assertEquals(1, rc);
    assertTrue(err.toString().contains("[file-missing]"), err.toString());
    assertEquals(1, err.toString().strip().lines().count(), err.toString());
  }

  @Test
  void detachedWedgeIsATypedError() throws Exception {
    Path scene = dir.resolve("d.scene.json");
    Files.writeString(scene, """
        { "sizePx": [100, 80], "mach": 1.5,
          "model": {"shape": "wedge", "deflectionDeg": 20, "leadingEdgePx": [30, 40], "chordPx": 30} }
        """);
    StringWriter out = new StringWriter();
    StringWriter err = new StringWriter();
    int rc = run(out, err, "render", scene.toString(), "--out", dir.resolve("d.png").toString());
    assertEquals(1, rc);
    assertTrue(err.toString().contains("[shock-detached]"), err.toString());
  }

  @Test
  void sequenceIsACompressedMultiPageTiffThatImageJReads() throws Exception {
    Path scene = dir.resolve("s.scene.json");
    Files.writeString(scene, """
        { "seed": 9, "sizePx": [96, 72], "mach": 2.5,
          "sequence": {"frames": 3, "machDriftPerFrame": 0.01, "shockJitterPx": 0.1},
          "model": {"shape": "wedge", "deflectionDeg": 10, "leadingEdgePx": [20, 36], "chordPx": 30} }
        """);
    StringWriter out = new StringWriter();
    StringWriter err = new StringWriter();
    int rc = run(out, err, "render", scene.toString(), "--out", dir.resolve("s.tif").toString());
    assertEquals(0, rc, out + "\n" + err);
    ij.ImagePlus imp = ij.IJ.openImage(dir.resolve("s.tif").toString());
    assertEquals(3, imp.getStackSize());
    assertEquals(16, imp.getBitDepth());
    TruthFile t = TruthFile.read(dir.resolve("s.truth.json"));
    assertEquals(3, t.frames().size());
    assertEquals(2.52, t.frames().get(2).mach(), 1e-12, "drift 0.01 per frame, no scatter");
  }
}
