package org.strainmath.material;

import org.strainmath.internal.Checks;
import org.strainmath.internal.Format;
import org.strainmath.quantity.Angle;
import org.strainmath.quantity.Strain;

/**
 * The in-plane strain state at a point: normal strains εx, εy and the engineering shear strain
 * γxy = 2·εxy, all in m/m, tension positive, γxy positive when the right angle between the
 * positive x and y directions closes.
 *
 * <pre>
 *   PlaneStrain e = PlaneStrain.ofMicrostrain(800, -200, 600);
 *   e.normalStrainAt(Angle.ofDegrees(45));   // 600.0 µε
 *   e.mohrCircle();                          // MohrStrainCircle[centre=300.0 µε, radius=583.095 µε]
 * </pre>
 *
 * <p>The transformation to axes x', y' turned counter-clockwise by θ from x, y (e.g. Gere and
 * Goodno, <i>Mechanics of Materials</i>, ch. 7, the strain transformation equations):
 * <pre>
 *   εx'   = (εx + εy)/2 + (εx − εy)/2·cos 2θ + γxy/2·sin 2θ
 *   εy'   = (εx + εy)/2 − (εx − εy)/2·cos 2θ − γxy/2·sin 2θ
 *   γx'y' = −(εx − εy)·sin 2θ + γxy·cos 2θ
 * </pre>
 * computed in the equivalent single-angle form (εx' = εx·cos²θ + εy·sin²θ + γxy·sinθ·cosθ ...)
 * after reducing θ modulo 180°. <i>Accuracy</i>: a few ulp of the largest component; the
 * trigonometric functions are those of {@link StrictMath}, so results are the same on every JDK.
 *
 * <p>Immutable and thread-safe (a record).
 *
 * @param exx normal strain along x, m/m
 * @param eyy normal strain along y, m/m
 * @param gxy engineering shear strain γxy, m/m (rad)
 */
public record PlaneStrain(double exx, double eyy, double gxy) {

    /** The state of no strain. */
    public static final PlaneStrain ZERO = new PlaneStrain(0, 0, 0);

    /**
     * Validates the components.
     *
     * @throws IllegalArgumentException if a component is NaN or infinite
     */
    public PlaneStrain {
        Checks.finite(exx, "exx");
        Checks.finite(eyy, "eyy");
        Checks.finite(gxy, "gxy");
    }

    /**
     * The state of {@code exx}, {@code eyy}, {@code gxy} in µε.
     *
     * @throws IllegalArgumentException if a component is NaN or infinite
     */
    public static PlaneStrain ofMicrostrain(double exx, double eyy, double gxy) {
        return new PlaneStrain(Checks.finite(exx, "exx") * 1e-6, Checks.finite(eyy, "eyy") * 1e-6,
                Checks.finite(gxy, "gxy") * 1e-6);
    }

    /**
     * The state of the three strains.
     *
     * @throws NullPointerException if a strain is null
     */
    public static PlaneStrain of(Strain exx, Strain eyy, Strain gxy) {
        return new PlaneStrain(exx.value(), eyy.value(), gxy.value());
    }

    /** εx as a {@link Strain}. */
    public Strain normalX() {
        return Strain.of(exx);
    }

    /** εy as a {@link Strain}. */
    public Strain normalY() {
        return Strain.of(eyy);
    }

    /** γxy as a {@link Strain}. */
    public Strain shearXY() {
        return Strain.of(gxy);
    }

    /**
     * The normal strain along the direction at {@code angle} counter-clockwise from x: εx' of
     * the transformation in the class comment.
     *
     * @throws NullPointerException if {@code angle} is null
     */
    public Strain normalStrainAt(Angle angle) {
        double theta = halfTurnRemainder(angle);
        double c = StrictMath.cos(theta);
        double n = StrictMath.sin(theta);
        return Strain.of(exx * c * c + eyy * n * n + gxy * n * c);
    }

    /**
     * The same state in axes turned by {@code angle} counter-clockwise from x, y (the
     * transformation in the class comment). Invariants: εx + εy and the radius of Mohr's circle.
     * A turn by 0 or by a multiple of 180° returns the components unchanged.
     *
     * @throws NullPointerException if {@code angle} is null
     */
    public PlaneStrain rotatedBy(Angle angle) {
        double theta = halfTurnRemainder(angle);
        double c = StrictMath.cos(theta);
        double n = StrictMath.sin(theta);
        double cc = c * c;
        double nn = n * n;
        double nc = n * c;
        return new PlaneStrain(exx * cc + eyy * nn + gxy * nc, exx * nn + eyy * cc - gxy * nc,
                2 * (eyy - exx) * nc + gxy * (cc - nn));
    }

    /**
     * The angle reduced to [−90°, 90°] by the exact IEEE remainder: the transformation has a
     * period of 180°, and the reduction makes a half turn exactly the identity.
     */
    static double halfTurnRemainder(Angle angle) {
        return Math.IEEEremainder(angle.toRadians(), Math.PI);
    }

    /**
     * Mohr's circle of this state, in the plane of ε and γ/2:
     * <pre>
     *   centre = (εx + εy)/2        radius = √(((εx − εy)/2)² + (γxy/2)²)
     * </pre>
     */
    public MohrStrainCircle mohrCircle() {
        return new MohrStrainCircle(Strain.of(0.5 * (exx + eyy)),
                Strain.of(StrictMath.hypot(0.5 * (exx - eyy), 0.5 * gxy)));
    }

    /** This state plus {@code other}, component by component. */
    public PlaneStrain plus(PlaneStrain other) {
        return new PlaneStrain(exx + other.exx, eyy + other.eyy, gxy + other.gxy);
    }

    /** This state minus {@code other}, component by component. */
    public PlaneStrain minus(PlaneStrain other) {
        return new PlaneStrain(exx - other.exx, eyy - other.eyy, gxy - other.gxy);
    }

    /** {@code PlaneStrain[exx=800.0 µε, eyy=-200.0 µε, gxy=600.0 µε]}. */
    @Override
    public String toString() {
        return "PlaneStrain[exx=" + Format.withUnit(exx * 1e6, "µε") + ", eyy="
                + Format.withUnit(eyy * 1e6, "µε") + ", gxy=" + Format.withUnit(gxy * 1e6, "µε")
                + "]";
    }
}
