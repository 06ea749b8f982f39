/**
 * Gas-dynamic relations of a perfect gas: isentropic flow, normal and oblique shocks, the Mach
 * angle, the Prandtl-Meyer function, conical flow, shock-expansion theory, shock reflection and
 * intersection. Pure functions of numbers: no images, files or reports.
 */
@NullMarked
package dev.wavemark.core.gas;

import org.jspecify.annotations.NullMarked;
