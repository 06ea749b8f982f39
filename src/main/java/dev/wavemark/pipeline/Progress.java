package dev.wavemark.pipeline;

import me.tongfei.progressbar.ConsoleProgressBarConsumer;
import me.tongfei.progressbar.ProgressBar;
import me.tongfei.progressbar.ProgressBarBuilder;
import me.tongfei.progressbar.ProgressBarStyle;
import org.jspecify.annotations.Nullable;

/**
 * The frames' progress bar on stderr (me.tongfei progressbar), or nothing: it is drawn only when
 * stderr is a terminal and {@code CI} is not {@code true}, so logs and pipes stay clean.
 */
final class Progress implements AutoCloseable {
  private final @Nullable ProgressBar bar;

  private Progress(@Nullable ProgressBar bar) {
    this.bar = bar;
  }

  /** True when a bar would be seen: a console is attached and this is not a CI run. */
  static boolean wanted() {
    return System.console() != null && !"true".equalsIgnoreCase(System.getenv("CI"));
  }

  static Progress of(boolean show, String task, int total) {
    if (!show || total < 2) {
      return new Progress(null);
    }
    String name = task.length() > 24 ? task.substring(0, 23) + "\u2026" : task;
    ProgressBar bar = new ProgressBarBuilder().setTaskName(name).setInitialMax(total).setUnit(" frames", 1)
        .setStyle(ProgressBarStyle.ASCII).setConsumer(new ConsoleProgressBarConsumer(System.err)).setUpdateIntervalMillis(200)
        .build();
    return new Progress(bar);
  }

  void step() {
    if (bar != null) {
      bar.step();
    }
  }

  @Override
  public void close() {
    if (bar != null) {
      bar.close();
    }
  }
}
