package dev.wavemark.imaging.io;

import boofcv.struct.image.GrayF32;
import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Reads one picture (or one page of a multi-page TIFF) into a {@link GrayF32} of calibrated
 * intensities: 8- and 16-bit PNG, 8/16/32-bit TIFF (uncompressed, LZW, PackBits, Deflate through
 * ImageJ's decoder; other compressions through javax.imageio), JPEG. The format is recognised
 * from the file's first bytes, not its name.
 *
 * <p>Values: 8- and 16-bit raw values are mapped through ImageJ's value calibration, so a
 * signed 16-bit TIFF reads as its signed values (raw 32668 reads -100) and a TIFF carrying a
 * calibration function reads as calibrated values; colour pictures read as the mean of their
 * channels.
 *
 * <p>Errors (each a {@link WavemarkException} naming the file): {@link Problem#FILE_MISSING};
 * {@link Problem#IMAGE_CORRUPT} for an unreadable, truncated or unknown file; and
 * {@link Problem#IMAGE_EMPTY} for a picture without pixels or with one value everywhere.
 * Thread-safe: every call opens its own stream.
 */
public final class ImageFiles {
  private ImageFiles() {}

  /** Reads a single picture, or the first page of a multi-page file. */
  public static GrayF32 read(Path file) {
    return read(file, 1);
  }

  /** Reads page {@code page} (1-based) of a file. */
  public static GrayF32 read(Path file, int page) {
    GrayF32 g = isTiff(file) ? TiffPages.open(file).read(page) : ImageIoPages.read(file, page);
    checkNotEmpty(g, page == 1 ? file.toString() : file + " page " + page);
    return g;
  }

  /** The number of pages: 1 for PNG and JPEG, the page count for a TIFF. */
  public static int pageCount(Path file) {
    return isTiff(file) ? TiffPages.open(file).pageCount() : 1;
  }

  static void checkNotEmpty(GrayF32 g, String what) {
    if (Pixels.isFlat(g)) {
      throw new WavemarkException(Problem.IMAGE_EMPTY, what);
    }
  }

  /** True when the file starts with a TIFF header ({@code II*\0} or {@code MM\0*}). */
  static boolean isTiff(Path file) {
    byte[] b = new byte[4];
    int n;
    try (InputStream in = Files.newInputStream(file)) {
      n = in.readNBytes(b, 0, 4);
    } catch (java.nio.file.NoSuchFileException e) {
      throw new WavemarkException(Problem.FILE_MISSING, file, file.toAbsolutePath().getParent());
    } catch (IOException e) {
      throw new WavemarkException(e, Problem.FILE_UNREADABLE, file, e.getMessage());
    }
    if (n < 4) {
      throw new WavemarkException(Problem.IMAGE_CORRUPT, file, "only " + n + " bytes long");
    }
    return (b[0] == 'I' && b[1] == 'I' && b[2] == 42 && b[3] == 0) || (b[0] == 'M' && b[1] == 'M' && b[2] == 0 && b[3] == 42);
  }
}
