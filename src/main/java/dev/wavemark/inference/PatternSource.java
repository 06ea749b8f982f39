package dev.wavemark.inference;

import dev.wavemark.core.model.BodyShape;
import dev.wavemark.core.model.ExpectedWave;
import java.util.List;

/**
 * The waves theory says a model makes at a freestream Mach number, placed in the picture: in
 * production {@code core.model.WavePattern.of}; tests may supply their own.
 */
@FunctionalInterface
interface PatternSource {
  List<ExpectedWave> of(BodyShape shape, double mach, double gamma, double flowDirectionRad, int widthPx, int heightPx);
}
