/**
 * Image-plane geometry: points, the files contract's angle conventions, and flow-aligned frames.
 */
@NullMarked
package dev.wavemark.core.geom;

import org.jspecify.annotations.NullMarked;
