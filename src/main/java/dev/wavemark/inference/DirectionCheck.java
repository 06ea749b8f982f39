package dev.wavemark.inference;

import dev.wavemark.core.model.ObservedWave;
import dev.wavemark.core.model.WaveKind;
import java.util.Optional;

/**
 * A measured line's direction against the direction theory gives it, for the waves that are only
 * checked (a slip line carries no Mach number of its own: its direction is fixed by the pressure
 * match of the streams on its two sides, from the three-shock solution at a triple point or the
 * shock-intersection solution where two shocks meet). Directions are signed, counter-clockwise
 * on screen from the freestream direction, radians.
 *
 * @param measuredRad the observed line's direction from the freestream
 * @param predictedRad the theory line's direction from the freestream, at the frame's Mach number
 * @param differenceRad measured minus predicted
 * @param differenceSigma the difference over the line's standard uncertainty; NaN without one
 */
public record DirectionCheck(double measuredRad, double predictedRad, double differenceRad, double differenceSigma) {

  /**
   * The check of an observed wave matched to a theory wave, for the kinds checked by direction
   * (slip lines); empty for the others, whose angle is compared with theory by the match itself.
   *
   * @param flowRad the freestream direction in the image, contract sense
   */
  public static Optional<DirectionCheck> of(ObservedWave observed, WaveMatch match, double flowRad) {
    if (match.expected().kind() != WaveKind.SLIP_LINE) {
      return Optional.empty();
    }
    double measured = Matcher.lineDifference(observed.line().directionRad(), flowRad);
    double predicted = Matcher.lineDifference(match.expected().directionRad(), flowRad);
    double diff = Matcher.lineDifference(observed.line().directionRad(), match.expected().directionRad());
    double s = observed.line().directionUncertaintyRad();
    return Optional.of(new DirectionCheck(measured, predicted, diff, s > 0 ? diff / s : Double.NaN));
  }
}
