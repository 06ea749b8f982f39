package dev.wavemark.inference;

import dev.wavemark.core.model.ExpectedWave;
import dev.wavemark.core.model.Feature;
import dev.wavemark.core.model.Side;
import dev.wavemark.core.model.WaveKind;
import java.util.List;
import java.util.Optional;

/**
 * Names a theory wave across patterns predicted at different Mach numbers, gammas and model
 * angles: its kind, side, feature and its rank among waves sharing those three.
 */
record WaveKey(WaveKind kind, Side side, Feature feature, int ordinal) {

  static WaveKey of(List<ExpectedWave> pattern, int index) {
    ExpectedWave e = pattern.get(index);
    int ordinal = 0;
    for (int i = 0; i < index; i++) {
      ExpectedWave o = pattern.get(i);
      if (o.kind() == e.kind() && o.side() == e.side() && o.feature() == e.feature()) {
        ordinal++;
      }
    }
    return new WaveKey(e.kind(), e.side(), e.feature(), ordinal);
  }

  Optional<ExpectedWave> find(List<ExpectedWave> pattern) {
    int seen = 0;
    for (ExpectedWave o : pattern) {
      if (o.kind() == kind && o.side() == side && o.feature() == feature) {
        if (seen == ordinal) {
          return Optional.of(o);
        }
        seen++;
      }
    }
    return Optional.empty();
  }

  /** The estimate label, e.g. {@code oblique-shock upper leading-edge}. */
  String label() {
    // a bow shock spans both sides of its stagnation line; its pattern side is nominal
    String sideName = kind == WaveKind.BOW_SHOCK ? "" : side.contractName() + " ";
    return kind.contractName() + " " + sideName + feature.contractName() + (ordinal > 0 ? " #" + (ordinal + 1) : "");
  }
}
