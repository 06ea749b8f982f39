package dev.wavemark.cli.render;

import com.fasterxml.jackson.databind.node.TextNode;
import dev.wavemark.files.CalibrationFile;
import dev.wavemark.files.ModelJson;
import dev.wavemark.files.RunFile;
import dev.wavemark.files.SceneFile;
import dev.wavemark.imaging.synth.CalibrationTarget;
import dev.wavemark.imaging.synth.SynthImages;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;

/**
 * The bundled demo set, defined here and rebuilt from its seeds by {@code wavemark samples}: the
 * Torvik Bay Gas Dynamics Laboratory's TB-2 blow-down tunnel (an invented facility), its bench
 * calibration, chessboard target pictures, and one scene per run.
 */
final class SampleSet {
  /** The geometry below is laid out for 640 x 480 and scaled by this to the camera's 512 x 384. */
  static final double S = 0.8;
  static final int W = 512;
  static final int H = 384;

  private SampleSet() {}

  /** The bench as calibrated: 12-bit camera, 640 x 480, circular 100 mm window. */
  static CalibrationFile bench() {
    return new CalibrationFile(0.35, 0.03, 2.2e-4 / S,
        new CalibrationFile.LensJson(1480 * S, 1480 * S, 322.4 * S, 238.1 * S, new double[] {-0.07, 0.012}, new double[] {0, 0}),
        new CalibrationFile.WindowJson("circle", new double[] {321 * S, 240 * S}, 228.0 * S, null));
  }

  /** The same camera read out as a 192 x 144 region of interest (offset 160, 120) for a fast sequence. */
  static CalibrationFile benchRoi() {
    return new CalibrationFile(0.35, 0.03, 2.2e-4 / S,
        new CalibrationFile.LensJson(1480 * S, 1480 * S, 322.4 * S - 160, 238.1 * S - 120, new double[] {-0.07, 0.012},
            new double[] {0, 0}),
        new CalibrationFile.WindowJson("circle", new double[] {321 * S - 160, 240 * S - 120}, 228.0 * S, null));
  }

  private static ModelJson model(String shape, Double defl, Double inc, double[] le, Double chord, double[][] wall,
      double[] second, Double secondDefl, double[][] les, double[] defls) {
    return new ModelJson(shape, defl, inc, le, chord, 0.05, wall, wall == null ? null : "lower", second, secondDefl, les, defls);
  }

  private static double[] p(double x, double y) {
    return new double[] {x * S, y * S};
  }

  /** A floor plate through (320, y), parallel to the rolled freestream (the camera is rolled, the tunnel is not). */
  private static double[][] wallAt(double y) {
    double t = Math.tan(Math.toRadians(bench().flowDirectionDeg()));
    return new double[][] {p(0, y + 320 * t), p(640, y - 320 * t)};
  }

  private static RunFile.TunnelJson tunnel(double m) {
    return new RunFile.TunnelJson(m, 0.02, null);
  }

  /** name, scene. */
  record Entry(String name, String image, SceneFile scene) {}

  static List<Entry> scenes() {
    List<Entry> e = new ArrayList<>();
    String cal = "../../calibration/bench.json";
    ModelJson wedge = model("wedge", 10.0, 0.0, p(175, 241), 130.0 * S, null, null, null, null, null);
    e.add(entry("run-2731-wedge-m20", ".png", 2731, 2.0, wedge, "schlieren-vertical-edge", cal, true, null, W, H,
        "TB-2 run 2731: 10 deg wedge W10, nozzle block M2.0, vertical knife edge"));
    e.add(entry("run-2734-wedge-m30", ".png", 2734, 3.0, wedge, "schlieren-vertical-edge", cal, false, null, W, H,
        "TB-2 run 2734: 10 deg wedge W10, nozzle block M3.0, vertical knife edge"));
    e.add(entry("run-2737-diamond-m25", ".png", 2737, 2.5,
        model("diamond", 7.0, 4.0, p(185, 238), 230.0 * S, null, null, null, null, null), "schlieren-horizontal-edge", cal, false,
        null, W, H, "TB-2 run 2737: 7 deg diamond airfoil D7 at 4 deg incidence, M2.5, horizontal knife edge"));
    e.add(entry("run-2740-generator-regular", ".png", 2740, 2.0,
        model("shock-generator", 8.0, null, p(150, 140), null, wallAt(372), null, null, null, null), "schlieren-vertical-edge",
        cal, true, null, W, H, "TB-2 run 2740: 8 deg shock generator SG8 over the floor plate, M2.0 (regular reflection)"));
    e.add(entry("run-2741-generator-mach", ".png", 2741, 2.0,
        model("shock-generator", 14.0, null, p(150, 140), null, wallAt(372), null, null, null, null), "schlieren-vertical-edge",
        cal, false, null, W, H, "TB-2 run 2741: 14 deg shock generator SG14 over the floor plate, M2.0 (Mach reflection)"));
    e.add(entry("run-2743-twin-generators", ".png", 2743, 2.5,
        model("twin-generators", null, null, null, null, null, null, null, new double[][] {p(150, 132), p(150, 348)},
            new double[] {8.0, 6.0}), "schlieren-horizontal-edge", cal, false, null, W, H,
        "TB-2 run 2743: twin generators TG8/6 (8 deg upper, 6 deg lower), crossing shocks, M2.5, horizontal knife edge"));
    double c = Math.cos(Math.toRadians(8));
    double s = Math.sin(Math.toRadians(8));
    e.add(entry("run-2745-double-ramp", ".png", 2745, 3.0,
        model("double-ramp", 8.0, null, p(140, 340), null, wallAt(340), p(140 + 120 * c, 340 - 120 * s), 8.0, null, null),
        "schlieren-vertical-edge", cal, false, null, W, H, "TB-2 run 2745: double ramp DR8/8 on the floor plate, M3.0"));
    e.add(entry("run-2750-cone-m25", ".png", 2750, 2.5, model("cone", 15.0, 0.0, p(190, 240), 170.0 * S, null, null, null, null, null),
        "schlieren-vertical-edge", cal, false, null, W, H, "TB-2 run 2750: 15 deg cone C15 on its sting, M2.5"));
    e.add(entry("run-2752-freestream-m20", ".png", 2752, 2.0, model("none", null, null, null, null, null, null, null, null, null),
        "schlieren-vertical-edge", cal, false, null, W, H, "TB-2 run 2752: empty test section, M2.0 (Mach waves from the nozzle walls)"));
    e.add(entry("run-2755-ramp-shadowgraph", ".png", 2755, 2.2,
        model("ramp", 12.0, null, p(290, 335), null, wallAt(335), null, null, null, null), "shadowgraph", cal, false, null, W, H,
        "TB-2 run 2755: 12 deg compression ramp R12 on the floor plate, M2.2, direct shadowgraph"));
    e.add(entry("run-2760-cylinder-m30", ".png", 2760, 3.0, ModelJson.blunt("cylinder", p(330, 240), 40.0 * S, 0.2),
        "schlieren-vertical-edge", cal, false, null, W, H,
        "TB-2 run 2760: 17.6 mm circular cylinder CY18 across the test section, seen end-on, M3.0, vertical knife edge"));
    e.add(entry("run-2770-wedge-sequence", ".tif", 2770, 2.5, model("wedge", 10.0, 0.0, new double[] {45, 73}, 40.0, null, null, null, null, null),
        "schlieren-vertical-edge", "../../calibration/bench-roi.json", true,
        new SceneFile.SequenceJson(50, -0.0004, 0.003, 0.15), 192, 144,
        "TB-2 run 2770: 10 deg wedge W10, M2.5, 50 frames at 2 kHz from a 192 x 144 region of interest"));
    return e;
  }

  private static Entry entry(String name, String ext, long seed, double mach, ModelJson m, String optics, String cal, boolean ref,
      SceneFile.SequenceJson seq, int w, int h, String label) {
    SceneFile.BenchJson bench = new SceneFile.BenchJson(null, null, null, null, null, null, null, null, null, null, null, null,
        40000.0, null, null, null, null, null, seed % 97);
    SceneFile sc = new SceneFile(label, seed, new int[] {w, h}, new RunFile.GasJson(1.4), mach, null, m, optics, bench,
        TextNode.valueOf(cal), seq, ref, tunnel(Math.round(mach * 10) / 10.0));
    return new Entry(name, name + ext, sc);
  }

  /** Rebuilds everything under {@code root}: calibration/ and sample-images/. */
  static void build(Path root, Consumer<String> log) {
    Path calDir = root.resolve("calibration");
    bench().write(calDir.resolve("bench.json"));
    benchRoi().write(calDir.resolve("bench-roi.json"));
    var lens = bench().toDomain("bench").lens().orElseThrow();
    double[][] poses = {{0, 0, -Math.toRadians(bench().flowDirectionDeg())}, {0.35, 0, 0.02}, {-0.35, 0.05, -0.03}, {0.05, 0.38, 0.01}, {0.02, -0.36, 0.04},
        {0.3, 0.3, -0.02}};
    for (int i = 0; i < poses.length; i++) {
      double sq = (i == 0 ? 36.4 : 30) * S;
      Path f = calDir.resolve(String.format(java.util.Locale.ROOT, "target-%02d.png", i + 1));
      SynthImages.write(CalibrationTarget.render(lens, W, H, 6, 8, sq, poses[i][0], poses[i][1], poses[i][2], 321 * S, 240 * S, 900 + i), f);
      log.accept("wrote " + f);
    }
    Path scenes = root.resolve("sample-images").resolve("scenes");
    for (Entry e : scenes()) {
      Path sf = scenes.resolve(e.name() + ".scene.json");
      e.scene().write(sf);
      try {
        SceneJob.Written w = SceneJob.run(sf, root.resolve("sample-images").resolve(e.image()));
        log.accept("wrote " + w.image() + " (" + w.waves() + " waves)");
      } catch (dev.wavemark.core.WavemarkException ex) {
        log.accept("skipped " + e.name() + ": " + ex.getMessage());
      }
    }
  }
}
