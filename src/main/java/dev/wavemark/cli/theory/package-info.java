/**
 * {@code wavemark theory}: one subcommand per gas-dynamic relation of {@code core.gas}, printing
 * a human-readable block, one JSON object ({@code --json}) or CSV rows over a Mach range.
 */
@NullMarked
package dev.wavemark.cli.theory;

import org.jspecify.annotations.NullMarked;
