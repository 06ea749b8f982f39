package dev.wavemark.bench;

import dev.wavemark.core.gas.ConicalFlow;
import dev.wavemark.core.gas.ObliqueShock;
import dev.wavemark.core.gas.PrandtlMeyer;
import dev.wavemark.core.gas.ShockBranch;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Average time per call of the relations with speed targets: beta(M, theta) &le; 2 us,
 * M(beta, theta) &le; 0.5 us, nu^-1 &le; 2 us, conical shock angle &le; 200 us, its inverse &le; 2 ms.
 * Inputs cycle through a small set so that no call is constant-folded.
 *
 * <p>Run (one fork, short):
 * <pre>
 * mvn -q test-compile exec:exec -Dexec.executable=java -Dexec.classpathScope=test \
 *   -Dexec.args="-cp %classpath org.openjdk.jmh.Main dev.wavemark.bench -f 1 -wi 3 -i 5 -w 1s -r 1s"
 * </pre>
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Fork(1)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
public class GasBenchmark {
  private static final double[] MACHS = {1.3, 1.8, 2.0, 2.5, 3.2, 4.0, 6.0, 9.0};
  private static final double[] THETAS = {0.03, 0.08, 0.12, 0.15, 0.18, 0.2, 0.1, 0.05};
  private final ConicalFlow cone = ConicalFlow.of(1.4);
  private final double[] betas = new double[MACHS.length];
  private final double[] nus = new double[MACHS.length];
  private final double[] coneShocks = new double[MACHS.length];
  private int i;

  public GasBenchmark() {
    for (int k = 0; k < MACHS.length; k++) {
      betas[k] = ObliqueShock.beta(MACHS[k], THETAS[k], ShockBranch.WEAK, 1.4);
      nus[k] = PrandtlMeyer.nu(MACHS[k], 1.4);
      coneShocks[k] = cone.shockAngle(MACHS[k], THETAS[k]);
    }
  }

  private int next() {
    i = (i + 1) & 7;
    return i;
  }

  @Benchmark
  public double betaFromMachAndDeflection() {
    int k = next();
    return ObliqueShock.beta(MACHS[k], THETAS[k], ShockBranch.WEAK, 1.4);
  }

  @Benchmark
  public double machFromShockAndDeflection() {
    int k = next();
    return ObliqueShock.machFromAngles(betas[k], THETAS[k], 1.4);
  }

  @Benchmark
  public double inversePrandtlMeyer() {
    return PrandtlMeyer.inverse(nus[next()], 1.4);
  }

  @Benchmark
  public double conicalShockAngle() {
    int k = next();
    return cone.shockAngle(MACHS[k], THETAS[k]);
  }

  @Benchmark
  public double machFromConicalShock() {
    int k = next();
    return cone.machFromShockAngle(coneShocks[k], THETAS[k]);
  }
}
