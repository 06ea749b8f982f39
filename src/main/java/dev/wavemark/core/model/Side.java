package dev.wavemark.core.model;

/** The half-plane above or below the body or wall, as seen on screen (contract {@code side}). */
public enum Side {
  UPPER("upper", +1),
  LOWER("lower", -1);

  private final String contractName;
  private final int sign;

  Side(String contractName, int sign) {
    this.contractName = contractName;
    this.sign = sign;
  }

  public String contractName() {
    return contractName;
  }

  /** +1 for upper, -1 for lower: the sign of the across-flow coordinate n on that side. */
  public int sign() {
    return sign;
  }

  public Side opposite() {
    return this == UPPER ? LOWER : UPPER;
  }

  /** Parses a contract name, or returns null. */
  public static @org.jspecify.annotations.Nullable Side fromContract(String s) {
    for (Side v : values()) {
      if (v.contractName.equals(s)) {
        return v;
      }
    }
    return null;
  }
}
