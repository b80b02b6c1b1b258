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
 *   σ1,2 = P ± R     P = E/(1 − ν)·(εx + εy)/2     R = √(((σx − σy)/2)² + τxy²)
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
    private final double p;
    private final double q;
    private final double s;
    private final Optional<Angle> angle;

    private RosetteStresses(IsotropicMaterial material, double p, double q, double s,
            Optional<Angle> angle) {
        this.material = material;
        this.p = p;
        this.q = q;
        this.s = s;
        this.angle = angle;
    }

    static RosetteStresses of(IsotropicMaterial material, double[][] rows, double[] readings,
            Optional<Angle> angle) {
        return new RosetteStresses(material, dot(rows[0], readings), dot(rows[1], readings),
                dot(rows[2], readings), angle);
    }

    private static double dot(double[] row, double[] r) {
        double sum = row[0] * r[0];
        for (int j = 1; j < row.length; j++) {
            sum += row[j] * r[j];
        }
        return sum;
    }

    private double radius() {
        return Math.sqrt(q * q + s * s);
    }

    /** The material the stresses were computed with. */
    public IsotropicMaterial material() {
        return material;
    }

    /** The stress state σx, σy, τxy in the rosette's reference axes. */
    public PlaneStress stress() {
        return new PlaneStress(p + q, p - q, s);
    }

    /** The in-plane principal stresses σ1 ≥ σ2 and their angle. */
    public PrincipalStresses principal() {
        double radius = radius();
        return new PrincipalStresses(Stress.ofPascals(p + radius), Stress.ofPascals(p - radius),
                angle);
    }

    /** The largest in-plane shear stress (σ1 − σ2)/2. */
    public Stress maximumInPlaneShear() {
        return Stress.ofPascals(radius());
    }

    /**
     * The absolute largest shear stress, over all planes through the point with σ3 = 0:
     * half the Tresca stress (larger than the in-plane one when σ1 and σ2 have one sign).
     */
    public Stress absoluteMaximumShear() {
        return Stress.ofPascals(0.5 * RosetteKernels.trescaOf(p, q, s));
    }

    /** The von Mises equivalent stress √(σ1² − σ1σ2 + σ2²) = √(P² + 3R²). */
    public Stress vonMises() {
        return Stress.ofPascals(Math.sqrt(p * p + 3 * (q * q + s * s)));
    }

    /** The Tresca equivalent stress max(|σ1 − σ2|, |σ1|, |σ2|). */
    public Stress tresca() {
        return Stress.ofPascals(RosetteKernels.trescaOf(p, q, s));
    }

    /** Mohr's circle of the in-plane stress state. */
    public MohrStressCircle mohrCircle() {
        return new MohrStressCircle(Stress.ofPascals(p), Stress.ofPascals(radius()));
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
