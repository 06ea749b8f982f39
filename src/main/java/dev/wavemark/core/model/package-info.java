/**
 * Validated domain records: body shapes, gas, tunnel, calibration and the run as a whole.
 * No JSON names live here; the {@code files} package maps the contract onto these records.
 */
@NullMarked
package dev.wavemark.core.model;

import org.jspecify.annotations.NullMarked;
