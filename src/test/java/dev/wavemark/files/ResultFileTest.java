package dev.wavemark.files;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import dev.wavemark.core.gas.ObliqueShock;
import dev.wavemark.core.gas.ShockBranch;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The result file against the files contract (shared spec, "The result file"): names, nesting, NaN policy. */
class ResultFileTest {
  @TempDir Path dir;

  /** 10 deg wedge at M 2: the weak shock at 39.31 deg, as in the contract's example (NACA Report 1135 chart 2, from memory). */
  private static ResultFile sample(double uncertainty) {
    double beta = Math.toDegrees(ObliqueShock.beta(2.0, Math.toRadians(10), ShockBranch.WEAK, 1.4));
    ResultFile.Wave w = new ResultFile.Wave("oblique-shock", "upper", beta, 0.04, new double[] {212, 384}, new double[] {700, 0},
        812, 0.31, "upper leading-edge shock", false, 10.0, beta, null, null, null);
    ResultFile.Mach m = new ResultFile.Mach(2.0, uncertainty,
        List.of(new ResultFile.Estimate("oblique-shock upper", 2.0, 0.008, null, null, null)), null, null, null);
    ResultFile.Frame ok = new ResultFile.Frame(0, "frame-0001.png", List.of(w), m,
        new ResultFile.Reflection("regular", "regular", "regular", "below the detachment criterion"), List.of(), null,
        List.of(new ResultFile.BudgetItem("angle-fit", "angle fit, 1 wave", 0.04, "deg", 0.004, false)), null, null);
    ResultFile.Frame bad = new ResultFile.Frame(1, "frame-0002.png", List.of(), null, null, List.of(),
        new ResultFile.FrameError("image-corrupt", "frame-0002.png: not a readable image (truncated)"), null, null, null);
    ResultFile.Summary s = new ResultFile.Summary(new ResultFile.Measure(2.0, 0.004), 2.0, 2, 1, null, null, null, null, null);
    return new ResultFile("label", new ResultFile.Tool("wavemark", "0.1.0"), List.of(ok, bad), s, null);
  }

  @Test
  void contractKeysAndNesting() throws Exception {
    JsonNode root = Json.MAPPER.readTree(sample(0.006).toBytes());
    assertEquals(List.of("label", "tool", "frames", "summary"), names(root));
    assertEquals(List.of("name", "version"), names(root.get("tool")));
    JsonNode f = root.get("frames").get(0);
    assertTrue(names(f).containsAll(List.of("index", "file", "waves", "mach", "reflection", "warnings")), names(f).toString());
    assertFalse(f.has("error"), "an analysed frame has no error field");
    assertEquals(List.of("kind", "side", "angleDeg", "uncertaintyDeg", "startPx", "endPx", "support", "rmsResidualPx"),
        names(f.get("waves").get(0)).subList(0, 8));
    assertEquals(List.of("value", "uncertainty", "estimates"), names(f.get("mach")));
    assertEquals(List.of("from", "value", "uncertainty"), names(f.get("mach").get("estimates").get(0)));
    assertEquals(List.of("verdict", "predicted", "observed", "reason"), names(f.get("reflection")));
    assertEquals(List.of("mach", "nominalMach", "frames", "failedFrames"), names(root.get("summary")));
    assertEquals(List.of("value", "uncertainty"), names(root.get("summary").get("mach")));
    JsonNode failed = root.get("frames").get(1);
    assertEquals("image-corrupt", failed.get("error").get("code").asText());
    assertEquals(2, failed.get("waves").size() + 2);
  }

  @Test
  void nanIsWrittenAsNullAndReadBackAsNaN() throws Exception {
    ResultFile r = sample(Double.NaN);
    String text = new String(r.toBytes(), java.nio.charset.StandardCharsets.UTF_8);
    assertFalse(text.contains("NaN"), text);
    JsonNode root = Json.MAPPER.readTree(text);
    assertTrue(root.get("frames").get(0).get("mach").get("uncertainty").isNull());
    Path p = dir.resolve("result.json");
    r.write(p);
    assertTrue(Double.isNaN(ResultFile.read(p).frames().get(0).mach().uncertainty()));
  }

  @Test
  void roundTrip() throws Exception {
    ResultFile r = sample(0.006);
    Path p = dir.resolve("result.json");
    r.write(p);
    ResultFile back = ResultFile.read(p);
    assertEquals(r.label(), back.label());
    assertEquals(r.summary(), back.summary());
    assertEquals(r.frames().get(1), back.frames().get(1));
    ResultFile.Wave a = r.frames().get(0).waves().get(0);
    ResultFile.Wave b = back.frames().get(0).waves().get(0);
    assertEquals(a.angleDeg(), b.angleDeg(), 0.0);
    assertArrayEquals(a.endPx(), b.endPx(), 0.0);
    assertEquals(r.frames().get(0).mach(), back.frames().get(0).mach());
    assertEquals(r.frames().get(0).budget(), back.frames().get(0).budget());
    assertFalse(Files.exists(dir.resolve(".result.json.part")));
  }

  private static List<String> names(JsonNode n) {
    List<String> out = new ArrayList<>();
    Iterator<String> it = n.fieldNames();
    it.forEachRemaining(out::add);
    return out;
  }
}
