package dev.wavemark.cli.theory;

import dev.wavemark.core.gas.Gas;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.function.DoubleFunction;
import org.jspecify.annotations.Nullable;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/**
 * The base of every {@code wavemark theory} subcommand. A subclass declares its options, and
 * {@link #compute()} returns a {@link Result}; printing (text, {@code --json}, CSV) is shared.
 *
 * <p>To add a relation: write a subclass annotated with
 * {@code @Command(name = "...", mixinStandardHelpOptions = true, description = ...)} and list it
 * in {@link TheoryCommand}'s {@code subcommands}. Angles on the command line are in degrees;
 * convert with {@link Math#toRadians} before calling {@code core.gas}.
 */
abstract class Relation implements Callable<Integer> {
  @Spec CommandSpec spec;

  @Mixin Output output;

  @Option(names = {"-g", "--gamma"}, defaultValue = "1.4", paramLabel = "GAMMA",
      description = "Ratio of specific heats (default ${DEFAULT-VALUE}).")
  double gamma;

  /** Computes the relation for the parsed options. Domain failures throw WavemarkException. */
  abstract Result compute();

  @Override
  public final Integer call() {
    Gas.check(gamma);
    Result r = compute();
    output.write(spec.commandLine().getOut(), spec.name(), gamma, r);
    return 0;
  }

  /** A usage error (exit 2): the options given do not select one form of the relation. */
  final ParameterException usage(String message) {
    return new ParameterException(spec.commandLine(), message);
  }

  /**
   * The common shape of a Mach-driven relation: one point for {@code --mach}, a table for
   * {@code --mach-range}; exactly one of the two must be given.
   */
  final Result pointOrTable(
      String title, @Nullable Double mach, @Nullable MachRange range, DoubleFunction<Values> at) {
    if (mach != null && range != null) {
      throw usage("give either --mach or --mach-range, not both");
    }
    if (mach != null) {
      return new Result.Point(title, at.apply(mach));
    }
    if (range != null) {
      List<Values> rows = new ArrayList<>();
      for (double m : range.values()) {
        rows.add(at.apply(m));
      }
      return new Result.Table(title, rows);
    }
    throw usage("give --mach M or --mach-range FROM:TO:STEP");
  }

  /** Degrees from the command line to radians. */
  static double rad(double deg) {
    return Math.toRadians(deg);
  }
}
