package org.strainmath.material;

import org.strainmath.internal.Checks;
import org.strainmath.internal.Format;
import org.strainmath.quantity.Angle;
import org.strainmath.quantity.Stress;

/**
 * The in-plane stress state at a point: normal stresses σx, σy and the shear stress τxy, in
 * pascals, tension positive, τxy positive on the positive x face in the positive y direction.
 *
 * <pre>
 *   PlaneStress s = PlaneStress.ofMegapascals(120, -40, 30);
 *   s.normalStressAt(Angle.ofDegrees(90));   // -40.0 MPa
 *   s.mohrCircle();                          // MohrStressCircle[centre=40.0 MPa, radius=85.44 MPa]
 * </pre>
 *
 * <p>The transformation to axes x', y' turned counter-clockwise by θ (e.g. Gere and Goodno,
 * <i>Mechanics of Materials</i>, ch. 7, the stress transformation equations):
 * <pre>
 *   σx'  = (σx + σy)/2 + (σx − σy)/2·cos 2θ + τxy·sin 2θ
 *   σy'  = (σx + σy)/2 − (σx − σy)/2·cos 2θ − τxy·sin 2θ
 *   τx'y' = −(σx − σy)/2·sin 2θ + τxy·cos 2θ
 * </pre>
 * computed in the equivalent single-angle form (σx' = σx·cos²θ + σy·sin²θ + 2τxy·sinθ·cosθ ...)
 * after reducing θ modulo 180°. <i>Accuracy</i>: a few ulp of the largest component, with
 * {@link StrictMath} trigonometry.
 *
 * <p>Immutable and thread-safe (a record).
 *
 * @param sxx normal stress along x, Pa
 * @param syy normal stress along y, Pa
 * @param txy shear stress τxy, Pa
 */
public record PlaneStress(double sxx, double syy, double txy) {

    /** The state of no stress. */
    public static final PlaneStress ZERO = new PlaneStress(0, 0, 0);

    /**
     * Validates the components.
     *
     * @throws IllegalArgumentException if a component is NaN or infinite
     */
    public PlaneStress {
        Checks.finite(sxx, "sxx");
        Checks.finite(syy, "syy");
        Checks.finite(txy, "txy");
    }

    /**
     * The state of {@code sxx}, {@code syy}, {@code txy} in MPa.
     *
     * @throws IllegalArgumentException if a component is NaN or infinite
     */
    public static PlaneStress ofMegapascals(double sxx, double syy, double txy) {
        return new PlaneStress(Checks.finite(sxx, "sxx") * 1e6, Checks.finite(syy, "syy") * 1e6,
                Checks.finite(txy, "txy") * 1e6);
    }

    /**
     * The state of the three stresses.
     *
     * @throws NullPointerException if a stress is null
     */
    public static PlaneStress of(Stress sxx, Stress syy, Stress txy) {
        return new PlaneStress(sxx.toPascals(), syy.toPascals(), txy.toPascals());
    }

    /** σx as a {@link Stress}. */
    public Stress normalX() {
        return Stress.ofPascals(sxx);
    }

    /** σy as a {@link Stress}. */
    public Stress normalY() {
        return Stress.ofPascals(syy);
    }

    /** τxy as a {@link Stress}. */
    public Stress shearXY() {
        return Stress.ofPascals(txy);
    }

    /**
     * The normal stress on the face whose normal is at {@code angle} counter-clockwise from x:
     * σx' of the transformation in the class comment.
     *
     * @throws NullPointerException if {@code angle} is null
     */
    public Stress normalStressAt(Angle angle) {
        double theta = PlaneStrain.halfTurnRemainder(angle);
        double c = StrictMath.cos(theta);
        double n = StrictMath.sin(theta);
        return Stress.ofPascals(sxx * c * c + syy * n * n + 2 * txy * n * c);
    }

    /**
     * The same state in axes turned by {@code angle} counter-clockwise from x, y (the
     * transformation in the class comment). Invariants: σx + σy and the radius of Mohr's circle.
     * A turn by 0 or by a multiple of 180° returns the components unchanged.
     *
     * @throws NullPointerException if {@code angle} is null
     */
    public PlaneStress rotatedBy(Angle angle) {
        double theta = PlaneStrain.halfTurnRemainder(angle);
        double c = StrictMath.cos(theta);
        double n = StrictMath.sin(theta);
        double cc = c * c;
        double nn = n * n;
        double nc = n * c;
        return new PlaneStress(sxx * cc + syy * nn + 2 * txy * nc,
                sxx * nn + syy * cc - 2 * txy * nc, (syy - sxx) * nc + txy * (cc - nn));
    }

    /**
     * Mohr's circle of this state:
     * <pre>
     *   centre = (σx + σy)/2        radius = √(((σx − σy)/2)² + τxy²)
     * </pre>
     */
    public MohrStressCircle mohrCircle() {
        return new MohrStressCircle(Stress.ofPascals(0.5 * (sxx + syy)),
                Stress.ofPascals(StrictMath.hypot(0.5 * (sxx - syy), txy)));
    }

    /** This state plus {@code other}, component by component. */
    public PlaneStress plus(PlaneStress other) {
        return new PlaneStress(sxx + other.sxx, syy + other.syy, txy + other.txy);
    }

    /** This state minus {@code other}, component by component. */
    public PlaneStress minus(PlaneStress other) {
        return new PlaneStress(sxx - other.sxx, syy - other.syy, txy - other.txy);
    }

    /** {@code PlaneStress[sxx=120.0 MPa, syy=-40.0 MPa, txy=30.0 MPa]}. */
    @Override
    public String toString() {
        return "PlaneStress[sxx=" + Format.withUnit(sxx * 1e-6, "MPa") + ", syy="
                + Format.withUnit(syy * 1e-6, "MPa") + ", txy="
                + Format.withUnit(txy * 1e-6, "MPa") + "]";
    }
}
