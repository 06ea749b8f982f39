package dev.wavemark.cli.theory;

import java.util.List;

/** What a relation produced: one evaluation, or a table of them (one row per evaluation). */
sealed interface Result {
  /** One evaluation, with a one-line title for the human-readable form. */
  record Point(String title, Values values) implements Result {}

  /** Rows of the same keys, e.g. over a Mach range; written as CSV by default. */
  record Table(String title, List<Values> rows) implements Result {}
}
