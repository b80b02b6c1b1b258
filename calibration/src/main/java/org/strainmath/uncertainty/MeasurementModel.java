package org.strainmath.uncertainty;

/**
 * A measurement model y = f(x1, ..., xN) (GUM 4.1): the inputs arrive in the order of the
 * budget's input quantities. The array is the model's to read (a copy each call). The model
 * should be a pure function: the budget calls it many times, and the Monte Carlo propagation
 * once per trial.
 */
@FunctionalInterface
public interface MeasurementModel {

    /** The value of the measurand for {@code inputs}. */
    double evaluate(double[] inputs);
}
