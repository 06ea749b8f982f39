package dev.wavemark.cli.theory;

import com.fasterxml.jackson.core.JsonProcessingException;
import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import dev.wavemark.files.Json;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.math.BigDecimal;
import java.math.MathContext;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.jspecify.annotations.Nullable;
import picocli.CommandLine.Option;

/**
 * The output options every theory relation shares, and the three ways of writing a result:
 * human-readable text (default), one JSON object ({@code --json}), and CSV for tables.
 */
final class Output {
  @Option(names = "--json", description = "Print one JSON object instead of text.")
  boolean json;

  @Option(names = "--out", paramLabel = "FILE",
      description = "Write a table's CSV (or the JSON with --json) to FILE instead of the standard output.")
  @Nullable Path out;

  /** Writes {@code result} of relation {@code relation} with gamma {@code gamma}. */
  void write(PrintWriter stdout, String relation, double gamma, Result result) {
    String text;
    if (result instanceof Result.Point p) {
      text = json ? json(pointObject(relation, gamma, p)) : human(p, gamma);
    } else {
      Result.Table t = (Result.Table) result;
      text = json ? json(tableObject(relation, gamma, t)) : csv(t);
    }
    if (out != null) {
      Json.writeAtomically(out, text.getBytes(StandardCharsets.UTF_8));
      stdout.println("wrote " + out);
    } else {
      stdout.print(text);
    }
    stdout.flush();
  }

  private static Map<String, Object> pointObject(String relation, double gamma, Result.Point p) {
    Map<String, Object> m = new LinkedHashMap<>();
    m.put("relation", relation);
    m.put("gamma", gamma);
    m.putAll(p.values().asMap());
    return m;
  }

  private static Map<String, Object> tableObject(String relation, double gamma, Result.Table t) {
    Map<String, Object> m = new LinkedHashMap<>();
    m.put("relation", relation);
    m.put("gamma", gamma);
    m.put("columns", t.rows().isEmpty() ? List.of() : t.rows().get(0).keys());
    List<List<Object>> rows = new ArrayList<>();
    for (Values v : t.rows()) {
      rows.add(new ArrayList<>(v.asMap().values()));
    }
    m.put("rows", rows);
    return m;
  }

  private static String json(Object o) {
    try {
      return Json.MAPPER.writeValueAsString(o) + System.lineSeparator();
    } catch (JsonProcessingException e) {
      throw new WavemarkException(Problem.WRITE_FAILED, "JSON output", e.getOriginalMessage());
    }
  }

  private static String human(Result.Point p, double gamma) {
    StringBuilder sb = new StringBuilder();
    sb.append(p.title()).append(" (gamma = ").append(format(gamma)).append(')').append(System.lineSeparator());
    int width = 0;
    for (Values.Entry e : p.values().entries()) {
      width = Math.max(width, e.label().length());
    }
    for (Values.Entry e : p.values().entries()) {
      sb.append("  ").append(String.format(Locale.ROOT, "%-" + width + "s", e.label())).append("  ")
          .append(e.value() instanceof Double d ? format(d) : e.value()).append(System.lineSeparator());
    }
    return sb.toString();
  }

  private static String csv(Result.Table t) {
    StringWriter w = new StringWriter();
    List<String> header = t.rows().isEmpty() ? List.of() : t.rows().get(0).keys();
    try (CSVPrinter printer = CSVFormat.DEFAULT.builder()
        .setHeader(header.toArray(String[]::new)).setRecordSeparator(System.lineSeparator()).get().print(w)) {
      for (Values v : t.rows()) {
        List<Object> row = new ArrayList<>();
        for (Object o : v.asMap().values()) {
          row.add(o instanceof Double d ? Double.toString(d) : o);
        }
        printer.printRecord(row);
      }
    } catch (IOException e) {
      throw new WavemarkException(Problem.WRITE_FAILED, "CSV output", e.getMessage());
    }
    return w.toString();
  }

  /** Six significant digits, no exponent for ordinary magnitudes, no trailing zeros. */
  static String format(double v) {
    if (!Double.isFinite(v)) {
      return Double.toString(v);
    }
    if (v == 0) {
      return "0";
    }
    double a = Math.abs(v);
    if (a < 1e-4 || a >= 1e7) {
      return String.format(Locale.ROOT, "%.5e", v);
    }
    return new BigDecimal(v).round(new MathContext(6)).stripTrailingZeros().toPlainString();
  }
}
