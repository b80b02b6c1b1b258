/**
 * Strain gauges, bridge arms and Wheatstone bridges, with exact bridge equations in both
 * directions and allocation-free block kernels.
 *
 * <p>Start with a {@link org.strainmath.bridge.StrainGauge} and one of the named arrangements of
 * {@link org.strainmath.bridge.Bridge} ({@code quarter}, {@code halfBending},
 * {@code fullAxialPoisson}, ...), or build any bridge from four
 * {@link org.strainmath.bridge.BridgeArm}s. The arm numbering, the sign convention and the
 * equations are stated once, in {@link org.strainmath.bridge.Bridge}.
 *
 * <p>Every class here is immutable and thread-safe.
 */
package org.strainmath.bridge;
