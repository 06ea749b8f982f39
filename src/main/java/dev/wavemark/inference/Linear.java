package dev.wavemark.inference;

import dev.wavemark.core.model.Side;
import dev.wavemark.core.model.WaveKind;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * A Mach estimate linearised about its inputs: its value and dM/dx for every input x it depends
 * on, from central differences.
 */
record Linear(
    String from, MachEstimate.Method method, WaveKind kind, Optional<Side> side, List<Integer> observed,
    double mach, Map<Linear.Input, Double> sensitivity) {

  /** An input of the budget: a source and, for angle fits and model angles, which one. */
  record Input(BudgetLine.Source source, int index) {
    static final Input FLOW = new Input(BudgetLine.Source.FLOW_DIRECTION, 0);
    static final Input GAMMA = new Input(BudgetLine.Source.GAMMA, 0);

    static Input angle(int observedIndex) {
      return new Input(BudgetLine.Source.ANGLE_FIT, observedIndex);
    }

    static final Input NOSE_RADIUS = new Input(BudgetLine.Source.NOSE_RADIUS, 0);
    static final Input CORRELATION = new Input(BudgetLine.Source.CORRELATION, 0);
    /** One offset added to the angle to the flow of every fan boundary of the frame. */
    static final Input FAN = new Input(BudgetLine.Source.FAN_LOCATOR, 0);

    static Input standoff(int observedIndex) {
      return new Input(BudgetLine.Source.STANDOFF, observedIndex);
    }

    static Input model(int k) {
      return new Input(BudgetLine.Source.MODEL_ANGLE, k);
    }
  }
}
