package org.strainmath.uncertainty;

import java.util.Objects;

/**
 * One row of an uncertainty budget: an input, its sensitivity coefficient, its contribution
 * |cᵢ|·uᵢ to the combined standard uncertainty, and its share of the combined variance,
 * (cᵢ·uᵢ)²/u_c² (the shares add to 1 only without correlations and second-order terms).
 *
 * <p>Immutable and thread-safe (a record).
 *
 * @param input        the input quantity
 * @param sensitivity  cᵢ = ∂f/∂xᵢ at the estimates
 * @param contribution |cᵢ|·uᵢ, in the measurand's unit
 * @param share        (cᵢ·uᵢ)²/u_c², between 0 and 1
 */
public record Contribution(InputQuantity input, double sensitivity, double contribution,
        double share) {

    /**
     * Validates the row.
     *
     * @throws NullPointerException if {@code input} is null
     */
    public Contribution {
        Objects.requireNonNull(input, "input");
    }
}
