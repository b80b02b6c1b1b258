package org.strainmath.history;

import java.util.Objects;

import org.strainmath.internal.Checks;
import org.strainmath.internal.Kernels;
import org.strainmath.quantity.Angle;

/**
 * Block helpers that turn a two-dimensional stress history (a rosette's, in plane stress) into
 * the one history a uniaxial count needs. Both are common practice (no source) for loading whose
 * principal directions stay nearly fixed (proportional loading):
 * <ul>
 *   <li>{@link #largerMagnitude}: the principal stress of larger magnitude, with its sign, so
 *       that a reversal from tension to compression counts its full range;</li>
 *   <li>{@link #normalOnPlane}: the normal stress on one fixed plane; repeated over planes a few
 *       degrees apart, the plane of largest damage is a simple critical-plane search.</li>
 * </ul>
 * <b>Not covered.</b> Non-proportional loading, where the principal directions turn during a
 * cycle (out-of-phase bending and torsion, moving loads near a weld): the larger principal
 * stress then jumps between directions and its count is no measure of damage on any plane, and
 * the fixed-plane scan misses the shear and normal stress interaction of the critical-plane
 * models (Findley, Brown–Miller, Fatemi–Socie), which this library does not implement. Nor
 * anything below the surface: a rosette measures the plane-stress state of the surface it is
 * bonded to.
 *
 * <p>Stateless; thread-safe. Per-sample arithmetic never throws: a NaN input gives NaN.
 */
public final class Histories {

    private Histories() {
    }

    /**
     * Writes, for each sample, whichever of {@code s1[i]} and {@code s2[i]} has the larger
     * magnitude, with its sign ({@code s1} on a tie): the signed principal stress of larger
     * magnitude from a rosette's {@code toPrincipalStresses}. NaN if either input is NaN or
     * infinite. Allocation-free; {@code dst} may be {@code s1} or {@code s2} at the same offset.
     *
     * @return the number of NaN outputs
     * @throws NullPointerException      if an array is null
     * @throws IndexOutOfBoundsException if a range is outside its array
     * @throws IllegalArgumentException  if {@code dst} overlaps an input at another offset
     */
    public static int largerMagnitude(double[] s1, double[] s2, int srcOff, double[] dst,
            int dstOff, int len) {
        Objects.requireNonNull(s1, "s1");
        Checks.block(s1, srcOff, dst, dstOff, len);
        Objects.requireNonNull(s2, "s2");
        Objects.checkFromIndexSize(srcOff, len, s2.length);
        sameOffsetOnly(s1, "s1", srcOff, dst, dstOff, len);
        sameOffsetOnly(s2, "s2", srcOff, dst, dstOff, len);
        for (int i = 0; i < len; i++) {
            double a = s1[srcOff + i];
            double b = s2[srcOff + i];
            double pick = Math.abs(a) >= Math.abs(b) ? a : b;
            dst[dstOff + i] = pick + (a - a) + (b - b);
        }
        return Kernels.countNaN(dst, dstOff, len);
    }

    /**
     * Writes the normal stress on the plane whose normal lies at {@code plane} counter-clockwise
     * from x, for each sample of the plane-stress history σx, σy, τxy:
     * <pre>
     *   σn = (σx + σy)/2 + (σx − σy)/2 · cos 2θ + τxy · sin 2θ
     * </pre>
     * (the stress transformation equation; e.g. Gere and Goodno, <i>Mechanics of
     * Materials</i>, ch. 7). Allocation-free; {@code dst} may be an input at the same offset.
     *
     * @return the number of NaN outputs
     * @throws NullPointerException      if an argument is null
     * @throws IndexOutOfBoundsException if a range is outside its array
     * @throws IllegalArgumentException  if {@code dst} overlaps an input at another offset
     */
    public static int normalOnPlane(double[] sxx, double[] syy, double[] txy, int srcOff,
            Angle plane, double[] dst, int dstOff, int len) {
        Objects.requireNonNull(sxx, "sxx");
        Checks.block(sxx, srcOff, dst, dstOff, len);
        Objects.requireNonNull(syy, "syy");
        Objects.requireNonNull(txy, "txy");
        Objects.requireNonNull(plane, "plane");
        Objects.checkFromIndexSize(srcOff, len, syy.length);
        Objects.checkFromIndexSize(srcOff, len, txy.length);
        sameOffsetOnly(sxx, "sxx", srcOff, dst, dstOff, len);
        sameOffsetOnly(syy, "syy", srcOff, dst, dstOff, len);
        sameOffsetOnly(txy, "txy", srcOff, dst, dstOff, len);
        double twice = 2 * plane.toRadians();
        double cos = StrictMath.cos(twice);
        double sin = StrictMath.sin(twice);
        for (int i = 0; i < len; i++) {
            double x = sxx[srcOff + i];
            double y = syy[srcOff + i];
            double t = txy[srcOff + i];
            dst[dstOff + i] = 0.5 * (x + y) + 0.5 * (x - y) * cos + t * sin;
        }
        return Kernels.countNaN(dst, dstOff, len);
    }

    /** An output may be an input only at the same offset, where each sample is read first. */
    private static void sameOffsetOnly(double[] in, String name, int srcOff, double[] dst,
            int dstOff, int len) {
        if (srcOff != dstOff) {
            Checks.disjoint(in, srcOff, name, dst, dstOff, "dst", len);
        }
    }
}
