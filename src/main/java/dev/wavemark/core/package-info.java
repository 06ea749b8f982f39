/**
 * The innermost layer: the error catalogue shared by every package, and the pure physics,
 * geometry and model subpackages. Nothing here knows about images, files or reports.
 */
@NullMarked
package dev.wavemark.core;

import org.jspecify.annotations.NullMarked;
