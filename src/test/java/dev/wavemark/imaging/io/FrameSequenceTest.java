package dev.wavemark.imaging.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import ij.ImagePlus;
import ij.ImageStack;
import ij.io.FileSaver;
import ij.process.ShortProcessor;
import java.io.RandomAccessFile;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class FrameSequenceTest {
  static final int W = 48;
  static final int H = 32;
  /** Bytes of one uncompressed 16-bit page. */
  static final long PAGE = 2L * W * H;

  @TempDir Path dir;

  /** Page k holds the value 1000 + k everywhere except one marker pixel, so each page is recognisable. */
  static ShortProcessor page(int k) {
    ShortProcessor sp = new ShortProcessor(W, H);
    sp.setValue(1000 + k);
    sp.fill();
    sp.set(k % W, 0, 5);
    return sp;
  }

  Path stack(String name, int pages, int firstK) {
    ImageStack st = new ImageStack(W, H);
    for (int k = 0; k < pages; k++) {
      st.addSlice("f" + k, page(firstK + k));
    }
    Path p = dir.resolve(name);
    assertTrue(new FileSaver(new ImagePlus(name, st)).saveAsTiffStack(p.toString()));
    return p;
  }

  Path single(String name, ShortProcessor sp) {
    Path p = dir.resolve(name);
    assertTrue(new FileSaver(new ImagePlus(name, sp)).saveAsPng(p.toString()));
    return p;
  }

  @Test
  void numbersPagesAcrossFilesAndCutsToRange() {
    Path a = single("a.png", page(0));
    Path s = stack("s.tif", 5, 1);
    Path b = single("b.png", page(6));
    FrameSequence seq = FrameSequence.open(List.of(a, s, b), Optional.empty(), Optional.empty());
    assertEquals(7, seq.size());
    for (int i = 0; i < 7; i++) {
      Frame f = seq.read(i);
      assertEquals(i, f.index());
      assertEquals(1000 + i, f.image().get(W - 1, H - 1), 0f, "frame " + i);
    }
    assertEquals("s.tif", seq.refs().get(3).file());
    assertEquals(3, seq.refs().get(3).page());
    assertEquals("s.tif[3]", seq.refs().get(3).label());

    FrameSequence cut = FrameSequence.open(List.of(a, s, b), Optional.of("2-4"), Optional.empty());
    assertEquals(3, cut.size());
    assertEquals(2, cut.read(0).index());
    assertEquals(1002, cut.read(0).image().get(1, 1), 0f);
    assertEquals(5, FrameSequence.open(List.of(a, s, b), Optional.of("2-"), Optional.empty()).size());
    assertEquals(7, FrameSequence.open(List.of(a, s, b), Optional.of("0-199"), Optional.empty()).size());
    WavemarkException e = assertThrows(WavemarkException.class,
        () -> FrameSequence.open(List.of(a), Optional.of("3-5"), Optional.empty()));
    assertEquals(Problem.BAD_ARGUMENT, e.problem());
    assertEquals(Problem.BAD_ARGUMENT, assertThrows(WavemarkException.class,
        () -> FrameSequence.open(List.of(a), Optional.of("first"), Optional.empty())).problem());
  }

  /**
   * A sequence cut short: the pages still on disk read, the lost ones fail one by one. A reader
   * that loaded the whole stack would fail (or silently zero-fill) every frame instead.
   */
  @Test
  void truncatedStackFailsOnlyTheLostPages() throws Exception {
    Path s = stack("long.tif", 40, 0);
    // where the pixels start, from the file's own directory (ImageJ puts slice labels after the pixels)
    long header = new ij.io.TiffDecoder(dir + java.io.File.separator, "long.tif").getTiffInfo()[0].getOffset();
    try (RandomAccessFile raf = new RandomAccessFile(s.toFile(), "rw")) {
      raf.setLength(header + 10 * PAGE + PAGE / 2); // keep 10.5 pages of pixels
    }
    FrameSequence seq = FrameSequence.open(List.of(s), Optional.empty(), Optional.empty());
    assertEquals(40, seq.size(), "the page count comes from the first directory");
    for (int i = 0; i < 10; i++) {
      assertEquals(1000 + i, seq.read(i).image().get(W - 1, H - 1), 0f, "page " + i);
    }
    for (int i : new int[] {10, 11, 39}) {
      WavemarkException e = assertThrows(WavemarkException.class, () -> seq.read(i));
      assertEquals(Problem.IMAGE_CORRUPT, e.problem(), e.getMessage());
      assertTrue(e.getMessage().contains("page " + (i + 1)), e.getMessage());
    }
  }

  @Test
  void brokenFileFailsOnlyItsFrame() throws Exception {
    Path a = single("a.png", page(0));
    Path bad = dir.resolve("bad.png");
    Files.writeString(bad, "not a picture");
    Path b = single("b.png", page(2));
    FrameSequence seq = FrameSequence.open(List.of(a, bad, b), Optional.empty(), Optional.empty());
    assertEquals(1000, seq.read(0).image().get(3, 3), 0f);
    assertEquals(Problem.IMAGE_CORRUPT, assertThrows(WavemarkException.class, () -> seq.read(1)).problem());
    assertEquals(1002, seq.read(2).image().get(3, 3), 0f);
  }

  @Test
  void frameOfAnotherSizeThanTheReference() {
    Path ref = single("tare.png", page(0));
    ShortProcessor big = new ShortProcessor(W + 2, H);
    big.setValue(7);
    big.fill();
    big.set(0, 0, 9);
    Path a = single("a.png", page(1));
    Path b = single("big.png", big);
    FrameSequence seq = FrameSequence.open(List.of(a, b), Optional.empty(), Optional.of(ref));
    assertEquals(W, seq.reference().orElseThrow().width);
    assertEquals(1001, seq.read(0).image().get(2, 2), 0f);
    WavemarkException e = assertThrows(WavemarkException.class, () -> seq.read(1));
    assertEquals(Problem.FRAME_SIZE_MISMATCH, e.problem());
    assertTrue(e.getMessage().contains((W + 2) + "x" + H), e.getMessage());
  }

  @Test
  void twoThreadsReadTheSameFramesAsOne() throws Exception {
    Path s = stack("par.tif", 60, 0);
    FrameSequence seq = FrameSequence.open(List.of(s), Optional.empty(), Optional.empty());
    ExecutorService pool = Executors.newFixedThreadPool(2);
    try {
      List<Future<Float>> out = new ArrayList<>();
      for (int i = 0; i < seq.size(); i++) {
        int k = i;
        out.add(pool.submit(() -> {
          Frame f = seq.read(k);
          return f.image().get(W - 1, H - 1) + f.image().get(k % W, 0) * 1e-3f;
        }));
      }
      for (int i = 0; i < seq.size(); i++) {
        assertEquals(1000 + i + 5e-3f, out.get(i).get(), 1e-3f, "frame " + i);
      }
    } finally {
      pool.shutdown();
    }
  }
}
