/**
 * Strain and stress histories: turning points through a hysteresis gate, rainflow cycle
 * counting as ASTM E1049-85 describes it (batch over an array, and a streaming counter with a
 * saveable state for a gateway), and the summaries of a count: range histograms, range–mean and
 * from–to matrices, level crossings and the equivalent constant-amplitude range.
 *
 * <p>A history is a {@code double[]} in one unit, whatever it is: strain in m/m from a channel's
 * kernel, stress in Pa from a rosette's. Samples that are not finite (NaN for a reading with no
 * physical strain) are skipped and counted. Damage from the counted cycles is in
 * {@link org.strainmath.fatigue}.
 *
 * <p>Configurations ({@link org.strainmath.history.Rainflow},
 * {@link org.strainmath.history.Bins}) and results ({@link org.strainmath.history.Cycles},
 * {@link org.strainmath.history.TurningPoints}) are immutable and thread-safe; the streaming
 * counter, the filter and the histograms are accumulators, mutable and not thread-safe.
 */
package org.strainmath.history;
