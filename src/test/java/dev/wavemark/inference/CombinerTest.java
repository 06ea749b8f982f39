package dev.wavemark.inference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.wavemark.core.model.Side;
import dev.wavemark.core.model.WaveKind;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.Test;

/**
 * The combination and its consistency test. With independent estimates the weighted mean and
 * its uncertainty are Taylor's (An Introduction to Error Analysis, 2nd ed., sec. 7.2); the test
 * statistic is then the familiar sum of squared residuals over variances with n - 1 degrees of freedom.
 */
class CombinerTest {
  private static final Combiner.Describer TEXT = new Combiner.Describer() {
    @Override
    public String describe(BudgetLine.Source source, int count, double in) {
      return source.code();
    }

    @Override
    public String unit(BudgetLine.Source source) {
      return "rad";
    }
  };

  /** An estimate with one own input (index i) of unit sensitivity and, optionally, a shared gamma input. */
  private static Linear est(String name, double m, int i, double gammaSensitivity) {
    Map<Linear.Input, Double> s = new LinkedHashMap<>();
    s.put(Linear.Input.angle(i), 1.0);
    if (gammaSensitivity != 0) {
      s.put(Linear.Input.GAMMA, gammaSensitivity);
    }
    return new Linear(name, MachEstimate.Method.THETA_BETA_M, WaveKind.OBLIQUE_SHOCK, Optional.of(Side.UPPER), List.of(i), m, s);
  }

  private static Combiner.Combined combine(List<Linear> e, double angleSigma, double gammaSigma) {
    return Combiner.combine(e, in -> in.source() == BudgetLine.Source.GAMMA ? gammaSigma : angleSigma, 0.01, true, TEXT)
        .orElseThrow();
  }

  @Test
  void independentEstimatesGiveTheInverseVarianceMean() {
    Combiner.Combined c = combine(List.of(est("a", 2.000, 0, 0), est("b", 2.002, 1, 0)), 0.002, 0);
    assertEquals(2.001, c.mach().value(), 1e-12);
    assertEquals(0.002 / Math.sqrt(2), c.mach().uncertainty(), 1e-12);
    assertEquals(0.5, c.consistency().chiSquare(), 1e-9, "two residuals of 0.001 over sigma 0.002");
    assertEquals(1, c.consistency().degreesOfFreedom());
    assertTrue(c.consistency().consistent());
  }

  @Test
  void oneShiftedEstimateIsNamed() {
    List<Linear> e = new ArrayList<>();
    e.add(est("oblique-shock upper leading-edge", 2.000, 0, 0));
    e.add(est("oblique-shock lower leading-edge", 2.001, 1, 0));
    e.add(est("expansion-head upper shoulder", 1.999, 2, 0));
    e.add(est("expansion-tail upper shoulder", 2.060, 3, 0));
    Combiner.Combined c = combine(e, 0.005, 0);
    assertFalse(c.consistency().consistent());
    assertEquals(List.of("expansion-tail upper shoulder"), c.consistency().disagreeing());
    assertTrue(c.consistency().birgeRatio() > 1);
    // The Birge-ratio scaling is a budget line, so the budget still adds up.
    assertEquals(c.mach().uncertainty(), BudgetLine.total(c.budget()), 1e-12);
    assertTrue(c.budget().stream().anyMatch(l -> l.source() == BudgetLine.Source.SCATTER));
  }

  @Test
  void aSharedInputCannotExplainADifference() {
    // Both estimates move together with gamma (sigma 0.01 in M); their own parts are 1e-4.
    // A 1e-3 difference is ten own sigmas: inconsistent, although each total sigma is 0.01.
    Combiner.Combined c = combine(List.of(est("a", 2.000, 0, 1), est("b", 2.001, 1, 1)), 1e-4, 0.01);
    assertFalse(c.consistency().consistent(), c.consistency().toString());
    Combiner.Combined same = combine(List.of(est("a", 2.000, 0, 1), est("b", 2.0001, 1, 1)), 1e-4, 0.01);
    assertTrue(same.consistency().consistent(), same.consistency().toString());
    // The common part does not average down.
    double gammaLine = same.budget().stream().filter(l -> l.source() == BudgetLine.Source.GAMMA).findFirst().orElseThrow().machContribution();
    assertEquals(0.01, gammaLine, 1e-12);
  }

  @Test
  void weightsSumToOne() {
    Combiner.Combined c = combine(List.of(est("a", 2.0, 0, 0), est("b", 2.0, 1, 0), est("c", 2.0, 2, 0.5)), 0.003, 0.002);
    assertEquals(1.0, c.estimates().stream().mapToDouble(MachEstimate::weight).sum(), 1e-12);
  }
}
