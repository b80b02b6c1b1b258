package org.strainmath.calibration;

import org.strainmath.internal.Format;

/**
 * A two-sided interval around an estimate, at a coverage (confidence) probability.
 *
 * <p>Immutable and thread-safe (a record).
 *
 * @param estimate    the central value
 * @param halfWidth   half the width of the interval, never negative
 * @param probability the coverage probability, in (0, 1)
 */
public record Interval(double estimate, double halfWidth, double probability) {

    /** The lower end, estimate − half width. */
    public double lower() {
        return estimate - halfWidth;
    }

    /** The upper end, estimate + half width. */
    public double upper() {
        return estimate + halfWidth;
    }

    /** {@code 1.23 ± 0.004 (95 %)}. */
    @Override
    public String toString() {
        return Format.number(estimate) + " ± " + Format.number(halfWidth) + " ("
                + Format.number(probability * 100) + " %)";
    }
}
