package org.strainmath.uncertainty;

import org.strainmath.internal.Format;

/**
 * The result of a Monte Carlo propagation (JCGM 101:2008): the mean of the model values, their
 * standard deviation (the standard uncertainty), and the probabilistically symmetric coverage
 * interval at the coverage probability.
 *
 * <p>Immutable and thread-safe (a record).
 *
 * @param estimate            the mean of the model values
 * @param standardUncertainty their standard deviation
 * @param lower               the lower end of the coverage interval
 * @param upper               the upper end
 * @param probability         the coverage probability
 * @param trials              the number of trials
 */
public record MonteCarloResult(double estimate, double standardUncertainty, double lower,
        double upper, double probability, int trials) {

    /** {@code MonteCarloResult[y = 1.234, u = 0.0056, 95 % interval [1.223, 1.245], 1000000 trials]}. */
    @Override
    public String toString() {
        return "MonteCarloResult[y = " + Format.number(estimate) + ", u = "
                + Format.number(standardUncertainty) + ", " + Format.number(probability * 100)
                + " % interval [" + Format.number(lower) + ", " + Format.number(upper) + "], "
                + trials + " trials]";
    }
}
