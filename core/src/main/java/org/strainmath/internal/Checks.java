package org.strainmath.internal;

import java.util.Objects;

/**
 * The argument checks of strainmath core, in one place so that every public entry point rejects
 * bad input the same way.
 *
 * <p>Every comparison is written so that NaN fails it ({@code !(x > 0)}, never {@code x <= 0}).
 * Messages name the argument, the constraint and the rejected value, in that order:
 * {@code gaugeFactor must be > 0 and finite: NaN}.
 *
 * <p>Stateless; thread-safe.
 */
public final class Checks {

    private Checks() {
    }

    /**
     * Returns {@code x} if it is finite.
     *
     * @throws IllegalArgumentException if {@code x} is NaN or infinite
     */
    public static double finite(double x, String name) {
        if (!Double.isFinite(x)) {
            throw new IllegalArgumentException(name + " must be finite: " + x);
        }
        return x;
    }

    /**
     * Returns {@code x} if it is finite and strictly positive.
     *
     * @throws IllegalArgumentException otherwise, NaN included
     */
    public static double positiveFinite(double x, String name) {
        if (!(x > 0) || x == Double.POSITIVE_INFINITY) {
            throw new IllegalArgumentException(name + " must be > 0 and finite: " + x);
        }
        return x;
    }

    /**
     * Returns {@code x} if it is finite and not negative.
     *
     * @throws IllegalArgumentException otherwise, NaN included
     */
    public static double nonNegativeFinite(double x, String name) {
        if (!(x >= 0) || x == Double.POSITIVE_INFINITY) {
            throw new IllegalArgumentException(name + " must be >= 0 and finite: " + x);
        }
        return x;
    }

    /**
     * Returns {@code x} if it lies in the open interval ({@code low}, {@code high}).
     *
     * @throws IllegalArgumentException otherwise, NaN included
     */
    public static double inOpenInterval(double x, double low, double high, String name) {
        if (!(x > low && x < high)) {
            throw new IllegalArgumentException(
                    name + " must be in (" + low + ", " + high + "): " + x);
        }
        return x;
    }

    /**
     * Returns {@code x} if it is at least {@code low} and finite.
     *
     * @throws IllegalArgumentException otherwise, NaN included
     */
    public static double atLeastFinite(double x, double low, String name) {
        if (!(x >= low) || x == Double.POSITIVE_INFINITY) {
            throw new IllegalArgumentException(name + " must be >= " + low + " and finite: " + x);
        }
        return x;
    }

    /**
     * Checks the arguments of a block kernel {@code (src, srcOff, dst, dstOff, len)}: both arrays
     * non-null and both ranges inside their arrays.
     *
     * @throws NullPointerException if an array is null
     * @throws IndexOutOfBoundsException if a range is out of bounds or {@code len} is negative
     */
    public static void block(double[] src, int srcOff, double[] dst, int dstOff, int len) {
        block(Objects.requireNonNull(src, "src").length, srcOff, dst, dstOff, len);
    }

    /**
     * Checks the arguments of a block kernel whose source is an array of any type, given by its
     * length (the caller checks it for null first, naming it): {@code dst} non-null and both
     * ranges inside their arrays.
     *
     * @throws NullPointerException if {@code dst} is null
     * @throws IndexOutOfBoundsException if a range is out of bounds or {@code len} is negative
     */
    public static void block(int srcLength, int srcOff, double[] dst, int dstOff, int len) {
        Objects.requireNonNull(dst, "dst");
        Objects.checkFromIndexSize(srcOff, len, srcLength);
        Objects.checkFromIndexSize(dstOff, len, dst.length);
    }

    /**
     * Checks that {@code a[aOff, aOff + len)} and {@code b[bOff, bOff + len)} share no element:
     * for a kernel that reads {@code a} after it has begun to write {@code b}.
     *
     * @throws IllegalArgumentException if they are the same array and the ranges overlap
     */
    public static void disjoint(double[] a, int aOff, String aName, double[] b, int bOff,
            String bName, int len) {
        if (a == b && len > 0 && aOff < bOff + len && bOff < aOff + len) {
            throw new IllegalArgumentException(aName + " must not overlap " + bName + ": "
                    + aName + "[" + aOff + ", " + (aOff + len) + ") and " + bName + "[" + bOff
                    + ", " + (bOff + len) + ") of the same array");
        }
    }
}
