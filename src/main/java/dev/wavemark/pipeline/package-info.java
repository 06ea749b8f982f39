/**
 * One run end to end: run file, streamed frames, normalisation, detection, inference per frame in
 * parallel with bounded memory, the run's summary and its report. A frame that fails becomes an
 * entry with an error and the other frames go on.
 */
@NullMarked
package dev.wavemark.pipeline;

import org.jspecify.annotations.NullMarked;
