package dev.wavemark.core.gas;

/**
 * A slow, obvious Taylor-Maccoll integration kept in test scope: classical fixed-step
 * fourth-order Runge-Kutta from the shock inwards, with the surface located by linear
 * interpolation of V_theta between the two steps that bracket its zero. The start state is
 * computed here from the normal-shock relations, independently of {@link TaylorMaccoll}.
 */
final class SlowConicalFlow {
  private SlowConicalFlow() {}

  static double coneAngle(double m, double beta, double gamma, int stepsPerRadian) {
    double mn2 = Math.pow(m * Math.sin(beta), 2);
    double rho = (gamma + 1) * mn2 / ((gamma - 1) * mn2 + 2);
    double delta = beta - Math.atan(Math.tan(beta) / rho);
    double m2n = Math.sqrt(((gamma - 1) * mn2 + 2) / (2 * gamma * mn2 - (gamma - 1)));
    double m2 = m2n / Math.sin(beta - delta);
    double v = 1 / Math.sqrt(2 / ((gamma - 1) * m2 * m2) + 1);
    double[] y = {v * Math.cos(beta - delta), -v * Math.sin(beta - delta)};
    double h = -1.0 / stepsPerRadian;
    double t = beta;
    while (t + h > 0) {
      double[] k1 = f(t, y, gamma);
      double[] k2 = f(t + h / 2, add(y, k1, h / 2), gamma);
      double[] k3 = f(t + h / 2, add(y, k2, h / 2), gamma);
      double[] k4 = f(t + h, add(y, k3, h), gamma);
      double[] next = new double[2];
      for (int i = 0; i < 2; i++) {
        next[i] = y[i] + h / 6 * (k1[i] + 2 * k2[i] + 2 * k3[i] + k4[i]);
      }
      if (next[1] >= 0) {
        // linear interpolation of V_theta to zero between t and t + h
        return t + h * (-y[1]) / (next[1] - y[1]);
      }
      y = next;
      t += h;
    }
    return 0;
  }

  private static double[] f(double t, double[] y, double gamma) {
    double vr = y[0];
    double vt = y[1];
    double a = 0.5 * (gamma - 1) * (1 - vr * vr - vt * vt);
    return new double[] {vt, (vt * vt * vr - a * (2 * vr + vt / Math.tan(t))) / (a - vt * vt)};
  }

  private static double[] add(double[] y, double[] k, double s) {
    return new double[] {y[0] + s * k[0], y[1] + s * k[1]};
  }
}
