package org.strainmath.rosette;

import java.util.Objects;
import java.util.Optional;

import org.strainmath.quantity.Angle;
import org.strainmath.quantity.Strain;

/**
 * The in-plane principal strains ε1 ≥ ε2 and the principal angle θp: from the reference axis
 * (x) counter-clockwise to the direction of ε1, in (−90°, 90°]. An equal-biaxial state
 * (ε1 = ε2, every direction principal) has no principal angle: {@link #angle()} is empty.
 *
 * <p>Immutable and thread-safe (a record).
 *
 * @param e1    the larger principal strain
 * @param e2    the smaller principal strain
 * @param angle θp, empty when there is no principal direction
 */
public record PrincipalStrains(Strain e1, Strain e2, Optional<Angle> angle) {

    /**
     * Validates the strains.
     *
     * @throws NullPointerException     if a component is null
     * @throws IllegalArgumentException if e1 &lt; e2
     */
    public PrincipalStrains {
        Objects.requireNonNull(e1, "e1");
        Objects.requireNonNull(e2, "e2");
        Objects.requireNonNull(angle, "angle");
        if (e1.compareTo(e2) < 0) {
            throw new IllegalArgumentException("e1 must be >= e2: " + e1 + " < " + e2);
        }
    }

    /** The largest in-plane engineering shear strain, γmax = ε1 − ε2. */
    public Strain maximumShear() {
        return e1.minus(e2);
    }

    /** Whether the state has a principal direction (it is not equal-biaxial). */
    public boolean hasDirection() {
        return angle.isPresent();
    }

    /** {@code PrincipalStrains[e1=1025.0 µε, e2=-208.3 µε, theta=-25.29°]}; theta=none if none. */
    @Override
    public String toString() {
        return "PrincipalStrains[e1=" + e1 + ", e2=" + e2 + ", theta="
                + angle.map(Angle::toString).orElse("none (equal biaxial)") + "]";
    }
}
