package dev.wavemark.imaging.io;

import boofcv.struct.image.GrayF32;
import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import dev.wavemark.core.model.RunSpec;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.jspecify.annotations.Nullable;

/**
 * The frames of a run, in order: every page of every file of {@code images.frames}, numbered
 * from 0 across files, then cut to {@code images.frameRange}. Opening reads only file headers
 * (a TIFF's directory), never pixels; {@link #read} loads one frame, so a 10,000-page TIFF is
 * streamed page by page.
 *
 * <p>Thread-safe: {@link #read} may be called from several workers at once (each call opens its
 * own stream). A frame that cannot be loaded fails alone, with a {@link WavemarkException}
 * naming the file and page: {@link Problem#IMAGE_CORRUPT}, {@link Problem#IMAGE_EMPTY}, or
 * {@link Problem#FRAME_SIZE_MISMATCH} when its size differs from the no-flow reference's.
 */
public final class FrameSequence {
  private final List<FrameRef> refs;
  /** Per file: its page reader, or null for a single-picture format or a TIFF whose directory failed. */
  private final List<@Nullable TiffPages> tiffs;
  private final List<Path> files;
  private final @Nullable GrayF32 reference;
  private final @Nullable Path referencePath;

  private FrameSequence(List<FrameRef> refs, List<Path> files, List<@Nullable TiffPages> tiffs,
      @Nullable GrayF32 reference, @Nullable Path referencePath) {
    this.refs = List.copyOf(refs);
    this.files = files;
    this.tiffs = tiffs;
    this.reference = reference;
    this.referencePath = referencePath;
  }

  /** Opens a run's frames and loads its no-flow reference, if it names one. */
  public static FrameSequence of(RunSpec run) {
    return open(run.frames(), run.frameRange(), run.noFlowReference());
  }

  /**
   * Opens a frame sequence.
   *
   * @param files the image files, in order; a multi-page TIFF contributes all its pages
   * @param frameRange optional {@code first-last} selection of frame indices, see {@link FrameRange}
   * @param noFlowReference optional reference picture; loaded now, and a failure to load it
   *     fails the whole run (every frame needs it)
   * @throws WavemarkException {@link Problem#FILE_MISSING} for a missing file (checked for all
   *     files now, so that a typo does not surface after hours of processing), a bad range, or a
   *     reference that cannot be read
   */
  public static FrameSequence open(List<Path> files, Optional<String> frameRange, Optional<Path> noFlowReference) {
    if (files.isEmpty()) {
      throw new WavemarkException(Problem.BAD_ARGUMENT, "no frame files given");
    }
    List<FrameRef> all = new ArrayList<>();
    List<@Nullable TiffPages> tiffs = new ArrayList<>();
    for (Path f : files) {
      TiffPages t = null;
      int pages = 1;
      if (ImageFiles.isTiff(f)) {
        try {
          t = TiffPages.open(f);
          pages = t.pageCount();
        } catch (WavemarkException e) {
          // a broken directory fails this file's single frame when it is read, not the run
          t = null;
        }
      }
      tiffs.add(t);
      for (int p = 1; p <= pages; p++) {
        all.add(new FrameRef(all.size(), f, p, pages));
      }
    }
    List<FrameRef> chosen = all;
    if (frameRange.isPresent()) {
      FrameRange r = FrameRange.parse(frameRange.get(), all.size());
      chosen = all.subList(r.first(), r.last() + 1);
    }
    GrayF32 ref = noFlowReference.map(ImageFiles::read).orElse(null);
    return new FrameSequence(chosen, List.copyOf(files), tiffs, ref, noFlowReference.orElse(null));
  }

  /** The number of frames selected. */
  public int size() {
    return refs.size();
  }

  /** The frames selected, in order; {@code refs().get(i).index()} is the sequence-wide index. */
  public List<FrameRef> refs() {
    return refs;
  }

  /** The no-flow reference picture, if the run has one; shared, do not modify. */
  public Optional<GrayF32> reference() {
    return Optional.ofNullable(reference);
  }

  /** Reads the {@code i}-th selected frame (0 ≤ i < size()). Thread-safe. */
  public Frame read(int i) {
    return read(refs.get(i));
  }

  /** Reads one frame of this sequence. Thread-safe. */
  public Frame read(FrameRef ref) {
    int fileIndex = files.indexOf(ref.path());
    TiffPages t = fileIndex >= 0 ? tiffs.get(fileIndex) : null;
    GrayF32 g = t != null ? t.read(ref.page()) : ImageFiles.read(ref.path(), ref.page());
    ImageFiles.checkNotEmpty(g, where(ref));
    if (reference != null && (g.width != reference.width || g.height != reference.height)) {
      throw new WavemarkException(Problem.FRAME_SIZE_MISMATCH, where(ref), g.width + "x" + g.height,
          reference.width + "x" + reference.height + " (" + referencePath + ")");
    }
    return new Frame(ref, g);
  }

  private static String where(FrameRef ref) {
    return ref.pageCount() == 1 ? ref.path().toString() : ref.path() + " page " + ref.page();
  }
}
