package org.strainmath.rosette;

import java.util.Objects;

/**
 * The argument checks of the rosette's block kernels (scalar arguments go through core's
 * {@code org.strainmath.internal.Checks}).
 *
 * <p>Stateless; thread-safe.
 */
final class Blocks {

    private Blocks() {
    }

    /**
     * Checks {@code readings} (one array per gauge, {@code gauges} of them) from {@code srcOff}
     * and the outputs from {@code dstOff}, {@code len} samples each, each output with the name
     * of its parameter (a null name for a kernel without a second or third output): every
     * output present, a different array, and an input array only at the same offset. No
     * allocation.
     */
    static void block(double[][] readings, int gauges, int srcOff, int dstOff, int len,
            double[] o1, String n1, double[] o2, String n2, double[] o3, String n3) {
        Objects.requireNonNull(readings, "readings");
        if (readings.length != gauges) {
            throw new IllegalArgumentException("readings must hold one array per gauge, "
                    + gauges + ": " + readings.length);
        }
        for (int j = 0; j < gauges; j++) {
            if (readings[j] == null) {
                throw new NullPointerException("readings[" + j + "]");   // message built only here
            }
            if (srcOff < 0 || len < 0 || srcOff > readings[j].length - len) {
                throw new IndexOutOfBoundsException("readings[" + j + "] has "
                        + readings[j].length + " values for " + len + " from " + srcOff);
            }
        }
        output(readings, srcOff, dstOff, len, o1, n1);
        if (n2 != null) {
            output(readings, srcOff, dstOff, len, o2, n2);
            if (o2 == o1) {
                throw new IllegalArgumentException(n1 + " and " + n2 + " must be different arrays");
            }
        }
        if (n3 != null) {
            output(readings, srcOff, dstOff, len, o3, n3);
            if (o3 == o1 || o3 == o2) {
                throw new IllegalArgumentException(n1 + ", " + n2 + " and " + n3
                        + " must be different arrays");
            }
        }
    }

    private static void output(double[][] readings, int srcOff, int dstOff, int len,
            double[] out, String name) {
        range(Objects.requireNonNull(out, name), name, dstOff, len);
        if (srcOff != dstOff) {
            for (double[] in : readings) {
                if (out == in) {
                    throw new IllegalArgumentException(name + " is also an input array and "
                            + "needs dstOff == srcOff: " + dstOff + " != " + srcOff);
                }
            }
        }
    }

    /**
     * Throws unless {@code a[off, off + len)} exists, naming the array (the message is built
     * only when it throws): {@code readings[1] has 10 values for 64 from 0}.
     */
    private static void range(double[] a, String name, int off, int len) {
        if (off < 0 || len < 0 || off > a.length - len) {
            throw new IndexOutOfBoundsException(name + " has " + a.length + " values for " + len
                    + " from " + off);
        }
    }
}
