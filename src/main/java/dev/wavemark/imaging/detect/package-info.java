/**
 * The measuring instrument: finds shock lines, expansion-fan boundaries and Mach waves in a
 * normalised frame and fits each with a sub-pixel line, an honest standard uncertainty and a
 * straightness test. Entry point: {@link dev.wavemark.imaging.detect.WaveDetector}.
 */
@NullMarked
package dev.wavemark.imaging.detect;

import org.jspecify.annotations.NullMarked;
