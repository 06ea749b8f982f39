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
    List<BufferedImage> pages = frames.stream().map(f -> ConvertBufferedImage.convertTo(f, null)).toList();
    writeWith("tiff", pages, file, "ZLib");
  }

  public static boolean isTiff(Path file) {
    String n = file.getFileName().toString().toLowerCase(Locale.ROOT);
    return n.endsWith(".tif") || n.endsWith(".tiff");
  }

  private static void writeWith(String format, List<BufferedImage> pages, Path file, String compression) {
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
      try (ImageOutputStream out = ImageIO.createImageOutputStream(tmp.toFile())) {
        w.setOutput(out);
        ImageWriteParam p = w.getDefaultWriteParam();
        if (compression != null && p.canWriteCompressed()) {
          p.setCompressionMode(ImageWriteParam.MODE_EXPLICIT);
          p.setCompressionType(compression);
        }
        if (pages.size() == 1) {
          w.write(null, new IIOImage(pages.get(0), null, null), p);
        } else {
          w.prepareWriteSequence(null);
          for (BufferedImage b : pages) {
            w.writeToSequence(new IIOImage(b, null, null), p);
          }
          w.endWriteSequence();
        }
      } finally {
        w.dispose();
      }
      try {
        Files.move(tmp, abs, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
      } catch (AtomicMoveNotSupportedException e) {
        Files.move(tmp, abs, StandardCopyOption.REPLACE_EXISTING);
      }
    } catch (IOException e) {
      throw new WavemarkException(Problem.WRITE_FAILED, file, e.getMessage());
    }
  }
}
