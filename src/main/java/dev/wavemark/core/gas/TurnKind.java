package dev.wavemark.core.gas;

/** What a simple wave that turns a supersonic stream is: a shock, a centred fan, or nothing. */
public enum TurnKind {
  /** A compression turn: an attached oblique shock on its weak branch. */
  SHOCK,
  /** An expansion turn: a centred Prandtl-Meyer fan with a head and a tail Mach line. */
  EXPANSION_FAN,
  /** No turn: the stream crosses only a Mach line. */
  NONE
}
