package dev.wavemark.imaging.io;

import boofcv.struct.image.GrayF32;
import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import ij.io.FileInfo;
import ij.io.FileOpener;
import ij.io.ImageReader;
import ij.io.RandomAccessStream;
import ij.measure.Calibration;
import ij.process.ByteProcessor;
import ij.process.ColorProcessor;
import ij.process.FloatProcessor;
import ij.process.ImageProcessor;
import ij.process.ShortProcessor;
import java.io.BufferedInputStream;
import java.io.File;
import java.io.FileInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.RandomAccessFile;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Page-by-page access to a TIFF through ImageJ's decoder: the directory is read once, and each
 * {@link #read} opens its own stream, seeks to that page and reads only its bytes, so one
 * instance serves several threads and a 10,000-page file is never held in memory.
 *
 * <p>ImageJ's {@code ImageReader} fills a short read with zeros instead of failing, so the byte
 * range of each page is checked against the file length first: a truncated file gives
 * {@link Problem#IMAGE_CORRUPT} for the pages it lost and nothing else.
 */
final class TiffPages {
  private final Path path;
  /** Either one entry describing {@code pages} contiguous images (ImageJ stacks), or one per page. */
  private final FileInfo[] infos;
  private final int pages;
  private final long fileLength;
  private final boolean signed16;
  private final int function;
  private final double @org.jspecify.annotations.Nullable [] coefficients;
  private final @org.jspecify.annotations.Nullable String valueUnit;

  private TiffPages(Path path, FileInfo[] infos, long fileLength) {
    this.path = path;
    this.infos = infos;
    this.fileLength = fileLength;
    FileInfo first = infos[0];
    // fills calibration function, coefficients and value unit from ImageJ's description tag
    new FileOpener(first).decodeDescriptionString(first);
    this.pages = infos.length == 1 ? Math.max(1, first.nImages) : infos.length;
    this.signed16 = first.fileType == FileInfo.GRAY16_SIGNED;
    this.function = first.calibrationFunction;
    this.coefficients = first.coefficients == null ? null : first.coefficients.clone();
    this.valueUnit = first.valueUnit;
  }

  /** Reads the TIFF directory; throws {@link Problem#IMAGE_CORRUPT} when it cannot. */
  static TiffPages open(Path path) {
    FileInfo[] infos;
    try {
      File f = path.toFile();
      String dir = f.getAbsoluteFile().getParent() + File.separator;
      infos = new ij.io.TiffDecoder(dir, f.getName()).getTiffInfo();
      if (infos == null || infos.length == 0) {
        throw new WavemarkException(Problem.IMAGE_CORRUPT, path, "no TIFF image directory");
      }
      return new TiffPages(path, infos, Files.size(path));
    } catch (IOException | RuntimeException e) {
      if (e instanceof WavemarkException w) {
        throw w;
      }
      throw new WavemarkException(e, Problem.IMAGE_CORRUPT, path, "TIFF directory: " + e.getMessage());
    }
  }

  int pageCount() {
    return pages;
  }

  /** Reads page {@code page} (1-based) with its value calibration applied. Thread-safe. */
  GrayF32 read(int page) {
    if (page < 1 || page > pages) {
      throw new WavemarkException(Problem.OUT_OF_RANGE, "page of " + path.getFileName(), page, "[1, " + pages + "]");
    }
    FileInfo fi = pageInfo(page);
    if (fi.width <= 0 || fi.height <= 0) {
      throw new WavemarkException(Problem.IMAGE_EMPTY, label(page));
    }
    if (!supported(fi)) {
      return ImageIoPages.read(path, page);
    }
    long end = endOfData(fi);
    if (end > fileLength) {
      throw new WavemarkException(Problem.IMAGE_CORRUPT, label(page),
          "truncated: the page needs " + end + " bytes but the file has " + fileLength);
    }
    Object pixels;
    boolean random = needsRandomAccess(fi);
    try (InputStream in = open(random)) {
      ImageReader reader = new ImageReader(fi);
      // a page read by random access finds each strip by seeking to its offset; skipping to the
      // first one through the stream would read every byte before it (all earlier pages)
      pixels = reader.readPixels(in, random ? 0 : fi.getOffset());
    } catch (IOException e) {
      throw new WavemarkException(e, Problem.IMAGE_CORRUPT, label(page), e.getMessage());
    }
    if (pixels == null) {
      throw new WavemarkException(Problem.IMAGE_CORRUPT, label(page), "ImageJ could not decode the pixels");
    }
    ImageProcessor ip = processor(fi, pixels);
    if (fi.whiteIsZero && !(ip instanceof FloatProcessor) && !(ip instanceof ColorProcessor)) {
      ip.invert();
    }
    Calibration cal = Pixels.calibrationFor(ip, signed16, function, coefficients, valueUnit);
    return Pixels.toGray(ip, cal);
  }

  private String label(int page) {
    return pages == 1 ? path.toString() : path + " page " + page;
  }

  private FileInfo pageInfo(int page) {
    FileInfo fi;
    if (infos.length == 1) {
      fi = (FileInfo) infos[0].clone();
      long size = (long) fi.width * fi.height * fi.getBytesPerPixel();
      long offset = infos[0].getOffset() + (page - 1) * (size + infos[0].getGap());
      fi.longOffset = offset;
      fi.offset = offset <= Integer.MAX_VALUE ? (int) offset : 0;
    } else {
      fi = (FileInfo) infos[page - 1].clone();
    }
    fi.nImages = 1;
    return fi;
  }

  private static boolean supported(FileInfo fi) {
    boolean compression = fi.compression == FileInfo.COMPRESSION_NONE || fi.compression == FileInfo.LZW
        || fi.compression == FileInfo.LZW_WITH_DIFFERENCING || fi.compression == FileInfo.PACK_BITS
        || fi.compression == FileInfo.ZIP || fi.compression == FileInfo.ZIP_WITH_DIFFERENCING;
    boolean type = switch (fi.fileType) {
      case FileInfo.GRAY8, FileInfo.COLOR8, FileInfo.GRAY16_SIGNED, FileInfo.GRAY16_UNSIGNED, FileInfo.GRAY12_UNSIGNED,
          FileInfo.GRAY32_INT, FileInfo.GRAY32_UNSIGNED, FileInfo.GRAY32_FLOAT, FileInfo.GRAY24_UNSIGNED,
          FileInfo.GRAY64_FLOAT, FileInfo.RGB, FileInfo.BGR, FileInfo.ARGB, FileInfo.ABGR, FileInfo.BARG,
          FileInfo.RGB_PLANAR -> true;
      default -> false;
    };
    return compression && type;
  }

  private static long endOfData(FileInfo fi) {
    if (fi.compression == FileInfo.COMPRESSION_NONE && (fi.stripOffsets == null || fi.stripOffsets.length <= 1)) {
      return fi.getOffset() + (long) fi.width * fi.height * fi.getBytesPerPixel();
    }
    long end = fi.getOffset();
    if (fi.stripOffsets != null && fi.stripLengths != null) {
      for (int i = 0; i < Math.min(fi.stripOffsets.length, fi.stripLengths.length); i++) {
        end = Math.max(end, (fi.stripOffsets[i] & 0xffffffffL) + (fi.stripLengths[i] & 0xffffffffL));
      }
    }
    return end;
  }

  /** As ImageJ's own FileOpener decides: compressed or multi-strip pages need random access. */
  private static boolean needsRandomAccess(FileInfo fi) {
    return fi.compression >= FileInfo.LZW || (fi.stripOffsets != null && fi.stripOffsets.length > 1);
  }

  private InputStream open(boolean random) throws IOException {
    if (random) {
      // over the file itself, so that a seek is a seek (over a plain stream ImageJ's
      // RandomAccessStream would read, and cache in memory, everything up to the offset)
      return new RandomAccessStream(new RandomAccessFile(path.toFile(), "r"));
    }
    return new BufferedInputStream(new FileInputStream(path.toFile()), 1 << 16);
  }

  private static ImageProcessor processor(FileInfo fi, Object pixels) {
    int w = fi.width;
    int h = fi.height;
    if (pixels instanceof byte[] b) {
      return new ByteProcessor(w, h, b, null);
    }
    if (pixels instanceof short[] s) {
      return new ShortProcessor(w, h, s, null);
    }
    if (pixels instanceof float[] f) {
      return new FloatProcessor(w, h, f, null);
    }
    if (pixels instanceof int[] c) {
      return new ColorProcessor(w, h, c);
    }
    throw new WavemarkException(Problem.IMAGE_CORRUPT, fi.fileName, "unsupported TIFF pixel layout");
  }
}
