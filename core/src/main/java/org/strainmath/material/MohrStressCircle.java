package org.strainmath.material;

import java.util.Objects;

import org.strainmath.quantity.Stress;

/**
 * Mohr's circle of a plane stress state, drawn in the plane of the normal stress σ (abscissa)
 * and the shear stress τ (ordinate). The in-plane principal stresses are its ends on the σ
 * axis; the largest in-plane shear stress is its radius.
 *
 * <p>Immutable and thread-safe (a record).
 *
 * @param centre (σx + σy)/2
 * @param radius √(((σx − σy)/2)² + τxy²), never negative
 */
public record MohrStressCircle(Stress centre, Stress radius) {

    /**
     * Validates the circle.
     *
     * @throws NullPointerException     if a component is null
     * @throws IllegalArgumentException if {@code radius} is negative
     */
    public MohrStressCircle {
        Objects.requireNonNull(centre, "centre");
        Objects.requireNonNull(radius, "radius");
        if (!(radius.toPascals() >= 0)) {
            throw new IllegalArgumentException("radius must be >= 0: " + radius);
        }
    }

    /** The larger in-plane principal stress σ1 = centre + radius. */
    public Stress maximum() {
        return Stress.ofPascals(centre.toPascals() + radius.toPascals());
    }

    /** The smaller in-plane principal stress σ2 = centre − radius. */
    public Stress minimum() {
        return Stress.ofPascals(centre.toPascals() - radius.toPascals());
    }

    /** The largest in-plane shear stress τmax = (σ1 − σ2)/2 = radius. */
    public Stress maximumShear() {
        return radius;
    }
}
