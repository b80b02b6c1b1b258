/**
 * Physical quantities with units: {@link org.strainmath.quantity.Strain},
 * {@link org.strainmath.quantity.Stress}, {@link org.strainmath.quantity.Resistance},
 * {@link org.strainmath.quantity.Voltage}, {@link org.strainmath.quantity.VoltageRatio} and
 * {@link org.strainmath.quantity.Temperature}.
 *
 * <p>Each is a final, immutable, thread-safe class with a private constructor. Values are made
 * by unit-named factories ({@code Strain.ofMicrostrain(250)}, {@code Stress.ofMegapascals(80)})
 * and read by unit-named accessors ({@code toMicrostrain()}, {@code toMegapascals()}), so that a
 * bare number never crosses the API without its unit. Each quantity keeps one SI value inside:
 * strain in m/m, stress in Pa, resistance in Ω, voltage in V, bridge output as V/V and
 * temperature in K. Factories reject NaN and infinities with an {@link IllegalArgumentException}
 * that names the argument.
 *
 * <p>{@code toString} is written for a person: six significant digits and the unit people use
 * for the quantity, e.g. {@code 250.0 µε}, {@code 80.0 MPa}, {@code 1.5 mV/V}.
 */
package org.strainmath.quantity;
