package dev.wavemark.inference;

import dev.wavemark.core.model.ExpectedWave;

/**
 * An observed line paired with the wave theory says the model makes, with the measured and
 * predicted angles at the frame's inferred Mach number (or the starting Mach number when none
 * could be inferred).
 *
 * @param observedIndex index into the frame's observed-wave list
 * @param expected the theory wave it was matched to, at the inferred Mach number
 * @param measuredAngleRad acute angle between the observed line and the wave's local upstream flow
 * @param measuredUncertaintyRad the fit's standard uncertainty of that angle
 * @param predictedAngleRad the theory angle at the inferred Mach number
 * @param residualSigma (measured - predicted) / measuredUncertainty; NaN when the fit gave no uncertainty
 * @param usedForMach true when the wave feeds a Mach estimate, false when it is only checked
 *     against theory (slip lines, Mach stems, bow shocks, failed inversions)
 */
public record WaveMatch(
    int observedIndex, ExpectedWave expected, double measuredAngleRad, double measuredUncertaintyRad,
    double predictedAngleRad, double residualSigma, boolean usedForMach) {}
