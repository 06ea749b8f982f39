package dev.wavemark.core.gas;

/** The kind of reflection theory allows for an incident shock meeting a plane wall in steady flow. */
public enum ReflectionVerdict {
  /** Only a regular (two-shock) reflection is possible: below the von Neumann criterion. */
  REGULAR,
  /**
   * Between the von Neumann and the detachment criteria both a regular and a Mach reflection are
   * theoretically possible (the dual-solution domain; which one appears depends on the history).
   */
  DUAL_SOLUTION,
  /** No regular reflection exists (beyond the detachment criterion): a Mach reflection forms. */
  MACH
}
