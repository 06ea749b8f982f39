package dev.wavemark.report;

import dev.wavemark.files.ModelJson;
import dev.wavemark.files.ResultFile;
import gg.jte.ContentType;
import gg.jte.TemplateEngine;
import gg.jte.output.StringOutput;
import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.jspecify.annotations.Nullable;

/** Builds the {@link ReportPage} of a result and renders it with the precompiled jte templates. */
final class HtmlReport {
  /** The frame table lists at most this many frames; the CSV and JSON have them all. */
  static final int MAX_FRAME_ROWS = 500;
  static final TemplateEngine ENGINE =
      TemplateEngine.createPrecompiled(null, ContentType.Html, HtmlReport.class.getClassLoader(), "dev.wavemark.report.templates");
  private static final DateTimeFormatter WHEN = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm 'UTC'", Locale.ROOT).withZone(ZoneOffset.UTC);

  private HtmlReport() {}

  static String when(Instant t) {
    return WHEN.format(t);
  }

  static byte[] render(String template, Object page) {
    StringOutput out = new StringOutput();
    ENGINE.render(template, page, out);
    return out.toString().getBytes(StandardCharsets.UTF_8);
  }

  /**
   * @param pictures frame index to the picture's path relative to the report
   * @param shown the frames to show in full
   */
  static ReportPage page(ResultFile r, Map<Integer, String> pictures, List<Integer> shown, Charts.Inputs charts,
      @Nullable String backLink, Instant written) {
    ResultFile.Summary s = r.summary();
    String headline = s.mach() == null ? Fmt.UNKNOWN : Fmt.pm(s.mach().value(), s.mach().uncertainty(), 4);
    List<ReportPage.Fact> summary = new ArrayList<>();
    summary.add(new ReportPage.Fact("Frames", s.frames() + " (" + (s.frames() - s.failedFrames()) + " analysed, " + s.failedFrames() + " failed)"));
    if (s.machScatter() != null && s.frames() - s.failedFrames() > 1) {
      summary.add(new ReportPage.Fact("Frame-to-frame scatter", Fmt.fixed(s.machScatter(), 4) + " (standard deviation of the frames' Mach numbers)"));
    }
    summary.add(new ReportPage.Fact("Nominal Mach number", s.nominalMach() == null ? "not given" : Fmt.fixed(s.nominalMach(), 4)));
    summary.add(new ReportPage.Fact("Tolerance", s.machTolerance() == null ? "not given" : "\u00b1 " + Fmt.fixed(s.machTolerance(), 4)));
    int warned = 0;
    for (ResultFile.Frame f : r.frames()) {
      warned += f.warnings().isEmpty() ? 0 : 1;
    }
    summary.add(new ReportPage.Fact("Frames with warnings", Integer.toString(warned)));

    List<ReportPage.FrameView> views = new ArrayList<>();
    Set<Integer> shownSet = Set.copyOf(shown);
    for (ResultFile.Frame f : r.frames()) {
      if (shownSet.contains(f.index())) {
        views.add(frameView(f, pictures.get(f.index())));
      }
    }
    List<ReportPage.FrameRow> rows = new ArrayList<>();
    List<ReportPage.Failure> failures = new ArrayList<>();
    for (ResultFile.Frame f : r.frames()) {
      if (rows.size() < MAX_FRAME_ROWS) {
        rows.add(new ReportPage.FrameRow(f.index(), f.file(),
            f.mach() == null ? Fmt.UNKNOWN : Fmt.pm(f.mach().value(), f.mach().uncertainty(), 4),
            f.reflection() == null ? Fmt.UNKNOWN : f.reflection().verdict(), f.warnings().size(),
            f.failed() ? "failed: " + f.error().code() : "analysed"));
      }
      if (f.failed() && failures.size() < MAX_FRAME_ROWS) {
        failures.add(new ReportPage.Failure(f.index(), f.file(), f.error().code(), f.error().message()));
      }
    }
    String framesNote = shown.size() == r.frames().size()
        ? "Every frame of the run is shown below."
        : "The report pictures " + shown.size() + " of the run's " + r.frames().size()
            + " frames, evenly spaced (the first and the last included); the table in section 5 and the CSV list every frame.";
    String subtitle = r.frames().size() + (r.frames().size() == 1 ? " frame" : " frames") + " \u00b7 " + r.tool().name() + " "
        + r.tool().version() + (r.settings() != null && r.settings().runFile() != null ? " \u00b7 run file " + r.settings().runFile() : "");
    return new ReportPage(r.label(), subtitle, WHEN.format(written), headline, summary, checks(s.tunnel()), settings(r),
        charts.thetaBetaSvg(), charts.thetaBetaNote(), charts.machSvg(), views, framesNote, rows,
        Math.max(0, r.frames().size() - rows.size()), failures, backLink);
  }

  private static List<ReportPage.Check> checks(ResultFile.@Nullable TunnelCheck t) {
    List<ReportPage.Check> out = new ArrayList<>();
    if (t == null) {
      return out;
    }
    for (ResultFile.Comparison c : t.comparisons()) {
      String tol = c.tolerance() == null ? "not given" : "\u00b1 " + Fmt.fixed(c.tolerance(), 4);
      String dev = signed(c.difference()) + (Double.isFinite(c.differenceInSigma())
          ? " (" + Fmt.fixed(c.differenceInSigma(), 1) + " \u03c3)" : "");
      String status = switch (c.outcome()) {
        case "pass" -> "pass";
        case "fail" -> "fail";
        default -> "info";
      };
      String verdict = switch (c.outcome()) {
        case "pass" -> "within tolerance";
        case "fail" -> "outside tolerance";
        case "inconclusive" -> "undecided: the uncertainty (2\u03c3 = " + Fmt.fixed(2 * t.measuredUncertainty(), 4)
            + ") is too wide for the tolerance";
        default -> "no tolerance given";
      };
      out.add(new ReportPage.Check(reference(c.reference()), Fmt.fixed(c.referenceMach(), 4), dev, tol, status, verdict));
    }
    return out;
  }

  private static String reference(String code) {
    return switch (code) {
      case "nominal" -> "nominal Mach number (run file)";
      case "pitot/static" -> "pitot over static pressure (Rayleigh pitot formula)";
      case "pitot/total" -> "pitot over total pressure (normal-shock total-pressure ratio)";
      case "static/total" -> "static over total pressure (isentropic)";
      default -> code;
    };
  }

  private static String signed(@Nullable Double d) {
    return d == null || !Double.isFinite(d) ? Fmt.UNKNOWN : (d >= 0 ? "+" : "") + Fmt.fixed(d, 4);
  }

  private static ReportPage.FrameView frameView(ResultFile.Frame f, @Nullable String picture) {
    if (f.failed()) {
      return new ReportPage.FrameView(f.index(), f.file(), null, Fmt.UNKNOWN, Fmt.UNKNOWN, "", List.of(), List.of(), null,
          List.of(), Fmt.UNKNOWN, List.of(), f.warnings(), f.error().message() + " [" + f.error().code() + "]", List.of());
    }
    List<ReportPage.WaveRow> waves = new ArrayList<>();
    for (int i = 0; i < f.waves().size(); i++) {
      ResultFile.Wave w = f.waves().get(i);
      ResultFile.Estimate e = Tables.estimateFor(f, i);
      waves.add(new ReportPage.WaveRow("W" + (i + 1), w.kind(), w.side() == null ? Fmt.UNKNOWN : w.side(),
          (w.label() == null ? Fmt.UNKNOWN : w.label()) + (w.bow() == null ? "" : String.format(java.util.Locale.ROOT,
              " (stand-off %.2f ± %.2f px = %.4f nose radii; vertex radius %.1f px)", w.bow().standoffPx(),
              w.bow().standoffUncertaintyPx(), w.bow().standoffNoseRadii(), w.bow().vertexRadiusPx())),
          Fmt.pm(w.angleDeg(), w.uncertaintyDeg(), 3),
          Fmt.fixed(w.theoryAngleDeg(), 3), Fmt.fixed(w.nominalTheoryAngleDeg(), 3), Fmt.fixed(w.deflectionDeg(), 2),
          e == null ? Fmt.UNKNOWN : Fmt.pm(e.value(), e.uncertainty(), 4), Integer.toString(w.support()),
          Fmt.fixed(w.rmsResidualPx(), 2), Boolean.TRUE.equals(w.curved())));
    }
    List<ReportPage.CheckRow> checks = new ArrayList<>();
    for (int i = 0; i < f.waves().size(); i++) {
      ResultFile.Wave w = f.waves().get(i);
      ResultFile.DirectionCheck c = w.check();
      if (c != null) {
        checks.add(new ReportPage.CheckRow("W" + (i + 1), w.label() == null ? w.kind() : w.label(),
            Fmt.pm(c.measuredDirectionDeg(), w.uncertaintyDeg(), 3), Fmt.fixed(c.theoryDirectionDeg(), 3),
            Fmt.fixed(c.differenceDeg(), 3), Fmt.fixed(c.differenceSigma(), 1)));
      }
    }
    List<ReportPage.EstimateRow> estimates = new ArrayList<>();
    String consistency = null;
    String mach = Fmt.UNKNOWN;
    if (f.mach() != null) {
      mach = Fmt.pm(f.mach().value(), f.mach().uncertainty(), 4);
      for (ResultFile.Estimate e : f.mach().estimates()) {
        estimates.add(new ReportPage.EstimateRow(e.from(), Fmt.pm(e.value(), e.uncertainty(), 4)));
      }
      if (f.mach().consistent() != null) {
        consistency = f.mach().consistent()
            ? "The estimates agree within their uncertainties."
            : "The estimates disagree beyond their uncertainties; see the warnings.";
      }
      if (f.mach().estimates().stream().anyMatch(e -> "Billig stand-off".equals(e.method()))) {
        consistency = (consistency == null ? "" : consistency + " ")
            + "The bow-shock estimate comes from the stand-off through Billig's empirical correlation: far less precise than "
            + "an oblique shock's, it enters the weighted mean with its own uncertainty (most of it the correlation's assumed scatter).";
      }
    }
    List<ReportPage.BudgetRow> budget = new ArrayList<>();
    double total2 = 0;
    List<ResultFile.BudgetItem> items = f.budget() == null ? List.of() : f.budget();
    for (ResultFile.BudgetItem b : items) {
      total2 += Double.isFinite(b.machUncertainty()) ? b.machUncertainty() * b.machUncertainty() : 0;
    }
    for (ResultFile.BudgetItem b : items) {
      double share = total2 > 0 ? 100 * b.machUncertainty() * b.machUncertainty() / total2 : Double.NaN;
      budget.add(new ReportPage.BudgetRow(b.description(), Fmt.fixed(b.inputUncertainty(), 4) + " " + b.unit(),
          Fmt.fixed(b.machUncertainty(), 5), Fmt.fixed(share, 1) + " %", b.systematic()));
    }
    List<String> predictions = new ArrayList<>();
    if (f.predicted() != null) {
      for (ResultFile.Prediction p : f.predicted()) {
        predictions.add(p.waves().size() + " at the " + p.basis() + " Mach number " + Fmt.fixed(p.mach(), 4));
      }
    }
    ResultFile.Reflection rf = f.reflection();
    String reflection = rf == null ? Fmt.UNKNOWN : rf.verdict();
    String reason = rf == null ? "" : "predicted " + rf.predicted() + ", observed " + rf.observed() + (rf.reason().isEmpty() ? "" : "; " + rf.reason());
    return new ReportPage.FrameView(f.index(), f.file(), picture, mach, reflection, reason, waves, estimates, consistency,
        budget, Fmt.fixed(Math.sqrt(total2), 5), predictions, f.warnings(), null, checks);
  }

  private static List<ReportPage.Fact> settings(ResultFile r) {
    List<ReportPage.Fact> out = new ArrayList<>();
    ResultFile.Settings s = r.settings();
    if (s == null) {
      out.add(new ReportPage.Fact("Settings", "not recorded in this result"));
      return out;
    }
    if (s.runFile() != null) {
      out.add(new ReportPage.Fact("Run file", s.runFile()));
    }
    out.add(new ReportPage.Fact("Images", s.images().size() <= 3 ? String.join(", ", s.images())
        : s.images().size() + " files (" + s.images().get(0) + " \u2026 " + s.images().get(s.images().size() - 1) + ")"));
    if (s.frameRange() != null) {
      out.add(new ReportPage.Fact("Frame range", s.frameRange()));
    }
    out.add(new ReportPage.Fact("No-flow reference", s.noFlowReference() == null ? "none" : s.noFlowReference()));
    out.add(new ReportPage.Fact("Optics", s.optics()));
    out.add(new ReportPage.Fact("Gas", "perfect gas, \u03b3 = " + Fmt.fixed(s.gamma(), 4)));
    ModelJson m = s.model();
    if (m != null) {
      out.add(new ReportPage.Fact("Model", model(m)));
    }
    if (m == null || m.noseRadiusPx() == null) {
      out.add(new ReportPage.Fact("Model angle tolerance", Fmt.fixed(s.modelAngleToleranceDeg(), 3) + "\u00b0 (standard uncertainty)"));
    }
    out.add(new ReportPage.Fact("Calibration", s.calibration() == null ? "none (flow along +x, no lens correction, no scale)" : calibration(s.calibration())));
    if (s.tunnel() != null) {
      var t = s.tunnel();
      StringBuilder b = new StringBuilder();
      b.append("nominal Mach ").append(t.nominalMach() == null ? "not given" : Fmt.fixed(t.nominalMach(), 4));
      b.append(", tolerance ").append(t.machTolerance() == null ? "not given" : Fmt.fixed(t.machTolerance(), 4));
      if (t.pitot() != null) {
        b.append("; pitot: total ").append(pa(t.pitot().totalPressurePa())).append(", pitot ").append(pa(t.pitot().pitotPressurePa()))
            .append(", static ").append(pa(t.pitot().staticPressurePa()));
      }
      out.add(new ReportPage.Fact("Tunnel", b.toString()));
    }
    if (s.annotatedFrames() != null) {
      out.add(new ReportPage.Fact("Frames pictured", s.annotatedFrames().toString()));
    }
    return out;
  }

  private static String pa(@Nullable Double p) {
    return p == null ? "not given" : String.format(Locale.ROOT, "%.4g Pa", p);
  }

  private static String model(ModelJson m) {
    List<String> parts = new ArrayList<>();
    parts.add(m.shape() == null ? "?" : m.shape());
    if (m.deflectionDeg() != null) {
      parts.add("deflection " + Fmt.fixed(m.deflectionDeg(), 3) + "\u00b0");
    }
    if (m.secondDeflectionDeg() != null) {
      parts.add("second deflection " + Fmt.fixed(m.secondDeflectionDeg(), 3) + "\u00b0");
    }
    if (m.deflectionsDeg() != null) {
      parts.add("deflections " + Arrays.toString(m.deflectionsDeg()) + "\u00b0");
    }
    if (m.incidenceDeg() != null) {
      parts.add("incidence " + Fmt.fixed(m.incidenceDeg(), 3) + "\u00b0");
    }
    if (m.leadingEdgePx() != null) {
      parts.add("leading edge / corner at " + px(m.leadingEdgePx()));
    }
    if (m.secondCornerPx() != null) {
      parts.add("second corner at " + px(m.secondCornerPx()));
    }
    if (m.leadingEdgesPx() != null) {
      for (double[] p : m.leadingEdgesPx()) {
        parts.add("leading edge at " + px(p));
      }
    }
    if (m.chordPx() != null) {
      parts.add("chord " + Fmt.fixed(m.chordPx(), 1) + " px");
    }
    if (m.centerPx() != null) {
      parts.add("centre at " + px(m.centerPx()));
    }
    if (m.noseRadiusPx() != null) {
      parts.add("nose radius " + Fmt.fixed(m.noseRadiusPx(), 2) + " px"
          + (m.noseRadiusTolerancePx() == null ? "" : " \u00b1 " + Fmt.fixed(m.noseRadiusTolerancePx(), 2) + " px (standard uncertainty)"));
    }
    if (m.wallPx() != null) {
      parts.add("wall through " + px(m.wallPx()[0]) + " and " + px(m.wallPx()[1]) + (m.wallSide() == null ? "" : ", solid " + m.wallSide()));
    }
    return String.join("; ", parts);
  }

  private static String calibration(dev.wavemark.files.CalibrationFile c) {
    List<String> parts = new ArrayList<>();
    parts.add("flow direction " + Fmt.fixed(c.flowDirectionDeg() == null ? 0.0 : c.flowDirectionDeg(), 3) + "\u00b0 \u00b1 "
        + Fmt.fixed(c.flowDirectionUncertaintyDeg() == null ? 0.0 : c.flowDirectionUncertaintyDeg(), 3) + "\u00b0");
    parts.add(c.metersPerPixel() == null ? "no scale" : String.format(Locale.ROOT, "%.4g m/px", c.metersPerPixel()));
    parts.add(c.lens() == null ? "no lens correction" : "lens corrected (Brown model, radial " + Arrays.toString(c.lens().radial()) + ")");
    if (c.window() != null) {
      parts.add(c.window().shape() + " window");
    }
    return String.join("; ", parts);
  }

  private static String px(double[] p) {
    return "(" + Fmt.fixed(p[0], 1) + ", " + Fmt.fixed(p[1], 1) + ") px";
  }
}
