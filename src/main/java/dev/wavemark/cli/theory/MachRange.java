package dev.wavemark.cli.theory;

import dev.wavemark.core.Problem;
import dev.wavemark.core.WavemarkException;
import java.util.ArrayList;
import java.util.List;
import picocli.CommandLine;

/**
 * A range of values FROM:TO:STEP given on the command line, e.g. {@code 1.5:5:0.25}; the end is
 * included when the steps land on it (within a millionth of a step).
 *
 * @param from first value
 * @param to last value, not below {@code from}
 * @param step positive step
 */
record MachRange(double from, double to, double step) {
  /** The most rows one table may have; a larger request is a typing error, not a chart. */
  static final int MAX_ROWS = 100_000;

  MachRange {
    if (!Double.isFinite(from) || !Double.isFinite(to) || !Double.isFinite(step)) {
      throw new WavemarkException(Problem.BAD_ARGUMENT, "range values must be finite numbers");
    }
    if (!(step > 0) || to < from) {
      throw new WavemarkException(Problem.BAD_ARGUMENT,
          "range " + from + ":" + to + ":" + step + " needs FROM <= TO and STEP > 0");
    }
    if ((to - from) / step > MAX_ROWS) {
      throw new WavemarkException(Problem.BAD_ARGUMENT,
          "range " + from + ":" + to + ":" + step + " has more than " + MAX_ROWS + " rows; use a larger STEP");
    }
  }

  /** The values of the range, computed as from + i*step to avoid accumulating rounding. */
  List<Double> values() {
    List<Double> v = new ArrayList<>();
    long n = (long) Math.floor((to - from) / step + 1e-6);
    for (long i = 0; i <= n; i++) {
      v.add(Math.min(to, from + i * step));
    }
    return v;
  }

  /** Parses FROM:TO:STEP (or FROM:TO, with 20 steps). */
  static final class Converter implements CommandLine.ITypeConverter<MachRange> {
    @Override
    public MachRange convert(String text) {
      String[] parts = text.split(":");
      if (parts.length < 2 || parts.length > 3) {
        throw new CommandLine.TypeConversionException("'" + text + "' is not a range FROM:TO:STEP, e.g. 1.5:5:0.25");
      }
      try {
        double from = Double.parseDouble(parts[0]);
        double to = Double.parseDouble(parts[1]);
        double step = parts.length == 3 ? Double.parseDouble(parts[2]) : (to - from) / 20;
        return new MachRange(from, to, step);
      } catch (NumberFormatException e) {
        throw new CommandLine.TypeConversionException("'" + text + "' is not a range FROM:TO:STEP of numbers");
      } catch (WavemarkException e) {
        throw new CommandLine.TypeConversionException(e.getMessage());
      }
    }
  }
}
