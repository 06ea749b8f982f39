package dev.wavemark.cli.theory;

import dev.wavemark.core.gas.Profile;
import dev.wavemark.core.gas.ShockExpansion;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.jspecify.annotations.Nullable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** {@code theory shock-expansion}: shock-expansion theory on a 2D body of straight segments. */
@Command(name = "shock-expansion", mixinStandardHelpOptions = true,
    description = {"Shock-expansion theory for a 2D profile of straight segments, with Ackeret's",
        "linear theory beside it. Body axes: x along the chord, y up; moments about the leading",
        "edge, nose-up positive; wave directions in degrees from the freestream.",
        "  --shape diamond|wedge|flat-plate [--half-angle DEG] [--afterbody L]",
        "  --upper X,Y X,Y ... --lower X,Y X,Y ...   any polygon (leading edge first)",
        "  --mach M: panels, waves and coefficients; --mach-range R: CSV of the coefficients"})
final class ShockExpansionCommand extends Relation {
  @Mixin MachOptions machs;

  @Option(names = {"-a", "--alpha"}, defaultValue = "0", paramLabel = "DEG", description = "Angle of attack, degrees (default 0).")
  double alphaDeg;

  @Option(names = "--shape", paramLabel = "SHAPE", description = "diamond, wedge or flat-plate.")
  @Nullable String shape;

  @Option(names = "--half-angle", paramLabel = "DEG", description = "Half-angle of the diamond or wedge, degrees.")
  @Nullable Double halfAngleDeg;

  @Option(names = "--afterbody", defaultValue = "0", paramLabel = "L",
      description = "Wedge only: flat afterbody behind the shoulders, in wedge lengths (default 0).")
  double afterbody;

  @Option(names = "--upper", arity = "2..*", paramLabel = "X,Y", description = "Upper-surface points, leading edge first.")
  @Nullable List<String> upper;

  @Option(names = "--lower", arity = "2..*", paramLabel = "X,Y", description = "Lower-surface points, leading edge first.")
  @Nullable List<String> lower;

  @Override
  Result compute() {
    Profile profile = profile();
    double alpha = rad(alphaDeg);
    if (machs.range != null) {
      if (machs.mach != null) {
        throw usage("give either --mach or --mach-range, not both");
      }
      List<Values> rows = new ArrayList<>();
      for (double m : machs.range.values()) {
        ShockExpansion.Solution s = ShockExpansion.solve(profile, m, alpha, gamma);
        rows.add(new Values().put("mach", "M", m).putDeg("alphaDeg", "alpha (deg)", alpha).putAll(coefficients(s)));
      }
      return new Result.Table("Shock-expansion coefficients", rows);
    }
    if (machs.mach == null) {
      throw usage("give --mach M or --mach-range FROM:TO:STEP");
    }
    ShockExpansion.Solution s = ShockExpansion.solve(profile, machs.mach, alpha, gamma);
    Values v = new Values().put("mach", "M", machs.mach).putDeg("alphaDeg", "alpha (deg)", alpha)
        .put("chord", "chord", profile.chord()).putAll(coefficients(s));
    for (ShockExpansion.Panel p : s.upper()) {
      v.putAll(panel(p));
    }
    for (ShockExpansion.Panel p : s.lower()) {
      v.putAll(panel(p));
    }
    for (ShockExpansion.VertexWave w : s.waves()) {
      v.putAll(wave(key(w.surface(), "Wave", w.vertexIndex()), w));
    }
    if (s.trailingEdge() instanceof ShockExpansion.Sharp sh) {
      v.putAll(wave("trailingUpper", sh.upperWave())).putAll(wave("trailingLower", sh.lowerWave()))
          .putDeg("wakeDirectionDeg", "wake slip line from the freestream (deg)", sh.slipLine().directionRad())
          .put("wakePressureRatio", "wake pressure p/p_inf", sh.slipLine().pressureRatio());
    } else if (s.trailingEdge() instanceof ShockExpansion.Blunt b) {
      v.put("baseHeight", "blunt base height (base pressure not modelled)", b.baseHeight());
    }
    return new Result.Point("Shock-expansion theory", v);
  }

  private Profile profile() {
    if (upper != null || lower != null) {
      if (upper == null || lower == null || shape != null || halfAngleDeg != null) {
        throw usage("a polygon needs both --upper and --lower, and no --shape or --half-angle");
      }
      return new Profile(points(upper), points(lower));
    }
    String sh = shape == null ? "diamond" : shape;
    if (sh.equals("flat-plate")) {
      return Profile.flatPlate(1);
    }
    if (halfAngleDeg == null) {
      throw usage("--shape " + sh + " needs --half-angle DEG");
    }
    return switch (sh) {
      case "diamond" -> Profile.diamond(rad(halfAngleDeg), 1);
      case "wedge" -> Profile.wedge(rad(halfAngleDeg), 1, afterbody);
      default -> throw usage("unknown --shape '" + sh + "'; expected diamond, wedge or flat-plate");
    };
  }

  private List<Profile.Vertex> points(List<String> texts) {
    List<Profile.Vertex> pts = new ArrayList<>();
    for (String t : texts) {
      String[] xy = t.split(",");
      try {
        if (xy.length != 2) {
          throw new NumberFormatException();
        }
        pts.add(new Profile.Vertex(Double.parseDouble(xy[0].trim()), Double.parseDouble(xy[1].trim())));
      } catch (NumberFormatException e) {
        throw usage("'" + t + "' is not a point X,Y (e.g. 0.5,0.04)");
      }
    }
    return pts;
  }

  private static Values coefficients(ShockExpansion.Solution s) {
    ShockExpansion.Coefficients c = s.coefficients();
    ShockExpansion.Coefficients l = s.linear();
    return new Values()
        .put("cl", "lift cl", c.cl()).put("cd", "wave drag cd", c.cd())
        .put("cmLeadingEdge", "cm about the leading edge (nose-up +)", c.cmLeadingEdge())
        .put("clAckeret", "cl, Ackeret", l.cl()).put("cdAckeret", "cd, Ackeret", l.cd())
        .put("cmLeadingEdgeAckeret", "cm about the leading edge, Ackeret", l.cmLeadingEdge());
  }

  private static String key(ShockExpansion.Surface s, String what, int i) {
    return (s == ShockExpansion.Surface.UPPER ? "upper" : "lower") + what + i;
  }

  private static Values panel(ShockExpansion.Panel p) {
    String k = key(p.surface(), "Panel", p.index());
    String label = p.surface().name().toLowerCase(Locale.ROOT) + " panel " + p.index();
    return new Values()
        .putDeg(k + "InclinationDeg", label + ": inclination in body axes (deg)", p.inclinationRad())
        .put(k + "Mach", label + ": M", p.mach())
        .put(k + "PressureRatio", label + ": p/p_inf", p.pressureRatio())
        .put(k + "Cp", label + ": Cp", p.cp())
        .put(k + "CpAckeret", label + ": Cp, Ackeret", p.cpLinear());
  }

  private static Values wave(String k, ShockExpansion.VertexWave w) {
    String label = (k.startsWith("trailing") ? "trailing edge, " : "")
        + w.surface().name().toLowerCase(Locale.ROOT) + " vertex " + w.vertexIndex();
    return new Values()
        .put(k + "Kind", label + ": wave", w.turn().kind().name().toLowerCase(Locale.ROOT).replace('_', '-'))
        .putDeg(k + "TurnDeg", label + ": turn (deg, - = expansion)", w.turn().compressionRad())
        .putDeg(k + "HeadAngleDeg", label + ": head angle to upstream flow (deg)", w.turn().headAngleRad())
        .putDeg(k + "TailAngleDeg", label + ": tail angle to downstream flow (deg)", w.turn().tailAngleRad())
        .putDeg(k + "HeadDirectionDeg", label + ": head direction from the freestream (deg)", w.headDirectionFreestreamRad())
        .putDeg(k + "TailDirectionDeg", label + ": tail direction from the freestream (deg)", w.tailDirectionFreestreamRad());
  }
}
