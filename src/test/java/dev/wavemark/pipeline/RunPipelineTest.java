package dev.wavemark.pipeline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.wavemark.core.model.RunSpec;
import dev.wavemark.files.ResultFile;
import dev.wavemark.files.RunFile;
import dev.wavemark.imaging.io.FrameSequence;
import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The pipeline's frame handling, with a per-frame analyser that reports the theory value for the model. */
class RunPipelineTest {
  @TempDir Path dir;

  static void png(Path p, int w, int h) throws Exception {
    BufferedImage img = new BufferedImage(w, h, BufferedImage.TYPE_BYTE_GRAY);
    for (int y = 0; y < h; y++) {
      for (int x = 0; x < w; x++) {
        img.getRaster().setSample(x, y, 0, (x * 7 + y * 3) % 200 + 20);
      }
    }
    ImageIO.write(img, "png", p.toFile());
  }

  static Path runFile(Path dir, List<String> frames) throws Exception {
    String list = String.join(", ", frames.stream().map(f -> "\"" + f + "\"").toList());
    Path p = dir.resolve("wedge.run.json");
    Files.writeString(p, "{\"label\":\"pipeline test\",\"images\":{\"frames\":[" + list + "]},"
        + "\"optics\":\"schlieren-vertical-edge\",\"model\":{\"shape\":\"wedge\",\"deflectionDeg\":10,"
        + "\"leadingEdgePx\":[40,60],\"chordPx\":50,\"angleToleranceDeg\":0.05},"
        + "\"tunnel\":{\"nominalMach\":2.0,\"machTolerance\":0.02}}");
    return p;
  }

  @Test
  void aCorruptFrameAmongGoodOnesBecomesAnErrorEntryAndTheOthersGoOn() throws Exception {
    png(dir.resolve("a.png"), 160, 120);
    Files.write(dir.resolve("b.png"), new byte[] {(byte) 0x89, 'P', 'N', 'G', 1, 2, 3});
    png(dir.resolve("c.png"), 160, 120);
    Path run = runFile(dir, List.of("a.png", "b.png", "c.png"));
    RunFile rf = RunFile.read(run);
    RunSpec spec = rf.toDomain(run);
    Path out = dir.resolve("out");
    RunPipeline.Outcome o = RunPipeline.run(run, rf, spec, FrameSequence.of(spec), new TheoryAnalyser(spec, 2.0), out,
        new RunPipeline.Options(2, false, null), "test");
    List<ResultFile.Frame> frames = o.result().frames();
    assertEquals(3, frames.size());
    assertNull(frames.get(0).error());
    assertNotNull(frames.get(1).error());
    assertEquals("image-corrupt", frames.get(1).error().code());
    assertEquals("b.png", frames.get(1).file());
    assertNull(frames.get(2).error());
    assertEquals(1, o.result().summary().failedFrames());
    assertEquals(2.0, o.result().summary().mach().value(), 1e-6, "theory's own waves invert to their Mach number");
    assertEquals("oblique-shock", frames.get(0).waves().get(0).kind());
    String html = Files.readString(o.report());
    assertTrue(html.contains("image-corrupt") && html.contains("b.png"));
    ResultFile back = ResultFile.read(out.resolve("result.json"));
    assertEquals("image-corrupt", back.frames().get(1).error().code());
    assertTrue(Files.exists(out.resolve("pictures/frame-00000.png")));
  }

  @Test
  void aBugOnOneFrameIsRecordedNotFatal() throws Exception {
    png(dir.resolve("a.png"), 80, 60);
    png(dir.resolve("b.png"), 80, 60);
    Path run = runFile(dir, List.of("a.png", "b.png"));
    RunFile rf = RunFile.read(run);
    RunSpec spec = rf.toDomain(run);
    TheoryAnalyser theory = new TheoryAnalyser(spec, 2.0);
    FrameAnalyser flaky = f -> {
      if (f.index() == 1) {
        throw new ArithmeticException("division by zero");
      }
      return theory.analyse(f);
    };
    RunPipeline.Outcome o = RunPipeline.run(run, rf, spec, FrameSequence.of(spec), flaky, dir.resolve("out"),
        new RunPipeline.Options(1, false, null), "test");
    assertEquals("frame-failed", o.result().frames().get(1).error().code());
    assertNull(o.result().frames().get(0).error());
  }

  @Test
  void framesComeBackInOrderWithBoundedWorkInFlight() {
    AtomicInteger started = new AtomicInteger();
    AtomicInteger consumed = new AtomicInteger();
    AtomicInteger most = new AtomicInteger();
    List<Integer> out = ParallelFrames.run(300, 3, i -> {
      most.accumulateAndGet(started.incrementAndGet() - consumed.get(), Math::max);
      return i;
    }, consumed::incrementAndGet);
    for (int i = 0; i < 300; i++) {
      assertEquals(i, out.get(i));
    }
    assertTrue(most.get() <= 6, "frames started but not yet collected stay within 2 x threads, got " + most.get());
  }
}
