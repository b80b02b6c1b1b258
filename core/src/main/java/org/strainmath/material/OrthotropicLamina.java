package org.strainmath.material;

import java.util.Objects;

import org.strainmath.internal.Checks;
import org.strainmath.internal.Format;
import org.strainmath.quantity.Angle;
import org.strainmath.quantity.Stress;

/**
 * A thin orthotropic lamina (one ply of a fibre composite) in plane stress, in its material
 * axes 1 (along the fibres) and 2 (across them): moduli E1, E2, in-plane Poisson's ratio ν12
 * (the strain −ε2/ε1 under stress σ1) and shear modulus G12. Reciprocity fixes the other
 * Poisson's ratio, ν21 = ν12·E2/E1.
 *
 * <pre>
 *   OrthotropicLamina ply = OrthotropicLamina.of(Stress.ofGigapascals(140),
 *           Stress.ofGigapascals(10), 0.3, Stress.ofGigapascals(5));
 *   ply.reducedStiffness();                        // Q in axes 1, 2
 *   ply.transformedStiffness(Angle.ofDegrees(45));  // Q̄ in axes x, y
 * </pre>
 *
 * <p>The reduced stiffness (e.g. Jones, <i>Mechanics of Composite Materials</i>, 2nd ed.,
 * § 2.6; Daniel and Ishai, <i>Engineering Mechanics of Composite Materials</i>, ch. 4):
 * <pre>
 *   Q11 = E1 / (1 − ν12·ν21)    Q22 = E2 / (1 − ν12·ν21)    Q12 = ν12·E2 / (1 − ν12·ν21)
 *   Q66 = G12                   Q16 = Q26 = 0
 * </pre>
 * and its transformation to axes x, y, where the fibre direction 1 lies at the ply angle θ
 * counter-clockwise from x (m = cos θ, n = sin θ; Jones, eq. 2.85, number from memory):
 * <pre>
 *   Q̄11 = Q11·m⁴ + 2(Q12 + 2Q66)·m²n² + Q22·n⁴
 *   Q̄12 = (Q11 + Q22 − 4Q66)·m²n² + Q12·(m⁴ + n⁴)
 *   Q̄22 = Q11·n⁴ + 2(Q12 + 2Q66)·m²n² + Q22·m⁴
 *   Q̄16 = (Q11 − Q12 − 2Q66)·m³n + (Q12 − Q22 + 2Q66)·mn³
 *   Q̄26 = (Q11 − Q12 − 2Q66)·mn³ + (Q12 − Q22 + 2Q66)·m³n
 *   Q̄66 = (Q11 + Q22 − 2Q12 − 2Q66)·m²n² + Q66·(m⁴ + n⁴)
 * </pre>
 * <b>Stability</b>: E1, E2, G12 positive and 1 − ν12·ν21 &gt; 0, i.e. ν12² &lt; E1/E2 (Jones,
 * § 2.4, restrictions on the elastic constants).
 *
 * <p><i>Accuracy</i>: Q to a few ulp; Q̄ to a few ulp of the largest entry of Q, with
 * {@link StrictMath} trigonometry, so the same on every JDK.
 *
 * <p>Immutable and thread-safe.
 */
public final class OrthotropicLamina {

    private final double e1;
    private final double e2;
    private final double nu12;
    private final double g12;
    private final PlaneStiffness reduced;

    private OrthotropicLamina(double e1, double e2, double nu12, double g12) {
        this.e1 = e1;
        this.e2 = e2;
        this.nu12 = nu12;
        this.g12 = g12;
        double nu21 = nu21();
        double d = 1 - nu12 * nu21;
        this.reduced = PlaneStiffness.withCompliance(
                new double[] {e1 / d, nu12 * e2 / d, 0, e2 / d, 0, g12},
                new double[] {1 / e1, -nu12 / e1, 0, 1 / e2, 0, 1 / g12});
    }

    /**
     * The lamina of fibre-direction modulus {@code e1}, transverse modulus {@code e2},
     * Poisson's ratio {@code nu12} and in-plane shear modulus {@code g12}.
     *
     * @throws NullPointerException     if a modulus is null
     * @throws IllegalArgumentException if a modulus is not positive, ν12 is not finite, or
     *                                  ν12² ≥ E1/E2 (no stable lamina)
     */
    public static OrthotropicLamina of(Stress e1, Stress e2, double nu12, Stress g12) {
        double a = Checks.positiveFinite(Objects.requireNonNull(e1, "e1").toPascals(), "e1");
        double b = Checks.positiveFinite(Objects.requireNonNull(e2, "e2").toPascals(), "e2");
        double g = Checks.positiveFinite(Objects.requireNonNull(g12, "g12").toPascals(), "g12");
        Checks.finite(nu12, "nu12");
        if (!(nu12 * nu12 < a / b)) {
            throw new IllegalArgumentException("nu12 " + Format.number(nu12) + " with e1 " + e1
                    + " and e2 " + e2 + " gives no stable lamina: it needs nu12² < e1/e2 = "
                    + Format.number(a / b));
        }
        return new OrthotropicLamina(a, b, nu12, g);
    }

    /** The modulus along the fibres, E1. */
    public Stress e1() {
        return Stress.ofPascals(e1);
    }

    /** The modulus across the fibres, E2. */
    public Stress e2() {
        return Stress.ofPascals(e2);
    }

    /** The major Poisson's ratio ν12. */
    public double nu12() {
        return nu12;
    }

    /** The minor Poisson's ratio ν21 = ν12·E2/E1 (reciprocity). */
    public double nu21() {
        return nu12 * e2 / e1;
    }

    /** The in-plane shear modulus G12. */
    public Stress g12() {
        return Stress.ofPascals(g12);
    }

    /** The reduced stiffness Q in the material axes 1, 2 (class comment). */
    public PlaneStiffness reducedStiffness() {
        return reduced;
    }

    /**
     * The transformed reduced stiffness Q̄ in axes x, y for the fibre direction at
     * {@code plyAngle} counter-clockwise from x (class comment). At 0° it is Q; at 90° Q11 and
     * Q22 trade places.
     *
     * @throws NullPointerException if {@code plyAngle} is null
     */
    public PlaneStiffness transformedStiffness(Angle plyAngle) {
        double[][] q = reduced.toMatrix();
        double q11 = q[0][0];
        double q12 = q[0][1];
        double q22 = q[1][1];
        double q66 = q[2][2];
        double theta = plyAngle.toRadians();
        double m = StrictMath.cos(theta);
        double n = StrictMath.sin(theta);
        double m2 = m * m;
        double n2 = n * n;
        double m2n2 = m2 * n2;
        double m4 = m2 * m2;
        double n4 = n2 * n2;
        double a = q11 - q12 - 2 * q66;
        double b = q12 - q22 + 2 * q66;
        double[] bar = {
            q11 * m4 + 2 * (q12 + 2 * q66) * m2n2 + q22 * n4,
            (q11 + q22 - 4 * q66) * m2n2 + q12 * (m4 + n4),
            a * m2 * m * n + b * m * n2 * n,
            q11 * n4 + 2 * (q12 + 2 * q66) * m2n2 + q22 * m4,
            a * m * n2 * n + b * m2 * m * n,
            (q11 + q22 - 2 * q12 - 2 * q66) * m2n2 + q66 * (m4 + n4)};
        return PlaneStiffness.withInverse(bar);
    }

    /**
     * The stresses in the material axes 1, 2 (σ1 along the fibres, σ2 across, τ12) of the
     * strain state {@code strainInXY}, measured in axes x, y, for the fibre direction at
     * {@code plyAngle} from x: the strains turned into the material axes
     * ({@link PlaneStrain#rotatedBy}), then σ = Q·ε. The result is a {@link PlaneStress} whose
     * x, y are the axes 1, 2.
     *
     * @throws NullPointerException if an argument is null
     */
    public PlaneStress stressInMaterialAxes(PlaneStrain strainInXY, Angle plyAngle) {
        return reduced.stressOf(strainInMaterialAxes(strainInXY, plyAngle));
    }

    /**
     * The strains in the material axes 1, 2 of the strain state {@code strainInXY} measured in
     * axes x, y: {@code strainInXY.rotatedBy(plyAngle)}.
     *
     * @throws NullPointerException if an argument is null
     */
    public PlaneStrain strainInMaterialAxes(PlaneStrain strainInXY, Angle plyAngle) {
        Objects.requireNonNull(plyAngle, "plyAngle");
        return Objects.requireNonNull(strainInXY, "strainInXY").rotatedBy(plyAngle);
    }

    @Override
    public boolean equals(Object o) {
        if (!(o instanceof OrthotropicLamina)) {
            return false;
        }
        OrthotropicLamina other = (OrthotropicLamina) o;
        return Double.compare(e1, other.e1) == 0 && Double.compare(e2, other.e2) == 0
                && Double.compare(nu12, other.nu12) == 0 && Double.compare(g12, other.g12) == 0;
    }

    @Override
    public int hashCode() {
        return java.util.Arrays.hashCode(new double[] {e1, e2, nu12, g12});
    }

    /**
     * {@code OrthotropicLamina[E1=140.0 GPa, E2=10.0 GPa, ν12=0.3, ν21=0.0214286, G12=5.0 GPa]}.
     */
    @Override
    public String toString() {
        return "OrthotropicLamina[E1=" + gpa(e1) + ", E2=" + gpa(e2) + ", ν12="
                + Format.number(nu12) + ", ν21=" + Format.number(nu21()) + ", G12=" + gpa(g12)
                + "]";
    }

    private static String gpa(double pascals) {
        return Format.withUnit(pascals * 1e-9, "GPa");
    }
}
