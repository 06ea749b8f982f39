package dev.wavemark.core.gas;

/**
 * Slow, obvious versions of the oblique-shock and Prandtl-Meyer inversions, kept in test scope to
 * check the closed forms of {@code core.gas}. Deliberately independent: the deflection comes from
 * continuity of the normal velocity, tan(beta - theta) = tan(beta) (rho1/rho2) (NACA Report 1135
 * eqs. 128-132), not from the theta-beta-M formula; roots come from plain bisection and the
 * maximum deflection from golden-section search.
 */
final class SlowGas {
  private static final int BISECTIONS = 200;

  private SlowGas() {}

  /** theta(M, beta) from the density ratio of the normal Mach component. */
  static double theta(double m, double beta, double gamma) {
    double mn2 = Math.pow(m * Math.sin(beta), 2);
    double densityRatio = (gamma + 1) * mn2 / ((gamma - 1) * mn2 + 2);
    return beta - Math.atan(Math.tan(beta) / densityRatio);
  }

  /** The shock angle maximising theta, by golden-section search on [mu, pi/2]. */
  static double betaAtMax(double m, double gamma) {
    double a = Math.asin(1 / m);
    double b = 0.5 * Math.PI;
    double g = (Math.sqrt(5) - 1) / 2;
    for (int i = 0; i < BISECTIONS && b - a > 1e-15; i++) {
      double c = b - g * (b - a);
      double d = a + g * (b - a);
      if (theta(m, c, gamma) > theta(m, d, gamma)) {
        b = d;
      } else {
        a = c;
      }
    }
    return 0.5 * (a + b);
  }

  static double thetaMax(double m, double gamma) {
    return theta(m, betaAtMax(m, gamma), gamma);
  }

  /** beta(M, theta) by bisection on the weak [mu, beta*] or strong [beta*, pi/2] interval. */
  static double beta(double m, double theta, ShockBranch branch, double gamma) {
    double star = betaAtMax(m, gamma);
    double lo = branch == ShockBranch.WEAK ? Math.asin(1 / m) : star;
    double hi = branch == ShockBranch.WEAK ? star : 0.5 * Math.PI;
    // theta rises on the weak interval and falls on the strong one
    double sign = branch == ShockBranch.WEAK ? 1 : -1;
    for (int i = 0; i < BISECTIONS; i++) {
      double mid = 0.5 * (lo + hi);
      if (sign * (theta(m, mid, gamma) - theta) < 0) {
        lo = mid;
      } else {
        hi = mid;
      }
    }
    return 0.5 * (lo + hi);
  }

  /** M(beta, theta) by bisection: at fixed beta, theta rises with M from 0 at M = 1/sin(beta). */
  static double mach(double beta, double theta, double gamma) {
    double lo = 1 / Math.sin(beta);
    double hi = lo;
    while (theta(hi, beta, gamma) < theta) {
      hi *= 2;
    }
    for (int i = 0; i < BISECTIONS; i++) {
      double mid = 0.5 * (lo + hi);
      if (theta(mid, beta, gamma) < theta) {
        lo = mid;
      } else {
        hi = mid;
      }
    }
    return 0.5 * (lo + hi);
  }

  /** nu^-1 by bisection on nu(M) written with atan2 forms, over [1, 1e8]. */
  static double nuInverse(double nu, double gamma) {
    double lo = 1;
    double hi = 1e8;
    for (int i = 0; i < BISECTIONS; i++) {
      double mid = 0.5 * (lo + hi);
      if (nuSlow(mid, gamma) < nu) {
        lo = mid;
      } else {
        hi = mid;
      }
    }
    return 0.5 * (lo + hi);
  }

  /** nu(M) as the integral form's closed result, written with acos (an equivalent, independent form). */
  static double nuSlow(double m, double gamma) {
    double k = Math.sqrt((gamma + 1) / (gamma - 1));
    double s = Math.sqrt(m * m - 1);
    // atan(x) = asin(x / sqrt(1 + x^2)); and atan(s) = acos(1/M)
    return k * Math.asin((s / k) / Math.sqrt(1 + s * s / (k * k))) - Math.acos(1 / m);
  }
}
