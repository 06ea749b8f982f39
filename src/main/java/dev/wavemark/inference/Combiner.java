package dev.wavemark.inference;

import dev.wavemark.core.numeric.Measured;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.function.ToDoubleFunction;
import org.hipparchus.distribution.continuous.ChiSquaredDistribution;
import org.hipparchus.linear.MatrixUtils;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.linear.SingularValueDecomposition;

/**
 * Combines linearised estimates into one Mach number with its budget and consistency test.
 *
 * <p>The covariance of the estimates is C = J S J^T, with J the sensitivities and S the input
 * variances (linear propagation, GUM JCGM 100:2008 sec. 5.2, from memory). The combined value
 * is the mean weighted by 1/C_ii (always positive weights, unlike generalised least squares when
 * estimates are strongly correlated), and its variance w^T C w is the exact propagation of every
 * input through that mean, so the budget lines add in quadrature to it. The consistency test is
 * the chi-square of the residuals r = M - M_hat with their own covariance (I - 1 w^T) C (I - 1 w^T)^T
 * through its pseudo-inverse (Hipparchus' SVD), with degrees of freedom its rank. When it fails,
 * the estimate with the largest standardised residual is named and set aside and the rest tested
 * again, until the rest agree (or two remain, both named).
 */
final class Combiner {
  private Combiner() {}

  record Combined(Measured mach, List<MachEstimate> estimates, Consistency consistency, List<BudgetLine> budget) {}

  /**
   * @param sigma each input's standard uncertainty
   * @param alpha the test level: inconsistent when the chi-square's p-value falls below it
   * @param describe text for each budget source
   */
  static Optional<Combined> combine(List<Linear> est, ToDoubleFunction<Linear.Input> sigma, double alpha,
      boolean scaleByBirge, Describer describe) {
    int n = est.size();
    if (n == 0) {
      return Optional.empty();
    }
    List<Linear.Input> inputs = new ArrayList<>(new LinkedHashSet<>(est.stream().flatMap(e -> e.sensitivity().keySet().stream()).toList()));
    int m = inputs.size();
    double[][] j = new double[n][m];
    double[] s = new double[m];
    for (int b = 0; b < m; b++) {
      s[b] = sigma.applyAsDouble(inputs.get(b));
      for (int a = 0; a < n; a++) {
        j[a][b] = est.get(a).sensitivity().getOrDefault(inputs.get(b), 0.0);
      }
    }
    double[][] c = new double[n][n];
    for (int a = 0; a < n; a++) {
      for (int b = 0; b < n; b++) {
        double sum = 0;
        for (int k = 0; k < m; k++) {
          sum += j[a][k] * j[b][k] * s[k] * s[k];
        }
        c[a][b] = sum;
      }
    }
    double[] w = weights(c);
    double mean = 0;
    for (int a = 0; a < n; a++) {
      mean += w[a] * est.get(a).mach();
    }
    double[] g = new double[m];
    for (int k = 0; k < m; k++) {
      for (int a = 0; a < n; a++) {
        g[k] += w[a] * j[a][k];
      }
    }
    Consistency cons = consistency(est, c, alpha);
    List<BudgetLine> budget = budget(inputs, g, s, describe);
    double u = BudgetLine.total(budget);
    if (scaleByBirge && cons.birgeRatio() > 1 && Double.isFinite(cons.birgeRatio())) {
      double r = cons.birgeRatio();
      budget.add(new BudgetLine(BudgetLine.Source.SCATTER,
          String.format(Locale.ROOT, "scatter between %d estimates beyond their uncertainties (Birge ratio %.2f)", n, r),
          r, "Birge ratio", u * Math.sqrt(r * r - 1)));
      u = BudgetLine.total(budget);
    }
    List<MachEstimate> out = new ArrayList<>();
    for (int a = 0; a < n; a++) {
      Linear e = est.get(a);
      out.add(new MachEstimate(e.from(), e.method(), e.kind(), e.side(), e.observed(),
          new Measured(e.mach(), Math.sqrt(Math.max(0, c[a][a]))), w[a]));
    }
    return Optional.of(new Combined(new Measured(mean, u), out, cons, budget));
  }

  /** Text for the budget lines. */
  interface Describer {
    String describe(BudgetLine.Source source, int count, double inputUncertainty);

    String unit(BudgetLine.Source source);
  }

  /** Inverse-variance weights; estimates with zero variance share the weight equally. */
  static double[] weights(double[][] c) {
    int n = c.length;
    double[] w = new double[n];
    int exact = 0;
    for (int a = 0; a < n; a++) {
      if (!(c[a][a] > 0)) {
        exact++;
      }
    }
    double sum = 0;
    for (int a = 0; a < n; a++) {
      w[a] = exact > 0 ? (c[a][a] > 0 ? 0 : 1) : 1 / c[a][a];
      sum += w[a];
    }
    for (int a = 0; a < n; a++) {
      w[a] /= sum;
    }
    return w;
  }

  private static Consistency consistency(List<Linear> est, double[][] c, double alpha) {
    int n = est.size();
    if (n < 2) {
      return Consistency.UNTESTED;
    }
    List<Integer> all = new ArrayList<>();
    for (int i = 0; i < n; i++) {
      all.add(i);
    }
    Test t = test(est, c, all);
    boolean ok = t.p >= alpha;
    List<String> bad = new ArrayList<>();
    if (!ok) {
      // Name the culprits one at a time: the worst standardised residual goes, and the rest is
      // tested again, so that one far-off estimate does not drag every other one into the list.
      List<Integer> rest = new ArrayList<>(all);
      Test cur = t;
      while (cur.p < alpha && rest.size() > 2) {
        int worst = cur.worst;
        bad.add(est.get(rest.get(worst)).from());
        rest.remove(worst);
        cur = test(est, c, rest);
      }
      if (cur.p < alpha && rest.size() == 2) {
        // Two that disagree: nothing says which one is wrong.
        rest.forEach(i -> bad.add(est.get(i).from()));
      }
    }
    return new Consistency(t.chi2, t.dof, Math.sqrt(t.chi2 / t.dof), t.p, ok, bad);
  }

  private record Test(double chi2, int dof, double p, int worst) {}

  /**
   * The chi-square test of the estimates {@code idx}: residuals about their inverse-variance mean
   * with the residuals' own covariance (I - 1 w^T) C (I - 1 w^T)^T through its pseudo-inverse, with
   * degrees of freedom its rank; and the position in {@code idx} of the largest standardised residual.
   */
  private static Test test(List<Linear> est, double[][] cAll, List<Integer> idx) {
    int n = idx.size();
    double[][] c = new double[n][n];
    for (int a = 0; a < n; a++) {
      for (int b = 0; b < n; b++) {
        c[a][b] = cAll[idx.get(a)][idx.get(b)];
      }
    }
    double[] w = weights(c);
    double mean = 0;
    for (int a = 0; a < n; a++) {
      mean += w[a] * est.get(idx.get(a)).mach();
    }
    double[][] a = new double[n][n];
    for (int i = 0; i < n; i++) {
      for (int k = 0; k < n; k++) {
        a[i][k] = (i == k ? 1 : 0) - w[k];
      }
    }
    RealMatrix am = MatrixUtils.createRealMatrix(a);
    RealMatrix cov = am.multiply(MatrixUtils.createRealMatrix(c)).multiplyTransposed(am);
    double[] r = new double[n];
    for (int i = 0; i < n; i++) {
      r[i] = est.get(idx.get(i)).mach() - mean;
    }
    double scale = 0;
    for (int i = 0; i < n; i++) {
      scale = Math.max(scale, cov.getEntry(i, i));
    }
    double chi2;
    int dof;
    if (scale == 0) {
      // Exact estimates: consistent only if they coincide to rounding.
      double maxR = 0;
      for (double x : r) {
        maxR = Math.max(maxR, Math.abs(x));
      }
      chi2 = maxR <= 1e-9 * Math.abs(mean) ? 0 : Double.POSITIVE_INFINITY;
      dof = n - 1;
    } else {
      SingularValueDecomposition svd = new SingularValueDecomposition(cov);
      double[] sv = svd.getSingularValues();
      double tol = 1e-10 * sv[0];
      dof = 0;
      for (double v : sv) {
        if (v > tol) {
          dof++;
        }
      }
      RealMatrix u = svd.getU();
      chi2 = 0;
      for (int k = 0; k < dof; k++) {
        double proj = 0;
        for (int i = 0; i < n; i++) {
          proj += u.getEntry(i, k) * r[i];
        }
        chi2 += proj * proj / sv[k];
      }
      dof = Math.max(dof, 1);
    }
    double p = Double.isInfinite(chi2) ? 0 : 1 - new ChiSquaredDistribution(dof).cumulativeProbability(chi2);
    int worst = 0;
    double worstZ = -1;
    for (int i = 0; i < n; i++) {
      double v = cov.getEntry(i, i);
      double z = v > 0 ? Math.abs(r[i]) / Math.sqrt(v) : (r[i] == 0 ? 0 : Double.POSITIVE_INFINITY);
      if (z > worstZ) {
        worstZ = z;
        worst = i;
      }
    }
    return new Test(chi2, dof, p, worst);
  }

  private static List<BudgetLine> budget(List<Linear.Input> inputs, double[] g, double[] s, Describer d) {
    List<BudgetLine> lines = new ArrayList<>();
    for (BudgetLine.Source src : List.of(BudgetLine.Source.ANGLE_FIT, BudgetLine.Source.FLOW_DIRECTION,
        BudgetLine.Source.MODEL_ANGLE, BudgetLine.Source.GAMMA, BudgetLine.Source.STANDOFF, BudgetLine.Source.NOSE_RADIUS,
        BudgetLine.Source.CORRELATION, BudgetLine.Source.FAN_LOCATOR)) {
      if (inputs.stream().noneMatch(in -> in.source() == src)) {
        // a source no estimate depends on has no line (a bow shock's run has no angle fit, flow
        // direction or model angle; a run without a fan no fan-locator line)
        continue;
      }
      double sumSq = 0;
      double sumIn = 0;
      int count = 0;
      for (int k = 0; k < inputs.size(); k++) {
        if (inputs.get(k).source() == src) {
          sumSq += g[k] * g[k] * s[k] * s[k];
          sumIn += s[k] * s[k];
          count++;
        }
      }
      double in = count == 0 ? 0 : Math.sqrt(sumIn / count);
      lines.add(new BudgetLine(src, d.describe(src, count, in), in, d.unit(src), Math.sqrt(sumSq)));
    }
    return lines;
  }
}
