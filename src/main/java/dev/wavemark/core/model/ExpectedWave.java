package dev.wavemark.core.model;

import dev.wavemark.core.geom.Point2;

/**
 * A wave that theory says the model makes at a given freestream Mach number, placed in the
 * image: the renderer's truth, the detector's hint and the inference's template.
 *
 * @param kind what the wave is
 * @param side upper or lower half-plane, as seen on screen
 * @param angleToFlowRad acute angle between the wave and its local upstream flow, in [0, pi/2]
 * @param localFlowDirectionRad image direction (contract sense) of that local upstream flow
 * @param directionRad image direction (contract sense) of the wave line, pointing away from its start
 * @param startPx where the wave starts (the feature), image pixels
 * @param endPx where theory ends it (another wave, a wall, or the picture's edge), image pixels
 * @param feature the model feature that makes the wave
 * @param label a short human label, e.g. "upper leading-edge shock"
 */
public record ExpectedWave(
    WaveKind kind, Side side, double angleToFlowRad, double localFlowDirectionRad, double directionRad,
    Point2 startPx, Point2 endPx, Feature feature, String label) {}
