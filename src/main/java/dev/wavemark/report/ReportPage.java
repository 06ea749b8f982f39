package dev.wavemark.report;

import java.util.List;
import org.jspecify.annotations.Nullable;

/**
 * What {@code report.html} shows, already formatted: the template only lays it out (and escapes
 * every string). Public only because the precompiled templates live in their own package.
 *
 * @param label the run's label
 * @param subtitle one line: frames, tool version, run file
 * @param written when the report was written (UTC)
 * @param headline the run's Mach number with its uncertainty, or a dash
 * @param summary key facts of the run, in order
 * @param checks the tunnel check lines
 * @param settings the run's settings, in order
 * @param thetaBetaSvg the theta-beta-M chart as an SVG element, or null when no shock can be placed on it (the note then says so)
 * @param machSvg Mach number against frame (sequences only), or null
 * @param frames the annotated frames
 * @param frameRows the frame table (bounded)
 * @param frameRowsOmitted how many frames the table leaves out (they are all in the CSV and JSON)
 * @param failures the frames that failed
 * @param backLink a link back to an index, or null
 */
public record ReportPage(
    String label, String subtitle, String written, String headline, List<Fact> summary, List<Check> checks,
    List<Fact> settings, @Nullable String thetaBetaSvg, @Nullable String thetaBetaNote, @Nullable String machSvg,
    List<FrameView> frames, String framesNote, List<FrameRow> frameRows, int frameRowsOmitted, List<Failure> failures,
    @Nullable String backLink) {

  /** A label and its value. */
  public record Fact(String name, String value) {}

  /** One line of the tunnel check; {@code status} is "pass", "fail" or "info". */
  public record Check(String against, String reference, String deviation, String tolerance, String status, String verdict) {}

  /** An annotated frame. */
  public record FrameView(
      int index, String file, @Nullable String picture, String mach, String reflection, String reflectionReason,
      List<WaveRow> waves, List<EstimateRow> estimates, @Nullable String consistency, List<BudgetRow> budget,
      String budgetTotal, List<String> predictions, List<String> warnings, @Nullable String error, List<CheckRow> checks) {}

  /** A wave checked by its direction (a slip line): measured and theory directions from the freestream, the difference. */
  public record CheckRow(String tag, String label, String measured, String theory, String difference, String sigmas) {}

  /** A measured wave with its theory values. */
  public record WaveRow(
      String tag, String kind, String side, String label, String angle, String theory, String nominalTheory,
      String deflection, String mach, String support, String rms, boolean curved) {}

  /** One Mach estimate. */
  public record EstimateRow(String from, String value) {}

  /** One line of the uncertainty budget. */
  public record BudgetRow(String source, String input, String mach, String share, boolean systematic) {}

  /** One frame in the frame table. */
  public record FrameRow(int index, String file, String mach, String reflection, int warnings, String status) {}

  /** A frame that failed: its code and message. */
  public record Failure(int index, String file, String code, String message) {}
}
