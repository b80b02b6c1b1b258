package org.strainmath.internal;

/**
 * Helpers shared by the block kernels of strainmath core.
 *
 * <p>Stateless; thread-safe.
 */
public final class Kernels {

    private Kernels() {
    }

    /**
     * The count of NaN values in {@code a[off, off + len)}. A pass of its own, so that the
     * arithmetic loop before it holds no branch and no counter and stays vectorised.
     */
    public static int countNaN(double[] a, int off, int len) {
        int count = 0;
        for (int i = off, end = off + len; i < end; i++) {
            double x = a[i];
            if (x != x) {
                count++;
            }
        }
        return count;
    }
}
