package dev.wavemark.core.model;

/** How the picture was formed (contract {@code optics}). */
public enum Optics {
  /** Knife-edge schlieren, edge vertical: brightness follows d(rho)/dx across the image. */
  SCHLIEREN_VERTICAL_EDGE("schlieren-vertical-edge"),
  /** Knife-edge schlieren, edge horizontal: brightness follows d(rho)/dy. */
  SCHLIEREN_HORIZONTAL_EDGE("schlieren-horizontal-edge"),
  /** Shadowgraph: brightness follows the Laplacian of density; a shock is a dark-bright pair. */
  SHADOWGRAPH("shadowgraph"),
  /** Let the detector decide from the picture. */
  AUTO("auto");

  private final String contractName;

  Optics(String contractName) {
    this.contractName = contractName;
  }

  public String contractName() {
    return contractName;
  }

  /** Parses a contract name, or returns null. */
  public static @org.jspecify.annotations.Nullable Optics fromContract(String s) {
    for (Optics v : values()) {
      if (v.contractName.equals(s)) {
        return v;
      }
    }
    return null;
  }
}
