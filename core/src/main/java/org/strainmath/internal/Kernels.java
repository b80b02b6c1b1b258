package org.strainmath.internal;

/**
 * Helpers shared by the block kernels of strainmath core.
 *
 * <p>Stateless; thread-safe.
 */
public final class Kernels {

    /**
     * Samples per chunk of a block kernel: 2048 doubles (16 KiB) of output stay in the first-level
     * cache between the arithmetic loop and the NaN count that reads them back.
     */
    public static final int CHUNK = 2048;

    /**
     * Whether a block loop may carry a reduction inside its vectorised body (a running min or
     * max) in place of a pass of its own over the block: true on JDK 25 and later, whose C2
     * keeps such a loop vectorised and reduces once after it; false before, since JDK 17's C2
     * reduces the vector inside every iteration. Measured with JMH on this project's machines
     * (2026-12-02, side by side, 4096 samples, two forks): the bridge inverse with
     * {@code probe = Math.min(probe, ε·0)} in its loop (0 when every output is finite, NaN
     * otherwise) ran at 0.92 to 1.00 × its floor on JDK 25, against 0.71 to 0.74 × with the NaN
     * probe as a pass of its own; the channel with the codes' least and greatest taken in its
     * loop at 0.89 to 1.05 × its floor, against 0.56 to 0.78 × with the proof pass before it.
     * On JDK 17 the same forms were slower than the separate passes: a division loop with the
     * min at 0.39 × its floor (0.66 × with the pass), the channel at 0.27 × its proof-pass form.
     * Not used where it was measured slower on JDK 25 too (the rosette's von Mises loop, 0.78 →
     * 0.59 × its floor; plane stress). JDK 18 to 24 were not measured and take the separate
     * passes. Both ways give the same outputs and counts; the
     * tests run both on every JDK.
     */
    public static final boolean REDUCTIONS_IN_LOOP = Runtime.version().feature() >= 25;

    /**
     * The shortest chunk of {@code double} samples that takes the loop with the reduction
     * where {@link #REDUCTIONS_IN_LOOP} allows it; shorter ones take the separate probe. On
     * JDK 25 the bridge inverse with the running min ran at 0.42 to 0.52 × its floor on blocks
     * of 64 samples (against 0.85 to 1.15 × with the separate probe), and at 1.02 × on 4096.
     */
    public static final int REDUCTION_MIN_LENGTH = 512;

    private Kernels() {
    }

    /**
     * The count of NaN values in {@code a[off, off + len)}, in a pass of its own so that the
     * arithmetic loop before it holds no branch and no counter and stays vectorised.
     *
     * <p>Most blocks hold no NaN, so the pass first sums the block in eight independent
     * accumulators (no branch, about twice as fast as counting on these machines): a sum that
     * is finite proves the block free of NaN. Only a NaN, or an infinity or an overflow of the
     * sum, leads to the exact count.
     */
    public static int countNaN(double[] a, int off, int len) {
        if (sumIsFinite(a, off, len)) {
            return 0;
        }
        int count = 0;
        for (int j = off; j < off + len; j++) {
            double x = a[j];
            if (x != x) {
                count++;
            }
        }
        return count;
    }

    /**
     * 1 if {@code x} is finite, else 0, without a branch: x·0 + 1 is exactly 1 for a finite x and
     * NaN otherwise, and a NaN converts to the int 0. ANDed over the temperatures inside the
     * channel's fused loop (which already mixes {@code int} codes and {@code double}
     * arithmetic), it left that loop vectorised and replaced the NaN count there. Not a general
     * replacement for {@link #countNaN}: in the plain {@code double} loops of the bridge
     * inverse, plane stress and the rosette, the same probe made them two to four times slower
     * on JDK 17 and 25 (measured with JMH, 2026-12-01), and a branch on
     * {@code Double.isFinite} keeps C2 from vectorising any loop.
     */
    public static int finiteBit(double x) {
        return (int) (x * 0.0 + 1.0);
    }

    /**
     * The count of rows {@code i} in [off, off + len) where {@code a[i]}, {@code b[i]} or
     * {@code c[i]} is NaN: the samples of a three-output kernel that have no result. One pass
     * first proves all three ranges finite (the usual case); only if it fails are the rows
     * counted.
     */
    public static int countNaNRows(double[] a, double[] b, double[] c, int off, int len) {
        if (rowsAreFinite(a, b, c, off, len)) {
            return 0;
        }
        int count = 0;
        for (int j = off; j < off + len; j++) {
            double x = a[j];
            double y = b[j];
            double z = c[j];
            if (x != x || y != y || z != z) {
                count++;
            }
        }
        return count;
    }

    /**
     * The count of rows {@code i} in [off, off + len) where {@code a[i]} or {@code b[i]} is NaN,
     * for two-output kernels: each range is probed as {@link #countNaN} does (eight-way sums,
     * faster here than one pass over both), and the rows are counted only if a probe fails.
     */
    public static int countNaNRows(double[] a, double[] b, int off, int len) {
        if (sumIsFinite(a, off, len) && sumIsFinite(b, off, len)) {
            return 0;
        }
        int count = 0;
        for (int j = off; j < off + len; j++) {
            double x = a[j];
            double y = b[j];
            if (x != x || y != y) {
                count++;
            }
        }
        return count;
    }

    /**
     * Whether every value of the three ranges is finite, in one pass: x·0 is 0 for a finite x
     * and NaN otherwise, so four accumulators of those products stay 0 exactly when all are
     * finite, whatever their size.
     */
    private static boolean rowsAreFinite(double[] a, double[] b, double[] c, int off, int len) {
        double s0 = 0;
        double s1 = 0;
        double s2 = 0;
        double s3 = 0;
        int i = off;
        int end = off + len;
        for (; i + 3 < end; i += 4) {
            s0 += (a[i] + b[i] + c[i]) * 0.0;
            s1 += (a[i + 1] + b[i + 1] + c[i + 1]) * 0.0;
            s2 += (a[i + 2] + b[i + 2] + c[i + 2]) * 0.0;
            s3 += (a[i + 3] + b[i + 3] + c[i + 3]) * 0.0;
        }
        for (; i < end; i++) {
            s0 += (a[i] + b[i] + c[i]) * 0.0;
        }
        return (s0 + s1) + (s2 + s3) == 0;
    }

    /**
     * Whether the sum of {@code a[off, off + len)}, in eight independent accumulators, is
     * finite, which proves the range free of NaN (an infinity or an overflow also fails it).
     */
    private static boolean sumIsFinite(double[] a, int off, int len) {
        double s0 = 0;
        double s1 = 0;
        double s2 = 0;
        double s3 = 0;
        double s4 = 0;
        double s5 = 0;
        double s6 = 0;
        double s7 = 0;
        int i = off;
        int end = off + len;
        for (; i + 7 < end; i += 8) {
            s0 += a[i];
            s1 += a[i + 1];
            s2 += a[i + 2];
            s3 += a[i + 3];
            s4 += a[i + 4];
            s5 += a[i + 5];
            s6 += a[i + 6];
            s7 += a[i + 7];
        }
        for (; i < end; i++) {
            s0 += a[i];
        }
        double sum = ((s0 + s1) + (s2 + s3)) + ((s4 + s5) + (s6 + s7));
        return sum - sum == 0;
    }

    /**
     * The array a kernel reads so that it can index its input and its output with one index:
     * {@code src} itself when the offsets are equal; otherwise {@code dst}, after the input has
     * been copied into place with {@link System#arraycopy} (which handles any overlap). C2 does
     * not vectorise a loop that reads and writes double arrays at two different unknown offsets,
     * since they may alias; with one index it does, and the copy costs a fraction of the
     * arithmetic.
     */
    public static double[] sameIndexSource(double[] src, int srcOff, double[] dst, int dstOff,
            int len) {
        if (srcOff == dstOff) {
            return src;
        }
        System.arraycopy(src, srcOff, dst, dstOff, len);
        return dst;
    }
}
