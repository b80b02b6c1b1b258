package org.strainmath.calibration;

import org.strainmath.internal.Format;

/**
 * The analysis of variance of a least-squares fit: the sums of squares of the regression and
 * of the residuals, their degrees of freedom and mean squares, and the F statistic. With an
 * intercept the sums are about the mean of the readings (total = regression + residual, with
 * n − 1 degrees of freedom); without one they are about zero (n degrees of freedom), as NIST's
 * StRD certifies them.
 *
 * <p>Immutable and thread-safe (a record).
 *
 * @param regressionSumOfSquares   the sum of squares the fitted curve explains
 * @param regressionDegrees        the number of fitted terms other than the intercept
 * @param residualSumOfSquares     Σ wᵢ·(yᵢ − ŷᵢ)²
 * @param residualDegrees          n − p
 */
public record AnovaTable(double regressionSumOfSquares, int regressionDegrees,
        double residualSumOfSquares, int residualDegrees) {

    /** The regression mean square, regression sum of squares over its degrees of freedom. */
    public double regressionMeanSquare() {
        return regressionSumOfSquares / regressionDegrees;
    }

    /** The residual mean square, the estimate of the variance σ² of a reading. */
    public double residualMeanSquare() {
        return residualSumOfSquares / residualDegrees;
    }

    /** The F statistic, regression over residual mean square. */
    public double fStatistic() {
        return regressionMeanSquare() / residualMeanSquare();
    }

    /** The table for a person, one row per source. */
    @Override
    public String toString() {
        return String.format(java.util.Locale.ROOT,
                "source       df  sum of squares  mean square     F%n"
                + "regression  %3d  %-14s  %-14s  %s%n"
                + "residual    %3d  %-14s  %s",
                regressionDegrees, Format.number(regressionSumOfSquares),
                Format.number(regressionMeanSquare()), Format.number(fStatistic()),
                residualDegrees, Format.number(residualSumOfSquares),
                Format.number(residualMeanSquare()));
    }
}
