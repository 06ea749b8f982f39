/**
 * Inference: match the detector's lines to the waves the model must make, invert gas-dynamic
 * theory to the freestream Mach number with an uncertainty budget, and judge reflections, detached
 * shocks and the tunnel. Uses {@code core} only; the entry point is {@link dev.wavemark.inference.Inference}.
 */
@NullMarked
package dev.wavemark.inference;

import org.jspecify.annotations.NullMarked;
