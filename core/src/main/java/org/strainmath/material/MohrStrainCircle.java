package org.strainmath.material;

import java.util.Objects;

import org.strainmath.quantity.Strain;

/**
 * Mohr's circle of a plane strain state, drawn in the plane of the normal strain ε (abscissa)
 * and half the engineering shear strain γ/2 (ordinate). The principal strains are its ends on
 * the ε axis; the largest in-plane engineering shear strain is its diameter.
 *
 * <p>Immutable and thread-safe (a record).
 *
 * @param centre (εx + εy)/2
 * @param radius √(((εx − εy)/2)² + (γxy/2)²), never negative
 */
public record MohrStrainCircle(Strain centre, Strain radius) {

    /**
     * Validates the circle.
     *
     * @throws NullPointerException     if a component is null
     * @throws IllegalArgumentException if {@code radius} is negative
     */
    public MohrStrainCircle {
        Objects.requireNonNull(centre, "centre");
        Objects.requireNonNull(radius, "radius");
        if (!(radius.value() >= 0)) {
            throw new IllegalArgumentException("radius must be >= 0: " + radius);
        }
    }

    /** The larger principal strain ε1 = centre + radius. */
    public Strain maximum() {
        return Strain.of(centre.value() + radius.value());
    }

    /** The smaller principal strain ε2 = centre − radius. */
    public Strain minimum() {
        return Strain.of(centre.value() - radius.value());
    }

    /** The largest in-plane engineering shear strain γmax = ε1 − ε2 = 2·radius. */
    public Strain maximumShear() {
        return Strain.of(2 * radius.value());
    }
}
