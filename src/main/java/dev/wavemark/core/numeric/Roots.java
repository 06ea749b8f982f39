package dev.wavemark.core.numeric;

import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import java.util.function.DoubleUnaryOperator;
import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.hipparchus.exception.MathIllegalArgumentException;
import org.hipparchus.exception.MathIllegalStateException;

/**
 * Bracketed root finding with an explicit evaluation budget, on Hipparchus'
 * {@link BracketingNthOrderBrentSolver} (a well-kept library rather than a hand-written bisection).
 * The bracket is checked first; a failure says what was searched.
 */
public final class Roots {
  /** Default evaluation budget: ample for the smooth, monotone functions of gas dynamics. */
  public static final int DEFAULT_BUDGET = 200;

  private Roots() {}

  /**
   * Finds x in [lo, hi] with f(x) = 0 to an absolute tolerance {@code absTol} in x.
   *
   * @param what a short description of the search, used in failure messages
   * @throws WavemarkException {@link Problem#NO_SOLUTION} when f does not change sign on the
   *     bracket, {@link Problem#SOLVER_FAILED} when the budget runs out
   */
  public static double solve(String what, DoubleUnaryOperator f, double lo, double hi, double absTol) {
    return solve(what, f, lo, hi, absTol, DEFAULT_BUDGET);
  }

  public static double solve(
      String what, DoubleUnaryOperator f, double lo, double hi, double absTol, int budget) {
    double flo = f.applyAsDouble(lo);
    double fhi = f.applyAsDouble(hi);
    if (flo == 0) {
      return lo;
    }
    if (fhi == 0) {
      return hi;
    }
    if (!(Math.signum(flo) * Math.signum(fhi) < 0)) {
      throw new WavemarkException(
          Problem.NO_SOLUTION,
          what + ": no root in [" + WavemarkException.num(lo) + ", " + WavemarkException.num(hi) + "]");
    }
    BracketingNthOrderBrentSolver solver = new BracketingNthOrderBrentSolver(1e-14, absTol, 1e-300, 5);
    try {
      return solver.solve(budget, f::applyAsDouble, lo, hi);
    } catch (MathIllegalStateException | MathIllegalArgumentException e) {
      throw new WavemarkException(
          e, Problem.SOLVER_FAILED, what, budget,
          "[" + WavemarkException.num(lo) + ", " + WavemarkException.num(hi) + "]");
    }
  }
}
