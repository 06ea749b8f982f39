/**
 * Jackson wire records for the run, calibration, scene, truth and result files: the only place
 * that knows JSON names. Each converts to and from the domain records of {@code core.model}.
 */
@NullMarked
package dev.wavemark.files;

import org.jspecify.annotations.NullMarked;
