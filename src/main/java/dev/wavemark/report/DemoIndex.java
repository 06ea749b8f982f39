package dev.wavemark.report;

import dev.wavemark.files.Json;
import dev.wavemark.files.ResultFile;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import org.jspecify.annotations.Nullable;

/** The demo's {@code index.html}: one line per sample run, linking its report. */
public final class DemoIndex {
  private DemoIndex() {}

  /** One run in the index, formatted; public only for the precompiled template. */
  public record Entry(String name, String label, String mach, String nominal, String check, String checkStatus, String frames,
      @Nullable String link, @Nullable String error) {

    /** The entry of a run that produced a result. */
    public static Entry of(String name, @Nullable ResultFile r, @Nullable String link, @Nullable String error) {
      if (r == null) {
        return new Entry(name, name, Fmt.UNKNOWN, Fmt.UNKNOWN, "not run", "fail", Fmt.UNKNOWN, link, error);
      }
      ResultFile.Summary s = r.summary();
      String mach = s.mach() == null ? Fmt.UNKNOWN : Fmt.pm(s.mach().value(), s.mach().uncertainty(), 4);
      String check = s.tunnel() == null ? "unchecked" : s.tunnel().verdict();
      String status = switch (check) {
        case "pass" -> "pass";
        case "fail" -> "fail";
        default -> "info";
      };
      String frames = (s.frames() - s.failedFrames()) + " of " + s.frames() + " analysed";
      return new Entry(name, r.label(), mach, s.nominalMach() == null ? "not given" : Fmt.fixed(s.nominalMach(), 3), check, status,
          frames, link, error);
    }
  }

  /** The index page's content. */
  public record Page(String version, String written, List<Entry> entries) {}

  /** Writes {@code dir/index.html} atomically. */
  public static Path write(List<Entry> entries, Path dir, String version) {
    Path p = dir.resolve("index.html");
    Page page = new Page(version, HtmlReport.when(Instant.now()), List.copyOf(entries));
    Json.writeAtomically(p, HtmlReport.render("report/index.jte", page));
    return p;
  }
}
