package dev.wavemark.core.gas;

import java.util.List;

/**
 * Integrates uniform panel pressures into force and moment coefficients. Each panel's pressure
 * pushes along its inward normal and acts at its mid-point (uniform pressure). Base pressure of a
 * blunt body is not modelled. Source: the panel form of the thin-airfoil force integrals, Anderson,
 * "Fundamentals of Aerodynamics", sec. 1.5 (from memory): cn = (1/c) sum(Cp_l - Cp_u) dx, and so on.
 */
final class PanelForces {
  private PanelForces() {}

  /** Coefficients for the given Cp of each upper and lower panel (same order as the profile). */
  static ShockExpansion.Coefficients integrate(Profile profile, double[] cpUpper, double[] cpLower, double alphaRad) {
    double[] acc = new double[3];
    add(profile.upper(), cpUpper, 1, profile.leadingEdge(), acc);
    add(profile.lower(), cpLower, -1, profile.leadingEdge(), acc);
    double c = profile.chord();
    double ca = acc[0] / c;
    double cn = acc[1] / c;
    double cm = -acc[2] / (c * c);
    double cl = cn * Math.cos(alphaRad) - ca * Math.sin(alphaRad);
    double cd = cn * Math.sin(alphaRad) + ca * Math.cos(alphaRad);
    return new ShockExpansion.Coefficients(cl, cd, cm, cn, ca);
  }

  /**
   * Adds one surface: for the upper surface (sign +1) the outward normal of a segment (dx, dy)
   * is (-dy, dx), so the force per unit dynamic pressure is -Cp (-dy, dx); the lower is mirrored.
   */
  private static void add(List<Profile.Vertex> pts, double[] cp, int sign, Profile.Vertex ref, double[] acc) {
    for (int i = 0; i + 1 < pts.size(); i++) {
      Profile.Vertex a = pts.get(i);
      Profile.Vertex b = pts.get(i + 1);
      double dx = b.x() - a.x();
      double dy = b.y() - a.y();
      double fx = sign * cp[i] * dy;
      double fy = -sign * cp[i] * dx;
      double xm = 0.5 * (a.x() + b.x()) - ref.x();
      double ym = 0.5 * (a.y() + b.y()) - ref.y();
      acc[0] += fx;
      acc[1] += fy;
      acc[2] += xm * fy - ym * fx;
    }
  }
}
