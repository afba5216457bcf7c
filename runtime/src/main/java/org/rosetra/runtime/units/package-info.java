/**
 * Dimensions and units. Every value is stored in SI (strain as a fraction, stress in Pa,
 * angle in rad, temperature in K); a {@link org.rosetra.runtime.units.Unit} only converts
 * at the edges, when a script's number is read ({@link org.rosetra.runtime.units.UnitParser},
 * {@link org.rosetra.runtime.units.Quantity#of}) and when a result is shown
 * ({@link org.rosetra.runtime.units.DisplayUnits}). Dimensions carry exact rational
 * exponents so that a checker can prove {@code sqrt(area)} is a length before running.
 */
package org.rosetra.runtime.units;
