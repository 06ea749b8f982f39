package dev.wavemark.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.wavemark.files.ResultFile;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;

class ResultCsvTest {
  @Test
  void oneRowPerWaveAndOnePerFailedFrame() throws Exception {
    ResultFile r = Fixtures.result("csv, \"quoted\"", List.of(
        Fixtures.frame(0, Fixtures.MACH, "frame-0001.png"),
        Fixtures.failed(1, "frame-0002.png", "image-corrupt", "frame-0002.png: not a readable image (bad, \"strip\")")));
    String text = new String(ResultCsv.toBytes(r), StandardCharsets.UTF_8);
    try (CSVParser p = CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get().parse(new StringReader(text))) {
      assertEquals(ResultCsv.HEADER, p.getHeaderNames());
      List<CSVRecord> rows = p.getRecords();
      assertEquals(3, rows.size());
      assertEquals("upper", rows.get(0).get("side"));
      assertEquals("lower", rows.get(1).get("side"));
      double beta = Fixtures.betaDeg(Fixtures.MACH);
      assertEquals(beta, Double.parseDouble(rows.get(0).get("angleDeg")), 1e-6, "angle written to 6 decimals");
      assertEquals(2.0, Double.parseDouble(rows.get(0).get("frameMach")), 1e-6);
      assertEquals("failed", rows.get(2).get("status"));
      assertEquals("", rows.get(2).get("angleDeg"));
      assertEquals("image-corrupt", rows.get(2).get("errorCode"));
      assertEquals("frame-0002.png: not a readable image (bad, \"strip\")", rows.get(2).get("errorMessage"));
    }
  }
}
