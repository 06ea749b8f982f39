/**
 * JMH benchmarks of the physics core, outside the test run. Run them with the command in
 * {@link dev.wavemark.bench.GasBenchmark}.
 */
@NullMarked
package dev.wavemark.bench;

import org.jspecify.annotations.NullMarked;
