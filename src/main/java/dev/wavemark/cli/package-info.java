/**
 * The picocli shell: commands that parse arguments, call one pipeline or core method, and turn
 * failures into exit codes and single lines.
 */
@NullMarked
package dev.wavemark.cli;

import org.jspecify.annotations.NullMarked;
