package dev.wavemark.report;

import dev.wavemark.files.ResultFile;
import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;

/**
 * {@code result.csv}: one row per frame and wave (a frame without waves, or one that failed, has
 * one row with the wave columns empty), written with commons-csv (RFC 4180 quoting). Numbers are
 * plain decimals in the contract's units; an unknown number is an empty cell.
 */
final class ResultCsv {
  /** The header, in column order. Other programs read these names: extend, never rename. */
  static final List<String> HEADER = List.of(
      "frame", "file", "status", "wave", "kind", "side", "label", "angleDeg", "uncertaintyDeg",
      "theoryAngleDeg", "nominalTheoryAngleDeg", "deflectionDeg", "startXPx", "startYPx", "endXPx", "endYPx",
      "support", "rmsResidualPx", "curved", "waveMach", "waveMachUncertainty", "frameMach", "frameMachUncertainty",
      "reflection", "warnings", "errorCode", "errorMessage");

  private ResultCsv() {}

  static byte[] toBytes(ResultFile result) {
    StringWriter sw = new StringWriter();
    CSVFormat format = CSVFormat.RFC4180.builder().setHeader(HEADER.toArray(String[]::new)).get();
    try (CSVPrinter p = new CSVPrinter(sw, format)) {
      for (ResultFile.Frame f : result.frames()) {
        if (f.waves().isEmpty()) {
          p.printRecord(row(f, -1, null));
        }
        for (int i = 0; i < f.waves().size(); i++) {
          p.printRecord(row(f, i, f.waves().get(i)));
        }
      }
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
    return sw.toString().getBytes(StandardCharsets.UTF_8);
  }

  private static List<String> row(ResultFile.Frame f, int i, ResultFile.@org.jspecify.annotations.Nullable Wave w) {
    List<String> r = new ArrayList<>(HEADER.size());
    r.add(Integer.toString(f.index()));
    r.add(f.file());
    r.add(f.failed() ? "failed" : "analysed");
    if (w == null) {
      for (int k = HEADER.indexOf("wave"); k < HEADER.indexOf("frameMach"); k++) {
        r.add("");
      }
    } else {
      ResultFile.Estimate e = Tables.estimateFor(f, i);
      r.add(Integer.toString(i));
      r.add(w.kind());
      r.add(w.side() == null ? "" : w.side());
      r.add(w.label() == null ? "" : w.label());
      r.add(Fmt.cell(w.angleDeg()));
      r.add(Fmt.cell(w.uncertaintyDeg()));
      r.add(Fmt.cell(w.theoryAngleDeg()));
      r.add(Fmt.cell(w.nominalTheoryAngleDeg()));
      r.add(Fmt.cell(w.deflectionDeg()));
      r.add(Fmt.cell(w.startPx()[0]));
      r.add(Fmt.cell(w.startPx()[1]));
      r.add(Fmt.cell(w.endPx()[0]));
      r.add(Fmt.cell(w.endPx()[1]));
      r.add(Integer.toString(w.support()));
      r.add(Fmt.cell(w.rmsResidualPx()));
      r.add(w.curved() == null ? "" : w.curved().toString());
      r.add(e == null ? "" : Fmt.cell(e.value()));
      r.add(e == null ? "" : Fmt.cell(e.uncertainty()));
    }
    r.add(f.mach() == null ? "" : Fmt.cell(f.mach().value()));
    r.add(f.mach() == null ? "" : Fmt.cell(f.mach().uncertainty()));
    r.add(f.reflection() == null ? "" : f.reflection().verdict());
    r.add(String.join(" | ", f.warnings()));
    r.add(f.error() == null ? "" : f.error().code());
    r.add(f.error() == null ? "" : f.error().message());
    return r;
  }
}
