package org.strainmath.rosette;

import java.util.Optional;

import org.strainmath.material.IsotropicMaterial;
import org.strainmath.material.MohrStressCircle;
import org.strainmath.material.PlaneStress;
import org.strainmath.quantity.Angle;
import org.strainmath.quantity.Stress;

/**
 * The stresses of one set of rosette readings on an isotropic material in plane stress (the
 * free surface under the gauges, σz = 0): the state, the principal stresses, the shears and the
 * von Mises and Tresca equivalent stresses.
 * <pre>
 *   σ1 = E/(1 − ν²)·(ε1 + ν·ε2)     σ2 = E/(1 − ν²)·(ε2 + ν·ε1)   (Hooke's law, principal axes)
 *   von Mises  σvm = √(σ1² − σ1·σ2 + σ2²)           (distortion energy, plane stress)
 *   Tresca     σT  = max(|σ1 − σ2|, |σ1|, |σ2|)      (largest shear × 2, with σ3 = 0)
 * </pre>
 * (e.g. Dowling, <i>Mechanical Behavior of Materials</i>, ch. 7, for both criteria.)
 *
 * <p><b>Caution</b>: an equivalent stress compared with an allowable is a number, not a
 * verdict. The result is only as good as the installation, the gauge data, the material
 * constants and the calibration; it covers one point of the surface, in the elastic range, and
 * says nothing of fatigue, stability or the stresses below the surface. Decisions about a
 * structure, a pressure vessel or lifting gear belong to a qualified engineer under the codes
 * that apply where it stands.
 *
 * <p>Immutable and thread-safe.
 */
public final class RosetteStresses {

    private final IsotropicMaterial material;
    private final double stiffness;   // E/(1 − ν²)
    private final double poisson;
    private final PlaneStress state;
    private final double e1;
    private final double e2;
    private final Optional<Angle> angle;

    RosetteStresses(IsotropicMaterial material, double stiffness, double poisson,
            PlaneStress state, double e1, double e2, Optional<Angle> angle) {
        this.material = material;
        this.stiffness = stiffness;
        this.poisson = poisson;
        this.state = state;
        this.e1 = e1;
        this.e2 = e2;
        this.angle = angle;
    }

    private double s1() {
        return RosetteKernels.s1Of(e1, e2, stiffness, poisson);
    }

    private double s2() {
        return RosetteKernels.s2Of(e1, e2, stiffness, poisson);
    }

    /** The material the stresses were computed with. */
    public IsotropicMaterial material() {
        return material;
    }

    /** The stress state σx, σy, τxy in the rosette's reference axes. */
    public PlaneStress stress() {
        return state;
    }

    /** The in-plane principal stresses σ1 ≥ σ2 and their angle. */
    public PrincipalStresses principal() {
        return new PrincipalStresses(Stress.ofPascals(s1()), Stress.ofPascals(s2()), angle);
    }

    /** The largest in-plane shear stress (σ1 − σ2)/2. */
    public Stress maximumInPlaneShear() {
        return Stress.ofPascals(0.5 * (s1() - s2()));
    }

    /**
     * The absolute largest shear stress, over all planes through the point with σ3 = 0:
     * half the Tresca stress (larger than the in-plane one when σ1 and σ2 have one sign).
     */
    public Stress absoluteMaximumShear() {
        return Stress.ofPascals(0.5 * RosetteKernels.trescaOf(e1, e2, stiffness, poisson));
    }

    /** The von Mises equivalent stress √(σ1² − σ1σ2 + σ2²). */
    public Stress vonMises() {
        return Stress.ofPascals(RosetteKernels.vonMisesOf(e1, e2, stiffness, poisson));
    }

    /** The Tresca equivalent stress max(|σ1 − σ2|, |σ1|, |σ2|). */
    public Stress tresca() {
        return Stress.ofPascals(RosetteKernels.trescaOf(e1, e2, stiffness, poisson));
    }

    /** Mohr's circle of the in-plane stress state. */
    public MohrStressCircle mohrCircle() {
        return new MohrStressCircle(Stress.ofPascals(0.5 * (s1() + s2())),
                Stress.ofPascals(0.5 * (s1() - s2())));
    }

    /**
     * The von Mises stress over {@code allowable}: a ratio below 1 is below the allowable. A
     * number for an engineer's assessment, not a verdict (see the caution in the class comment).
     *
     * @throws IllegalArgumentException if {@code allowable} is not positive
     */
    public double vonMisesRatio(Stress allowable) {
        return vonMises().toPascals() / positive(allowable);
    }

    /**
     * The Tresca stress over {@code allowable}, with the caution of the class comment.
     *
     * @throws IllegalArgumentException if {@code allowable} is not positive
     */
    public double trescaRatio(Stress allowable) {
        return tresca().toPascals() / positive(allowable);
    }

    private static double positive(Stress allowable) {
        return org.strainmath.internal.Checks.positiveFinite(allowable.toPascals(), "allowable");
    }

    /** {@code RosetteStresses[PlaneStress[...], PrincipalStresses[...], von Mises 180.2 MPa, Tresca 201.0 MPa]}. */
    @Override
    public String toString() {
        return "RosetteStresses[" + stress() + ", " + principal() + ", von Mises " + vonMises()
                + ", Tresca " + tresca() + "]";
    }
}
