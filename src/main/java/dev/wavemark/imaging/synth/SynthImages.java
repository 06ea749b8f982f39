package dev.wavemark.imaging.synth;

import boofcv.io.image.ConvertBufferedImage;
import boofcv.struct.image.GrayU16;
import boofcv.struct.image.GrayU8;
import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Iterator;
import java.util.List;
import java.util.Locale;
import javax.imageio.IIOImage;
import javax.imageio.ImageIO;
import javax.imageio.ImageWriteParam;
import javax.imageio.ImageWriter;
import javax.imageio.stream.ImageOutputStream;

/**
 * Writes rendered pictures: 16-bit grey PNG or TIFF, and multi-page TIFF for a sequence
 * (Deflate-compressed, which ImageJ's TIFF decoder and the JDK's TIFF reader both read), through
 * a temporary file and a move so that an interrupted run leaves no half-written picture.
 */
public final class SynthImages {
  private SynthImages() {}

  /** Writes one 16-bit picture; the format follows the extension (.png, .tif, .tiff). */
  public static void write(GrayU16 img, Path file) {
    if (isTiff(file)) {
      writeTiff(List.of(img), file);
    } else {
      writeWith("png", List.of(ConvertBufferedImage.convertTo(img, null)), file, null);
    }
  }

  /** Writes an 8-bit picture (a calibration target) as PNG. */
  public static void write(GrayU8 img, Path file) {
    writeWith("png", List.of(ConvertBufferedImage.convertTo(img, null)), file, null);
  }

  /** Writes frames as one multi-page, Deflate-compressed 16-bit TIFF. */
  public static void writeTiff(List<GrayU16> frames, Path file) {
    List<BufferedImage> pages = new java.util.ArrayList<>(frames.size());
    for (GrayU16 f : frames) {
      pages.add(ConvertBufferedImage.convertTo(f, null));
    }
    writeWith("tiff", pages, file, "ZLib");
  }

  /**
   * Opens a multi-page, Deflate-compressed 16-bit TIFF to be written a page at a time, so that a
   * long sequence is never held in memory whole. {@link PageWriter#commit()} moves it into place;
   * closing it without a commit leaves nothing behind.
   */
  public static PageWriter openTiff(Path file) {
    return PageWriter.open("tiff", file, "ZLib");
  }

  public static boolean isTiff(Path file) {
    String n = file.getFileName().toString().toLowerCase(Locale.ROOT);
    return n.endsWith(".tif") || n.endsWith(".tiff");
  }

  private static void writeWith(String format, List<BufferedImage> pages, Path file, String compression) {
    try (PageWriter w = PageWriter.open(format, file, compression)) {
      for (BufferedImage b : pages) {
        w.add(b);
      }
      w.commit();
    }
  }

  /**
   * A picture file written page by page into a temporary sibling, then moved into place. Pages of
   * a TIFF go out as they are added (the JDK's writer chains their directories as it goes).
   */
  public static final class PageWriter implements AutoCloseable {
    private final Path file;
    private final Path tmp;
    private final ImageWriter writer;
    private final ImageOutputStream out;
    private final ImageWriteParam param;
    private final boolean sequence;
    private boolean started;
    private boolean committed;

    private PageWriter(Path file, Path tmp, ImageWriter writer, ImageOutputStream out, ImageWriteParam param) {
      this.file = file;
      this.tmp = tmp;
      this.writer = writer;
      this.out = out;
      this.param = param;
      this.sequence = writer.canWriteSequence();
    }

    static PageWriter open(String format, Path file, String compression) {
      Path abs = file.toAbsolutePath();
      Path tmp = abs.resolveSibling("." + abs.getFileName() + ".part");
      Iterator<ImageWriter> it = ImageIO.getImageWritersByFormatName(format);
      if (!it.hasNext()) {
        throw new WavemarkException(Problem.WRITE_FAILED, file, "no " + format + " writer in this Java runtime");
      }
      ImageWriter w = it.next();
      try {
        Files.createDirectories(abs.getParent());
        Files.deleteIfExists(tmp);
        ImageOutputStream out = ImageIO.createImageOutputStream(tmp.toFile());
        if (out == null) {
          throw new IOException("cannot open " + tmp + " for writing");
        }
        w.setOutput(out);
        ImageWriteParam p = w.getDefaultWriteParam();
        if (compression != null && p.canWriteCompressed()) {
          p.setCompressionMode(ImageWriteParam.MODE_EXPLICIT);
          p.setCompressionType(compression);
        }
        return new PageWriter(file, tmp, w, out, p);
      } catch (IOException e) {
        w.dispose();
        throw new WavemarkException(Problem.WRITE_FAILED, file, e.getMessage());
      }
    }

    /** Writes the next page (the only one, for a format without sequences). */
    public void add(BufferedImage page) {
      try {
        if (!sequence) {
          if (started) {
            throw new IllegalStateException(file + ": this format holds one picture");
          }
          writer.write(null, new IIOImage(page, null, null), param);
        } else {
          if (!started) {
            writer.prepareWriteSequence(null);
          }
          writer.writeToSequence(new IIOImage(page, null, null), param);
        }
        started = true;
      } catch (IOException e) {
        throw new WavemarkException(Problem.WRITE_FAILED, file, e.getMessage());
      }
    }

    /** Writes a 16-bit frame as the next page. */
    public void add(GrayU16 frame) {
      add(ConvertBufferedImage.convertTo(frame, null));
    }

    /** Finishes the file and moves it into place. */
    public void commit() {
      try {
        if (sequence && started) {
          writer.endWriteSequence();
        }
        out.close();
        try {
          Files.move(tmp, file.toAbsolutePath(), StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } catch (AtomicMoveNotSupportedException e) {
          Files.move(tmp, file.toAbsolutePath(), StandardCopyOption.REPLACE_EXISTING);
        }
        committed = true;
      } catch (IOException e) {
        throw new WavemarkException(Problem.WRITE_FAILED, file, e.getMessage());
      }
    }

    @Override
    public void close() {
      writer.dispose();
      try {
        out.close();
      } catch (IOException e) {
        // already closed by commit, or the write failed; the temporary file goes either way
      }
      if (!committed) {
        try {
          Files.deleteIfExists(tmp);
        } catch (IOException e) {
          // best effort: a hidden .part file is all that can remain
        }
      }
    }
  }
}
