package dev.wavemark.core;

import java.util.Locale;

/**
 * The stable catalogue of things that can go wrong, each with a kebab-case code that tests and
 * result files rely on and a message pattern ({@link String#format} syntax, {@link Locale#ROOT}).
 * Add new cases freely; never rename a code.
 */
public enum Problem {
  // Physics inputs and inversions
  NOT_FINITE("not-finite", "%s must be a finite number, got %s"),
  OUT_OF_RANGE("out-of-range", "%s = %s is outside its valid range %s"),
  GAMMA_INVALID("gamma-invalid", "ratio of specific heats gamma = %s must be greater than 1"),
  SUBSONIC("subsonic", "Mach number %s must be greater than 1 for %s"),
  BELOW_MACH_ANGLE("below-mach-angle", "wave angle %s° is below the Mach angle %s° for M = %s: no shock of that angle exists"),
  SHOCK_DETACHED("shock-detached", "deflection %s° exceeds the maximum %s° for M = %s: the shock detaches"),
  NO_SOLUTION("no-solution", "%s"),
  SOLVER_FAILED("solver-failed", "%s did not converge within %s evaluations while searching %s"),
  // Geometry and models
  GEOMETRY_IMPOSSIBLE("geometry-impossible", "%s"),
  FIELD_MISSING("field-missing", "%s: field '%s' is required for shape '%s'"),
  SHAPE_UNKNOWN("shape-unknown", "%s: unknown model shape '%s'; expected one of %s"),
  // Files and images
  FILE_MISSING("file-missing", "%s: file not found; check the path (relative paths are resolved against %s)"),
  FILE_UNREADABLE("file-unreadable", "%s: cannot be read (%s)"),
  JSON_INVALID("json-invalid", "%s: not valid for this file type (%s)"),
  IMAGE_CORRUPT("image-corrupt", "%s: not a readable image (%s); re-export it as 8/16-bit PNG or TIFF"),
  IMAGE_EMPTY("image-empty", "%s: the frame is empty or has no contrast"),
  FRAME_SIZE_MISMATCH("frame-size-mismatch", "%s: frame is %s but the no-flow reference is %s; use a reference taken with the same camera settings"),
  MASK_OUTSIDE("mask-outside", "%s: %s lies outside the %s picture"),
  NO_WAVE_FOUND("no-wave-found", "%s: no %s found; %s"),
  WRITE_FAILED("write-failed", "%s: cannot be written (%s)"),
  BAD_ARGUMENT("bad-argument", "%s"),
  // Pipeline
  FRAME_FAILED("frame-failed", "%s: analysis failed unexpectedly (%s); please report this with the frame"),
  SAMPLES_MISSING("samples-missing", "%s: no sample run files (*.run.json) found; run demo from the wavemark folder or pass --samples DIR"),
  // Calibration
  TARGET_NOT_FOUND("target-not-found", "%s: no %s found; %s"),
  // Correlations
  OUTSIDE_CORRELATION("outside-correlation", "%s = %s is outside the range %s of %s");

  private final String code;
  private final String pattern;

  Problem(String code, String pattern) {
    this.code = code;
    this.pattern = pattern;
  }

  /** The stable kebab-case code, e.g. {@code shock-detached}. */
  public String code() {
    return code;
  }

  /** Formats the message for the given arguments. */
  public String format(Object... args) {
    return String.format(Locale.ROOT, pattern, args);
  }
}
