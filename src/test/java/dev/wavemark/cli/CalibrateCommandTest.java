package dev.wavemark.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import boofcv.struct.calib.CameraPinholeBrown;
import boofcv.struct.image.GrayF32;
import dev.wavemark.files.CalibrationFile;
import dev.wavemark.imaging.calib.ChessboardRenderer;
import dev.wavemark.imaging.calib.ChessboardTarget;
import ij.ImagePlus;
import ij.io.FileSaver;
import ij.process.FloatProcessor;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Runs {@code wavemark calibrate} in-process on chessboards rendered through a known camera. */
class CalibrateCommandTest {
  static final CameraPinholeBrown CAMERA = new CameraPinholeBrown().fsetK(500, 500, 0, 320, 240, 640, 480).fsetRadial(-0.20, 0.05);
  static final ChessboardTarget BOARD = new ChessboardTarget(7, 9, 0.03);
  static final double DEG = Math.PI / 180;

  @TempDir Path dir;

  record Run(int rc, String out, String err) {
    String both() {
      return "exit " + rc + "\n--- stdout ---\n" + out + "--- stderr ---\n" + err;
    }
  }

  static Run run(String... args) {
    StringWriter out = new StringWriter();
    StringWriter err = new StringWriter();
    int rc = Main.commandLine(new PrintWriter(out, true), new PrintWriter(err, true)).execute(args);
    return new Run(rc, out.toString(), err.toString());
  }

  Path save(String name, double rollDeg, double tiltX, double tiltY, double tx, double ty, double tz) {
    GrayF32 g = ChessboardRenderer.render(CAMERA, BOARD, ChessboardRenderer.rotation(rollDeg * DEG, tiltX, tiltY),
        new double[] {tx, ty, tz}, 1.0, name.hashCode());
    FloatProcessor fp = new FloatProcessor(g.width, g.height, g.data.clone());
    Path p = dir.resolve(name);
    assertTrue(new FileSaver(new ImagePlus(name, fp.convertToByteProcessor(false))).saveAsPng(p.toString()));
    return p;
  }

  @Test
  void lensViewsAndInSituViewMakeACalibrationFile() {
    List<String> args = new ArrayList<>(List.of("calibrate"));
    args.add(save("tilt-1.png", 0, 0.35, 0, 0.03, 0.02, 0.35).toString());
    args.add(save("tilt-2.png", 5, -0.35, 0, -0.03, -0.02, 0.35).toString());
    args.add(save("tilt-3.png", 10, 0, 0.35, 0.02, -0.03, 0.35).toString());
    args.add(save("tilt-4.png", 15, 0.25, 0.25, 0.05, 0.04, 0.38).toString());
    // lens views alone: a lens, and no flow direction or scale
    Path lensOnly = dir.resolve("lens.json");
    List<String> lensArgs = new ArrayList<>(args);
    lensArgs.addAll(List.of("--square-size", "0.03", "--out", lensOnly.toString()));
    Run l = run(lensArgs.toArray(String[]::new));
    assertEquals(0, l.rc(), l.both());
    CalibrationFile lf = CalibrationFile.read(lensOnly);
    assertNull(lf.flowDirectionDeg(), l.both());
    assertNull(lf.metersPerPixel(), l.both());
    assertNotNull(lf.lens(), l.both());

    Path inSitu = save("in-section.png", -1.5, 0, 0, 0, 0, 0.4);
    Path out = dir.resolve("bench.json");
    args.addAll(List.of("--in-situ", inSitu.toString(), "--squares", "7x9", "--square-size", "0.03",
        "--placement-uncertainty-deg", "0.05", "--out", out.toString()));
    Run r = run(args.toArray(String[]::new));
    assertEquals(0, r.rc(), r.both());
    CalibrationFile f = CalibrationFile.read(out);
    assertEquals(-1.5, f.flowDirectionDeg(), 0.02, r.both());
    // the placement uncertainty dominates the measured one, so it shows in the file
    assertTrue(f.flowDirectionUncertaintyDeg() >= 0.05 && f.flowDirectionUncertaintyDeg() < 0.06, r.both());
    assertEquals(0.4 / 500, f.metersPerPixel(), 0.4 / 500 * 0.01, r.both());
    assertNotNull(f.lens(), r.both());
    assertTrue(f.lens().radial()[0] < -0.15 && f.lens().radial()[0] > -0.25, "k1 " + f.lens().radial()[0]);
    assertTrue(r.out().contains("flow direction"), r.both());

    // a second in-situ picture later, with the lens kept from the first calibration
    Path later = save("later.png", 0.5, 0, 0, 0, 0, 0.4);
    Path out2 = dir.resolve("bench-2.json");
    Run r2 = run("calibrate", later.toString(), "--lens-from", out.toString(), "--square-size", "0.03", "--out", out2.toString());
    assertEquals(0, r2.rc(), r2.both());
    CalibrationFile f2 = CalibrationFile.read(out2);
    assertEquals(0.5, f2.flowDirectionDeg(), 0.02, r2.both());
    assertEquals(f.lens().fx(), f2.lens().fx(), 0, r2.both());
  }

  @Test
  void badInputGivesOneLine() throws Exception {
    Path text = dir.resolve("board.png");
    Files.writeString(text, "not a picture");
    Run r = run("calibrate", text.toString(), "--out", dir.resolve("x.json").toString());
    assertEquals(1, r.rc(), r.both());
    assertTrue(r.err().contains("[image-corrupt]"), r.both());
    assertEquals(1, r.err().strip().lines().count(), r.both());
    assertFalse(Files.exists(dir.resolve("x.json")), r.both());

    Path board = save("board-7x9.png", 0, 0, 0, 0, 0, 0.4);
    Run wrong = run("calibrate", board.toString(), "--squares", "6x8", "--out", dir.resolve("y.json").toString());
    assertEquals(1, wrong.rc(), wrong.both());
    assertTrue(wrong.err().contains("[target-not-found]"), wrong.both());

    Run bad = run("calibrate", board.toString(), "--squares", "seven", "--out", dir.resolve("z.json").toString());
    assertEquals(2, bad.rc(), bad.both());
  }
}
