/**
 * Numerical support for the physics: bracketed root finding with budgets (on Hipparchus),
 * argument checks, and {@link dev.wavemark.core.numeric.Measured} values with uncertainties.
 */
@NullMarked
package dev.wavemark.core.numeric;

import org.jspecify.annotations.NullMarked;
