package dev.wavemark.cli.theory;

import dev.wavemark.core.gas.Profile;
import dev.wavemark.core.gas.ShockExpansion;
import java.util.Locale;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code theory shock-expansion}: a 2D profile of straight panels, with Ackeret beside it. */
@Command(name = "shock-expansion", mixinStandardHelpOptions = true,
    description = {"Shock-expansion theory for a diamond, a wedge or a flat plate at incidence: each panel's",
        "Mach number, p/p_inf and Cp, and the lift, wave-drag and moment coefficients, with linear (Ackeret) theory."})
final class ShockExpansionCommand extends Relation {
  @Option(names = {"-m", "--mach"}, required = true, paramLabel = "M", description = "Freestream Mach number.")
  double mach;

  @Option(names = "--shape", defaultValue = "diamond", paramLabel = "SHAPE",
      description = "diamond, wedge or flat-plate (default ${DEFAULT-VALUE}).")
  String shape = "diamond";

  @Option(names = "--half-angle", defaultValue = "5", paramLabel = "DEG",
      description = "Half-angle at the leading edge, degrees (default ${DEFAULT-VALUE}; unused for a flat plate).")
  double halfAngleDeg;

  @Option(names = {"-a", "--alpha"}, defaultValue = "0", paramLabel = "DEG", description = "Angle of attack, degrees.")
  double alphaDeg;

  @Override
  Result compute() {
    Profile profile = switch (shape.toLowerCase(Locale.ROOT)) {
      case "diamond" -> Profile.diamond(rad(halfAngleDeg), 1);
      case "wedge" -> Profile.wedge(rad(halfAngleDeg), 1, 0);
      case "flat-plate" -> Profile.flatPlate(1);
      default -> throw usage("--shape must be diamond, wedge or flat-plate, got '" + shape + "'");
    };
    ShockExpansion.Solution s = ShockExpansion.solve(profile, mach, rad(alphaDeg), gamma);
    Values v = new Values().put("mach", "M", mach).put("shape", "shape", shape).putDeg("alphaDeg", "angle of attack (deg)", rad(alphaDeg));
    for (ShockExpansion.Panel p : s.upper()) {
      panel(v, "upper", p);
    }
    for (ShockExpansion.Panel p : s.lower()) {
      panel(v, "lower", p);
    }
    v.put("cl", "lift coefficient", s.coefficients().cl())
        .put("cd", "wave-drag coefficient", s.coefficients().cd())
        .put("cmLeadingEdge", "moment coefficient about the leading edge", s.coefficients().cmLeadingEdge())
        .put("clAckeret", "lift coefficient, Ackeret", s.linear().cl())
        .put("cdAckeret", "wave-drag coefficient, Ackeret", s.linear().cd());
    return new Result.Point("Shock-expansion theory", v);
  }

  private static void panel(Values v, String side, ShockExpansion.Panel p) {
    String k = side + p.index();
    v.put(k + "Mach", side + " panel " + p.index() + " Mach", p.mach())
        .put(k + "PressureRatio", side + " panel " + p.index() + " p/p_inf", p.pressureRatio())
        .put(k + "Cp", side + " panel " + p.index() + " Cp", p.cp());
  }
}
