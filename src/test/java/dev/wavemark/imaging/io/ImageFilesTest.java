package dev.wavemark.imaging.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import boofcv.struct.image.GrayF32;
import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import ij.ImagePlus;
import ij.ImageStack;
import ij.io.FileSaver;
import ij.process.ByteProcessor;
import ij.process.FloatProcessor;
import ij.process.ShortProcessor;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Round trips through ImageJ's own writer (FileSaver): what ImageJ writes, wavemark reads back unchanged. */
class ImageFilesTest {
  static final int W = 61;
  static final int H = 37;

  @TempDir Path dir;

  /** A 16-bit test pattern using the full range, distinct in every pixel. */
  static ShortProcessor pattern16(int seed) {
    ShortProcessor sp = new ShortProcessor(W, H);
    for (int i = 0; i < W * H; i++) {
      sp.set(i, (i * 977 + seed * 31) % 65536);
    }
    return sp;
  }

  static ByteProcessor pattern8() {
    ByteProcessor bp = new ByteProcessor(W, H);
    for (int i = 0; i < W * H; i++) {
      bp.set(i, (i * 7) % 256);
    }
    return bp;
  }

  static void assertSame(ij.process.ImageProcessor ip, GrayF32 g) {
    assertEquals(ip.getWidth(), g.width);
    assertEquals(ip.getHeight(), g.height);
    for (int y = 0; y < H; y++) {
      for (int x = 0; x < W; x++) {
        assertEquals(ip.getf(x, y), g.get(x, y), 0f, "pixel " + x + "," + y);
      }
    }
  }

  @Test
  void png8RoundTrip() {
    ByteProcessor bp = pattern8();
    Path p = dir.resolve("a8.png");
    assertTrue(new FileSaver(new ImagePlus("a8", bp)).saveAsPng(p.toString()));
    assertSame(bp, ImageFiles.read(p));
  }

  @Test
  void png16KeepsAllSixteenBits() {
    ShortProcessor sp = pattern16(1);
    Path p = dir.resolve("a16.png");
    assertTrue(new FileSaver(new ImagePlus("a16", sp)).saveAsPng(p.toString()));
    GrayF32 g = ImageFiles.read(p);
    assertSame(sp, g);
    assertTrue(boofcv.alg.misc.ImageStatistics.max(g) > 60000, "16-bit range kept (the 8-bit path would cap at 255)");
  }

  @Test
  void tiff8And16And32RoundTrip() {
    ShortProcessor sp = pattern16(2);
    Path p16 = dir.resolve("a16.tif");
    assertTrue(new FileSaver(new ImagePlus("t16", sp)).saveAsTiff(p16.toString()));
    assertSame(sp, ImageFiles.read(p16));

    ByteProcessor bp = pattern8();
    Path p8 = dir.resolve("a8.tif");
    assertTrue(new FileSaver(new ImagePlus("t8", bp)).saveAsTiff(p8.toString()));
    assertSame(bp, ImageFiles.read(p8));

    FloatProcessor fp = new FloatProcessor(W, H);
    for (int i = 0; i < W * H; i++) {
      fp.setf(i, (float) Math.sin(i * 0.01) * 1.5e-3f);
    }
    Path p32 = dir.resolve("a32.tif");
    assertTrue(new FileSaver(new ImagePlus("t32", fp)).saveAsTiff(p32.toString()));
    assertSame(fp, ImageFiles.read(p32));
    assertEquals(1, ImageFiles.pageCount(p32));
  }

  @Test
  void multiPageTiffReadsEachPage() {
    ImageStack st = new ImageStack(W, H);
    ShortProcessor[] pages = new ShortProcessor[4];
    for (int k = 0; k < pages.length; k++) {
      pages[k] = pattern16(10 + k);
      st.addSlice("p" + k, pages[k]);
    }
    Path p = dir.resolve("stack.tif");
    assertTrue(new FileSaver(new ImagePlus("st", st)).saveAsTiffStack(p.toString()));
    assertEquals(4, ImageFiles.pageCount(p));
    for (int k = 0; k < pages.length; k++) {
      assertSame(pages[k], ImageFiles.read(p, k + 1));
    }
  }

  @Test
  void jpegReadsCloseToWhatWasWritten() {
    ByteProcessor bp = new ByteProcessor(W, H);
    for (int y = 0; y < H; y++) {
      for (int x = 0; x < W; x++) {
        bp.set(x, y, 40 + 3 * x);
      }
    }
    Path p = dir.resolve("a.jpg");
    assertTrue(new FileSaver(new ImagePlus("j", bp)).saveAsJpeg(p.toString()));
    GrayF32 g = ImageFiles.read(p);
    // JPEG is lossy: a smooth ramp comes back within a few grey levels at ImageJ's default quality 85
    for (int y = 0; y < H; y++) {
      for (int x = 0; x < W; x++) {
        assertEquals(bp.get(x, y), g.get(x, y), 6f, "pixel " + x + "," + y);
      }
    }
  }

  @Test
  void signed16TiffReadsSignedValues() {
    ShortProcessor sp = new ShortProcessor(W, H);
    for (int i = 0; i < W * H; i++) {
      sp.set(i, 32768 - 500 + i % 1000);
    }
    ImagePlus imp = new ImagePlus("s16", sp);
    imp.getCalibration().setSigned16BitCalibration();
    Path p = dir.resolve("s16.tif");
    assertTrue(new FileSaver(imp).saveAsTiff(p.toString()));
    GrayF32 g = ImageFiles.read(p);
    // ImageJ stores signed 16-bit data offset by +32768 (ij.measure.Calibration.setSigned16BitCalibration)
    for (int i = 0; i < W * H; i++) {
      assertEquals(-500 + i % 1000, g.data[i], 0f, "pixel " + i);
    }
  }

  @Test
  void truncatedPngIsCorrupt() throws IOException {
    Path good = dir.resolve("g.png");
    assertTrue(new FileSaver(new ImagePlus("g", pattern16(3))).saveAsPng(good.toString()));
    byte[] b = Files.readAllBytes(good);
    Path bad = dir.resolve("cut.png");
    Files.write(bad, Arrays.copyOf(b, b.length / 2));
    assertOneLine(Problem.IMAGE_CORRUPT, bad, assertThrows(WavemarkException.class, () -> ImageFiles.read(bad)));
  }

  @Test
  void truncatedTiffIsCorrupt() throws IOException {
    Path good = dir.resolve("g.tif");
    assertTrue(new FileSaver(new ImagePlus("g", pattern16(3))).saveAsTiff(good.toString()));
    byte[] b = Files.readAllBytes(good);
    Path bad = dir.resolve("cut.tif");
    Files.write(bad, Arrays.copyOf(b, b.length - 100));
    assertOneLine(Problem.IMAGE_CORRUPT, bad, assertThrows(WavemarkException.class, () -> ImageFiles.read(bad)));
  }

  @Test
  void textFileNamedPngIsCorrupt() throws IOException {
    Path bad = dir.resolve("notes.png");
    Files.writeString(bad, "exposure 1/8000 s, knife edge vertical\n");
    assertOneLine(Problem.IMAGE_CORRUPT, bad, assertThrows(WavemarkException.class, () -> ImageFiles.read(bad)));
    Path tif = dir.resolve("notes.tif");
    Files.writeString(tif, "II*\0 this only looks like a TIFF");
    assertOneLine(Problem.IMAGE_CORRUPT, tif, assertThrows(WavemarkException.class, () -> ImageFiles.read(tif)));
  }

  @Test
  void flatFrameIsEmpty() {
    Path p = dir.resolve("flat.png");
    ByteProcessor bp = new ByteProcessor(W, H);
    bp.setValue(17);
    bp.fill();
    assertTrue(new FileSaver(new ImagePlus("f", bp)).saveAsPng(p.toString()));
    assertOneLine(Problem.IMAGE_EMPTY, p, assertThrows(WavemarkException.class, () -> ImageFiles.read(p)));
  }

  @Test
  void missingFile() {
    Path p = dir.resolve("nope.png");
    assertOneLine(Problem.FILE_MISSING, p, assertThrows(WavemarkException.class, () -> ImageFiles.read(p)));
  }

  static void assertOneLine(Problem expected, Path file, WavemarkException e) {
    assertEquals(expected, e.problem(), e.getMessage());
    assertTrue(e.getMessage().contains(file.toString()), "message names the file: " + e.getMessage());
    assertFalse(e.getMessage().contains("\n"), "one line: " + e.getMessage());
  }
}
