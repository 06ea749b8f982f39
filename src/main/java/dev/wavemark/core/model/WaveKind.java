package dev.wavemark.core.model;

/** The kinds of wave the contract names ({@code kind} in result files). More may be added. */
public enum WaveKind {
  OBLIQUE_SHOCK("oblique-shock"),
  CONICAL_SHOCK("conical-shock"),
  EXPANSION_HEAD("expansion-head"),
  EXPANSION_TAIL("expansion-tail"),
  MACH_WAVE("mach-wave"),
  MACH_STEM("mach-stem"),
  REFLECTED_SHOCK("reflected-shock"),
  SLIP_LINE("slip-line"),
  BOW_SHOCK("bow-shock"),
  TRANSMITTED_SHOCK("transmitted-shock");

  private final String contractName;

  WaveKind(String contractName) {
    this.contractName = contractName;
  }

  public String contractName() {
    return contractName;
  }

  /** True for the kinds that are shocks (a jump), as opposed to fans, Mach waves and slip lines. */
  public boolean isShock() {
    return switch (this) {
      case OBLIQUE_SHOCK, CONICAL_SHOCK, MACH_STEM, REFLECTED_SHOCK, BOW_SHOCK, TRANSMITTED_SHOCK -> true;
      case EXPANSION_HEAD, EXPANSION_TAIL, MACH_WAVE, SLIP_LINE -> false;
    };
  }

  /** Parses a contract name, or returns null. */
  public static @org.jspecify.annotations.Nullable WaveKind fromContract(String s) {
    for (WaveKind v : values()) {
      if (v.contractName.equals(s)) {
        return v;
      }
    }
    return null;
  }
}
