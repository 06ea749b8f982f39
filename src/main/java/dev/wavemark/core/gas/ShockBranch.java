package dev.wavemark.core.gas;

/** The two attached oblique-shock solutions for a deflection below the detachment limit. */
public enum ShockBranch {
  /** The weaker shock, the one seen on wedges and ramps in practice. */
  WEAK,
  /** The stronger shock, subsonic behind (except very close to the detachment limit). */
  STRONG
}
