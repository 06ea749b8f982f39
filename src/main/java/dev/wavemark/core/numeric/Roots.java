package dev.wavemark.core.numeric;

import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import java.util.function.DoubleUnaryOperator;
import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.hipparchus.analysis.solvers.PegasusSolver;
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

  /**
   * Refines a root already bracketed by [a, b], whose function values {@code fa} and {@code fb}
   * (of opposite signs) are known, so they are not computed again: Hipparchus' {@link PegasusSolver}
   * (a regula falsi with superlinear convergence that keeps the bracket). It stops when the bracket
   * is narrower than {@code absTol} or as soon as |f| &le; {@code fTol} at one point, which lets a
   * caller that has scaled f to units of x stop one costly evaluation earlier than a
   * two-sided bracket test would.
   *
   * @throws WavemarkException {@link Problem#NO_SOLUTION} when fa and fb do not bracket a root,
   *     {@link Problem#SOLVER_FAILED} when the budget runs out
   */
  public static double refine(
      String what, DoubleUnaryOperator f, double a, double fa, double b, double fb, double absTol, double fTol,
      int budget) {
    if (fa == 0) {
      return a;
    }
    if (fb == 0) {
      return b;
    }
    if (!(Math.signum(fa) * Math.signum(fb) < 0)) {
      throw new WavemarkException(
          Problem.NO_SOLUTION,
          what + ": no root in [" + WavemarkException.num(a) + ", " + WavemarkException.num(b) + "]");
    }
    double lo = Math.min(a, b);
    double hi = Math.max(a, b);
    double flo = lo == a ? fa : fb;
    double fhi = lo == a ? fb : fa;
    PegasusSolver solver = new PegasusSolver(1e-14, absTol, fTol);
    try {
      return solver.solve(budget, x -> x == lo ? flo : x == hi ? fhi : f.applyAsDouble(x), lo, hi);
    } catch (MathIllegalStateException | MathIllegalArgumentException e) {
      throw new WavemarkException(
          e, Problem.SOLVER_FAILED, what, budget,
          "[" + WavemarkException.num(lo) + ", " + WavemarkException.num(hi) + "]");
    }
  }
}
