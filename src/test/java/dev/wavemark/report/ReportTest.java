package dev.wavemark.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import dev.wavemark.files.ModelJson;
import dev.wavemark.files.ResultFile;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ReportTest {
  @TempDir Path dir;

  @Test
  void writesEveryFileAndTheHtmlIsEscaped() throws Exception {
    String label = "<script>alert('x')</script> & run \"7\"";
    ResultFile r = Fixtures.result(label, List.of(Fixtures.frame(0, Fixtures.MACH, "frame-0001.png")));
    Path html = Report.write(new Report.Input(r, Fixtures.WEDGE, 0, Map.of(0, Fixtures.picture()), null), dir);
    String page = Files.readString(html);
    assertFalse(page.contains("<script>"), "the label must come out inert");
    assertTrue(page.contains("&lt;script&gt;alert("), "the label must be shown escaped");
    assertTrue(Files.exists(dir.resolve("result.json")));
    assertTrue(Files.exists(dir.resolve("result.csv")));
    assertTrue(Files.exists(dir.resolve("pictures/frame-00000.png")));
    assertTrue(page.contains("pictures/frame-00000.png"));
    assertTrue(page.contains("<svg"), "the oblique-shock chart is inline SVG");
    assertFalse(page.contains("http://") && page.contains("<link"), "no external stylesheet");
    assertFalse(page.contains("<script"), "no scripts at all");
    assertEquals(label, ResultFile.read(dir.resolve("result.json")).label());
    try (Stream<Path> s = Files.walk(dir)) {
      assertTrue(s.noneMatch(p -> p.getFileName().toString().endsWith(".part")), "no temporary file left behind");
    }
  }

  @Test
  void aBluntBodyShowsItsNoseRadiusAndAnUndecidedTunnelCheckSaysWhy() throws Exception {
    ResultFile base = Fixtures.result("cylinder", List.of(Fixtures.frame(0, Fixtures.MACH, "frame-0001.png")));
    ModelJson cylinder = ModelJson.blunt("cylinder", new double[] {264, 192}, 32.0, 0.2);
    ResultFile.Settings s = base.settings();
    ResultFile.Settings blunt = new ResultFile.Settings(s.runFile(), s.gamma(), s.optics(), cylinder, s.calibration(), s.tunnel(),
        s.images(), s.noFlowReference(), s.frameRange(), 0.0, s.annotatedFrames());
    ResultFile.TunnelCheck undecided = new ResultFile.TunnelCheck(2.9996, 0.1518,
        List.of(new ResultFile.Comparison("nominal", 3.0, -0.0004, -0.0004 / 0.1518, 0.02, "inconclusive")), List.of(), "inconclusive");
    ResultFile.Summary sum = base.summary();
    ResultFile r = new ResultFile(base.label(), base.tool(), base.frames(), new ResultFile.Summary(sum.mach(), sum.nominalMach(),
        sum.frames(), sum.failedFrames(), sum.machTolerance(), sum.machScatter(), sum.budget(), undecided, sum.warnings()), blunt);
    String page = Files.readString(Report.write(new Report.Input(r, Fixtures.WEDGE, 0, Map.of(), null), dir));
    assertTrue(page.contains("nose radius 32.00 px \u00b1 0.20 px"), "the blunt body's radius and its tolerance are shown");
    assertFalse(page.contains("Model angle tolerance"), "a blunt body has no angle to hold a tolerance on");
    assertTrue(page.contains("undecided: the uncertainty (2\u03c3 = 0.3036) is too wide for the tolerance"), page);
  }

  @Test
  void theObliqueShockDiagramIsLeftOutWhenNoPlaneShockWasMeasured() throws Exception {
    ResultFile.Frame f = Fixtures.frame(0, Fixtures.MACH, "frame-0001.png");
    ResultFile.Frame bare = new ResultFile.Frame(f.index(), f.file(), List.of(), f.mach(), f.reflection(), f.warnings(), f.error(),
        f.budget(), f.predicted(), f.tunnel());
    ResultFile base = Fixtures.result("bow shock only", List.of(bare));
    String page = Files.readString(Report.write(new Report.Input(base, Fixtures.WEDGE, 0, Map.of(), null), dir));
    assertTrue(page.contains("the oblique-shock diagram is left out"), "the page says why the diagram is missing");
    assertFalse(page.contains("<b>Oblique-shock diagram.</b>"), "no diagram of theory alone");
    String withShocks = Files.readString(Report.write(new Report.Input(Fixtures.result("wedge", List.of(f)), Fixtures.WEDGE, 0, Map.of(), null), dir));
    assertTrue(withShocks.contains("<b>Oblique-shock diagram.</b>"), "measured shocks get the diagram");
  }

  @Test
  void aSlipLineCheckIsTabulatedAndWrittenToTheResult() throws Exception {
    // a double ramp (8 + 8 deg at M 3): theory's slip line from the core's same-family
    // intersection, the measured line turned 0.4 deg from it with a 0.05 deg uncertainty
    dev.wavemark.core.model.BodyShape.Wall floor = new dev.wavemark.core.model.BodyShape.Wall(
        new dev.wavemark.core.geom.Point2(0, 600), new dev.wavemark.core.geom.Point2(1000, 600), dev.wavemark.core.model.Side.LOWER);
    var ramp = new dev.wavemark.core.model.BodyShape.DoubleRamp(Math.toRadians(8), new dev.wavemark.core.geom.Point2(300, 600),
        Math.toRadians(8), new dev.wavemark.core.geom.Point2(450, 600), floor);
    var slip = dev.wavemark.core.model.WavePattern.of(ramp, 3.0, 1.4, 0, 1024, 768).stream()
        .filter(e -> e.kind() == dev.wavemark.core.model.WaveKind.SLIP_LINE).findFirst().orElseThrow();
    double theory = Math.toDegrees(slip.directionRad());
    ResultFile.Wave w = new ResultFile.Wave("slip-line", "upper", 0.4, 0.05, new double[] {slip.startPx().x(), slip.startPx().y()},
        new double[] {slip.endPx().x(), slip.endPx().y()}, 300, 0.2, slip.label(), false, null, 0.0, 0.0,
        new ResultFile.DirectionCheck(theory + 0.4, theory, 0.4, 8.0), null);
    ResultFile.Frame f0 = Fixtures.frame(0, Fixtures.MACH, "frame-0001.png");
    List<ResultFile.Wave> waves = new java.util.ArrayList<>(f0.waves());
    waves.add(w);
    ResultFile.Frame f = new ResultFile.Frame(f0.index(), f0.file(), waves, f0.mach(), f0.reflection(), f0.warnings(), f0.error(),
        f0.budget(), f0.predicted(), f0.tunnel());
    Path html = Report.write(new Report.Input(Fixtures.result("slip", List.of(f)), Fixtures.WEDGE, 0, Map.of(), null), dir);
    String page = Files.readString(html);
    assertTrue(page.contains("Slip lines against intersection theory"), "the check table is shown");
    assertTrue(page.contains(String.format(java.util.Locale.ROOT, "%.3f", theory)), "theory's direction is shown");
    assertTrue(page.contains("8.0"), "the difference in sigmas is shown");
    String json = Files.readString(dir.resolve("result.json"));
    assertTrue(json.contains("\"measuredDirectionDeg\"") && json.contains("\"differenceSigma\""), "the check is in result.json");
    ResultFile.DirectionCheck back = ResultFile.read(dir.resolve("result.json")).frames().get(0).waves().get(2).check();
    assertEquals(0.4, back.differenceDeg(), 1e-12);
  }

  @Test
  void aSequenceGetsTheMachChartAndABoundedPictureSelection() throws Exception {
    List<ResultFile.Frame> frames = new java.util.ArrayList<>();
    for (int i = 0; i < 30; i++) {
      frames.add(Fixtures.frame(i, 1.98 + 0.001 * i, String.format("seq.tif#%d", i + 1)));
    }
    frames.set(7, Fixtures.failed(7, "seq.tif#8", "image-corrupt", "seq.tif#8: not a readable image (bad strip)"));
    Map<Integer, Picture> pics = new java.util.HashMap<>();
    for (int i : FrameSelection.evenly(30, FrameSelection.MAX_PICTURES)) {
      pics.put(i, Fixtures.picture());
    }
    Path html = Report.write(new Report.Input(Fixtures.result("sequence", frames), Fixtures.WEDGE, 0, pics, "../index.html"), dir);
    String page = Files.readString(html);
    assertTrue(page.contains("Mach number against frame"));
    assertTrue(page.contains("image-corrupt"), "the failed frame is listed with its code");
    try (Stream<Path> s = Files.list(dir.resolve("pictures"))) {
      assertEquals(FrameSelection.MAX_PICTURES, s.count());
    }
  }

  @Test
  void anInterruptedWriteLeavesNoReportPage() throws Exception {
    ResultFile r = Fixtures.result("ok", List.of(Fixtures.frame(0, Fixtures.MACH, "frame-0001.png")));
    Report.write(new Report.Input(r, Fixtures.WEDGE, 0, Map.of(), null), dir);
    assertTrue(Files.exists(dir.resolve("report.html")));
    // A second run whose pictures cannot be written (a file stands where the folder must go).
    Files.writeString(dir.resolve("pictures"), "not a folder");
    WavemarkException e = assertThrows(WavemarkException.class,
        () -> Report.write(new Report.Input(r, Fixtures.WEDGE, 0, Map.of(0, Fixtures.picture()), null), dir));
    assertEquals(Problem.WRITE_FAILED, e.problem());
    assertFalse(Files.exists(dir.resolve("report.html")), "the old page must not pass for the new run's");
  }

  @Test
  void evenSelectionKeepsFirstAndLast() {
    assertEquals(List.of(0, 1, 2), FrameSelection.evenly(3, 8));
    List<Integer> s = FrameSelection.evenly(10_000, 8);
    assertEquals(8, s.size());
    assertEquals(0, s.get(0));
    assertEquals(9_999, s.get(7));
  }

  @Test
  void measuredLinesAreDrawnThroughTheLensOntoThePicture() throws Exception {
    // result pixels are lens-corrected; a stand-in distortion that moves everything 40 px down
    ResultFile.Frame f = Fixtures.frame(0, Fixtures.MACH, "frame-0001.png");
    ResultFile.Wave w = f.waves().get(0);
    int mx = (int) Math.round(0.5 * (w.startPx()[0] + w.endPx()[0]));
    int my = (int) Math.round(0.5 * (w.startPx()[1] + w.endPx()[1]));
    java.awt.image.BufferedImage plain = png(f, java.util.function.UnaryOperator.identity());
    java.awt.image.BufferedImage moved = png(f, q -> new dev.wavemark.core.geom.Point2(q.x(), q.y() + 40));
    assertTrue(redNear(plain, mx, my), "the line is drawn where the result puts it without a lens");
    assertFalse(redNear(moved, mx, my), "with a lens it is not drawn at the corrected position");
    assertTrue(redNear(moved, mx, my + 40), "it is drawn where the lens puts it in the picture");
  }

  private static java.awt.image.BufferedImage png(ResultFile.Frame f, java.util.function.UnaryOperator<dev.wavemark.core.geom.Point2> lens)
      throws Exception {
    byte[] b = Annotator.png(Fixtures.picture(), f, List.of(), lens);
    return javax.imageio.ImageIO.read(new java.io.ByteArrayInputStream(b));
  }

  private static boolean redNear(java.awt.image.BufferedImage img, int x, int y) {
    for (int dy = -2; dy <= 2; dy++) {
      for (int dx = -2; dx <= 2; dx++) {
        int rgb = img.getRGB(x + dx, y + dy);
        int r = (rgb >> 16) & 0xff;
        int g = (rgb >> 8) & 0xff;
        if (r > 200 && g < 140) {
          return true;
        }
      }
    }
    return false;
  }
}
