package dev.wavemark.cli.theory;

import dev.wavemark.core.gas.BowShock;
import java.util.Locale;
import org.jspecify.annotations.Nullable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** {@code theory standoff}: Billig's bow-shock correlation and its inverse. */
@Command(name = "standoff", mixinStandardHelpOptions = true,
    description = {"Bow-shock stand-off ahead of a sphere or a cylinder: Billig's CORRELATION of measurements in air",
        "(J. Spacecraft Rockets 4, 1967), valid for gamma = 1.4 and M in [1.2, 20].",
        "  --mach M              delta/R and the shock's vertex radius Rc/R",
        "  --standoff-ratio D/R  the Mach number from a measured stand-off"})
final class StandoffCommand extends Relation {
  @Mixin MachOptions machs;

  @Option(names = "--nose", paramLabel = "SHAPE", defaultValue = "sphere",
      description = "sphere or cylinder (default ${DEFAULT-VALUE}).")
  String nose = "sphere";

  @Option(names = "--standoff-ratio", paramLabel = "D/R", description = "Measured stand-off distance over nose radius.")
  @Nullable Double ratio;

  @Override
  Result compute() {
    BowShock.Nose n = switch (nose.toLowerCase(Locale.ROOT)) {
      case "sphere" -> BowShock.Nose.SPHERE;
      case "cylinder" -> BowShock.Nose.CYLINDER;
      default -> throw usage("--nose must be sphere or cylinder, got '" + nose + "'");
    };
    if (ratio != null) {
      if (machs.given()) {
        throw usage("give either --standoff-ratio or --mach/--mach-range");
      }
      return new Result.Point("Mach number from the bow-shock stand-off (Billig correlation)",
          at(n, BowShock.machFromStandoff(n, ratio, gamma)));
    }
    return pointOrTable("Bow-shock stand-off (Billig correlation)", machs.mach, machs.range, m -> at(n, m));
  }

  private Values at(BowShock.Nose n, double m) {
    return new Values().put("nose", "nose", n.name().toLowerCase(Locale.ROOT)).put("mach", "M", m)
        .put("standoffRatio", "stand-off delta/R", BowShock.standoffRatio(n, m, gamma))
        .put("vertexRadiusRatio", "shock vertex radius Rc/R", BowShock.vertexRadiusRatio(n, m, gamma))
        .put("basis", "basis", "correlation (Billig 1967), M 1.2-20, air");
  }
}
