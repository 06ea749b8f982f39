package dev.wavemark.inference;

import dev.wavemark.core.model.ExpectedWave;
import dev.wavemark.core.numeric.Measured;
import java.util.List;
import java.util.Optional;

/**
 * Everything inference says about one frame.
 *
 * @param mach the frame's Mach number (generalised least-squares combination of the estimates);
 *     empty when no wave gave an estimate (then {@code warnings} says why)
 * @param estimates the individual estimates, each with its weight in {@code mach}
 * @param consistency the chi-square test between the estimates
 * @param budget the uncertainty budget; the contributions add in quadrature to mach's uncertainty
 * @param matches observed lines paired with theory waves, in observed order
 * @param unmatchedObserved indices of observed lines that match no theory wave
 * @param predictedAtInferred theory waves at the inferred Mach number (empty without one)
 * @param predictedAtNominal theory waves at the tunnel's nominal Mach number (empty without one)
 * @param reflection the reflection verdict
 * @param findings detached shocks, curved waves, missing and unmatched waves
 * @param warnings every warning, one line each, findings included
 * @param gammaUncertainty the standard uncertainty assumed for gamma in the budget
 * @param iterations match, invert, re-predict cycles used
 */
public record FrameInference(
    Optional<Measured> mach, List<MachEstimate> estimates, Consistency consistency, List<BudgetLine> budget,
    List<WaveMatch> matches, List<Integer> unmatchedObserved, List<ExpectedWave> predictedAtInferred,
    List<ExpectedWave> predictedAtNominal, ReflectionVerdict reflection, List<Finding> findings,
    List<Warning> warnings, double gammaUncertainty, int iterations) {

  public FrameInference {
    estimates = List.copyOf(estimates);
    budget = List.copyOf(budget);
    matches = List.copyOf(matches);
    unmatchedObserved = List.copyOf(unmatchedObserved);
    predictedAtInferred = List.copyOf(predictedAtInferred);
    predictedAtNominal = List.copyOf(predictedAtNominal);
    findings = List.copyOf(findings);
    warnings = List.copyOf(warnings);
  }
}
