package dev.wavemark.inference;

import java.util.List;

/**
 * The consistency test between a frame's Mach estimates: the generalised chi-square of the
 * estimates about their combined value, using their full covariance (shared inputs such as the
 * flow direction and gamma make estimates correlated).
 *
 * @param chiSquare the chi-square statistic; 0 with fewer than two estimates
 * @param degreesOfFreedom number of estimates minus one (0 when there is nothing to test)
 * @param birgeRatio sqrt(chiSquare / degreesOfFreedom), 1 expected; 1 when untestable
 * @param pValue probability of a chi-square at least this large if the estimates agree; 1 when untestable
 * @param consistent false when pValue falls below the test level
 * @param disagreeing the {@code from} labels of the estimates that disagree (empty when
 *     consistent): the worst standardised residual is named and set aside and the rest tested
 *     again until the rest agree; when two remain that disagree, both are named
 */
public record Consistency(
    double chiSquare, int degreesOfFreedom, double birgeRatio, double pValue, boolean consistent, List<String> disagreeing) {

  public Consistency {
    disagreeing = List.copyOf(disagreeing);
  }

  /** Nothing to test: fewer than two estimates. */
  public static final Consistency UNTESTED = new Consistency(0, 0, 1, 1, true, List.of());
}
