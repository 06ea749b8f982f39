package dev.wavemark.core.model;

/** The model feature a wave starts from. */
public enum Feature {
  LEADING_EDGE("leading-edge"),
  SHOULDER("shoulder"),
  TRAILING_EDGE("trailing-edge"),
  CORNER("corner"),
  SECOND_CORNER("second-corner"),
  IMPINGEMENT("impingement"),
  INTERSECTION("intersection"),
  TRIPLE_POINT("triple-point"),
  WALL("wall"),
  APEX("apex"),
  BODY_NOSE("body-nose");

  private final String contractName;

  Feature(String contractName) {
    this.contractName = contractName;
  }

  public String contractName() {
    return contractName;
  }
}
