package dev.wavemark.imaging.detect;

/**
 * What a wave looks like across its line, which fixes how its centre is located. Knife-edge
 * schlieren shows the density gradient (a shock is a thin line, a fan boundary a step);
 * shadowgraph shows its derivative (a shock is a dark-bright pair, a fan boundary a thin line).
 */
enum Signature {
  /** A thin line: the centre is the midpoint of the profile's crossings of its upper levels. */
  PEAK,
  /** A step: the centre is the step's midpoint, the peak of the profile's derivative. */
  STEP,
  /** A dark-bright pair: the centre is the zero crossing between the two. */
  DIPOLE
}
