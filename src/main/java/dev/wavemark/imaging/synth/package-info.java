/**
 * Synthetic schlieren and shadowgraph pictures whose truth is known: the flow from the physics
 * core, the optics of a real bench, and the truth for tests, demos and benchmarks.
 */
@NullMarked
package dev.wavemark.imaging.synth;

import org.jspecify.annotations.NullMarked;
