package dev.wavemark.imaging.io;

import boofcv.struct.image.GrayF32;
import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import ij.ImagePlus;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import javax.imageio.ImageIO;
import javax.imageio.ImageReader;
import javax.imageio.stream.ImageInputStream;

/**
 * PNG, JPEG (and TIFF pages ImageJ's decoder does not handle) through javax.imageio, handed to
 * ImageJ as an ImagePlus so that 16-bit grey stays 16-bit. Decoder warnings such as a premature
 * end of a JPEG count as corruption: the JDK would otherwise return a partly grey picture.
 */
final class ImageIoPages {
  private ImageIoPages() {}

  static int pageCount(Path path) {
    try (ImageInputStream iis = ImageIO.createImageInputStream(path.toFile())) {
      ImageReader reader = reader(iis, path);
      try {
        reader.setInput(iis);
        return reader.getNumImages(true);
      } finally {
        reader.dispose();
      }
    } catch (IOException e) {
      throw new WavemarkException(e, Problem.IMAGE_CORRUPT, path, e.getMessage());
    }
  }

  /** Reads page {@code page} (1-based). */
  static GrayF32 read(Path path, int page) {
    List<String> warnings = new ArrayList<>();
    BufferedImage bi;
    try (ImageInputStream iis = ImageIO.createImageInputStream(path.toFile())) {
      ImageReader reader = reader(iis, path);
      try {
        reader.setInput(iis);
        reader.addIIOReadWarningListener((source, warning) -> warnings.add(warning));
        bi = reader.read(page - 1);
      } finally {
        reader.dispose();
      }
    } catch (IOException | RuntimeException e) {
      if (e instanceof WavemarkException w) {
        throw w;
      }
      throw new WavemarkException(e, Problem.IMAGE_CORRUPT, path, oneLine(e));
    }
    if (!warnings.isEmpty()) {
      throw new WavemarkException(Problem.IMAGE_CORRUPT, path, warnings.get(0));
    }
    if (bi.getWidth() == 0 || bi.getHeight() == 0) {
      throw new WavemarkException(Problem.IMAGE_EMPTY, path);
    }
    ImagePlus imp = new ImagePlus(path.getFileName().toString(), bi);
    return Pixels.toGray(imp.getProcessor(), null);
  }

  private static ImageReader reader(ImageInputStream iis, Path path) {
    if (iis == null) {
      throw new WavemarkException(Problem.IMAGE_CORRUPT, path, "cannot open a stream on it");
    }
    Iterator<ImageReader> it = ImageIO.getImageReaders(iis);
    if (!it.hasNext()) {
      throw new WavemarkException(Problem.IMAGE_CORRUPT, path, "not a PNG, TIFF or JPEG image");
    }
    return it.next();
  }

  private static String oneLine(Exception e) {
    String m = e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
    Throwable c = e.getCause();
    if (c != null && c.getMessage() != null && !m.contains(c.getMessage())) {
      m = m + ": " + c.getMessage();
    }
    return m.replace('\n', ' ');
  }
}
