/**
 * The optical bench: lens model conversion and point undistortion, chessboard detection,
 * intrinsic calibration, and the in-situ roll and scale that give the flow direction.
 */
@NullMarked
package dev.wavemark.imaging.calib;

import org.jspecify.annotations.NullMarked;
