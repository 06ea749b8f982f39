/**
 * Frame input: images read through ImageJ into BoofCV {@code GrayF32} with ImageJ's value
 * calibration applied, streamed frame sequences, normalisation, and the flow-region mask.
 */
@NullMarked
package dev.wavemark.imaging.io;

import org.jspecify.annotations.NullMarked;
