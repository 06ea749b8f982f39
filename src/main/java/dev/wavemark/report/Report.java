package dev.wavemark.report;

import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import dev.wavemark.core.geom.Point2;
import dev.wavemark.core.model.BodyShape;
import dev.wavemark.files.Json;
import dev.wavemark.files.ResultFile;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.UnaryOperator;
import org.jspecify.annotations.Nullable;

/**
 * Writes a run's report into a folder: {@code result.json}, {@code result.csv},
 * {@code pictures/frame-NNNNN.png} for the pictured frames, and {@code report.html}.
 *
 * <p>Each file is written under a temporary name and moved into place. The old
 * {@code report.html} is removed first and the new one is written last, so a folder whose run was
 * interrupted has no report page that looks whole.
 */
public final class Report {
  public static final String RESULT_JSON = "result.json";
  public static final String RESULT_CSV = "result.csv";
  public static final String REPORT_HTML = "report.html";
  public static final String PICTURES = "pictures";

  private Report() {}

  /**
   * What the report needs besides the result.
   *
   * @param result the result file's content
   * @param model the model, for its outline on the pictures
   * @param flowDirectionRad the freestream direction in the image (contract sense)
   * @param pictures display copies of the frames to picture, by frame index
   * @param backLink a relative link back to an index page, or null
   * @param toPicture maps the result's lens-corrected pixels to the photographed picture's (the
   *     lens distortion), so that lines are drawn where the waves are in the picture
   */
  public record Input(ResultFile result, BodyShape model, double flowDirectionRad, Map<Integer, Picture> pictures,
      @Nullable String backLink, UnaryOperator<Point2> toPicture) {
    public Input {
      pictures = Map.copyOf(pictures);
    }

    /** An input whose pictures have no lens distortion to draw through. */
    public Input(ResultFile result, BodyShape model, double flowDirectionRad, Map<Integer, Picture> pictures,
        @Nullable String backLink) {
      this(result, model, flowDirectionRad, pictures, backLink, UnaryOperator.identity());
    }
  }

  /**
   * Writes the report into {@code dir} (created if needed).
   *
   * @return the path of {@code report.html}
   * @throws WavemarkException write-failed when a file cannot be written
   */
  public static Path write(Input in, Path dir) {
    Path html = dir.resolve(REPORT_HTML);
    try {
      Files.createDirectories(dir);
      Files.deleteIfExists(html);
    } catch (IOException e) {
      throw new WavemarkException(Problem.WRITE_FAILED, dir, e.getMessage());
    }
    ResultFile r = in.result();
    List<Integer> shown = shownFrames(r, in.pictures());
    Map<Integer, String> pictureFiles = new LinkedHashMap<>();
    for (ResultFile.Frame f : r.frames()) {
      Picture p = in.pictures().get(f.index());
      if (p == null || f.failed() || !shown.contains(f.index())) {
        continue;
      }
      double reach = Math.hypot(p.image().getWidth(), p.image().getHeight()) / p.scale();
      List<List<Point2>> outline = ModelOutline.of(in.model(), in.flowDirectionRad(), reach);
      String name = PICTURES + "/" + String.format(Locale.ROOT, "frame-%05d.png", f.index());
      Json.writeAtomically(dir.resolve(name), Annotator.png(p, f, outline, in.toPicture()));
      pictureFiles.put(f.index(), name);
    }
    r.write(dir.resolve(RESULT_JSON));
    Json.writeAtomically(dir.resolve(RESULT_CSV), ResultCsv.toBytes(r));
    ReportPage page = HtmlReport.page(r, pictureFiles, shown, Charts.forResult(r, shown), in.backLink(), Instant.now());
    Json.writeAtomically(html, HtmlReport.render("report/page.jte", page));
    return html;
  }

  /**
   * The frames shown in full: those with a picture, plus, when no picture was given for a frame in
   * the even selection, that frame (so failed selected frames still show their error).
   */
  private static List<Integer> shownFrames(ResultFile r, Map<Integer, Picture> pictures) {
    if (!pictures.isEmpty()) {
      java.util.TreeSet<Integer> s = new java.util.TreeSet<>(pictures.keySet());
      for (ResultFile.Frame f : r.frames()) {
        if (f.failed() && s.size() < FrameSelection.MAX_PICTURES + 4) {
          s.add(f.index());
        }
      }
      return List.copyOf(s);
    }
    List<Integer> idx = FrameSelection.evenly(r.frames().size(), FrameSelection.MAX_PICTURES);
    return idx.stream().map(i -> r.frames().get(i).index()).toList();
  }
}
