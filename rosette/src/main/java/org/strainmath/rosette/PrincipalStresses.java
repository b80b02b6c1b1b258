package org.strainmath.rosette;

import java.util.Objects;
import java.util.Optional;

import org.strainmath.quantity.Angle;
import org.strainmath.quantity.Stress;

/**
 * The in-plane principal stresses σ1 ≥ σ2 of a plane stress state (σ3 = 0 normal to the
 * surface) and their angle, which for an isotropic material is the principal strain angle:
 * from the reference axis counter-clockwise to σ1, in (−90°, 90°], empty for an equal-biaxial
 * state.
 *
 * <p>Immutable and thread-safe (a record).
 *
 * @param s1    the larger in-plane principal stress
 * @param s2    the smaller in-plane principal stress
 * @param angle θp, empty when there is no principal direction
 */
public record PrincipalStresses(Stress s1, Stress s2, Optional<Angle> angle) {

    /**
     * Validates the stresses.
     *
     * @throws NullPointerException     if a component is null
     * @throws IllegalArgumentException if s1 &lt; s2
     */
    public PrincipalStresses {
        Objects.requireNonNull(s1, "s1");
        Objects.requireNonNull(s2, "s2");
        Objects.requireNonNull(angle, "angle");
        if (s1.compareTo(s2) < 0) {
            throw new IllegalArgumentException("s1 must be >= s2: " + s1 + " < " + s2);
        }
    }

    /** {@code PrincipalStresses[s1=215.1 MPa, s2=-12.4 MPa, theta=-25.29°]}. */
    @Override
    public String toString() {
        return "PrincipalStresses[s1=" + s1 + ", s2=" + s2 + ", theta="
                + angle.map(Angle::toString).orElse("none (equal biaxial)") + "]";
    }
}
