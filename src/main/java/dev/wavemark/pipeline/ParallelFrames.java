package dev.wavemark.pipeline;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorCompletionService;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.ThreadFactory;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.IntFunction;

/**
 * Runs one task per frame on a fixed pool, with at most {@code 2 x threads} frames in flight, so
 * that memory stays bounded however long the sequence (each task loads, analyses and drops its
 * own frame; only its small result is kept). Results come back in frame order.
 *
 * <p>A task must not throw for a bad frame (it returns an error entry instead); an exception that
 * escapes a task anyway is a bug and is rethrown after the pool is shut down.
 */
final class ParallelFrames {
  /** Told after each frame finishes. */
  interface Progress {
    void step();
  }

  private ParallelFrames() {}

  static <T> List<T> run(int count, int threads, IntFunction<T> task, Progress progress) {
    if (count == 0) {
      return List.of();
    }
    int n = Math.max(1, Math.min(threads, count));
    if (n == 1) {
      List<T> out = new ArrayList<>(count);
      for (int i = 0; i < count; i++) {
        out.add(task.apply(i));
        progress.step();
      }
      return out;
    }
    ExecutorService pool = Executors.newFixedThreadPool(n, daemonThreads());
    try {
      ExecutorCompletionService<Indexed<T>> done = new ExecutorCompletionService<>(pool);
      List<T> out = new ArrayList<>(Collections.nCopies(count, null));
      int window = 2 * n;
      int submitted = 0;
      int finished = 0;
      while (finished < count) {
        while (submitted < count && submitted - finished < window) {
          int i = submitted++;
          done.submit(() -> new Indexed<>(i, task.apply(i)));
        }
        Future<Indexed<T>> f = done.take();
        Indexed<T> r = f.get();
        out.set(r.index, r.value);
        finished++;
        progress.step();
      }
      return out;
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
      throw new IllegalStateException("interrupted while analysing frames", e);
    } catch (ExecutionException e) {
      Throwable c = e.getCause();
      if (c instanceof RuntimeException re) {
        throw re;
      }
      if (c instanceof Error er) {
        throw er;
      }
      throw new IllegalStateException(c);
    } finally {
      pool.shutdownNow();
    }
  }

  private record Indexed<T>(int index, T value) {}

  private static ThreadFactory daemonThreads() {
    AtomicInteger k = new AtomicInteger();
    return r -> {
      Thread t = new Thread(r, "wavemark-frame-" + k.incrementAndGet());
      t.setDaemon(true);
      return t;
    };
  }
}
