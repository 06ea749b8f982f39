/**
 * The {@code render} and {@code samples} commands: scene files to synthetic pictures with their
 * truth and run files, and the bundled sample set rebuilt from its seeds.
 */
@NullMarked
package dev.wavemark.cli.render;

import org.jspecify.annotations.NullMarked;
