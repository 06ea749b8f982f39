package dev.wavemark.inference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.wavemark.core.model.Tunnel;
import dev.wavemark.core.numeric.Measured;
import java.util.Optional;
import org.junit.jupiter.api.Test;

/**
 * The tunnel check against published pitot values. NACA Report 1135, Table I at M = 2.00:
 * p/p0 = 0.1278; Table II at M1 = 2.00: p02/p01 = 0.7209 and p1/p02 = 0.1773 (from memory).
 */
class TunnelCheckTest {
  /** Four printed digits of the ratios move the Mach number by under 3e-4. */
  private static final double TABLE_TOL = 1e-3;
  private static final double P1 = 2.0e4;
  private static final double P02 = P1 / 0.1773;
  private static final double P01 = P02 / 0.7209;

  private static Tunnel tunnel(double p01, double p02, double p1) {
    return new Tunnel(Optional.of(2.0), Optional.of(0.02),
        Optional.of(new Tunnel.Pitot(Optional.of(p01), Optional.of(p02), Optional.of(p1))));
  }

  @Test
  void pitotReadingsOfTheTablesGiveMachTwoAndThePictureMachPasses() {
    TunnelCheck c = Inference.checkTunnel(tunnel(P01, P02, P1), 1.4, new Measured(2.005, 0.004));
    assertEquals(4, c.comparisons().size());
    for (TunnelCheck.Comparison k : c.comparisons()) {
      assertEquals(2.0, k.referenceMach().value(), TABLE_TOL, k.reference().code());
      assertEquals(TunnelCheck.Outcome.PASS, k.outcome(), k.toString());
    }
    TunnelCheck.Comparison nominal = c.comparisons().get(0);
    assertEquals(TunnelCheck.Reference.NOMINAL, nominal.reference());
    assertEquals(1.25, nominal.differenceInSigma(), 1e-9);
    assertTrue(c.passes());
  }

  @Test
  void aMachOutsideTheToleranceFails() {
    TunnelCheck c = Inference.checkTunnel(tunnel(P01, P02, P1), 1.4, new Measured(2.05, 0.004));
    assertFalse(c.passes());
    assertTrue(c.comparisons().stream().allMatch(k -> k.outcome() == TunnelCheck.Outcome.FAIL));
    assertEquals(12.5, c.comparisons().get(0).differenceInSigma(), 1e-9);
  }

  @Test
  void anImpossiblePitotReadingIsANoteNotAnException() {
    // A pitot pressure above the total pressure cannot come from a shock.
    TunnelCheck c = Inference.checkTunnel(tunnel(P02 * 0.9, P02, P1), 1.4, new Measured(2.0, 0.004));
    assertEquals(1, c.notes().size(), c.notes().toString());
    assertTrue(c.comparisons().stream().noneMatch(k -> k.reference() == TunnelCheck.Reference.PITOT_TOTAL));
  }

  @Test
  void withoutToleranceThereIsNoVerdict() {
    TunnelCheck c = Inference.checkTunnel(new Tunnel(Optional.of(2.0), Optional.empty(), Optional.empty()), 1.4, new Measured(2.1, 0.01));
    assertEquals(TunnelCheck.Outcome.NO_TOLERANCE, c.comparisons().get(0).outcome());
    assertFalse(c.passes());
  }
}
