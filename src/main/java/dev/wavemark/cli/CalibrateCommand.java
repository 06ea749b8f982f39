package dev.wavemark.cli;

import dev.wavemark.core.WavemarkException;
import dev.wavemark.core.model.Calibration;
import dev.wavemark.files.CalibrationFile;
import dev.wavemark.imaging.calib.BenchCalibration;
import dev.wavemark.imaging.calib.ChessboardTarget;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.Callable;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.jspecify.annotations.Nullable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code wavemark calibrate TARGET-IMAGE ... --out FILE}: a calibration file from chessboard pictures. */
@Command(name = "calibrate", mixinStandardHelpOptions = true, versionProvider = Main.Version.class,
    description = {
        "Measures the optical bench from pictures of a printed chessboard and writes a calibration file.",
        "Lens: three or more views of the board, tilted differently and reaching into the picture's corners,",
        "give the focal lengths, principal point and radial distortion.",
        "Flow direction and scale: one view of the board laid flat in the test section, the edges of its squares",
        "along the tunnel axis (--in-situ, or the only picture given). The flow direction written is the board",
        "edge direction closest to --flow-nominal-deg; the scale is the board's in its own plane."},
    footer = {"", "Example: wavemark calibrate tilt-*.png --in-situ board-in-section.png --squares 7x9 --square-size 0.01 --out bench.json"})
public final class CalibrateCommand implements Callable<Integer> {
  private static final Pattern SQUARES = Pattern.compile("(\\d+)\\s*[xX]\\s*(\\d+)");

  @CommandLine.Spec CommandLine.Model.CommandSpec spec;

  @Parameters(paramLabel = "TARGET-IMAGE", arity = "1..*", description = "Pictures of the chessboard (PNG, TIFF, JPEG).")
  List<Path> images = List.of();

  @Option(names = "--out", required = true, paramLabel = "FILE", description = "Calibration file to write (JSON).")
  Path out;

  @Option(names = "--squares", paramLabel = "ROWSxCOLS", defaultValue = "7x9",
      description = "Board size in squares, not corners (default ${DEFAULT-VALUE}).")
  String squares;

  @Option(names = "--square-size", paramLabel = "M", defaultValue = "0.01",
      description = "Side of one square in metres (default ${DEFAULT-VALUE}).")
  double squareSizeM;

  @Option(names = "--in-situ", paramLabel = "IMAGE",
      description = "The picture of the board laid in the test section; it may also be one of the TARGET-IMAGEs.")
  @Nullable Path inSitu;

  @Option(names = "--lens-from", paramLabel = "FILE",
      description = "Take the lens from this calibration file instead of estimating it (for a new in-situ view).")
  @Nullable Path lensFrom;

  @Option(names = "--flow-nominal-deg", paramLabel = "DEG", defaultValue = "0",
      description = "Rough flow direction in the picture, counter-clockwise from +x (default ${DEFAULT-VALUE}: left to right).")
  double nominalDeg;

  @Option(names = "--placement-uncertainty-deg", paramLabel = "DEG", defaultValue = "0",
      description = "Standard uncertainty of the board's alignment with the tunnel axis, added to the measured one "
          + "(default ${DEFAULT-VALUE}: measurement only).")
  double placementDeg;

  @Option(names = "--radial-terms", paramLabel = "N", defaultValue = "2",
      description = "Radial distortion coefficients to estimate, 1 or 2 (default ${DEFAULT-VALUE}; use 1 for a long lens, "
          + "whose narrow field cannot separate k1 from k2).")
  int radialTerms;

  @Option(names = "--tangential", description = "Also estimate tangential (decentring) distortion.")
  boolean tangential;

  @Override
  public Integer call() {
    Matcher m = SQUARES.matcher(squares.trim());
    if (!m.matches()) {
      throw new CommandLine.ParameterException(spec.commandLine(),
          "--squares must be ROWSxCOLS counted in squares, e.g. 7x9, got '" + squares + "'");
    }
    if (radialTerms < 1 || radialTerms > 2) {
      throw new CommandLine.ParameterException(spec.commandLine(), "--radial-terms must be 1 or 2");
    }
    if (!(placementDeg >= 0 && placementDeg < 10)) {
      throw new CommandLine.ParameterException(spec.commandLine(), "--placement-uncertainty-deg must be in [0, 10)");
    }
    ChessboardTarget target = new ChessboardTarget(Integer.parseInt(m.group(1)), Integer.parseInt(m.group(2)), squareSizeM);
    Optional<Calibration.Lens> prior = Optional.ofNullable(lensFrom).flatMap(p -> {
      if (!Files.exists(p)) {
        throw new WavemarkException(dev.wavemark.core.Problem.FILE_MISSING, p, Path.of("").toAbsolutePath());
      }
      return CalibrationFile.read(p).toDomain(p.toString()).lens();
    });
    BenchCalibration.Result r = BenchCalibration.run(new BenchCalibration.Request(images, Optional.ofNullable(inSitu), target,
        prior, Math.toRadians(nominalDeg), Math.toRadians(placementDeg), radialTerms, tangential));
    CalibrationFile file = CalibrationFile.fromDomain(r.calibration());
    if (r.pose().isEmpty()) {
      file = new CalibrationFile(null, null, null, file.lens(), null);
    }
    file.write(out);

    PrintWriter o = spec.commandLine().getOut();
    r.lensFit().ifPresent(f -> o.printf(Locale.ROOT,
        "lens: fx %.2f px, fy %.2f px, centre (%.2f, %.2f) px, radial %s from %d views; reprojection error mean %.3f px, max %.3f px%n",
        f.camera().fx, f.camera().fy, f.camera().cx, f.camera().cy, java.util.Arrays.toString(f.camera().radial), f.views(),
        f.meanErrorPx(), f.maxErrorPx()));
    if (r.lensFit().isEmpty()) {
      o.println(prior.isPresent() ? "lens: taken from " + lensFrom : "lens: none (no lens views given; points are not corrected)");
    }
    r.pose().ifPresent(p -> o.printf(Locale.ROOT,
        "flow direction: %.4f deg +- %.4f deg (board x-axis at %.4f deg); scale %.4e m/px (axes differ by %.2f%%); %d corners, rms %.3f px%n",
        Math.toDegrees(r.calibration().flowDirectionRad()), Math.toDegrees(r.calibration().flowDirectionUncertaintyRad()),
        Math.toDegrees(p.targetXAxisRad()), p.metersPerPixel(), 100 * p.scaleAnisotropy(), p.corners(), p.rmsResidualPx()));
    if (r.pose().isEmpty()) {
      o.println("flow direction, scale: not measured (give --in-situ IMAGE: the board laid in the test section)");
    }
    o.println("wrote " + out);
    o.flush();
    return 0;
  }
}
