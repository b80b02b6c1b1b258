package org.strainmath.material;

import java.util.Objects;

import org.strainmath.internal.Checks;
import org.strainmath.internal.Format;
import org.strainmath.internal.Kernels;

/**
 * An in-plane stiffness: Hooke's law between a plane strain state (εx, εy, γxy) and a plane
 * stress state (σx, σy, τxy), as the symmetric 3×3 matrix Q and its inverse, the compliance S:
 * <pre>
 *   ⎡σx ⎤   ⎡Q11 Q12 Q16⎤ ⎡εx ⎤          ⎡εx ⎤       ⎡σx ⎤
 *   ⎢σy ⎥ = ⎢Q12 Q22 Q26⎥ ⎢εy ⎥          ⎢εy ⎥ = S · ⎢σy ⎥,   S = Q⁻¹
 *   ⎣τxy⎦   ⎣Q16 Q26 Q66⎦ ⎣γxy⎦          ⎣γxy⎦       ⎣τxy⎦
 * </pre>
 * Q in Pa, strains in m/m with the engineering shear strain γxy. Obtained from a material
 * ({@link IsotropicMaterial#planeStressStiffness()}, {@link IsotropicMaterial#planeStrainStiffness()},
 * {@link OrthotropicLamina#reducedStiffness()}, {@link OrthotropicLamina#transformedStiffness})
 * or from its six entries ({@link #of}).
 *
 * <p>The block kernel {@link #toStress} converts strain arrays to stress arrays: nine
 * multiply-adds per sample, allocation-free.
 *
 * <p><i>Accuracy</i>: stress from strain is a product of the matrix, correct to a few ulp of the
 * largest term; strain from stress uses the compliance, exact in closed form for the isotropic
 * and orthotropic cases and otherwise the adjugate of Q divided by its determinant, which loses
 * about log10 of the condition number of Q in digits.
 *
 * <p>Immutable and thread-safe.
 */
public final class PlaneStiffness {

    private final double q11;
    private final double q12;
    private final double q16;
    private final double q22;
    private final double q26;
    private final double q66;

    private final double s11;
    private final double s12;
    private final double s16;
    private final double s22;
    private final double s26;
    private final double s66;

    private PlaneStiffness(double[] q, double[] s) {
        q11 = q[0];
        q12 = q[1];
        q16 = q[2];
        q22 = q[3];
        q26 = q[4];
        q66 = q[5];
        s11 = s[0];
        s12 = s[1];
        s16 = s[2];
        s22 = s[3];
        s26 = s[4];
        s66 = s[5];
    }

    /**
     * The stiffness of the six entries of the symmetric matrix Q, in Pa.
     *
     * @throws IllegalArgumentException if an entry is NaN or infinite, or Q is not positive
     *                                  definite (Q11 &gt; 0, Q11·Q22 − Q12² &gt; 0, det Q &gt; 0:
     *                                  a stable material stores energy under any strain)
     */
    public static PlaneStiffness of(double q11, double q12, double q16, double q22, double q26,
            double q66) {
        double[] q = {Checks.finite(q11, "q11"), Checks.finite(q12, "q12"),
            Checks.finite(q16, "q16"), Checks.finite(q22, "q22"), Checks.finite(q26, "q26"),
            Checks.finite(q66, "q66")};
        return withInverse(q);
    }

    /** The stiffness q, its compliance by the adjugate, after the check for a stable material. */
    static PlaneStiffness withInverse(double[] q) {
        double a = q[0];
        double b = q[1];
        double c = q[2];
        double d = q[3];
        double e = q[4];
        double f = q[5];
        double c11 = d * f - e * e;
        double c12 = c * e - b * f;
        double c13 = b * e - c * d;
        double c22 = a * f - c * c;
        double c23 = b * c - a * e;
        double c33 = a * d - b * b;
        double det = a * c11 + b * c12 + c * c13;
        if (!(a > 0 && c33 > 0 && det > 0) || !Double.isFinite(det)) {
            throw new IllegalArgumentException("stiffness must be positive definite (Q11 > 0, "
                    + "Q11·Q22 − Q12² > 0, det Q > 0): " + text(q));
        }
        double[] s = {c11 / det, c12 / det, c13 / det, c22 / det, c23 / det, c33 / det};
        return new PlaneStiffness(q, s);
    }

    /** The stiffness q with the compliance s known in closed form (isotropic, orthotropic). */
    static PlaneStiffness withCompliance(double[] q, double[] s) {
        return new PlaneStiffness(q, s);
    }

    /**
     * The stress of the strain state {@code strain}: σ = Q·ε.
     *
     * @throws NullPointerException if {@code strain} is null
     */
    public PlaneStress stressOf(PlaneStrain strain) {
        double ex = strain.exx();
        double ey = strain.eyy();
        double g = strain.gxy();
        return new PlaneStress(sx(ex, ey, g), sy(ex, ey, g), txy(ex, ey, g));
    }

    /**
     * The strain state of the stress state {@code stress}: ε = S·σ.
     *
     * @throws NullPointerException if {@code stress} is null
     */
    public PlaneStrain strainOf(PlaneStress stress) {
        double sx = stress.sxx();
        double sy = stress.syy();
        double t = stress.txy();
        return new PlaneStrain(s11 * sx + s12 * sy + s16 * t, s12 * sx + s22 * sy + s26 * t,
                s16 * sx + s26 * sy + s66 * t);
    }

    private double sx(double ex, double ey, double g) {
        return q11 * ex + q12 * ey + q16 * g;
    }

    private double sy(double ex, double ey, double g) {
        return q12 * ex + q22 * ey + q26 * g;
    }

    private double txy(double ex, double ey, double g) {
        return q16 * ex + q26 * ey + q66 * g;
    }

    /**
     * Converts {@code len} strain states from {@code exx}, {@code eyy}, {@code gxy} (m/m, from
     * {@code srcOff}) to stresses in {@code sxx}, {@code syy}, {@code txy} (Pa, from
     * {@code dstOff}): σ = Q·ε per sample, the same function as {@link #stressOf}, bit for bit.
     * Allocation-free. The outputs may be the input arrays (in place) only at the same offset.
     *
     * @return the number of samples with a NaN output: a NaN input, or an infinite one whose
     *         products cancel or meet a zero entry of Q (infinite inputs otherwise give infinite
     *         stresses)
     * @throws NullPointerException      if an array is null
     * @throws IndexOutOfBoundsException if a range is outside its array
     * @throws IllegalArgumentException  if two outputs are one array, or an output is an input
     *                                   array at another offset
     */
    public int toStress(double[] exx, double[] eyy, double[] gxy, int srcOff, double[] sxx,
            double[] syy, double[] txy, int dstOff, int len) {
        checkBlock(exx, eyy, gxy, srcOff, sxx, syy, txy, dstOff, len);
        int nan = 0;
        for (int done = 0; done < len; done += Kernels.CHUNK) {
            int n = Math.min(Kernels.CHUNK, len - done);
            if (srcOff == dstOff) {
                stressBlock(exx, eyy, gxy, sxx, syy, txy, dstOff + done, dstOff + done + n);
            } else {
                stressBlock(exx, eyy, gxy, srcOff + done, sxx, syy, txy, dstOff + done, n);
            }
            nan += Kernels.countNaNRows(sxx, syy, txy, dstOff + done, n);
        }
        return nan;
    }

    private void stressBlock(double[] exx, double[] eyy, double[] gxy, double[] sxx,
            double[] syy, double[] txy, int start, int end) {
        final double a11 = q11;
        final double a12 = q12;
        final double a16 = q16;
        final double a22 = q22;
        final double a26 = q26;
        final double a66 = q66;
        for (int i = start; i < end; i++) {
            double ex = exx[i];
            double ey = eyy[i];
            double g = gxy[i];
            sxx[i] = a11 * ex + a12 * ey + a16 * g;
            syy[i] = a12 * ex + a22 * ey + a26 * g;
            txy[i] = a16 * ex + a26 * ey + a66 * g;
        }
    }

    private void stressBlock(double[] exx, double[] eyy, double[] gxy, int srcOff,
            double[] sxx, double[] syy, double[] txy, int dstOff, int len) {
        final double a11 = q11;
        final double a12 = q12;
        final double a16 = q16;
        final double a22 = q22;
        final double a26 = q26;
        final double a66 = q66;
        for (int i = 0; i < len; i++) {
            double ex = exx[srcOff + i];
            double ey = eyy[srcOff + i];
            double g = gxy[srcOff + i];
            sxx[dstOff + i] = a11 * ex + a12 * ey + a16 * g;
            syy[dstOff + i] = a12 * ex + a22 * ey + a26 * g;
            txy[dstOff + i] = a16 * ex + a26 * ey + a66 * g;
        }
    }

    private static void checkBlock(double[] exx, double[] eyy, double[] gxy, int srcOff,
            double[] sxx, double[] syy, double[] txy, int dstOff, int len) {
        Objects.checkFromIndexSize(srcOff, len, Objects.requireNonNull(exx, "exx").length);
        Objects.checkFromIndexSize(srcOff, len, Objects.requireNonNull(eyy, "eyy").length);
        Objects.checkFromIndexSize(srcOff, len, Objects.requireNonNull(gxy, "gxy").length);
        Objects.checkFromIndexSize(dstOff, len, Objects.requireNonNull(sxx, "sxx").length);
        Objects.checkFromIndexSize(dstOff, len, Objects.requireNonNull(syy, "syy").length);
        Objects.checkFromIndexSize(dstOff, len, Objects.requireNonNull(txy, "txy").length);
        if (sxx == syy || sxx == txy || syy == txy) {
            throw new IllegalArgumentException("sxx, syy and txy must be three different arrays");
        }
        if (srcOff != dstOff) {
            for (double[] out : new double[][] {sxx, syy, txy}) {
                if (out == exx || out == eyy || out == gxy) {
                    throw new IllegalArgumentException("an output that is also an input array "
                            + "needs dstOff == srcOff: " + dstOff + " != " + srcOff);
                }
            }
        }
    }

    /**
     * The matrix Q in Pa, a new array {@code {{Q11, Q12, Q16}, {Q12, Q22, Q26}, {Q16, Q26, Q66}}}.
     */
    public double[][] toMatrix() {
        return new double[][] {{q11, q12, q16}, {q12, q22, q26}, {q16, q26, q66}};
    }

    /** The compliance S = Q⁻¹ in 1/Pa, a new array laid out as {@link #toMatrix()}. */
    public double[][] toComplianceMatrix() {
        return new double[][] {{s11, s12, s16}, {s12, s22, s26}, {s16, s26, s66}};
    }

    private static String text(double[] q) {
        return "Q11=" + gpa(q[0]) + ", Q12=" + gpa(q[1]) + ", Q16=" + gpa(q[2]) + ", Q22="
                + gpa(q[3]) + ", Q26=" + gpa(q[4]) + ", Q66=" + gpa(q[5]);
    }

    private static String gpa(double pascals) {
        return Format.withUnit(pascals * 1e-9, "GPa");
    }

    /**
     * The entries in GPa:
     * {@code PlaneStiffness[Q11=219.78 GPa, Q12=65.9341 GPa, Q16=0.0 GPa, ...]}.
     */
    @Override
    public String toString() {
        return "PlaneStiffness[" + text(new double[] {q11, q12, q16, q22, q26, q66}) + "]";
    }
}
