package dev.wavemark.imaging.detect;

/**
 * What a wave looks like across its line, which fixes how its centre is located. Knife-edge
 * schlieren shows the density gradient (a shock is a thin line, a fan boundary a step);
 * shadowgraph shows its derivative (a shock is a dark-bright pair, a fan boundary a thin line).
 * A cone's shock, seen side-on, is a rise as the square root of the distance behind it (see
 * {@link SqrtRise}), which neither shows symmetrically.
 */
enum Signature {
  /** A thin line: the centre is the midpoint of the profile's crossings of its upper levels. */
  PEAK,
  /** A step: the centre is the step's midpoint, the peak of the profile's derivative. */
  STEP,
  /** A dark-bright pair: the centre is the zero crossing between the two. */
  DIPOLE,
  /** A cone's shock in schlieren: a spike with a 1/sqrt tail; the centre is its fitted onset. */
  ROOT_SPIKE,
  /** A cone's shock in shadowgraph: a dark spike with a long bright tail; the centre is its fitted onset. */
  ROOT_PAIR;

  /** Whether the centre is a fitted onset of a square-root rise ({@link SqrtRise}). */
  boolean onset() {
    return this == ROOT_SPIKE || this == ROOT_PAIR;
  }
}
